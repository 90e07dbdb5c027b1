// The class market-value curve (SPEC 6 "Fleet data", SPEC 7 tenure_class_latest): what a unit is
// worth as a fraction of its first cost at a given age,
//     fraction(age) = value_start * (1 - value_decline)^age,
// fitted log-linearly on the class's valuations, else the policy's market_value.annual_decline.
//
//   ValuationPool pool;
//   pool.add(in_service, first_cost, valued_on, amount);   // once per valuation row
//   ValueCurve curve = fit_value_curve(pool, 0.18);          // policy annual_decline
//   curve.fraction_at(4.0) * first_cost;                     // market value at age 4
//
// Rules:
//   (1) A valuation is the point (age, fraction): age = years_between(in_service, valued_on)
//       (fractional, days / 365.25), fraction = amount / first_cost.
//   (2) Valuations with fraction <= 0 have no logarithm: they are excluded and counted.
//   (3) Fitted by least squares on ln fraction = ln value_start + age ln(1 - value_decline), so
//       value_start = e^intercept and value_decline = 1 - e^slope. A rising curve (decline < 0)
//       is kept as fitted; decline < 1 holds by construction.
//   (4) The fit needs at least kMinValuations usable valuations at two or more distinct ages;
//       with fewer, or when the fitted numbers are not finite and positive (an overflow of
//       e^slope or e^intercept), the curve is the policy's: value_start = 1,
//       value_decline = annual_decline, model "policy", valuations_used = 0.
#pragma once

#include <cstddef>
#include <string_view>

#include "core/types.h"
#include "fleet/date.h"
#include "fleet/line_fit.h"

namespace tenure::fleet {

inline constexpr std::size_t kMinValuations = 3;  // rule (4)

enum class ValueModel { fitted, policy };
std::string_view name(ValueModel model);  // "fitted" | "policy"

enum class ValuationFate {
  used,                   // entered the pool
  non_positive_fraction,  // excluded by rule (2); not an input error
  before_in_service,      // rejected: valued before the asset's in-service date
  non_finite_amount,      // rejected: NaN or infinite amount
};

// The usable valuations of one class, as a running log-linear fit (memory O(1)).
class ValuationPool {
 public:
  // Rule (1). Throws InputError naming "first_cost" unless it is finite and > 0.
  ValuationFate add(Date in_service, Money first_cost, Date valued_on, Money amount);

  std::size_t used() const { return log_line_.points(); }
  std::size_t excluded_non_positive() const { return excluded_non_positive_; }
  // x = age in years, y = ln fraction.
  const LineFit& log_line() const { return log_line_; }

 private:
  LineFit log_line_;
  std::size_t excluded_non_positive_ = 0;
};

struct ValueCurve {
  ValueModel model;
  double value_start;    // fraction of first cost at age 0
  Rate value_decline;    // fraction of value lost per year; < 1
  std::size_t valuations_used;

  // value_start * (1 - value_decline)^age_years. Throws InputError naming "age_years" unless it
  // is finite.
  double fraction_at(double age_years) const;
};

// The policy curve of rule (4). Throws InputError naming "annual_decline" unless it is finite and
// < 1.
ValueCurve policy_value_curve(Rate annual_decline);

// Rules (3) and (4). Checks annual_decline as policy_value_curve does, even when the fit succeeds.
ValueCurve fit_value_curve(const ValuationPool& pool, Rate annual_decline);

}  // namespace tenure::fleet
