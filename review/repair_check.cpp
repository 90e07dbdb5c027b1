// The repair check's rules (see repair_check.h).
#include "review/repair_check.h"

#include <cmath>
#include <string>
#include <vector>

#include "core/checks.h"
#include "core/errors.h"
#include "replacement/life_curve.h"
#include "replacement/stakes.h"

namespace tenure::review {

const char* to_string(RepairVerdict verdict) {
  return verdict == RepairVerdict::repair ? "repair" : "replace";
}

const char* to_string(NotWeighed why) {
  switch (why) {
    case NotWeighed::retired:
      return "retired";
    case NotWeighed::rejected:
      return "rejected";
    case NotWeighed::not_yet_in_service:
      return "not_yet_in_service";
    case NotWeighed::cannot_weigh:
      return "cannot_weigh";
    case NotWeighed::not_in_run:
      break;
  }
  return "not_in_run";
}

RepairWeighing weigh_repair(const replacement::Timing& timing, double deduction_factor,
                            Money estimate) {
  RepairWeighing w{};
  w.repair_limit = replacement::stakes(timing, deduction_factor).repair_limit;
  w.deduction_factor = deduction_factor;
  w.net_cost = estimate * deduction_factor;  // rule (2)
  w.keep_years = timing.keep_years;
  w.verdict = w.repair_limit > 0 && estimate <= w.repair_limit  // rule (1)
                  ? RepairVerdict::repair
                  : RepairVerdict::replace;
  const replacement::Timing repaired =
      replacement::after_repair(timing, estimate, deduction_factor);
  // Rule (3). With a replace verdict the estimate is above the limit: no T(k) + net cost with
  // k >= 1 is below T(0), and this is 0.
  w.keep_years_if_repaired = repaired.keep_years;
  if (w.verdict == RepairVerdict::repair && w.keep_years_if_repaired == 0) {
    const std::vector<Money> kept(repaired.present_worth.begin() + 1, repaired.present_worth.end());
    w.keep_years_if_repaired = static_cast<Years>(replacement::least_with_ties(kept)) + 1;
  }
  return w;
}

void require_repair_estimate(double estimate, std::string_view where) {
  if (!std::isfinite(estimate) || estimate < 0 || estimate > kMaxAmount) {  // rule (4)
    throw InputError(std::string(where), "must be a finite amount >= 0 and at most 1e15");
  }
}

}  // namespace tenure::review
