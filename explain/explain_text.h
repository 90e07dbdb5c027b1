// `tenure explain` for people: one asset's whole computation as numbered sections of aligned
// tables a reviewer can check line by line, the verdict first and the caution of SPEC 10 last.
//
//   std::cout << explanation_to_text(explain_asset(run, cls, asset, input));
//   // tenure explain: asset FLT-00049 (class forklift-electric), run 1 as of 2026-11-30
//   //
//   // Verdict: REPLACE now (after-tax basis)
//   //   Replace: keeping it any longer costs more than a new unit; ...
//   // ...
//   // 1. Inputs
//   //   asset                       FLT-00049
//   //   ...
#pragma once

#include <string>

#include "explain/explanation.h"

namespace tenure::explain {

// Sections: the verdict and whether the stored figures were reproduced; 1 inputs; 2 rates and
// money; 3 class curves; 4 own cost history and credibility; 5 the defender's future; 6 selling
// now; 7 the defender's after-tax cash flows with present worth and the sale columns; 8 EUAC by
// years kept, defender and challenger, with marginal costs; 9 the challenger's cash flows;
// 10 replacement timing with k*; 11 the verdict's rule; then the caution.
std::string explanation_to_text(const Explanation& e);

}  // namespace tenure::explain
