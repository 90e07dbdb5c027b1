// Invented stored runs, written row by row into a database with the results schema, for the
// tests of what reads runs back (`tenure due`): every verdict, figure and class is typed in the
// test, so what the reader must return is known by hand. Not real data.
//
//   db::Connection db = db::Connection::open(path, true);
//   const std::int64_t run = add_stored_run(db, "2026-11-30",
//                                           {due_asset("PX-1", "pump-x", Verdict::review, 500)});
#pragma once

#include <cstdint>
#include <optional>
#include <set>
#include <string>
#include <vector>

#include "db/connection.h"
#include "db/schema.h"
#include "db/table_sql.h"
#include "results/rows.h"
#include "results/tables.h"

namespace tenure::test_support {

// An asset row with the fields a due list shows; the others keep their defaults.
inline results::AssetRow due_asset(std::string asset_id, std::string asset_class,
                                   review::Verdict verdict, std::optional<Money> delay_cost) {
  results::AssetRow row;
  row.asset_id = std::move(asset_id);
  row.asset_class = std::move(asset_class);
  row.verdict = verdict;
  row.delay_cost = delay_cost;
  row.reason = "invented";
  return row;
}

// Stores a run as of `as_of` with these asset rows and a class row for each of their classes
// and of `more_classes`, all in one transaction; returns its run_id.
inline std::int64_t add_stored_run(db::Connection& db, const std::string& as_of,
                                   const std::vector<results::AssetRow>& assets,
                                   results::RunStatus status = results::RunStatus::ok,
                                   const std::vector<std::string>& more_classes = {}) {
  db::Transaction tx(db, db::Transaction::Kind::immediate);
  db::migrate(db);
  results::RunRow run;
  run.as_of = as_of;
  run.started_at = as_of + "T02:00:00Z";
  run.policy_json = "{}";
  run.policy_sha256 = "invented";
  run.status = status;
  run.tenure_version = "invented";
  db::TableWriter<results::RunRow>(db, results::run_table()).insert(run);
  const std::int64_t run_id = sqlite3_last_insert_rowid(db.handle());
  std::set<std::string> classes(more_classes.begin(), more_classes.end());
  for (const results::AssetRow& a : assets) classes.insert(a.asset_class);
  db::TableWriter<results::ClassRow> class_rows(db, results::class_table());
  for (const std::string& c : classes) {
    results::ClassRow row;
    row.asset_class = c;
    class_rows.insert(row, run_id);
  }
  db::TableWriter<results::AssetRow> asset_rows(db, results::asset_table());
  for (const results::AssetRow& a : assets) asset_rows.insert(a, run_id);
  tx.commit();
  return run_id;
}

}  // namespace tenure::test_support
