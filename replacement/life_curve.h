// EUAC against years kept, its least point (the economic service life of a challenger, the best
// remaining life of a defender) and the marginal cost of each year (SPEC 6). Ties within
// kTieTolerance go to the shorter life.
//
//   LifeCurve c = life_curve(before_tax_keeping_costs(asset, 0.10));
//   c.best_years; c.best_euac; c.euac[0] /* 1 year */; c.marginal_costs[0] /* year 1 */;
#pragma once

#include <vector>

#include "core/types.h"
#include "replacement/keeping_costs.h"

namespace tenure::replacement {

struct LifeCurve {
  std::vector<Money> euac;            // euac[n-1] = EUAC of keeping n years, n = 1..N
  std::vector<Money> marginal_costs;  // marginal_costs[k-1] = marginal cost of year k
  Years best_years;                   // argmin of euac, shortest on ties
  Money best_euac;
};

LifeCurve life_curve(const KeepingCosts& costs);

// Index of the least value, the first one among values equal within kTieTolerance (relative).
std::size_t least_with_ties(const std::vector<Money>& values);

}  // namespace tenure::replacement
