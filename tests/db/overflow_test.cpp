// Figures that overflow never reach the stored results (issue: a geometric class whose costs grow
// fourfold a year, with one asset in service since 1400, stored NaN as NULL, a reason reading
// "-nan" and an r2 of -inf). The asset that cannot be weighed gets `review` with a reason naming
// the figure; every REAL of every tenure_ table is finite; explain reproduces the stored row.
// The fleet is invented.
#include <gtest/gtest.h>

#include <cmath>

#include <fmt/format.h>

#include "app/explain_run.h"
#include "app/review_run.h"
#include "db_test_support.h"
#include "fixtures/fleets/fixture_fleets.h"

namespace tenure::db {
namespace {

using testing_support::scalar;
using testing_support::TempDatabase;
using testing_support::text_of;

constexpr const char* kPolicy = R"({
  // Invented: a class whose costs quadruple every year.
  "marr": 0.10, "income_tax_rate": 0.25, "detail": "all",
  "classes": {"grower": {
    "challenger_first_cost": 10000, "max_life_years": 15,
    "depreciation": {"method": "straight_line", "life_years": 5, "salvage": 0},
    "market_value": {"annual_decline": 0.2}, "cost_model": "geometric"}}})";

void add_growing_fleet(sqlite3* db) {
  // Five units in service from 2015 whose yearly costs are 10, 40, 160, ... (x4 a year), and one
  // in service since 1400 with no cost recorded: 626 years old at the as-of date, where the class
  // curve is far beyond a double.
  std::string sql = "BEGIN;";
  for (int unit = 1; unit <= 5; ++unit) {
    sql += fmt::format("INSERT INTO asset VALUES ('GR-{}', 'grower', '2015-0{}-01', 10000, NULL);",
                       unit, unit);
    double cost = 10;
    for (int year = 2015; year <= 2025; ++year, cost *= 4) {
      sql += fmt::format("INSERT INTO cost_event VALUES ('GR-{}', '{}-0{}-15', {}, 'repair');",
                         unit, year + 1, unit, cost);
    }
  }
  sql += "INSERT INTO asset VALUES ('GR-OLD', 'grower', '1400-01-01', 10000, NULL);"
         "COMMIT;";
  fixtures::exec(db, sql);
}

// Every REAL stored by the run in every tenure_ table: count of those that are not finite (NaN is
// stored as NULL in a NOT NULL column only by error, so the check is on the values present).
double non_finite_reals(Connection& db, const std::string& table) {
  Statement columns(db, "SELECT name FROM pragma_table_info(?1) WHERE type = 'REAL'");
  columns.bind(1, table);
  double count = 0;
  while (columns.step()) {
    const std::string c(columns.text(0));
    count += scalar(db, fmt::format("SELECT count(*) FROM {0} WHERE typeof({1}) = 'real' AND "
                                    "({1} != {1} OR abs({1}) > 1.7976931348623157e308)",
                                    table, c));
  }
  return count;
}

TEST(Overflow, AnAssetWhoseFiguresOverflowIsUnderReviewAndNothingNonFiniteIsStored) {
  TempDatabase file;
  {
    Connection db = file.open();
    fixtures::create_input_tables(db.handle());
    add_growing_fleet(db.handle());
  }
  Connection db = file.open();
  app::run_review(db, {std::string(kPolicy), parse_iso_date("2026-06-30"), {}, {}});
  EXPECT_EQ(text_of(db, "SELECT verdict FROM tenure_latest WHERE asset_id = 'GR-OLD'"), "review");
  const std::string reason =
      text_of(db, "SELECT reason FROM tenure_latest WHERE asset_id = 'GR-OLD'");
  EXPECT_EQ(reason.rfind("Review: its expected operating cost overflows (it is not a finite "
                         "number), so tenure cannot weigh this asset",
                         0),
            0u)
      << reason;
  EXPECT_EQ(reason.find("nan"), std::string::npos);
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM tenure_latest WHERE asset_id = 'GR-OLD' AND "
                       "defender_euac IS NULL AND replace_after_years IS NULL"),
            1);
  // The young units are weighed as usual.
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM tenure_latest WHERE asset_id LIKE 'GR-_' AND "
                       "defender_euac IS NOT NULL"),
            5);
  for (const char* table : {"tenure_run", "tenure_class_result", "tenure_asset_result",
                            "tenure_euac_curve", "tenure_cash_flow"}) {
    EXPECT_EQ(non_finite_reals(db, table), 0) << table;
  }
  // The fit's r2 over 626 years of a curve that quadruples is not finite: none is stored.
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM tenure_class_latest WHERE cost_r2 IS NULL"), 1);
  const explain::Explanation e = app::explain_stored_asset(db, "GR-OLD", std::nullopt);
  EXPECT_TRUE(e.reproduced()) << ::testing::PrintToString(e.differences);
}

}  // namespace
}  // namespace tenure::db
