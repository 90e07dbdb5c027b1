// A fixed study period of T years (SPEC 6): for j = 0..T keep the defender j years, then the
// challenger T - j years, sold at its market value then. Options that would need more years than
// a cost series holds are left out. Earliest j on ties.
//
//   StudyPeriod s = study_period(&defender_costs, challenger_costs, 3);
//   s.best_defender_years;
#pragma once

#include <vector>

#include "core/types.h"
#include "replacement/keeping_costs.h"

namespace tenure::replacement {

struct StudyOption {
  Years defender_years;
  Money present_worth_cost;  // PWdef(j) + (P/F, i, j) PWch(T - j)
};

struct StudyPeriod {
  Years years;
  std::vector<StudyOption> options;
  Years best_defender_years;
};

// `defender` may be null (no defender: the only option is j = 0). Throws InputError naming
// "$.study_period_years" when T < 1 or no option fits the series.
StudyPeriod study_period(const KeepingCosts* defender, const KeepingCosts& challenger, Years years);

}  // namespace tenure::replacement
