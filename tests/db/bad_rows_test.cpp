// Every kind of bad input row (SPEC 3, fleet_reader.h rules 1-3) ends in tenure_rejected with its
// source, a row reference and a reason, and the rest of the fleet is still reviewed.
#include <gtest/gtest.h>

#include <fmt/format.h>

#include "app/review_run.h"
#include "db_test_support.h"
#include "fixtures/fleets/fixture_fleets.h"

namespace tenure::db {
namespace {

using testing_support::scalar;
using testing_support::TempDatabase;

struct BadRow {
  const char* source;
  const char* insert;      // SQL adding the bad row
  const char* row_ref;     // expected substring of row_ref
  const char* reason;      // expected reason, exactly
};

// The asset table here has no PRIMARY KEY (a site's own table may not), so duplicates can occur.
const BadRow kBadRows[] = {
    {"asset", "INSERT INTO asset VALUES ('PF-001', 'pump-fixture', '2020-01-15', 9000, NULL)",
     "asset_id 'PF-001'", "duplicate asset_id 'PF-001': the first row with it is used"},
    {"asset", "INSERT INTO asset VALUES (NULL, 'pump-fixture', '2020-01-15', 9000, NULL)", "position ",
     "asset_id is missing"},
    {"asset", "INSERT INTO asset VALUES ('X-CLASS', 'crane', '2020-01-15', 9000, NULL)",
     "asset_id 'X-CLASS'", "asset_class 'crane' is not among the policy's classes"},
    {"asset", "INSERT INTO asset VALUES ('X-DATE', 'pump-fixture', '2020-02-30', 9000, NULL)",
     "asset_id 'X-DATE'", "in_service_on '2020-02-30' is not a valid date (YYYY-MM-DD)"},
    {"asset", "INSERT INTO asset VALUES ('X-FORMAT', 'pump-fixture', '15/01/2020', 9000, NULL)",
     "asset_id 'X-FORMAT'", "in_service_on '15/01/2020' is not a valid date (YYYY-MM-DD)"},
    {"asset", "INSERT INTO asset VALUES ('X-ZERO', 'pump-fixture', '2020-01-15', 0, NULL)",
     "asset_id 'X-ZERO'", "first_cost 0 must be greater than 0"},
    {"asset", "INSERT INTO asset VALUES ('X-NEG', 'pump-fixture', '2020-01-15', -5, NULL)",
     "asset_id 'X-NEG'", "first_cost -5 must be greater than 0"},
    {"asset", "INSERT INTO asset VALUES ('X-TEXT', 'pump-fixture', '2020-01-15', 'lots', NULL)",
     "asset_id 'X-TEXT'", "first_cost 'lots' is not a number"},
    {"asset", "INSERT INTO asset VALUES ('X-INF', 'pump-fixture', '2020-01-15', 1e999, NULL)",
     "asset_id 'X-INF'", "first_cost is not a finite number"},
    {"asset", "INSERT INTO asset VALUES ('X-RET', 'pump-fixture', '2020-01-15', 9000, '2019-01-01')",
     "asset_id 'X-RET'", "retired_on is before in_service_on"},
    {"asset", "INSERT INTO asset VALUES ('X-BADRET', 'pump-fixture', '2020-01-15', 9000, 'soon')",
     "asset_id 'X-BADRET'", "retired_on 'soon' is not a valid date (YYYY-MM-DD)"},
    {"asset", "INSERT INTO asset VALUES (CAST(X'FF41' AS TEXT), 'pump-fixture', '2020-01-15', 9000, NULL)",
     "position ", "asset_id is not valid UTF-8"},
    {"cost_event", "INSERT INTO cost_event VALUES ('PF-002', '2023-13-01', 10, 'repair')",
     "asset_id 'PF-002', occurred_on '2023-13-01'", "occurred_on '2023-13-01' is not a valid date (YYYY-MM-DD)"},
    {"cost_event", "INSERT INTO cost_event VALUES ('PF-002', '2023-02-29', 10, 'repair')",
     "occurred_on '2023-02-29'", "occurred_on '2023-02-29' is not a valid date (YYYY-MM-DD)"},
    {"cost_event", "INSERT INTO cost_event VALUES ('PF-002', '2025-03-01', 'n/a', 'repair')",
     "occurred_on '2025-03-01'", "amount 'n/a' is not a number"},
    {"cost_event", "INSERT INTO cost_event VALUES ('PF-002', '2025-03-02', -1e999, 'repair')",
     "occurred_on '2025-03-02'", "amount is not a finite number"},
    {"cost_event", "INSERT INTO cost_event VALUES ('PF-002', '2025-03-03', NULL, 'repair')",
     "occurred_on '2025-03-03'", "amount is missing"},
    {"cost_event", "INSERT INTO cost_event VALUES ('GHOST-1', '2025-03-01', 10, 'repair')",
     "asset_id 'GHOST-1'", "asset_id 'GHOST-1' is not in the asset relation"},
    {"cost_event", "INSERT INTO cost_event VALUES ('X-ZERO', '2025-03-01', 10, 'repair')",
     "asset_id 'X-ZERO'", "asset 'X-ZERO' was rejected (see its row in the asset relation)"},
    {"cost_event", "INSERT INTO cost_event VALUES ('PF-001', '1999-01-01', 10, 'repair')",
     "occurred_on '1999-01-01'", "occurred_on is before the asset's in_service_on 2025-11-15"},
    {"cost_event", "INSERT INTO cost_event VALUES ('RET-1', '2024-06-01', 10, 'repair')",
     "asset_id 'RET-1'", "occurred_on is after the asset's retired_on 2023-06-30"},
    {"asset_valuation", "INSERT INTO asset_valuation VALUES ('PF-002', '2025-01-01', -100, 'x')",
     "valued_on '2025-01-01'", "amount must not be negative"},
    {"asset_valuation", "INSERT INTO asset_valuation VALUES ('PF-002', 'yesterday', 100, 'x')",
     "valued_on 'yesterday'", "valued_on 'yesterday' is not a valid date (YYYY-MM-DD)"},
    {"asset_valuation", "INSERT INTO asset_valuation VALUES ('RET-1', '2024-01-01', 100, 'x')",
     "asset_id 'RET-1'", "valued_on is after the asset's retired_on 2023-06-30"},
    {"asset_valuation", "INSERT INTO asset_valuation VALUES ('PF-002', '1990-01-01', 100, 'x')",
     "valued_on '1990-01-01'", "valued_on is before the asset's in_service_on 2025-04-15"},
};

class BadRows : public ::testing::Test {
 protected:
  void SetUp() override {
    Connection db = file.open();
    fixtures::create_loose_input_tables(db.handle());
    fixtures::add_noiseless_fleet(db.handle());
    db.exec("INSERT INTO asset VALUES ('RET-1', 'pump-fixture', '2015-01-15', 9000, '2023-06-30');"
            "INSERT INTO cost_event VALUES ('RET-1', '2016-03-01', 1000, 'repair');");
  }
  TempDatabase file;
};

TEST_F(BadRows, EveryKindIsRejectedWithItsReasonAndTheRestIsReviewed) {
  Connection db = file.open();
  for (const BadRow& bad : kBadRows) db.exec(bad.insert);
  const app::RunSummary s = app::run_review(db, {fixtures::noiseless_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
  EXPECT_EQ(s.rows_rejected, static_cast<std::int64_t>(std::size(kBadRows)));
  for (const BadRow& bad : kBadRows) {
    SCOPED_TRACE(bad.insert);
    Statement q(db, "SELECT count(*) FROM tenure_rejected WHERE run_id = ?1 AND source = ?2 AND "
                    "instr(row_ref, ?3) > 0 AND reason = ?4");
    q.bind(1, s.run_id);
    q.bind(2, bad.source);
    q.bind(3, bad.row_ref);
    q.bind(4, bad.reason);
    ASSERT_TRUE(q.step());
    EXPECT_EQ(q.integer(0), 1);
  }
  // The 30 fixture assets are all reviewed; RET-1 is retired, so it feeds the curve only.
  EXPECT_EQ(s.assets_reviewed, 30);
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM tenure_latest"), 30);
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM tenure_latest WHERE asset_id = 'RET-1'"), 0);
  // No NaN or infinity reaches the results.
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM tenure_latest WHERE defender_euac IS NULL OR "
                       "defender_euac <> defender_euac OR abs(defender_euac) > 1e300"), 0);
}

TEST_F(BadRows, RowsDatedAfterTheAsOfDateAreCountedNotRejected) {
  Connection db = file.open();
  db.exec("INSERT INTO cost_event VALUES ('PF-002', '2027-01-01', 10, 'repair');"
          "INSERT INTO asset_valuation VALUES ('PF-002', '2027-01-01', 100, 'x');");
  const app::RunSummary s = app::run_review(db, {fixtures::noiseless_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
  EXPECT_EQ(s.rows_rejected, 0);
  EXPECT_GE(s.rows_after_as_of, 2);
  EXPECT_EQ(scalar(db, fmt::format("SELECT rows_after_as_of FROM tenure_run WHERE run_id = {}", s.run_id)),
            s.rows_after_as_of);
}

}  // namespace
}  // namespace tenure::db
