// Refitting a class cost curve from per-asset sums (see curve_refit.h).
#include "fleet/curve_refit.h"

#include <cmath>

namespace tenure::fleet {

CurveSums curve_sums(const CostCurve& curve, std::span<const Money> year_costs) {
  const bool geometric = curve.model == CostModel::geometric;
  CurveSums sums;
  for (std::size_t i = 0; i < year_costs.size(); ++i) {
    const Money y = year_costs[i];
    if (geometric && !(y > 0)) continue;  // rule (1)
    const int k = static_cast<int>(i) + 1;
    const double x = static_cast<double>(i);
    const double residual =
        geometric ? std::log(y) - std::log(curve.predict(k)) : y - curve.predict(k);
    sums.n += 1;
    sums.x += x;
    sums.xx += x * x;
    sums.e += residual;
    sums.xe += x * residual;
  }
  if (sums.n > 0) sums.assets = 1;
  return sums;
}

std::optional<CostCurve> refit(const CostCurve& curve, const CurveSums& drawn) {
  if (!(drawn.n > 0)) return std::nullopt;  // rule (5)
  const bool geometric = curve.model == CostModel::geometric;
  const double mean_x = drawn.x / drawn.n;
  const double mean_e = drawn.e / drawn.n;
  const double spread = drawn.xx - drawn.x * mean_x;
  CostCurve out = curve;
  out.r2 = 0;
  out.asset_years = static_cast<std::size_t>(drawn.n);
  out.excluded_non_positive = 0;
  out.assets = drawn.assets;
  out.single_age = spread < 0.25;  // rule (4)
  if (out.single_age) {
    const int age = static_cast<int>(std::lround(mean_x)) + 1;
    out.a = geometric ? curve.predict(age) * std::exp(mean_e) : curve.predict(age) + mean_e;
    out.g = 0;
    return out;
  }
  // Rule (3): the residuals' line, intercept at x = 0 (age-year 1).
  const double slope = (drawn.xe - drawn.x * mean_e) / spread;
  const double intercept = mean_e - slope * mean_x;
  if (geometric) {
    out.a = curve.a * std::exp(intercept);
    out.g = (1 + curve.g) * std::exp(slope) - 1;
  } else {
    out.a = curve.a + intercept;
    out.g = curve.g + slope;
  }
  return out;
}

}  // namespace tenure::fleet
