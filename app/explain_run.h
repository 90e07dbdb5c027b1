// `tenure explain` as a use case: one asset of a stored run explained, from a database
// connection (explain/explanation.h does the work). The reads share one snapshot, and the run's
// stored policy is read once.
//
//   db::Connection db = db::Connection::open_existing("fleet.db", "--db");
//   explain::Explanation e = explain_stored_asset(db, "PU-0042", std::nullopt);
//   explain::explanation_to_text(e);
#pragma once

#include <cstdint>
#include <optional>
#include <string_view>

#include "db/connection.h"
#include "explain/explanation.h"

namespace tenure::app {

// The asset `asset_id` in run `run_id` (default: the latest baseline run, db::read_run). Throws
// InputError naming "ASSET" when the run did not review it, and what db::read_run throws.
explain::Explanation explain_stored_asset(db::Connection& db, std::string_view asset_id,
                                          std::optional<std::int64_t> run_id);

}  // namespace tenure::app
