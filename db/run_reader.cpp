// Reading a stored run back (see run_reader.h).
#include "db/run_reader.h"

#include <fmt/format.h>

#include "core/checks.h"
#include "core/errors.h"
#include "db/row_checks.h"
#include "db/table_sql.h"

namespace tenure::db {
namespace {

bool has_results_schema(Connection& db) {
  Statement q(db, "SELECT 1 FROM sqlite_schema WHERE type = 'table' AND name = 'tenure_run'");
  return q.step();
}

std::string relation(const std::string& name, const char* key) {
  if (!is_plain_identifier(name)) {
    throw InputError(std::string("$.sources.") + key, "must be a plain SQL identifier");
  }
  return quoted(name);
}

// The rows of `table` that `where` (with ?1 the run id and ?2 `key`, when given) selects.
template <class Row>
std::vector<Row> rows_where(Connection& db, const results::Table<Row>& table,
                            std::string_view where, std::int64_t run_id,
                            std::optional<std::string_view> key = std::nullopt) {
  Statement q(db, fmt::format("{} WHERE {}", select_sql(table), where));
  q.bind(1, run_id);
  if (key) q.bind(2, *key);
  std::vector<Row> out;
  while (q.step()) out.push_back(read_row(q, table));
  return out;
}

// The run that run ?1's "newly due" compares with (run_reader.h): for a baseline run, the
// baseline run just before it in tenure_run_order; for a what-if run, the latest baseline run.
constexpr const char* kComparedRun =
    "(SELECT CASE WHEN scenario IS NULL THEN previous_run_id "
    "ELSE (SELECT run_id FROM main.tenure_latest_run) END FROM main.tenure_run_order WHERE run_id = ?1)";

template <class Row>
std::optional<Row> first(std::vector<Row> rows) {
  if (rows.empty()) return std::nullopt;
  return std::move(rows.front());
}

}  // namespace

results::RunRow read_run(Connection& db, std::optional<std::int64_t> run_id) {
  if (!has_results_schema(db)) {
    throw InputError("--db", "no review run in this database (run 'tenure review' first)");
  }
  // The latest baseline run as the views define it (schema.h, tenure_latest_run).
  Statement q(db, select_sql(results::run_table()) +
                      " WHERE status = 'ok' AND run_id = coalesce(?1, "
                      "(SELECT run_id FROM main.tenure_latest_run))");
  q.bind(1, run_id);
  if (!q.step()) {
    if (run_id) throw InputError("--run", fmt::format("no successful run {}", *run_id));
    throw InputError("--db",
                     "no successful baseline review run in this database (run 'tenure review' "
                     "without --scenario first, or name a what-if run with --run)");
  }
  return read_row(q, results::run_table());
}

std::optional<results::AssetRow> read_asset_result(Connection& db, std::int64_t run_id,
                                                   std::string_view asset_id) {
  return first(rows_where(db, results::asset_table(), "run_id = ?1 AND asset_id = ?2", run_id,
                          asset_id));
}

std::vector<results::AssetRow> read_asset_results(Connection& db, std::int64_t run_id) {
  return rows_where(db, results::asset_table(), "run_id = ?1 ORDER BY asset_id", run_id);
}

std::optional<results::ClassRow> read_class_result(Connection& db, std::int64_t run_id,
                                                   std::string_view asset_class) {
  return first(rows_where(db, results::class_table(), "run_id = ?1 AND asset_class = ?2", run_id,
                          asset_class));
}

std::vector<results::ClassRow> read_class_results(Connection& db, std::int64_t run_id) {
  return rows_where(db, results::class_table(), "run_id = ?1 ORDER BY asset_class", run_id);
}

std::vector<results::CurveRow> read_challenger_curves(Connection& db, std::int64_t run_id) {
  return rows_where(db, results::curve_table(),
                    "run_id = ?1 AND role = 'challenger' AND asset_id IS NULL "
                    "ORDER BY asset_class, basis, years",
                    run_id);
}

std::vector<results::RejectedRow> read_rejected(Connection& db, std::int64_t run_id,
                                                std::size_t limit) {
  Statement q(db, select_sql(results::rejected_table()) +
                      " WHERE run_id = ?1 ORDER BY rowid LIMIT ?2");
  q.bind(1, run_id);
  q.bind(2, static_cast<std::int64_t>(limit));
  std::vector<results::RejectedRow> out;
  while (q.step()) out.push_back(read_row(q, results::rejected_table()));
  return out;
}

std::unordered_set<std::string> due_in_previous_run(Connection& db, std::int64_t run_id) {
  Statement q(db, std::string("SELECT asset_id FROM main.tenure_asset_result WHERE verdict IN "
                              "('review', 'replace') AND run_id = ") +
                      kComparedRun);
  q.bind(1, run_id);
  std::unordered_set<std::string> out;
  while (q.step()) out.emplace(q.text(0));
  return out;
}

std::int64_t count_newly_due(Connection& db, std::int64_t run_id) {
  Statement q(db, std::string("SELECT count(*) FROM main.tenure_asset_result AS d WHERE d.run_id = ?1 "
                              "AND d.verdict IN ('review', 'replace') AND NOT EXISTS ("
                              "SELECT 1 FROM main.tenure_asset_result AS p WHERE p.asset_id = "
                              "d.asset_id AND p.verdict IN ('review', 'replace') AND p.run_id = ") +
                      kComparedRun + ")");
  q.bind(1, run_id);
  q.step();
  return q.integer(0);
}

std::optional<results::RejectedRow> read_rejected_asset(Connection& db, std::int64_t run_id,
                                                        std::string_view assets_source,
                                                        std::string_view asset_id) {
  // The reader's row_ref of an asset row (row_checks.h asset_row_ref).
  const std::string ends = asset_ref_keys(asset_id);
  Statement q(db, select_sql(results::rejected_table()) +
                      " WHERE run_id = ?1 AND source = ?2 AND row_ref GLOB 'position [0-9]*' AND "
                      "substr(row_ref, -length(?3)) = ?3 ORDER BY rowid LIMIT 1");
  q.bind(1, run_id);
  q.bind(2, assets_source);
  q.bind(3, ends);
  if (!q.step()) return std::nullopt;
  return read_row(q, results::rejected_table());
}

std::optional<results::InputAsset> read_input_row(Connection& db, const review::Sources& sources,
                                                  std::string_view asset_id) {
  Statement asset(db, fmt::format("SELECT in_service_on, retired_on, first_cost FROM {} WHERE "
                                  "asset_id = ?1",
                                  relation(sources.assets, "assets")));
  asset.bind(1, asset_id);
  if (!asset.step()) return std::nullopt;
  results::InputAsset out;
  out.in_service_on = asset.text(0);
  if (!asset.is_null(1)) out.retired_on = asset.text(1);
  out.first_cost = asset.real(2);
  return out;
}

std::optional<results::InputAsset> read_input_asset(Connection& db,
                                                    const review::Sources& sources,
                                                    std::string_view asset_id) {
  std::optional<results::InputAsset> out = read_input_row(db, sources, asset_id);
  if (!out) return std::nullopt;
  Statement events(db, fmt::format("SELECT occurred_on, amount FROM {} WHERE asset_id = ?1",
                                   relation(sources.costs, "costs")));
  events.bind(1, asset_id);
  while (events.step()) {
    const int type = events.column_type(1);
    if (events.column_type(0) != SQLITE_TEXT || (type != SQLITE_INTEGER && type != SQLITE_FLOAT)) {
      ++out->events_unreadable;
      continue;
    }
    out->events.push_back({std::string(events.text(0)), events.real(1)});
  }
  return out;
}

}  // namespace tenure::db
