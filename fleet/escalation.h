// Restating past money into as-of money with the policy's cost_escalation (SPEC 4, SPEC 6
// "Fleet data"). Restated costs are constant as-of money, so the analysis must then use a real
// MARR (NIST Handbook 135 practice).
//
//   Escalation e(*parse_iso_date("2024-01-01"), 0.03);
//   e.restate(*parse_iso_date("2023-01-01"), 1000.0);   // 1000 * 1.03^(365 / 365.25)
//
// Rule (1): an amount paid on day D is worth amount * (1 + e)^(t) on the as-of date, with
// t = (as_of - D in whole days) / 365.25, exact fractional years (date.h rule 4). An event on the
// as-of date keeps its amount; e = 0 keeps every amount exactly.
#pragma once

#include <cmath>

#include "core/types.h"
#include "fleet/date.h"

namespace tenure::fleet {

class Escalation {
 public:
  // Throws InputError naming "cost_escalation" unless it is finite and > -1.
  Escalation(Date as_of, Rate cost_escalation);

  Date as_of() const { return as_of_; }
  Rate rate() const { return rate_; }

  // (1 + e)^(t) of rule (1), as exp(days * ln(1 + e) / 365.25): one exp per event.
  double factor(Date occurred_on) const {
    return std::exp(days_between(occurred_on, as_of_) * log_growth_per_day_);
  }
  Money restate(Date occurred_on, Money amount) const { return amount * factor(occurred_on); }

 private:
  Date as_of_;
  Rate rate_;
  double log_growth_per_day_;
};

}  // namespace tenure::fleet
