// The repair check at the counter (SPEC 11 "At the counter"): one asset, one repair estimate R
// paid now, repair or replace, from the timing present worths T(k) of its decision
// (replacement/timing.h) and its repair limit (replacement/stakes.h rule (3)). What a stored run
// did not weigh (retired, rejected, not yet in service, a class without a cost curve) is said
// instead of a verdict. app/repair_check.h reads it from a run; repair_reasons.h words it.
//
//   RepairWeighing w = weigh_repair(decision.timing, repair_deduction_factor(rates, basis), 1500);
//   w.verdict;                  // RepairVerdict::repair
//   w.keep_years_if_repaired;   // k* after repairing: keep it that many years, then replace
//
// Rules (cited by the code):
//   (1) repair when R <= repair_limit and the limit is above 0; otherwise replace. A unit whose
//       k* is 0 has a limit of 0: keeping it costs more than replacing it now, and no repair,
//       even a free one, changes that.
//   (2) The estimate weighs at its net cost R x repair_deduction_factor: all of it before tax;
//       after tax it is expensed, its deduction at the end of year 1.
//   (3) k* after repairing: replacement::after_repair, the net cost added to every T(k), k >= 1.
//       At the limit itself keeping and replacing now cost the same and the tie rule (earliest)
//       picks 0; the verdict there is repair (rule (1)), so it is the best k >= 1. With a replace
//       verdict it is 0.
//   (4) An estimate is a finite amount >= 0 and at most kMaxAmount (1e15).
#pragma once

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>

#include "core/types.h"
#include "replacement/keeping_costs.h"
#include "replacement/timing.h"

namespace tenure::review {

enum class RepairVerdict { repair, replace };
const char* to_string(RepairVerdict verdict);  // "repair" | "replace"

// Why a stored run did not weigh an asset the asset relation holds.
enum class NotWeighed {
  retired,             // retired on or before the as-of date: its costs fed the curves only
  rejected,            // its row was rejected (tenure_rejected says why)
  not_yet_in_service,  // put in service after the as-of date
  cannot_weigh,        // its class has no cost curve, so no challenger (verdict_rule.h rule (0))
  not_in_run,          // none of these: most likely added after the run
};
// "retired" | "rejected" | "not_yet_in_service" | "cannot_weigh" | "not_in_run"
const char* to_string(NotWeighed why);

struct RepairWeighing {
  RepairVerdict verdict;
  Money repair_limit;            // replacement::stakes rule (3)
  double deduction_factor;       // replacement::repair_deduction_factor on the basis
  Money net_cost;                // rule (2): the estimate x deduction_factor
  Years keep_years;              // k* without the repair, the run's
  Years keep_years_if_repaired;  // rule (3)
};

// Rules (1) to (3) for the estimate `estimate` (checked by require_repair_estimate).
RepairWeighing weigh_repair(const replacement::Timing& timing, double deduction_factor,
                            Money estimate);

// Rule (4): throws InputError(where, "must be a finite amount >= 0 and at most 1e15").
void require_repair_estimate(double estimate, std::string_view where);

// The whole answer for one asset of a stored run.
struct RepairCheck {
  std::string asset_id;
  std::optional<std::string> asset_class;  // none when the run did not review the asset
  std::int64_t run_id = 0;
  std::string as_of;                                         // the run's, YYYY-MM-DD
  replacement::Basis basis = replacement::Basis::after_tax;  // the run's verdict basis
  Money estimate = 0;
  std::optional<RepairWeighing> weighing;  // none when the run did not weigh the asset ...
  std::optional<NotWeighed> not_weighed;   // ... and this says why
  std::string reason;                      // one sentence with the numbers (repair_reasons.h)
};

}  // namespace tenure::review
