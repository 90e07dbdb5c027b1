// An asset's own cost level against its class curve, credibility weighted (SPEC 6 "Fleet data"):
// its future costs are the class curve times `factor`.
//
//   Credibility c = credibility(history.year_costs(asset), class_curve);
//   c.factor * class_curve.predict(age + 1);   // the asset's expected cost next year
//
// Rules:
//   (1) m = the asset's complete age-years (the length of year_costs).
//   (2) r = (sum of its restated costs over years 1..m) / (sum of curve.predict(k), k = 1..m):
//       a ratio of totals, so one odd year weighs by its money, not as a ratio of its own.
//   (3) z = m / (m + kCredibilityYears), kCredibilityYears = 3.
//   (4) factor = 1 + z (r - 1).
//   (5) With m = 0, a predicted total <= 0 (a falling linear curve, say) or one so small or large
//       that r is not a finite number, r cannot be measured: r is reported as 1, so factor = 1
//       (the class curve as is), measured = false.
#pragma once

#include <span>

#include "core/types.h"
#include "fleet/cost_curve.h"

namespace tenure::fleet {

inline constexpr int kCredibilityYears = 3;  // rule (3)

struct Credibility {
  int years;      // m
  double ratio;   // r; 1 when not measured
  double weight;  // z
  double factor;  // 1 + z (r - 1)
  bool measured;  // false under rule (5)
};

// year_costs[k-1] is the asset's restated cost of complete age-year k (CostHistory::year_costs).
Credibility credibility(std::span<const Money> year_costs, const CostCurve& curve);

}  // namespace tenure::fleet
