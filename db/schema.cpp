// The results schema and its migrations (see schema.h).
#include "db/schema.h"

#include <array>
#include <string_view>

namespace tenure::db {
namespace {

// Migration 1: the run history, results, rejected rows and the four views of SPEC 7.
constexpr std::string_view kMigration1 = R"sql(
CREATE TABLE IF NOT EXISTS tenure_policy(
  policy_id INTEGER PRIMARY KEY,
  stored_at TEXT NOT NULL DEFAULT (strftime('%Y-%m-%dT%H:%M:%SZ','now')),
  policy_json TEXT NOT NULL);

CREATE TABLE tenure_run(
  run_id INTEGER PRIMARY KEY,
  as_of TEXT NOT NULL,
  started_at TEXT NOT NULL,
  finished_at TEXT,
  policy_json TEXT NOT NULL,
  policy_sha256 TEXT NOT NULL,
  rows_read INTEGER NOT NULL,
  rows_rejected INTEGER NOT NULL,
  status TEXT NOT NULL CHECK (status IN ('ok', 'failed')),
  basis TEXT NOT NULL,                 -- 'after_tax' or 'before_tax'
  money TEXT NOT NULL,                 -- 'real' (costs restated by cost_escalation) or 'nominal'
  assets_reviewed INTEGER NOT NULL,
  assets_retired INTEGER NOT NULL,
  assets_not_yet_in_service INTEGER NOT NULL,
  rows_after_as_of INTEGER NOT NULL,   -- events and valuations dated after as_of: not counted
  tenure_version TEXT NOT NULL);

CREATE TABLE tenure_class_result(
  run_id INTEGER NOT NULL REFERENCES tenure_run(run_id),
  asset_class TEXT NOT NULL,
  assets INTEGER NOT NULL,
  challenger_first_cost REAL NOT NULL,
  max_life_years INTEGER NOT NULL,
  esl_years_before_tax INTEGER, euac_before_tax REAL,
  esl_years_after_tax INTEGER, euac_after_tax REAL,
  cost_model TEXT, cost_a REAL, cost_g REAL, cost_r2 REAL,
  asset_years INTEGER NOT NULL,
  value_model TEXT NOT NULL, value_start REAL NOT NULL, value_decline REAL NOT NULL,
  valuations_used INTEGER NOT NULL,
  note TEXT,
  PRIMARY KEY (run_id, asset_class));

CREATE TABLE tenure_asset_result(
  run_id INTEGER NOT NULL REFERENCES tenure_run(run_id),
  asset_id TEXT NOT NULL,
  asset_class TEXT NOT NULL,
  age_years INTEGER NOT NULL,
  first_cost REAL NOT NULL,
  book_value_now REAL NOT NULL,
  market_value_now REAL NOT NULL,
  market_value_source TEXT NOT NULL,
  cost_years INTEGER NOT NULL,         -- complete age-years of its own cost history
  cost_ratio REAL NOT NULL,            -- its observed / class-predicted cost
  credibility_factor REAL NOT NULL,    -- 1 + z (ratio - 1), z = m / (m + 3)
  class_esl_years INTEGER,
  defender_best_years INTEGER,
  defender_euac REAL,
  challenger_euac REAL,
  defender_euac_before_tax REAL,
  defender_euac_after_tax REAL,
  marginal_cost_next_year REAL,
  replace_after_years INTEGER,
  verdict TEXT NOT NULL CHECK (verdict IN ('keep', 'review', 'replace')),
  reason TEXT NOT NULL,
  basis TEXT NOT NULL,
  PRIMARY KEY (run_id, asset_id));

CREATE TABLE tenure_euac_curve(
  run_id INTEGER NOT NULL REFERENCES tenure_run(run_id),
  asset_class TEXT NOT NULL,
  asset_id TEXT,                       -- NULL for the class challenger
  role TEXT NOT NULL CHECK (role IN ('challenger', 'defender')),
  basis TEXT NOT NULL,
  years INTEGER NOT NULL,
  euac REAL NOT NULL,
  marginal_cost REAL NOT NULL);
CREATE INDEX tenure_euac_curve_by_asset ON tenure_euac_curve(run_id, asset_class, asset_id);

CREATE TABLE tenure_cash_flow(
  run_id INTEGER NOT NULL REFERENCES tenure_run(run_id),
  asset_class TEXT NOT NULL,
  asset_id TEXT,                       -- NULL for the class challenger
  role TEXT NOT NULL CHECK (role IN ('challenger', 'defender')),
  year INTEGER NOT NULL,               -- years kept
  operating_cost REAL NOT NULL,
  depreciation REAL NOT NULL,
  book_value REAL NOT NULL,
  taxable_income REAL NOT NULL,
  income_tax REAL NOT NULL,
  after_tax_cash_flow REAL NOT NULL,
  market_value REAL NOT NULL,          -- if sold at the end of this year
  disposal_tax REAL NOT NULL,
  net_proceeds REAL NOT NULL);
CREATE INDEX tenure_cash_flow_by_asset ON tenure_cash_flow(run_id, asset_class, asset_id);

CREATE TABLE tenure_rejected(
  run_id INTEGER NOT NULL REFERENCES tenure_run(run_id),
  source TEXT NOT NULL,                -- the input relation, as named by the policy's sources
  row_ref TEXT NOT NULL,
  reason TEXT NOT NULL);
CREATE INDEX tenure_rejected_by_run ON tenure_rejected(run_id);

CREATE VIEW tenure_latest AS
  SELECT run_id, asset_id, asset_class, age_years, class_esl_years, defender_euac,
         challenger_euac, marginal_cost_next_year, replace_after_years, verdict, reason, basis,
         first_cost, book_value_now, market_value_now, market_value_source, credibility_factor,
         defender_best_years
  FROM tenure_asset_result
  WHERE run_id = (SELECT max(run_id) FROM tenure_run WHERE status = 'ok');

CREATE VIEW tenure_due AS
  SELECT * FROM tenure_latest WHERE verdict IN ('replace', 'review');

CREATE VIEW tenure_newly_due AS
  SELECT d.* FROM tenure_due AS d
  WHERE NOT EXISTS (
    SELECT 1 FROM tenure_asset_result AS p
    WHERE p.run_id = (SELECT max(run_id) FROM tenure_run
                      WHERE status = 'ok' AND run_id < d.run_id)
      AND p.asset_id = d.asset_id
      AND p.verdict IN ('replace', 'review'));

CREATE VIEW tenure_class_latest AS
  SELECT run_id, asset_class, esl_years_before_tax, euac_before_tax, esl_years_after_tax,
         euac_after_tax, cost_model, cost_a, cost_g, cost_r2, asset_years, value_model,
         value_start, value_decline, valuations_used, assets, challenger_first_cost,
         max_life_years, note
  FROM tenure_class_result
  WHERE run_id = (SELECT max(run_id) FROM tenure_run WHERE status = 'ok');
)sql";

constexpr std::array<std::string_view, 1> kMigrations = {kMigration1};

}  // namespace

int current_schema_version() { return static_cast<int>(kMigrations.size()); }

void migrate(Connection& db) {
  db.exec(
      "CREATE TABLE IF NOT EXISTS tenure_schema_version("
      " version INTEGER PRIMARY KEY,"
      " applied_at TEXT NOT NULL DEFAULT (strftime('%Y-%m-%dT%H:%M:%SZ','now')))");
  Statement current(db, "SELECT coalesce(max(version), 0) FROM tenure_schema_version");
  current.step();
  const auto applied = static_cast<std::size_t>(current.integer(0));
  current.reset();
  Statement record(db, "INSERT INTO tenure_schema_version(version) VALUES (?1)");
  for (std::size_t v = applied; v < kMigrations.size(); ++v) {
    db.exec(kMigrations[v]);
    record.bind(1, static_cast<std::int64_t>(v + 1));
    record.run();
  }
}

}  // namespace tenure::db
