// The results schema and its migrations (see schema.h). The tables are generated from their
// column lists (results/tables.h, db/table_sql.h); the views are written here.
#include "db/schema.h"

#include <algorithm>
#include <array>
#include <string>
#include <string_view>

#include <fmt/format.h>

#include "db/policy_store.h"
#include "db/table_sql.h"

namespace tenure::db {
namespace {

// SPEC 7's columns of the latest views, in its order; the columns a table marks `in_views` follow
// them in table order.
constexpr std::array<std::string_view, 12> kLatestColumns = {
    "run_id",          "asset_id",        "asset_class",
    "age_years",       "class_esl_years", "defender_euac",
    "challenger_euac", "marginal_cost_next_year", "replace_after_years",
    "verdict",         "reason",          "basis"};
constexpr std::array<std::string_view, 15> kClassLatestColumns = {
    "run_id",          "asset_class",     "esl_years_before_tax", "euac_before_tax",
    "esl_years_after_tax", "euac_after_tax", "cost_model",       "cost_a",
    "cost_g",          "cost_r2",         "asset_years",          "value_model",
    "value_start",     "value_decline",   "valuations_used"};

// "a, b, c": the contract's columns first, then the table's other columns shown in views, in
// lines of at most 100 columns after "  SELECT ".
template <class Row, std::size_t N>
std::string view_columns(const std::array<std::string_view, N>& contract,
                         const results::Table<Row>& table) {
  std::vector<std::string_view> names(contract.begin(), contract.end());
  for (const results::Column<Row>& c : table.columns) {
    if (c.options.in_views && std::find(names.begin(), names.end(), c.name) == names.end()) {
      names.push_back(c.name);
    }
  }
  std::string out;
  std::size_t column = 9;  // after "  SELECT "
  for (std::size_t i = 0; i < names.size(); ++i) {
    const std::size_t width = names[i].size() + (i + 1 < names.size() ? 1 : 0);
    if (i > 0 && column + 1 + width > 100) {
      out += "\n         ";
      column = 9;
    } else if (i > 0) {
      out += ' ';
      ++column;
    }
    out += names[i];
    if (i + 1 < names.size()) out += ',';
    column += width;
  }
  return out;
}

// The one definition of "latest" (the order of tenure_run_order: by as_of, then run_id, within
// a run's scenario, baseline runs being the scenario NULL), which every view below and
// db::read_run (run_reader.cpp) read through tenure_latest_run.
std::string views_sql() {
  return fmt::format(R"sql(
CREATE VIEW tenure_run_order AS
  SELECT run_id, as_of, scenario,
         row_number() OVER newest_first AS recency,
         lead(run_id) OVER newest_first AS previous_run_id
  FROM tenure_run
  WHERE status = 'ok'
  WINDOW newest_first AS (PARTITION BY scenario ORDER BY as_of DESC, run_id DESC);

CREATE VIEW tenure_latest_run AS
  SELECT run_id, as_of, previous_run_id
  FROM tenure_run_order
  WHERE scenario IS NULL AND recency = 1;

CREATE VIEW tenure_latest AS
  SELECT {0}
  FROM tenure_asset_result
  WHERE run_id = (SELECT run_id FROM tenure_latest_run);

CREATE VIEW tenure_due AS
  SELECT * FROM tenure_latest WHERE verdict IN ('replace', 'review');

CREATE VIEW tenure_newly_due AS
  SELECT d.* FROM tenure_due AS d
  WHERE NOT EXISTS (
    SELECT 1 FROM tenure_asset_result AS p
    WHERE p.run_id = (SELECT previous_run_id FROM tenure_latest_run)
      AND p.asset_id = d.asset_id
      AND p.verdict IN ('replace', 'review'));

CREATE VIEW tenure_class_latest AS
  SELECT {1}
  FROM tenure_class_result
  WHERE run_id = (SELECT run_id FROM tenure_latest_run);

CREATE VIEW tenure_scenario_diff AS
  SELECT s.scenario, b.run_id AS baseline_run_id, s.run_id AS scenario_run_id,
         b.asset_id, b.asset_class,
         b.verdict AS baseline_verdict, a.verdict AS scenario_verdict,
         b.replace_after_years AS baseline_replace_after_years,
         a.replace_after_years AS scenario_replace_after_years,
         b.delay_cost AS baseline_delay_cost, a.delay_cost AS scenario_delay_cost,
         a.verdict IS NOT b.verdict AS verdict_differs
  FROM tenure_latest AS b
  JOIN tenure_run_order AS s ON s.scenario IS NOT NULL AND s.recency = 1
  LEFT JOIN tenure_asset_result AS a ON a.run_id = s.run_id AND a.asset_id = b.asset_id;
)sql",
                     view_columns(kLatestColumns, results::asset_table()),
                     view_columns(kClassLatestColumns, results::class_table()));
}

// Dependent views first.
constexpr std::string_view kDropViews =
    "DROP VIEW IF EXISTS main.tenure_scenario_diff; DROP VIEW IF EXISTS main.tenure_newly_due; "
    "DROP VIEW IF EXISTS main.tenure_due; DROP VIEW IF EXISTS main.tenure_latest; "
    "DROP VIEW IF EXISTS main.tenure_class_latest; DROP VIEW IF EXISTS main.tenure_latest_run; "
    "DROP VIEW IF EXISTS main.tenure_run_order;";

// Calls f(table) for each stored table, in the order they are created.
template <class F>
void for_each_table(F&& f) {
  f(results::run_table());
  f(results::class_table());
  f(results::asset_table());
  f(results::curve_table());
  f(results::cash_flow_table());
  f(results::rejected_table());
}

}  // namespace

int current_schema_version() { return results::newest_column_version(); }

void migrate(Connection& db) {
  db.exec(
      "CREATE TABLE IF NOT EXISTS main.tenure_schema_version("
      " version INTEGER PRIMARY KEY,"
      " applied_at TEXT NOT NULL DEFAULT (strftime('%Y-%m-%dT%H:%M:%SZ','now')))");
  Statement current(db, "SELECT coalesce(max(version), 0) FROM main.tenure_schema_version");
  current.step();
  const auto applied = static_cast<int>(current.integer(0));
  current.reset();
  const int target = current_schema_version();
  if (applied >= target) return;
  create_policy_table(db);
  if (applied == 0) {
    for_each_table([&](const auto& table) { db.exec(create_table_sql(table)); });
  } else {
    // Version v adds the columns whose `since` is v (results/tables.h).
    for_each_table([&](const auto& table) {
      for (const auto& column : table.columns) {
        if (column.options.since > applied) db.exec(add_column_sql(table, column));
      }
    });
  }
  db.exec(kDropViews);
  db.exec(views_sql());
  Statement record(db, "INSERT INTO main.tenure_schema_version(version) VALUES (?1)");
  for (int v = applied + 1; v <= target; ++v) {
    record.bind(1, std::int64_t{v});
    record.run();
  }
}

}  // namespace tenure::db
