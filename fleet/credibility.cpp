// Credibility-weighted asset level (see credibility.h).
#include "fleet/credibility.h"

#include <cmath>

namespace tenure::fleet {

Credibility credibility(std::span<const Money> year_costs, const CostCurve& curve) {
  const int m = static_cast<int>(year_costs.size());
  const double z = static_cast<double>(m) / (m + kCredibilityYears);
  double observed = 0;
  double predicted = 0;
  for (int k = 1; k <= m; ++k) {
    observed += year_costs[static_cast<std::size_t>(k - 1)];
    predicted += curve.predict(k);
  }
  if (m == 0 || !(predicted > 0) || !std::isfinite(predicted)) {
    return {m, 1.0, z, 1.0, false};  // rule (5)
  }
  const double r = observed / predicted;
  if (!std::isfinite(r) || !std::isfinite(1 + z * (r - 1))) return {m, 1.0, z, 1.0, false};
  return {m, r, z, 1 + z * (r - 1), true};
}

}  // namespace tenure::fleet
