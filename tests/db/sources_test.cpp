// A site's own schema mapped through the policy's sources with CREATE VIEW gives the same
// results as the default relation names (SPEC 3 and 4); sources that are not plain identifiers
// are refused before any SQL is built from them.
#include <gtest/gtest.h>

#include "core/errors.h"
#include "app/review_run.h"
#include "db_test_support.h"
#include "fixtures/fleets/fixture_fleets.h"

namespace tenure::db {
namespace {

using testing_support::TempDatabase;

std::vector<std::string> latest_rows(Connection& db) {
  Statement q(db, "SELECT asset_id, asset_class, age_years, class_esl_years, defender_euac, "
                  "challenger_euac, marginal_cost_next_year, replace_after_years, verdict, "
                  "reason, basis FROM tenure_latest ORDER BY asset_id");
  std::vector<std::string> rows;
  while (q.step()) {
    std::string row;
    for (int c = 0; c < 11; ++c) row += std::string(q.text(c)) + "|";
    rows.push_back(row);
  }
  return rows;
}

std::string mapped_policy() {
  std::string policy = fixtures::noiseless_policy();
  const std::string sources =
      R"("sources": {"assets": "v_unit", "costs": "v_work_cost", "valuations": "v_appraisal"},)";
  return policy.insert(policy.find("\"classes\""), sources);
}

TEST(Sources, ViewsOverAnotherSchemaGiveTheSameResults) {
  TempDatabase plain, mapped;
  {
    Connection db = plain.open();
    fixtures::create_input_tables(db.handle());
    fixtures::add_noiseless_fleet(db.handle());
  }
  {
    // The same data in a differently shaped schema, mapped with views.
    Connection db = mapped.open();
    fixtures::create_input_tables(db.handle());
    fixtures::add_noiseless_fleet(db.handle());
    db.exec(
        "CREATE TABLE unit(tag TEXT PRIMARY KEY, family TEXT, commissioned TEXT, price REAL,"
        " decommissioned TEXT);"
        "INSERT INTO unit SELECT * FROM asset;"
        "CREATE TABLE work_cost(tag TEXT, booked TEXT, labour REAL, parts REAL);"
        "INSERT INTO work_cost SELECT asset_id, occurred_on, amount * 0.25, amount * 0.75 FROM cost_event;"
        "CREATE TABLE appraisal(tag TEXT, on_day TEXT, worth REAL);"
        "INSERT INTO appraisal SELECT asset_id, valued_on, amount FROM asset_valuation;"
        "DROP TABLE asset; DROP TABLE cost_event; DROP TABLE asset_valuation;"
        "CREATE VIEW v_unit AS SELECT tag AS asset_id, family AS asset_class,"
        " commissioned AS in_service_on, price AS first_cost, decommissioned AS retired_on FROM unit;"
        "CREATE VIEW v_work_cost AS SELECT tag AS asset_id, booked AS occurred_on,"
        " labour + parts AS amount FROM work_cost;"
        "CREATE VIEW v_appraisal AS SELECT tag AS asset_id, on_day AS valued_on, worth AS amount"
        " FROM appraisal;");
  }
  Connection a = plain.open();
  Connection b = mapped.open();
  app::run_review(a, {fixtures::noiseless_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
  app::run_review(b, {mapped_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
  const auto rows = latest_rows(a);
  EXPECT_EQ(rows.size(), 30u);
  EXPECT_EQ(rows, latest_rows(b));
}

TEST(Sources, ColumnNamesMatchWhateverTheirCaseAsInSqlite) {
  // SQLite resolves "Asset_Id" as asset_id; so does the check of the input's columns.
  TempDatabase plain, shouted;
  for (TempDatabase* file : {&plain, &shouted}) {
    Connection db = file->open();
    fixtures::create_input_tables(db.handle());
    fixtures::add_noiseless_fleet(db.handle());
  }
  {
    Connection db = shouted.open();
    db.exec("ALTER TABLE asset RENAME COLUMN asset_id TO Asset_Id;"
            "ALTER TABLE asset RENAME COLUMN in_service_on TO IN_SERVICE_ON;"
            "ALTER TABLE cost_event RENAME COLUMN amount TO Amount;"
            "ALTER TABLE asset_valuation RENAME COLUMN valued_on TO Valued_On;");
  }
  Connection a = plain.open();
  Connection b = shouted.open();
  app::run_review(a, {fixtures::noiseless_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
  app::run_review(b, {fixtures::noiseless_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
  EXPECT_EQ(latest_rows(a).size(), 30u);
  EXPECT_EQ(latest_rows(a), latest_rows(b));
}

TEST(Sources, AViewFailingMidScanIsNamed) {
  // A site's view whose expression fails on one row: the failure names the relation.
  TempDatabase file;
  Connection db = file.open();
  fixtures::create_input_tables(db.handle());
  fixtures::add_noiseless_fleet(db.handle());
  db.exec("CREATE TABLE raw_cost(asset_id TEXT, occurred_on TEXT, detail TEXT);"
          "INSERT INTO raw_cost SELECT asset_id, occurred_on, json_object('a', amount) "
          "FROM cost_event;"
          "INSERT INTO raw_cost VALUES ('PF-001', '2025-01-01', 'not json');"
          "CREATE VIEW v_cost AS SELECT asset_id, occurred_on, json_extract(detail, '$.a') "
          "AS amount FROM raw_cost;");
  std::string policy = fixtures::noiseless_policy();
  policy.insert(policy.find("\"classes\""), R"("sources": {"costs": "v_cost"},)");
  try {
    app::run_review(db, {policy, parse_iso_date(fixtures::kAsOf), {}, {}});
    FAIL() << "expected a RuntimeFailure";
  } catch (const RuntimeFailure& e) {
    EXPECT_EQ(std::string(e.what()), "cannot read the inputs: relation 'v_cost': malformed JSON");
  }
}

TEST(Sources, NamesThatAreNotPlainIdentifiersAreRefused) {
  TempDatabase file;
  Connection db = file.open();
  fixtures::create_input_tables(db.handle());
  std::string policy = fixtures::noiseless_policy();
  policy.insert(policy.find("\"classes\""),
                R"("sources": {"costs": "cost_event; DROP TABLE asset"},)");
  try {
    app::run_review(db, {policy, parse_iso_date(fixtures::kAsOf), {}, {}});
    FAIL() << "expected an InputError";
  } catch (const InputError& e) {
    EXPECT_EQ(e.where(), "$.sources.costs");
  }
  EXPECT_EQ(testing_support::scalar(db, "SELECT count(*) FROM asset"), 0);
  EXPECT_EQ(testing_support::scalar(db, "SELECT count(*) FROM sqlite_schema WHERE name = 'asset'"), 1);
}

}  // namespace
}  // namespace tenure::db
