// EUAC curve, least EUAC and marginal costs (see life_curve.h).
#include "replacement/life_curve.h"

#include <algorithm>
#include <cmath>

namespace tenure::replacement {

std::size_t least_with_ties(const std::vector<Money>& values) {
  std::size_t best = 0;
  for (std::size_t k = 1; k < values.size(); ++k) {
    const double scale = std::max(std::abs(values[k]), std::abs(values[best]));
    // Strictly smaller beyond the tolerance; equal within it keeps the earlier (shorter) one.
    if (values[k] < values[best] - kTieTolerance * scale) best = k;
  }
  return best;
}

LifeCurve life_curve(const KeepingCosts& costs) {
  LifeCurve curve;
  for (Years n = 1; n <= costs.max_years(); ++n) {
    curve.euac.push_back(costs.euac(n));
    curve.marginal_costs.push_back(costs.marginal_cost(n));
  }
  const std::size_t best = least_with_ties(curve.euac);
  curve.best_years = static_cast<Years>(best) + 1;
  curve.best_euac = curve.euac[best];
  return curve;
}

}  // namespace tenure::replacement
