// The repair check (review/repair_check.h, SPEC 11 "At the counter") written out: a few lines for
// the counter (`tenure repair`), and one JSON document for tools, which `tenure repair --format
// json` prints and the SQL function tenure_repair_check returns.
//
//   repair_check_text(check);
//   // REPAIR  asset PF-010 (class pump-fixture), run 1 as of 2026-06-30, after-tax basis
//   //   repair limit      2,345.67
//   //   estimate          1,500.00 (1,151.16 net of its tax deduction, in present worth)
//   //   after repairing   keep it 3 years more, then replace (k* = 3)
//   // Repair: the estimate of 1500.00 is within the repair limit of 2345.67 on ...
//   //
//   // Caution: ...
//   repair_check_to_json(check)["verdict"];   // "repair"
//
// JSON keys, always all of them (null where there is no figure): asset_id, asset_class, run_id,
// as_of, basis, estimate, verdict ("repair" | "replace" | "not_weighed"), not_weighed (null, or
// why: "retired" | "rejected" | "not_yet_in_service" | "cannot_weigh" | "not_in_run"),
// repair_limit, repair_deduction_factor, estimate_net_cost, replace_after_years (the run's k*),
// replace_after_years_if_repaired, reason, caution. Money at full double precision.
#pragma once

#include <nlohmann/json.hpp>
#include <string>

#include "review/repair_check.h"

namespace tenure::formats {

// The verdict word (REPAIR, REPLACE or NOT WEIGHED) with the asset and run, the figures, the
// reason and the caution.
std::string repair_check_text(const review::RepairCheck& check);

nlohmann::json repair_check_to_json(const review::RepairCheck& check);

}  // namespace tenure::formats
