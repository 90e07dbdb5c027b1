// When to replace (SPEC 6): with the challenger repeated forever at its least EUAC C*, keep the
// defender k* = argmin over k >= 0 of PWcost(k) + (C* / i) (P/F, i, k) years; earliest on ties.
//
//   Timing t = optimal_replacement(defender_costs, challenger_curve.best_euac);
//   t.keep_years;   // k*; 0 means replace now
#pragma once

#include <span>
#include <vector>

#include "core/types.h"
#include "replacement/keeping_costs.h"

namespace tenure::replacement {

struct Timing {
  std::vector<Money> present_worth;  // [k] = PWcost(k) + (C*/i)(P/F,i,k), k = 0..M
  Years keep_years;                  // k*
};

Timing optimal_replacement(const KeepingCosts& defender, Money challenger_least_euac);

// With technology that improves (SPEC 14): T(k) = PWcost(k) + (P/F, i, k) C*_k / i, where
// least_euac_by_year[k] = C*_k is the least EUAC of the challenger bought k years from now;
// it must hold at least defender.max_years() + 1 values.
Timing optimal_replacement(const KeepingCosts& defender, std::span<const Money> least_euac_by_year);

}  // namespace tenure::replacement
