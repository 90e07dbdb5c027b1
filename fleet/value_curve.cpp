// The class market-value curve (see value_curve.h).
#include "fleet/value_curve.h"

#include <cmath>

#include "core/checks.h"
#include "core/errors.h"

namespace tenure::fleet {

std::string_view name(ValueModel model) { return model == ValueModel::fitted ? "fitted" : "policy"; }

ValuationFate ValuationPool::add(Date in_service, Money first_cost, Date valued_on, Money amount) {
  require_positive(first_cost, "first_cost");
  if (!std::isfinite(amount)) return ValuationFate::non_finite_amount;
  if (valued_on < in_service) return ValuationFate::before_in_service;
  const double fraction = amount / first_cost;
  if (!(fraction > 0)) {  // also catches an underflow of amount / first_cost to 0
    ++excluded_non_positive_;
    return ValuationFate::non_positive_fraction;
  }
  log_line_.add(years_between(in_service, valued_on), std::log(fraction));
  return ValuationFate::used;
}

double ValueCurve::fraction_at(double age_years) const {
  require_finite(age_years, "age_years");
  return value_start * std::pow(1 - value_decline, age_years);
}

ValueCurve policy_value_curve(Rate annual_decline) {
  require_finite(annual_decline, "annual_decline");
  if (annual_decline >= 1) throw InputError("annual_decline", "must be < 1");
  return {ValueModel::policy, 1.0, annual_decline, 0};
}

ValueCurve fit_value_curve(const ValuationPool& pool, Rate annual_decline) {
  const ValueCurve fallback = policy_value_curve(annual_decline);
  const LineFit& line = pool.log_line();
  if (line.points() < kMinValuations || !line.x_varies()) return fallback;
  const double start = std::exp(line.intercept());
  const double keep_per_year = std::exp(line.slope());  // 1 - value_decline
  if (!std::isfinite(start) || !(start > 0) || !std::isfinite(keep_per_year) ||
      !(keep_per_year > 0)) {
    return fallback;
  }
  return {ValueModel::fitted, start, -std::expm1(line.slope()), line.points()};
}

}  // namespace tenure::fleet
