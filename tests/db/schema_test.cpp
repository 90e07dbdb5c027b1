// The results schema generated from results/tables.h (db/schema.cpp, db/table_sql.h): a fresh
// database gets SPEC 7's tables and views with the columns written out below by hand from SPEC 7
// and from the schema tenure 0.1.0 created; a database that 0.1.0 created
// (fixtures/schemas/results_schema_v1.sql) is upgraded in place to the same columns, its runs
// then baseline runs (tenure_run.scenario NULL) ordered by as_of; migrating again changes
// nothing; and a stored row survives the generated INSERT and SELECT unchanged.
#include "db/schema.h"

#include <gtest/gtest.h>

#include <fstream>
#include <sstream>
#include <string>
#include <vector>

#include "db/table_sql.h"
#include "db_test_support.h"
#include "results/tables.h"

namespace tenure::db {
namespace {

using testing_support::scalar;
using testing_support::TempDatabase;

// "name type notnull pk" for each column of a table or view, in order.
std::vector<std::string> columns_of(Connection& db, const std::string& relation) {
  Statement q(db, "SELECT name, type, \"notnull\", pk FROM pragma_table_info(?1)");
  q.bind(1, relation);
  std::vector<std::string> out;
  while (q.step()) {
    out.push_back(std::string(q.text(0)) + " " + std::string(q.text(1)) + " " +
                  std::to_string(q.integer(2)) + " " + std::to_string(q.integer(3)));
  }
  return out;
}

std::string fixture_schema_v1() {
  std::ifstream file(std::string(TENURE_SOURCE_DIR) + "/fixtures/schemas/results_schema_v1.sql");
  std::stringstream text;
  text << file.rdbuf();
  return text.str();
}

const std::vector<std::string> kAssetResult = {"run_id INTEGER 1 1",
                                               "asset_id TEXT 1 2",
                                               "asset_class TEXT 1 0",
                                               "age_years INTEGER 1 0",
                                               "first_cost REAL 1 0",
                                               "book_value_now REAL 1 0",
                                               "market_value_now REAL 1 0",
                                               "market_value_source TEXT 1 0",
                                               "cost_years INTEGER 1 0",
                                               "cost_ratio REAL 1 0",
                                               "credibility_factor REAL 1 0",
                                               "class_esl_years INTEGER 0 0",
                                               "defender_best_years INTEGER 0 0",
                                               "defender_euac REAL 0 0",
                                               "challenger_euac REAL 0 0",
                                               "defender_euac_before_tax REAL 0 0",
                                               "defender_euac_after_tax REAL 0 0",
                                               "marginal_cost_next_year REAL 0 0",
                                               "replace_after_years INTEGER 0 0",
                                               "verdict TEXT 1 0",
                                               "reason TEXT 1 0",
                                               "basis TEXT 1 0",
                                               // SPEC 11, from schema version 2:
                                               "delay_cost REAL 0 0",
                                               "early_cost REAL 0 0",
                                               "repair_limit REAL 0 0",
                                               "break_even_price REAL 0 0",
                                               "break_even_cost_factor REAL 0 0",
                                               "close_call INTEGER 0 0",
                                               // SPEC 14, from schema version 3:
                                               "challenger TEXT 0 0"};

const std::vector<std::string> kClassResult = {"run_id INTEGER 1 1",
                                               "asset_class TEXT 1 2",
                                               "assets INTEGER 1 0",
                                               "challenger_first_cost REAL 1 0",
                                               "max_life_years INTEGER 1 0",
                                               "esl_years_before_tax INTEGER 0 0",
                                               "euac_before_tax REAL 0 0",
                                               "esl_years_after_tax INTEGER 0 0",
                                               "euac_after_tax REAL 0 0",
                                               "cost_model TEXT 0 0",
                                               "cost_a REAL 0 0",
                                               "cost_g REAL 0 0",
                                               "cost_r2 REAL 0 0",
                                               "asset_years INTEGER 1 0",
                                               "value_model TEXT 1 0",
                                               "value_start REAL 1 0",
                                               "value_decline REAL 1 0",
                                               "valuations_used INTEGER 1 0",
                                               "note TEXT 0 0",
                                               // SPEC 11 "Per class", from schema version 2:
                                               "esl_band_low INTEGER 0 0",
                                               "esl_band_high INTEGER 0 0",
                                               "esl_p10 INTEGER 0 0",
                                               "esl_p90 INTEGER 0 0"};

// SPEC 7's columns of tenure_latest, in its order (views report no types or keys).
const std::vector<std::string> kLatestSpec = {"run_id",
                                              "asset_id",
                                              "asset_class",
                                              "age_years",
                                              "class_esl_years",
                                              "defender_euac",
                                              "challenger_euac",
                                              "marginal_cost_next_year",
                                              "replace_after_years",
                                              "verdict",
                                              "reason",
                                              "basis"};
const std::vector<std::string> kClassLatestSpec = {"run_id",
                                                   "asset_class",
                                                   "esl_years_before_tax",
                                                   "euac_before_tax",
                                                   "esl_years_after_tax",
                                                   "euac_after_tax",
                                                   "cost_model",
                                                   "cost_a",
                                                   "cost_g",
                                                   "cost_r2",
                                                   "asset_years",
                                                   "value_model",
                                                   "value_start",
                                                   "value_decline",
                                                   "valuations_used"};

std::vector<std::string> names(const std::vector<std::string>& columns) {
  std::vector<std::string> out;
  for (const std::string& c : columns) out.push_back(c.substr(0, c.find(' ')));
  return out;
}

void expect_starts_with(const std::vector<std::string>& all, const std::vector<std::string>& head) {
  ASSERT_GE(all.size(), head.size());
  EXPECT_EQ(std::vector<std::string>(all.begin(), all.begin() + head.size()), head);
}

const char* const kTables[] = {"tenure_run",        "tenure_class_result", "tenure_asset_result",
                               "tenure_euac_curve", "tenure_cash_flow",    "tenure_rejected",
                               "tenure_policy"};
const char* const kViews[] = {"tenure_latest",       "tenure_due",       "tenure_newly_due",
                              "tenure_class_latest", "tenure_run_order", "tenure_latest_run",
                              "tenure_scenario_diff"};

// The columns of tenure_scenario_diff, in order, as db/schema.h documents them (from the brief
// of issue 12 item 6: run ids, the asset, both verdicts, both k*, both delay costs, the flag).
const std::vector<std::string> kScenarioDiff = {"scenario",
                                                "baseline_run_id",
                                                "scenario_run_id",
                                                "asset_id",
                                                "asset_class",
                                                "baseline_verdict",
                                                "scenario_verdict",
                                                "baseline_replace_after_years",
                                                "scenario_replace_after_years",
                                                "baseline_delay_cost",
                                                "scenario_delay_cost",
                                                "verdict_differs"};

TEST(Schema, FreshDatabaseHasSpec7TablesAndViews) {
  TempDatabase file;
  Connection db = file.open();
  migrate(db);
  EXPECT_EQ(columns_of(db, "tenure_asset_result"), kAssetResult);
  EXPECT_EQ(columns_of(db, "tenure_class_result"), kClassResult);
  EXPECT_EQ(columns_of(db, "tenure_rejected"),
            (std::vector<std::string>{"run_id INTEGER 1 0", "source TEXT 1 0", "row_ref TEXT 1 0",
                                      "reason TEXT 1 0"}));
  EXPECT_EQ(names(columns_of(db, "tenure_run")),
            (std::vector<std::string>{
                "run_id", "as_of", "started_at", "finished_at", "policy_json", "policy_sha256",
                "rows_read", "rows_rejected", "status", "basis", "money", "assets_reviewed",
                "assets_retired", "assets_not_yet_in_service", "rows_after_as_of", "tenure_version",
                // From schema version 2: NULL for a baseline run, else the what-if run's name.
                "scenario"}));
  EXPECT_EQ(columns_of(db, "tenure_run").back(), "scenario TEXT 0 0");
  for (const char* view : {"tenure_latest", "tenure_due", "tenure_newly_due"}) {
    SCOPED_TRACE(view);
    expect_starts_with(names(columns_of(db, view)), kLatestSpec);
  }
  const std::vector<std::string> class_latest = names(columns_of(db, "tenure_class_latest"));
  expect_starts_with(class_latest, kClassLatestSpec);
  // SPEC 11's per-class figures are shown too, last.
  ASSERT_GE(class_latest.size(), 4u);
  EXPECT_EQ(std::vector<std::string>(class_latest.end() - 4, class_latest.end()),
            (std::vector<std::string>{"esl_band_low", "esl_band_high", "esl_p10", "esl_p90"}));
  EXPECT_EQ(names(columns_of(db, "tenure_scenario_diff")), kScenarioDiff);
  EXPECT_EQ(names(columns_of(db, "tenure_latest_run")),
            (std::vector<std::string>{"run_id", "as_of", "previous_run_id"}));
  EXPECT_EQ(scalar(db, "SELECT max(version) FROM tenure_schema_version"), current_schema_version());
}

TEST(Schema, DatabaseOfVersionOneIsUpgradedInPlace) {
  TempDatabase fresh_file, old_file;
  Connection fresh = fresh_file.open();
  migrate(fresh);
  Connection old = old_file.open();
  old.exec(
      "CREATE TABLE tenure_schema_version(version INTEGER PRIMARY KEY, applied_at TEXT NOT "
      "NULL DEFAULT (strftime('%Y-%m-%dT%H:%M:%SZ','now'))); "
      "INSERT INTO tenure_schema_version(version) VALUES (1);");
  old.exec(fixture_schema_v1());
  // Two runs 0.1.0 stored, the second back-dated (an earlier as_of, a higher run_id).
  for (const char* run : {"(1, '2026-06-30')", "(2, '2025-06-30')"}) {
    old.exec(std::string("INSERT INTO tenure_run(run_id, as_of, started_at, policy_json, "
                         "policy_sha256, rows_read, rows_rejected, status, basis, money, "
                         "assets_reviewed, assets_retired, assets_not_yet_in_service, "
                         "rows_after_as_of, tenure_version) SELECT *, '2026-07-01T02:00:00Z', "
                         "'{}', '-', 0, 0, 'ok', 'after_tax', 'nominal', 0, 0, 0, 0, '0.1.0' "
                         "FROM (VALUES ") +
             run + ")");
  }
  {
    Transaction tx(old, Transaction::Kind::immediate);
    migrate(old);
    tx.commit();
  }
  for (const char* relation : kTables) {
    SCOPED_TRACE(relation);
    EXPECT_EQ(columns_of(old, relation), columns_of(fresh, relation));
  }
  for (const char* view : kViews) {
    SCOPED_TRACE(view);
    EXPECT_EQ(columns_of(old, view), columns_of(fresh, view));
  }
  EXPECT_EQ(scalar(old, "SELECT max(version) FROM tenure_schema_version"),
            current_schema_version());
  // The new column is there, and the runs stored before it are baseline runs, the latest being
  // the one of the latest as_of (run 1), with the back-dated run 2 before it.
  EXPECT_EQ(columns_of(old, "tenure_run").back(), "scenario TEXT 0 0");
  EXPECT_EQ(scalar(old, "SELECT count(*) FROM tenure_run WHERE scenario IS NULL"), 2);
  EXPECT_EQ(scalar(old, "SELECT run_id FROM tenure_latest_run"), 1);
  EXPECT_EQ(scalar(old, "SELECT previous_run_id FROM tenure_latest_run"), 2);
}

TEST(Schema, MigratingAgainChangesNothing) {
  TempDatabase file;
  Connection db = file.open();
  migrate(db);
  const std::string before = testing_support::relation_digest(db, "sqlite_schema");
  migrate(db);
  EXPECT_EQ(testing_support::relation_digest(db, "sqlite_schema"), before);
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM tenure_schema_version"), current_schema_version());
}

TEST(TableSql, AStoredRowReadsBackUnchanged) {
  TempDatabase file;
  Connection db = file.open();
  migrate(db);
  results::AssetRow row;
  row.asset_id = "PU-0042";
  row.asset_class = "pump-duty";
  row.age_years = 6;
  row.first_cost = 18500.25;
  row.book_value_now = 0.1 + 0.2;  // not a round number: REALs survive exactly
  row.market_value_now = 4100;
  row.market_value_source = "valuation of 2026-05-14";
  row.cost_years = 5;
  row.cost_ratio = 1.0 / 3.0;
  row.credibility_factor = 1.25;
  row.defender_euac = 4123.0912;
  row.replace_after_years = 0;
  row.verdict = review::Verdict::replace;
  row.reason = "Replace: ...";
  row.basis = replacement::Basis::before_tax;
  TableWriter<results::AssetRow>(db, results::asset_table()).insert(row, 9);
  Statement q(db, select_sql(results::asset_table()) + " WHERE run_id = 9");
  ASSERT_TRUE(q.step());
  const results::AssetRow back = read_row(q, results::asset_table());
  EXPECT_EQ(back.asset_id, row.asset_id);
  EXPECT_EQ(back.age_years, row.age_years);
  EXPECT_EQ(back.first_cost, row.first_cost);
  EXPECT_EQ(back.book_value_now, row.book_value_now);
  EXPECT_EQ(back.market_value_source, row.market_value_source);
  EXPECT_EQ(back.cost_ratio, row.cost_ratio);
  EXPECT_EQ(back.defender_euac, row.defender_euac);
  EXPECT_FALSE(back.challenger_euac);
  EXPECT_EQ(back.replace_after_years, 0);
  EXPECT_EQ(back.verdict, review::Verdict::replace);
  EXPECT_EQ(back.basis, replacement::Basis::before_tax);
  EXPECT_EQ(scalar(db,
                   "SELECT count(*) FROM tenure_asset_result WHERE verdict = 'replace' AND "
                   "basis = 'before_tax' AND challenger_euac IS NULL"),
            1);
}

TEST(TableSql, AClassRowsLifeFiguresReadBack) {
  TempDatabase file;
  Connection db = file.open();
  migrate(db);
  results::ClassRow row;  // invented
  row.asset_class = "pump-duty";
  row.assets = 40;
  row.challenger_first_cost = 18500;
  row.max_life_years = 15;
  row.esl_years_after_tax = 9;
  row.esl_band_low = 7;
  row.esl_band_high = 12;
  row.esl_p10 = 8;
  row.esl_p90 = 11;
  results::ClassRow without = row;  // a class without a challenger has none of them
  without.asset_class = "van-delivery";
  without.esl_years_after_tax = std::nullopt;
  without.esl_band_low = without.esl_band_high = without.esl_p10 = without.esl_p90 = std::nullopt;
  TableWriter<results::ClassRow> writer(db, results::class_table());
  writer.insert(row, 3);
  writer.insert(without, 3);
  Statement q(db, select_sql(results::class_table()) + " WHERE run_id = 3 ORDER BY asset_class");
  ASSERT_TRUE(q.step());
  const results::ClassRow back = read_row(q, results::class_table());
  EXPECT_EQ(back.esl_band_low, 7);
  EXPECT_EQ(back.esl_band_high, 12);
  EXPECT_EQ(back.esl_p10, 8);
  EXPECT_EQ(back.esl_p90, 11);
  ASSERT_TRUE(q.step());
  const results::ClassRow none = read_row(q, results::class_table());
  EXPECT_FALSE(none.esl_band_low || none.esl_band_high || none.esl_p10 || none.esl_p90);
  EXPECT_EQ(scalar(db,
                   "SELECT count(*) FROM tenure_class_result WHERE esl_band_low = 7 AND "
                   "esl_band_high = 12 AND esl_p10 = 8 AND esl_p90 = 11"),
            1);
}

TEST(TableSql, AStoredWordThisBuildDoesNotKnowIsNamed) {
  TempDatabase file;
  Connection db = file.open();
  migrate(db);
  db.exec(
      "INSERT INTO tenure_euac_curve(run_id, asset_class, role, basis, years, euac, "
      "marginal_cost) VALUES (1, 'vans', 'challenger', 'sideways', 1, 10, 10)");
  Statement q(db, select_sql(results::curve_table()));
  ASSERT_TRUE(q.step());
  try {
    read_row(q, results::curve_table());
    FAIL() << "expected a RuntimeFailure";
  } catch (const RuntimeFailure& e) {
    EXPECT_EQ(std::string(e.what()),
              "tenure_euac_curve.basis: the stored value 'sideways' does not read as this build "
              "of tenure stores it");
  }
}

}  // namespace
}  // namespace tenure::db
