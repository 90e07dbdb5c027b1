// Reads a stored review run back (SPEC 7) for `tenure explain`, `tenure report` and `tenure
// repair`: the run row, its class and asset results, the class challengers' EUAC curves, its
// rejected rows (all, or one asset's), which assets were due in the run before, and one asset's
// input row with or without its cost events. Rows come back
// as results/rows.h holds them, through each table's generated SELECT (db/table_sql.h). Every
// value is bound; the results tables and the input relations are only read.
//
//   results::RunRow run = read_run(db, std::nullopt);   // the latest baseline run
//   auto asset = read_asset_result(db, run.run_id, "PU-0042");
//   auto input = read_input_asset(db, policy.sources, "PU-0042");
//
//   sqlite> SELECT asset_id, defender_euac FROM tenure_asset_result
//      ...>   WHERE run_id = 1 AND asset_id = 'PU-0042';
//   PU-0042|4123.0912...
#pragma once

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <unordered_set>
#include <vector>

#include "db/connection.h"
#include "results/input_asset.h"
#include "results/rows.h"
#include "review/policy.h"

namespace tenure::db {

// The run `run_id` (a baseline or a what-if run), or by default the latest baseline run, the
// one the views show (schema.h, tenure_latest_run: latest by as_of, then run_id). Throws
// InputError naming "--db" when the database holds no successful baseline run (or no results
// schema), and "--run" when run_id is not a successful run.
results::RunRow read_run(Connection& db, std::optional<std::int64_t> run_id);

// One asset's result row in the run; nullopt when the run did not review that asset id.
std::optional<results::AssetRow> read_asset_result(Connection& db, std::int64_t run_id,
                                                   std::string_view asset_id);
// Every asset result of the run, ordered by asset_id.
std::vector<results::AssetRow> read_asset_results(Connection& db, std::int64_t run_id);

// One class row; nullopt when the run has no such class.
std::optional<results::ClassRow> read_class_result(Connection& db, std::int64_t run_id,
                                                   std::string_view asset_class);
// Every class row of the run, ordered by class.
std::vector<results::ClassRow> read_class_results(Connection& db, std::int64_t run_id);

// The class challengers' EUAC curves, ordered by class, basis and years.
std::vector<results::CurveRow> read_challenger_curves(Connection& db, std::int64_t run_id);

// The run's first `limit` rejected rows, in the order they were recorded.
std::vector<results::RejectedRow> read_rejected(Connection& db, std::int64_t run_id,
                                                std::size_t limit);

// The ids of the assets due (review or replace) in the run that `run_id` is compared with: for
// a baseline run, the baseline run just before it by as_of, then run_id (as the view
// tenure_newly_due compares the latest); for a what-if run, the latest baseline run. Empty when
// there is none, so every asset due now is newly due.
std::unordered_set<std::string> due_in_previous_run(Connection& db, std::int64_t run_id);

// How many assets due in the run were not due in the run it is compared with (as above); for
// the latest baseline run, the number of rows of the view tenure_newly_due.
std::int64_t count_newly_due(Connection& db, std::int64_t run_id);

// The asset's row in the relation sources.assets and its events in sources.costs (SELECT ...
// WHERE asset_id = ?1: the index on (asset_id, occurred_on) makes it a few page reads). Nullopt
// when the relation has no such asset. Throws InputError naming "$.sources.assets" or
// "$.sources.costs" when a relation name is not a plain SQL identifier.
std::optional<results::InputAsset> read_input_asset(Connection& db,
                                                    const review::Sources& sources,
                                                    std::string_view asset_id);
// The same row without its events (events empty, events_unreadable 0): sources.costs is not
// read. Throws InputError naming "$.sources.assets" as above.
std::optional<results::InputAsset> read_input_row(Connection& db, const review::Sources& sources,
                                                  std::string_view asset_id);

// The first row of run `run_id` in tenure_rejected that rejected the row of `asset_id` in the
// asset relation `assets_source` (its row_ref ends in "(asset_id '<id>')", the id shown as the
// reader shows it, db/row_checks.h); nullopt when there is none.
//
//   sqlite> SELECT reason FROM tenure_rejected WHERE run_id = 1 AND source = 'asset'
//      ...>   AND row_ref = 'position 322 (asset_id ''VAN-00322'')';
//   in_service_on '2021/11/30' is not a valid date (YYYY-MM-DD)
std::optional<results::RejectedRow> read_rejected_asset(Connection& db, std::int64_t run_id,
                                                        std::string_view assets_source,
                                                        std::string_view asset_id);

}  // namespace tenure::db
