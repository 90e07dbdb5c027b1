// What is at stake in a replacement decision (SPEC 11), from the timing present worths T(k) of
// replacement/timing.h, all on the decision's basis and in present worth at the start:
//
//   (1) delay_cost = T(k*+1) - T(k*): what missing the best time by one year costs; none when k*
//       is the last year weighed (there is no later year to compare).
//   (2) early_cost = T(0) - T(k*): what replacing now instead of at the best time costs.
//   (3) repair_limit: the largest one-time repair, paid now with the costs ahead unchanged, still
//       worth making rather than replacing now. A repair R adds its cost to every T(k), k >= 1,
//       and nothing to T(0); so R_net = max(0, T(0) - min over k >= 1 of T(k)), and
//       R = R_net / repair_deduction_factor (after tax the repair is expensed, its deduction at
//       the end of year 1). 0 when k* = 0 (replace).
//
//   Stakes s = stakes(decision.timing, repair_deduction_factor(rates, decision.basis));
//   s.delay_cost;     // 1234.56, or none
#pragma once

#include <optional>

#include "core/types.h"
#include "replacement/keeping_costs.h"
#include "replacement/timing.h"
#include "tax/rates.h"

namespace tenure::replacement {

struct Stakes {
  std::optional<Money> delay_cost;  // rule (1)
  Money early_cost = 0;             // rule (2)
  Money repair_limit = 0;           // rule (3)
};

// What a repair of 1 paid now costs net of tax, in present worth: 1 before tax;
// 1 - t (P/F, after-tax MARR, 1) after tax.
double repair_deduction_factor(const tax::Rates& rates, Basis basis);

Stakes stakes(const Timing& timing, double repair_deduction_factor);

// The timing after a repair of `repair` (its net cost, repair x repair_deduction_factor, added
// to every T(k), k >= 1): what `tenure repair` weighs.
Timing after_repair(const Timing& timing, Money repair, double repair_deduction_factor);

}  // namespace tenure::replacement
