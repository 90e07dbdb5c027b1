// Restating past money into as-of money (see escalation.h).
#include "fleet/escalation.h"

#include "core/checks.h"

namespace tenure::fleet {

Escalation::Escalation(Date as_of, Rate cost_escalation)
    : as_of_(as_of), rate_(cost_escalation), log_growth_per_day_(0) {
  require_rate(cost_escalation, "cost_escalation");
  // log1p keeps small rates exact; e = 0 gives exactly 0, so factor() is exactly 1.
  log_growth_per_day_ = std::log1p(cost_escalation) / kDaysPerYear;
}

}  // namespace tenure::fleet
