// `tenure repair` and tenure_repair_check as a use case (SPEC 11 "At the counter"): repair or
// replace one asset for a repair estimate, from a stored run. The asset is rebuilt from the run's
// stored inputs with the review's own code, as `tenure explain` does (explain/explanation.h), but
// without its cost events; review/repair_check.h weighs the estimate. The reads share one
// snapshot (except inside a statement that writes, where SQLite allows none).
//
//   db::Connection db = db::Connection::open_existing("fleet.db", "--db");
//   review::RepairCheck c = check_repair(db, "PU-0042", 1500, std::nullopt);
//   c.weighing->verdict;   // RepairVerdict::repair
//   formats::repair_check_text(c);
#pragma once

#include <cstdint>
#include <optional>
#include <string_view>

#include "core/types.h"
#include "db/connection.h"
#include "review/repair_check.h"

namespace tenure::app {

using review::RepairCheck;

// The repair check of `asset_id` in run `run_id` (default: the latest successful run) for a
// repair of `estimate` paid now. An asset the run reviewed is weighed; one it did not is answered
// with why (review::NotWeighed), looked up in this order: retired on or before the as-of date,
// put in service after it (both from its row in the asset relation now), rejected by the run
// (tenure_rejected), else not in the run. A class without a cost curve is NotWeighed::cannot_weigh.
// Throws InputError naming "estimate" (review::require_repair_estimate), "ASSET" when the asset
// relation has no such asset, what db::read_run throws, and RuntimeFailure when the run's stored
// figures of the asset are not reproduced by the recomputation (`tenure explain` names them).
RepairCheck check_repair(db::Connection& db, std::string_view asset_id, Money estimate,
                         std::optional<std::int64_t> run_id);

}  // namespace tenure::app
