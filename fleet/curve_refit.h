// Refitting a class cost curve (cost_curve.h) on a resample of the class's assets, as the
// bootstrap of review/esl_bootstrap.h does 200 times, without reading any asset's cost years
// again: each asset's complete years are reduced once to the five sums a least-squares line
// needs, and a refit adds up the sums of the assets drawn (an asset drawn twice, twice).
//
//   std::vector<CurveSums> sums;   // once per asset of the class:
//   for (auto a : assets) sums.push_back(curve_sums(curve, history.year_costs(a)));
//   CurveSums drawn;               // then per refit:
//   for (std::size_t i : draws) drawn.add(sums[i]);
//   std::optional<CostCurve> again = refit(curve, drawn);   // the curve of the drawn assets
//
// Rules:
//   (1) The points are those of cost_curve.h rules (1) and (2) for the curve's model: (k, y) of
//       every complete age-year for a linear curve; for a geometric one only y > 0, on ln y.
//   (2) Each point enters as x = k - 1 and its residual e against the curve it is refitted from:
//       e = y - predict(k) (linear), e = ln y - ln predict(k) (geometric). Residuals are the
//       scatter about the curve, not the cost level, so the sums lose no digits to cancellation.
//   (3) The refit is the least-squares line of the points, the model's own fit: the line of the
//       residuals, intercept d0 and slope d1, corrects the curve, a' = a + d0 and g' = g + d1
//       (linear) or a' = a e^d0 and 1 + g' = (1 + g) e^d1 (geometric). Least squares is linear
//       in y, so this equals fit_cost_curve with the same model on the same points (to
//       rounding); residuals that are all zero give back a curve that predicts exactly what
//       `curve` predicts.
//   (4) When all points share one age the curve is flat at their mean (linear) or geometric mean
//       (geometric), g = 0 and single_age, as cost_curve.h rule (5). The ages are whole
//       numbers, so two distinct ages give a spread sum_x2 - sum_x^2 / n of at least 1/2; below
//       1/4 the points are read as one age.
//   (5) No point, no curve (nullopt). A refitted curve carries r2 = 0 (not computed: the
//       bootstrap needs only its prediction) and counts its points in asset_years.
#pragma once

#include <optional>
#include <span>

#include "core/types.h"
#include "fleet/cost_curve.h"

namespace tenure::fleet {

// The sums of rule (2) over some points.
struct CurveSums {
  double n = 0;            // points
  double x = 0;            // sum of x
  double xx = 0;           // sum of x^2
  double e = 0;            // sum of residuals
  double xe = 0;           // sum of x e
  std::size_t assets = 0;  // assets whose sums were added

  // `other` added `times` times (an asset drawn that often); inline, as a refit adds every
  // asset's sums.
  void add(const CurveSums& other, std::size_t times = 1) {
    const auto w = static_cast<double>(times);
    n += w * other.n;
    x += w * other.x;
    xx += w * other.xx;
    e += w * other.e;
    xe += w * other.xe;
    assets += times * other.assets;
  }
};

// One asset's complete years (year_costs[k-1] = cost of age-year k) against `curve`, rule (2).
// An asset with no point of the curve's model has n = 0 and assets = 0.
CurveSums curve_sums(const CostCurve& curve, std::span<const Money> year_costs);

// Rules (3) to (5): the curve of the points in `drawn`, refitted from `curve`.
std::optional<CostCurve> refit(const CostCurve& curve, const CurveSums& drawn);

}  // namespace tenure::fleet
