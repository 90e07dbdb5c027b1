// The bad-input catalogue (issue "hardening"): every kind of odd or hostile value a maintenance
// database can hold, each fed through app::run_review on an invented fixture fleet. Each ends in a
// rejected row with its reason, or a clear error, and never in a crash or in a NaN or an infinity
// in the results (every REAL column of every tenure_ table and view is checked).
// bad_rows_test.cpp has one row of each rejection reason; this file has the odd values.
#include <gtest/gtest.h>

#include <cmath>
#include <limits>
#include <string>

#include <fmt/format.h>

#include "core/errors.h"
#include "app/explain_run.h"
#include "app/review_run.h"
#include "db/row_checks.h"
#include "db_test_support.h"
#include "fixtures/fleets/fixture_fleets.h"

namespace tenure::db {
namespace {

using testing_support::scalar;
using testing_support::TempDatabase;
using testing_support::text_of;

// The noiseless fixture class plus two invented classes that get odd histories in some tests.
std::string catalogue_policy() {
  return R"({
  // Invented fixture policy.
  "marr": 0.10, "income_tax_rate": 0.25, "detail": "all",
  "classes": {
    "pump-fixture": {"challenger_first_cost": 20000, "max_life_years": 12,
      "depreciation": {"method": "straight_line", "life_years": 8, "salvage": 0},
      "market_value": {"annual_decline": 0.2}, "cost_model": "linear"},
    "hoist-fixture": {"challenger_first_cost": 9000, "max_life_years": 10,
      "depreciation": {"method": "macrs", "recovery_years": 7},
      "market_value": {"annual_decline": 0.15}, "cost_model": "auto"}}})";
}

class InputCatalogue : public ::testing::Test {
 protected:
  void SetUp() override {
    Connection db = file.open();
    fixtures::create_loose_input_tables(db.handle());
    fixtures::add_noiseless_fleet(db.handle());
  }

  app::RunSummary review(const std::string& as_of = fixtures::kAsOf) {
    Connection db = file.open();
    return app::run_review(db, {catalogue_policy(), parse_iso_date(as_of), {}, {}});
  }

  // Runs a statement with one bound double (for NaN, which SQL text cannot spell).
  void insert_with_number(const std::string& sql, double value) {
    Connection db = file.open();
    Statement q(db, sql);
    q.bind(1, value);
    q.run();
  }

  // The reasons tenure_rejected holds for rows whose row_ref contains `ref`.
  std::vector<std::string> reasons(const app::RunSummary& s, const std::string& source,
                                   const std::string& ref) {
    Connection db = file.open();
    Statement q(db, "SELECT reason FROM tenure_rejected WHERE run_id = ?1 AND source = ?2 AND "
                    "instr(row_ref, ?3) > 0 ORDER BY rowid");
    q.bind(1, s.run_id);
    q.bind(2, source);
    q.bind(3, ref);
    std::vector<std::string> out;
    while (q.step()) out.emplace_back(q.text(0));
    return out;
  }

  double count(const std::string& sql) {
    Connection db = file.open();
    return scalar(db, sql);
  }

  // Every REAL column of every tenure_ table and of the two latest views: no NaN (which SQLite
  // would store as NULL, so NULLs are checked where a value is due) and no infinity or number
  // near the double's limit.
  void expect_only_finite_numbers() {
    Connection db = file.open();
    Statement relations(db, "SELECT name FROM sqlite_schema WHERE name LIKE 'tenure_%' AND "
                            "type IN ('table', 'view') ORDER BY name");
    int checked = 0;
    while (relations.step()) {
      const std::string relation(relations.text(0));
      Statement columns(db, "SELECT name, type FROM pragma_table_info(?1)");
      columns.bind(1, relation);
      while (columns.step()) {
        const std::string column(columns.text(0));
        const std::string type(columns.text(1));
        if (type != "REAL" && relation.find("_latest") == std::string::npos) continue;
        const double bad = scalar(db, fmt::format(
            "SELECT count(*) FROM {0} WHERE typeof({1}) IN ('real', 'integer') AND "
            "({1} <> {1} OR abs({1}) > 1e300)", relation, column));
        EXPECT_EQ(bad, 0) << relation << "." << column;
        ++checked;
      }
    }
    EXPECT_GT(checked, 40);
    // A class with a cost curve gives every one of its assets a defender and challenger EUAC and
    // a marginal cost: a NaN there would have become NULL.
    EXPECT_EQ(scalar(db, "SELECT count(*) FROM tenure_latest AS a JOIN tenure_class_latest AS c "
                         "USING (asset_class) WHERE c.cost_model IS NOT NULL AND "
                         "(a.defender_euac IS NULL OR a.challenger_euac IS NULL OR "
                         "a.marginal_cost_next_year IS NULL)"),
              0);
    EXPECT_EQ(scalar(db, "SELECT count(*) FROM tenure_class_latest WHERE cost_model IS NOT NULL "
                         "AND (euac_before_tax IS NULL OR euac_after_tax IS NULL OR "
                         "cost_a IS NULL OR cost_g IS NULL)"),
              0);
  }

  TempDatabase file;
};

// Text in a number column: SQLite converts text that reads as a number in a REAL column (the
// column's affinity), and keeps any other text as text, which is refused, never read as 0.
TEST_F(InputCatalogue, TextInNumberColumns) {
  Connection db = file.open();
  db.exec("INSERT INTO asset VALUES ('T-1', 'pump-fixture', '2020-01-15', 'nine thousand', NULL);"
          "INSERT INTO asset VALUES ('T-2', 'pump-fixture', '2020-01-15', '9000', NULL);"
          "INSERT INTO asset VALUES ('T-3', 'pump-fixture', '2020-01-15', X'00FF', NULL);"
          "INSERT INTO cost_event VALUES ('T-2', '2021-03-01', '1,200.50', 'repair');"
          "INSERT INTO cost_event VALUES ('T-2', '2021-03-02', '', 'repair');"
          "INSERT INTO cost_event VALUES ('T-2', '2021-03-03', '  250  ', 'repair');"
          "INSERT INTO asset_valuation VALUES ('T-2', '2022-01-15', 'about 5000', 'x');");
  const app::RunSummary s = review();
  EXPECT_EQ(reasons(s, "asset", "'T-1'"),
            std::vector<std::string>{"first_cost 'nine thousand' is not a number"});
  EXPECT_EQ(reasons(s, "asset", "'T-2'"), std::vector<std::string>{});  // '9000' became 9000.0
  EXPECT_EQ(reasons(s, "asset", "'T-3'"),
            std::vector<std::string>{"first_cost is a BLOB, not a number"});
  EXPECT_EQ(reasons(s, "cost_event", "occurred_on '2021-03-01'"),
            std::vector<std::string>{"amount '1,200.50' is not a number"});
  EXPECT_EQ(reasons(s, "cost_event", "occurred_on '2021-03-02'"),
            std::vector<std::string>{"amount '' is not a number"});
  // REAL affinity trims the spaces and stores 250.0: accepted.
  EXPECT_EQ(reasons(s, "cost_event", "occurred_on '2021-03-03'"), std::vector<std::string>{});
  EXPECT_EQ(reasons(s, "asset_valuation", "'T-2'"),
            std::vector<std::string>{"amount 'about 5000' is not a number"});
  EXPECT_EQ(s.rows_rejected, 5);
  EXPECT_EQ(count("SELECT count(*) FROM tenure_latest WHERE asset_id = 'T-2'"), 1);
  expect_only_finite_numbers();
}

// A BLOB is refused alike in every column of every relation, saying so, even one whose bytes
// read as a valid date or id (issue: a BLOB date was accepted in cost_event, refused in asset with
// a message showing a valid-looking date, and a BLOB id with a NUL in it was stored).
TEST_F(InputCatalogue, BlobsAreRefusedAlikeEverywhere) {
  Connection db = file.open();
  db.exec("INSERT INTO asset VALUES (CAST(X'42004C4F42' AS BLOB), 'pump-fixture', '2020-01-15', "
          "9000, NULL);"
          "INSERT INTO asset VALUES ('B-1', CAST('pump-fixture' AS BLOB), '2020-01-15', 9000, NULL);"
          "INSERT INTO asset VALUES ('B-2', 'pump-fixture', CAST('2020-01-15' AS BLOB), 9000, NULL);"
          "INSERT INTO asset VALUES ('B-3', 'pump-fixture', '2020-01-15', 9000, "
          "CAST('2030-01-01' AS BLOB));"
          "INSERT INTO asset VALUES ('B-4', 'pump-fixture', '2020-01-15', 9000, NULL);"
          "INSERT INTO cost_event VALUES ('B-4', CAST('2021-03-01' AS BLOB), 5, 'x');"
          "INSERT INTO cost_event VALUES ('B-4', '2021-03-02', X'01', 'x');"
          "INSERT INTO cost_event VALUES (CAST('B-4' AS BLOB), '2021-03-03', 5, 'x');"
          "INSERT INTO asset_valuation VALUES ('B-4', CAST('2022-01-15' AS BLOB), 100, 'x');"
          "INSERT INTO asset_valuation VALUES ('B-4', '2022-01-16', X'01', 'x');");
  const app::RunSummary s = review();
  EXPECT_EQ(reasons(s, "asset", "'B?LOB'"),
            std::vector<std::string>{"asset_id is a BLOB, not text"});
  EXPECT_EQ(reasons(s, "asset", "'B-1'"),
            std::vector<std::string>{"asset_class is a BLOB, not text"});
  EXPECT_EQ(reasons(s, "asset", "'B-2'"),
            std::vector<std::string>{"in_service_on is a BLOB, not a date (YYYY-MM-DD)"});
  EXPECT_EQ(reasons(s, "asset", "'B-3'"),
            std::vector<std::string>{"retired_on is a BLOB, not a date (YYYY-MM-DD)"});
  EXPECT_EQ(reasons(s, "cost_event", "'2021-03-01'"),
            std::vector<std::string>{"occurred_on is a BLOB, not a date (YYYY-MM-DD)"});
  EXPECT_EQ(reasons(s, "cost_event", "'2021-03-02'"),
            std::vector<std::string>{"amount is a BLOB, not a number"});
  EXPECT_EQ(reasons(s, "cost_event", "'2021-03-03'"),
            std::vector<std::string>{"asset_id is a BLOB, not text"});
  EXPECT_EQ(reasons(s, "asset_valuation", "'2022-01-15'"),
            std::vector<std::string>{"valued_on is a BLOB, not a date (YYYY-MM-DD)"});
  EXPECT_EQ(reasons(s, "asset_valuation", "'2022-01-16'"),
            std::vector<std::string>{"amount is a BLOB, not a number"});
  EXPECT_EQ(count("SELECT count(*) FROM tenure_asset_result WHERE instr(asset_id, 'LOB') > 0"), 0);
  EXPECT_EQ(count("SELECT count(*) FROM tenure_latest WHERE asset_id = 'B-4'"), 1);
  expect_only_finite_numbers();
}

// NaN cannot be stored: SQLite turns a bound NaN into NULL, so it arrives as a missing number.
TEST_F(InputCatalogue, NaNArrivesAsMissing) {
  const double nan = std::numeric_limits<double>::quiet_NaN();
  insert_with_number("INSERT INTO asset VALUES ('N-1', 'pump-fixture', '2020-01-15', ?1, NULL)", nan);
  insert_with_number("INSERT INTO cost_event VALUES ('PF-010', '2025-01-02', ?1, 'repair')", nan);
  insert_with_number("INSERT INTO asset_valuation VALUES ('PF-010', '2025-01-02', ?1, 'x')", nan);
  EXPECT_EQ(count("SELECT count(*) FROM asset WHERE asset_id = 'N-1' AND first_cost IS NULL"), 1);
  const app::RunSummary s = review();
  EXPECT_EQ(reasons(s, "asset", "'N-1'"), std::vector<std::string>{"first_cost is missing"});
  EXPECT_EQ(reasons(s, "cost_event", "occurred_on '2025-01-02'"),
            std::vector<std::string>{"amount is missing"});
  EXPECT_EQ(reasons(s, "asset_valuation", "valued_on '2025-01-02'"),
            std::vector<std::string>{"amount is missing"});
  EXPECT_EQ(s.rows_rejected, 3);
  expect_only_finite_numbers();
}

// Infinities (1e999 in SQL text overflows to +inf) in each number column.
TEST_F(InputCatalogue, InfinitiesAreRejected) {
  const double inf = std::numeric_limits<double>::infinity();
  insert_with_number("INSERT INTO asset VALUES ('I-1', 'pump-fixture', '2020-01-15', ?1, NULL)", -inf);
  Connection db = file.open();
  db.exec("INSERT INTO cost_event VALUES ('PF-010', '2025-01-03', 1e999, 'repair');"
          "INSERT INTO asset_valuation VALUES ('PF-010', '2025-01-03', 1e999, 'x');"
          "INSERT INTO asset_valuation VALUES ('PF-010', '2025-01-04', -1e999, 'x');");
  const app::RunSummary s = review();
  EXPECT_EQ(reasons(s, "asset", "'I-1'"), std::vector<std::string>{"first_cost is not a finite number"});
  EXPECT_EQ(reasons(s, "cost_event", "occurred_on '2025-01-03'"),
            std::vector<std::string>{"amount is not a finite number"});
  EXPECT_EQ(reasons(s, "asset_valuation", "valued_on '2025-01-03'"),
            std::vector<std::string>{"amount is not a finite number"});
  EXPECT_EQ(reasons(s, "asset_valuation", "valued_on '2025-01-04'"),
            std::vector<std::string>{"amount is not a finite number"});
  EXPECT_EQ(s.rows_rejected, 4);
  expect_only_finite_numbers();
}

// Huge but finite amounts (1e308 is just below the double's limit): two such costs would sum to
// infinity and stop the whole review, and a first cost of 1e308 gives EUACs near the limit, so
// amounts beyond the reader's bound (fleet_reader.h, kMaxAmount) are rejected with a reason.
TEST_F(InputCatalogue, HugeFiniteAmountsAreRejectedBeyondTheBound) {
  Connection db = file.open();
  db.exec("INSERT INTO asset VALUES ('H-1', 'pump-fixture', '2020-01-15', 1e308, NULL);"
          "INSERT INTO asset VALUES ('H-2', 'pump-fixture', '2020-01-15', 1.000001e15, NULL);"
          "INSERT INTO cost_event VALUES ('PF-010', '2025-01-05', 1e308, 'repair');"
          "INSERT INTO cost_event VALUES ('PF-010', '2025-01-06', 1e308, 'repair');"
          "INSERT INTO cost_event VALUES ('PF-010', '2025-01-07', -1e308, 'credit');"
          "INSERT INTO asset_valuation VALUES ('PF-009', '2025-01-05', 1e308, 'x');");
  const app::RunSummary s = review();
  EXPECT_EQ(reasons(s, "asset", "'H-1'"),
            std::vector<std::string>{"first_cost 1e+308 is larger in magnitude than 1e+15"});
  EXPECT_EQ(reasons(s, "asset", "'H-2'"),
            std::vector<std::string>{"first_cost 1000001000000000 is larger in magnitude than 1e+15"});
  for (const char* day : {"2025-01-05", "2025-01-06"}) {
    EXPECT_EQ(reasons(s, "cost_event", fmt::format("'PF-010', occurred_on '{}'", day)),
              std::vector<std::string>{"amount 1e+308 is larger in magnitude than 1e+15"})
        << day;
  }
  EXPECT_EQ(reasons(s, "cost_event", "'PF-010', occurred_on '2025-01-07'"),
            std::vector<std::string>{"amount -1e+308 is larger in magnitude than 1e+15"});
  EXPECT_EQ(reasons(s, "asset_valuation", "'PF-009'"),
            std::vector<std::string>{"amount 1e+308 is larger in magnitude than 1e+15"});
  EXPECT_EQ(s.rows_rejected, 6);
  EXPECT_EQ(s.assets_reviewed, 30);
  expect_only_finite_numbers();
}

// Amounts at the bound itself are kept, and the review still gives finite numbers.
TEST_F(InputCatalogue, AmountsAtTheBoundAreKeptAndStayFinite) {
  Connection db = file.open();
  db.exec("INSERT INTO asset VALUES ('B-1', 'hoist-fixture', '2019-03-01', 1e15, NULL);"
          "INSERT INTO cost_event VALUES ('B-1', '2019-09-01', 1e15, 'repair');"
          "INSERT INTO cost_event VALUES ('B-1', '2020-09-01', 1e15, 'repair');"
          "INSERT INTO cost_event VALUES ('B-1', '2021-09-01', 1e15, 'repair');"
          "INSERT INTO asset_valuation VALUES ('B-1', '2021-03-01', 1e15, 'x');");
  const app::RunSummary s = review();
  EXPECT_EQ(s.rows_rejected, 0);
  EXPECT_EQ(count("SELECT count(*) FROM tenure_latest WHERE asset_id = 'B-1'"), 1);
  expect_only_finite_numbers();
}

// first_cost 0 and -1 are rejected; a negative cost event is a credit and is kept (it lowers
// that year's total); a zero cost event and a zero valuation are kept.
TEST_F(InputCatalogue, NegativeAndZeroAmounts) {
  Connection db = file.open();
  db.exec("INSERT INTO asset VALUES ('Z-0', 'pump-fixture', '2020-01-15', 0, NULL);"
          "INSERT INTO asset VALUES ('Z-1', 'pump-fixture', '2020-01-15', -1, NULL);"
          "INSERT INTO asset VALUES ('HO-1', 'hoist-fixture', '2019-03-01', 9000, NULL);"
          "INSERT INTO asset VALUES ('HO-2', 'hoist-fixture', '2019-03-01', 9000, NULL);");
  for (const char* id : {"HO-1", "HO-2"}) {
    for (int year = 2019; year <= 2025; ++year) {
      db.exec(fmt::format("INSERT INTO cost_event VALUES ('{}', '{}-09-01', {}, 'repair')", id,
                          year, 500 + 100 * (year - 2019)));
    }
  }
  db.exec("INSERT INTO cost_event VALUES ('HO-1', '2024-10-01', -400, 'warranty credit');"
          "INSERT INTO cost_event VALUES ('HO-1', '2024-10-02', 0, 'inspection');"
          "INSERT INTO asset_valuation VALUES ('HO-2', '2026-03-01', 0, 'scrap');");
  const app::RunSummary s = review();
  EXPECT_EQ(reasons(s, "asset", "'Z-0'"), std::vector<std::string>{"first_cost 0 must be greater than 0"});
  EXPECT_EQ(reasons(s, "asset", "'Z-1'"), std::vector<std::string>{"first_cost -1 must be greater than 0"});
  EXPECT_EQ(s.rows_rejected, 2);
  // The credit lowered HO-1's observed costs below its twin's.
  EXPECT_LT(count("SELECT cost_ratio FROM tenure_asset_result WHERE asset_id = 'HO-1'"),
            count("SELECT cost_ratio FROM tenure_asset_result WHERE asset_id = 'HO-2'"));
  // A zero valuation within the last year is HO-2's market value now.
  EXPECT_EQ(count("SELECT market_value_now FROM tenure_latest WHERE asset_id = 'HO-2'"), 0);
  expect_only_finite_numbers();
}

// Dates outside Boost's range (years 1400..9999) and other impossible dates are rejected.
TEST_F(InputCatalogue, DatesOutOfRange) {
  Connection db = file.open();
  const char* dates[] = {"0000-01-01", "1399-12-31", "10000-01-01", "2020-00-10", "2020-01-32",
                         "-2020-01-01", "2020-1-1", "2020-01-01T00:00:00", " 2020-01-01"};
  int i = 0;
  for (const char* date : dates) {
    ++i;
    db.exec(fmt::format("INSERT INTO asset VALUES ('D-{}', 'pump-fixture', '{}', 9000, NULL)", i, date));
    db.exec(fmt::format("INSERT INTO cost_event VALUES ('PF-010', '{}', 10, 'repair')", date));
    db.exec(fmt::format("INSERT INTO asset_valuation VALUES ('PF-010', '{}', 10, 'x')", date));
  }
  // A date stored as a number (days or a Julian day) is not a date either.
  db.exec("INSERT INTO asset VALUES ('D-NUM', 'pump-fixture', 2459000.5, 9000, NULL)");
  const app::RunSummary s = review();
  i = 0;
  for (const char* date : dates) {
    ++i;
    SCOPED_TRACE(date);
    const std::string shown = fmt::format("'{}'", date);
    EXPECT_EQ(reasons(s, "asset", fmt::format("'D-{}'", i)),
              std::vector<std::string>{fmt::format("in_service_on {} is not a valid date (YYYY-MM-DD)", shown)});
    EXPECT_EQ(reasons(s, "cost_event", "occurred_on " + shown),
              std::vector<std::string>{fmt::format("occurred_on {} is not a valid date (YYYY-MM-DD)", shown)});
    EXPECT_EQ(reasons(s, "asset_valuation", "valued_on " + shown),
              std::vector<std::string>{fmt::format("valued_on {} is not a valid date (YYYY-MM-DD)", shown)});
  }
  EXPECT_EQ(reasons(s, "asset", "'D-NUM'"),
            std::vector<std::string>{"in_service_on '2459000.5' is not a valid date (YYYY-MM-DD)"});
  EXPECT_EQ(s.rows_rejected, 3 * static_cast<std::int64_t>(std::size(dates)) + 1);
  expect_only_finite_numbers();
}

// Pre-1900 and far-future dates that are valid: an asset in service since 1850 is reviewed (far
// older than max_life_years); one put in service in 9999 is not yet in service; events dated in
// the far future are after the as-of date, counted apart.
TEST_F(InputCatalogue, PreNineteenHundredAndFarFutureDates) {
  Connection db = file.open();
  const std::int64_t after_as_of = review().rows_after_as_of;  // the fixture's own
  db.exec("INSERT INTO asset VALUES ('OLD-1850', 'pump-fixture', '1850-01-15', 9000, NULL);"
          "INSERT INTO cost_event VALUES ('OLD-1850', '1850-06-01', 100, 'repair');"
          "INSERT INTO cost_event VALUES ('OLD-1850', '1899-12-31', 9000, 'repair');"
          "INSERT INTO cost_event VALUES ('OLD-1850', '2025-12-31', 9000, 'repair');"
          "INSERT INTO asset_valuation VALUES ('OLD-1850', '1900-01-01', 100, 'x');"
          "INSERT INTO asset VALUES ('OLD-1400', 'pump-fixture', '1400-01-01', 9000, NULL);"
          "INSERT INTO asset VALUES ('FUT-9999', 'pump-fixture', '9999-12-31', 9000, NULL);"
          "INSERT INTO cost_event VALUES ('PF-010', '9999-12-31', 10, 'repair');"
          "INSERT INTO asset_valuation VALUES ('PF-010', '9999-12-31', 10, 'x');");
  const app::RunSummary s = review();
  EXPECT_EQ(s.rows_rejected, 0);
  EXPECT_EQ(s.rows_after_as_of, after_as_of + 2);
  EXPECT_EQ(count("SELECT age_years FROM tenure_latest WHERE asset_id = 'OLD-1850'"), 176);
  EXPECT_EQ(count("SELECT age_years FROM tenure_latest WHERE asset_id = 'OLD-1400'"), 626);
  EXPECT_EQ(count("SELECT count(*) FROM tenure_latest WHERE asset_id = 'FUT-9999'"), 0);
  EXPECT_EQ(count(fmt::format("SELECT assets_not_yet_in_service FROM tenure_run WHERE run_id = {}",
                              s.run_id)),
            1);
  // Far past the class's 12-year maximum life: due for review or replacement.
  EXPECT_NE(text_of(db, "SELECT verdict FROM tenure_latest WHERE asset_id = 'OLD-1850'"), "keep");
  expect_only_finite_numbers();
}

// A review as of the last day the calendar allows (every asset is then thousands of years old,
// its future years past 9999) and as of the first (no asset is in service yet).
TEST_F(InputCatalogue, AsOfDatesAtTheEndsOfTheCalendar) {
  const app::RunSummary last = review("9999-12-31");
  EXPECT_EQ(last.assets_reviewed, 30);
  EXPECT_EQ(last.due, 30);
  expect_only_finite_numbers();
  const app::RunSummary first = review("1400-01-01");
  EXPECT_EQ(first.assets_reviewed, 0);
  EXPECT_EQ(count(fmt::format("SELECT assets_not_yet_in_service FROM tenure_run WHERE run_id = {}",
                              first.run_id)),
            30);
  expect_only_finite_numbers();
}

// Past costs restated at 20% a year into the money of 9999 overflow a double: the review is
// refused with an InputError before anything is written (the message could name the cause
// better: see the hardening report).
TEST_F(InputCatalogue, EscalationToAFarFutureAsOfIsRefusedAndWritesNothing) {
  std::string policy = catalogue_policy();
  policy.insert(policy.find("\"classes\""), "\"cost_escalation\": 0.2, ");
  Connection db = file.open();
  try {
    app::run_review(db, {policy, parse_iso_date("9999-12-31"), {}, {}});
    ADD_FAILURE() << "expected an InputError";
  } catch (const InputError& e) {
    // It names the row, the as-of date's money and what to change.
    EXPECT_EQ(e.where(), "cost_escalation");
    EXPECT_EQ(e.rule().rfind("cost_event (asset_id 'PF-", 0), 0u) << e.rule();
    EXPECT_NE(e.rule().find("in 9999-12-31 money; review as of a nearer date (--as-of) or with "
                            "a smaller cost_escalation"),
              std::string::npos)
        << e.rule();
  }
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM sqlite_schema WHERE name LIKE 'tenure_%'"), 0);
  // The same escalation to an ordinary as-of date is fine.
  app::run_review(db, {policy, parse_iso_date(fixtures::kAsOf), {}, {}});
  expect_only_finite_numbers();
}

// Ids: 10 KB long, not UTF-8, and ids that look like SQL. The long and invalid ones are
// rejected with a shortened, safe row reference; the SQL-looking one is an ordinary id, stored
// as it is, and no input table is touched.
TEST_F(InputCatalogue, LongNonUtf8AndSqlLookingIds) {
  const std::string long_id(10 * 1024, 'L');
  const std::string sql_id = "'; DROP TABLE asset; --";
  const std::string sql_id2 = "x\"); DELETE FROM cost_event; --";
  Connection db = file.open();
  {
    Statement add(db, "INSERT INTO asset VALUES (?1, 'pump-fixture', '2020-01-15', 9000, NULL)");
    Statement cost(db, "INSERT INTO cost_event VALUES (?1, '2021-06-01', 700, 'repair')");
    for (const std::string& id : {long_id, sql_id, sql_id2}) {
      add.bind(1, id);
      add.run();
      cost.bind(1, id);
      cost.run();
    }
    db.exec("INSERT INTO asset VALUES (CAST(X'C328' AS TEXT), 'pump-fixture', '2020-01-15', 9000, NULL);"
            "INSERT INTO cost_event VALUES (CAST(X'C328' AS TEXT), '2021-06-02', 10, 'repair');"
            "INSERT INTO cost_event VALUES (CAST(X'EDA080' AS TEXT), '2021-06-03', 10, 'repair');"
            "INSERT INTO asset VALUES ('tab' || char(9) || 'and' || char(10) || 'newline',"
            " 'pump-fixture', '2020-01-15', 9000, NULL);");
  }
  const double assets_before = count("SELECT count(*) FROM asset");
  const double costs_before = count("SELECT count(*) FROM cost_event");
  const app::RunSummary s = review();
  const std::string shown_long = "'" + std::string(64, 'L') + "...'";
  EXPECT_EQ(reasons(s, "asset", shown_long), std::vector<std::string>{"asset_id is longer than 256 bytes"});
  EXPECT_EQ(reasons(s, "cost_event", shown_long),
            std::vector<std::string>{"asset " + shown_long + " was rejected (see its row in the asset relation)"});
  EXPECT_EQ(reasons(s, "asset", "DROP TABLE").size() + reasons(s, "asset", "DELETE FROM").size(),
            0u);  // the SQL-looking ids are ordinary ids
  EXPECT_EQ(count("SELECT count(*) FROM tenure_latest WHERE asset_id IN ("
                  "'''; DROP TABLE asset; --', 'x\"); DELETE FROM cost_event; --')"),
            2);
  EXPECT_EQ(count("SELECT count(*) FROM tenure_latest WHERE asset_id = 'tab' || char(9) || "
                  "'and' || char(10) || 'newline'"),
            1);
  // C3 28 is a broken two-byte form: refused in the asset relation, and its event with it.
  // ED A0 80 (a lone surrogate, not UTF-8 either) appears only in a cost event: simply an
  // unknown asset.
  EXPECT_EQ(count(fmt::format("SELECT count(*) FROM tenure_rejected WHERE run_id = {} AND "
                              "reason = 'asset_id is not valid UTF-8'", s.run_id)),
            1);
  EXPECT_EQ(count(fmt::format("SELECT count(*) FROM tenure_rejected WHERE run_id = {} AND "
                              "source = 'cost_event' AND reason LIKE '%was rejected%'", s.run_id)),
            2);
  EXPECT_EQ(count(fmt::format("SELECT count(*) FROM tenure_rejected WHERE run_id = {} AND "
                              "source = 'cost_event' AND reason LIKE '%is not in the asset "
                              "relation'", s.run_id)),
            1);
  EXPECT_EQ(s.rows_rejected, 5);
  EXPECT_EQ(count("SELECT count(*) FROM asset"), assets_before);
  EXPECT_EQ(count("SELECT count(*) FROM cost_event"), costs_before);
  // Row references show control characters as '?', so a reason is always one line.
  EXPECT_EQ(count("SELECT count(*) FROM tenure_rejected WHERE instr(row_ref, char(10)) > 0 OR "
                  "instr(reason, char(10)) > 0"),
            0);
  // ... and bytes that are not UTF-8 as '?', so every stored text is valid UTF-8.
  {
    Statement rejected(db, "SELECT row_ref, reason FROM tenure_rejected");
    while (rejected.step()) {
      EXPECT_TRUE(valid_utf8(rejected.text(0))) << rejected.text(0);
      EXPECT_TRUE(valid_utf8(rejected.text(1))) << rejected.text(1);
    }
  }
  expect_only_finite_numbers();
}

// A database whose relations exist but hold no row: the run succeeds with nothing to review.
TEST(InputCatalogueEmpty, EmptyFleetRunsWithZeroAssets) {
  TempDatabase file;
  Connection db = file.open();
  fixtures::create_input_tables(db.handle());
  const app::RunSummary s = app::run_review(db, {catalogue_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
  EXPECT_EQ(s.assets_reviewed, 0);
  EXPECT_EQ(s.rows_read, 0);
  EXPECT_EQ(s.rows_rejected, 0);
  EXPECT_EQ(s.due, 0);
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM tenure_latest"), 0);
  EXPECT_EQ(text_of(db, fmt::format("SELECT status FROM tenure_run WHERE run_id = {}", s.run_id)), "ok");
  // Each class still has its row, without a cost curve.
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM tenure_class_latest WHERE cost_model IS NULL"), 2);
}

// A class whose only history is one complete asset-year: a curve through one point.
TEST_F(InputCatalogue, ClassWithOneAssetYear) {
  Connection db = file.open();
  db.exec("INSERT INTO asset VALUES ('HO-ONE', 'hoist-fixture', '2025-01-10', 9000, NULL);"
          "INSERT INTO cost_event VALUES ('HO-ONE', '2025-05-01', 800, 'repair');");
  const app::RunSummary s = review();
  EXPECT_EQ(s.rows_rejected, 0);
  EXPECT_EQ(count("SELECT asset_years FROM tenure_class_latest WHERE asset_class = 'hoist-fixture'"), 1);
  EXPECT_EQ(count("SELECT count(*) FROM tenure_latest WHERE asset_id = 'HO-ONE'"), 1);
  expect_only_finite_numbers();
}

// A class with assets but no complete asset-year (all in service for less than a year): no cost
// curve, so its assets are put under review with a reason instead of a number.
TEST_F(InputCatalogue, ClassWithNoCostHistory) {
  Connection db = file.open();
  db.exec("INSERT INTO asset VALUES ('HO-NEW-1', 'hoist-fixture', '2025-09-10', 9000, NULL);"
          "INSERT INTO asset VALUES ('HO-NEW-2', 'hoist-fixture', '2026-01-10', 9500, NULL);"
          "INSERT INTO cost_event VALUES ('HO-NEW-1', '2026-05-01', 300, 'repair');");
  const app::RunSummary s = review();
  EXPECT_EQ(s.rows_rejected, 0);
  EXPECT_EQ(count("SELECT count(*) FROM tenure_class_latest WHERE asset_class = 'hoist-fixture' "
                  "AND cost_model IS NULL AND asset_years = 0 AND euac_before_tax IS NULL"),
            1);
  Statement q(db, "SELECT verdict, reason, defender_euac FROM tenure_latest WHERE asset_class = "
                  "'hoist-fixture' ORDER BY asset_id");
  int rows = 0;
  while (q.step()) {
    ++rows;
    EXPECT_EQ(q.text(0), "review");
    EXPECT_NE(q.text(1).find("cannot weigh this asset"), std::string_view::npos) << q.text(1);
    EXPECT_TRUE(q.is_null(2));
  }
  EXPECT_EQ(rows, 2);
  EXPECT_EQ(s.assets_reviewed, 32);
  expect_only_finite_numbers();
}

// Complete years without any event are years that cost nothing: a flat zero curve, finite.
TEST_F(InputCatalogue, GeometricClassWithYearsButNoCostAboveZeroSaysSo) {
  // Issue: it said "no complete year of cost history" though the class has complete years.
  std::string policy = catalogue_policy();
  const std::string automatic = "\"cost_model\": \"auto\"";
  policy.replace(policy.rfind(automatic), automatic.size(), "\"cost_model\": \"geometric\"");
  Connection db = file.open();
  db.exec("INSERT INTO asset VALUES ('HO-IDLE', 'hoist-fixture', '2018-01-10', 9000, NULL);"
          "INSERT INTO cost_event VALUES ('HO-IDLE', '2019-03-01', 0, 'inspection');");
  const app::RunSummary s = app::run_review(db, {policy, parse_iso_date(fixtures::kAsOf), {}, {}});
  EXPECT_EQ(text_of(db, "SELECT reason FROM tenure_latest WHERE asset_id = 'HO-IDLE'"),
            "Review: none of the 8 complete asset-years of class 'hoist-fixture' has a cost above "
            "zero, which its cost_model geometric needs (or use linear or auto); tenure cannot "
            "weigh this asset until then.");
  // explain reads the same words back from the stored class row.
  EXPECT_TRUE(app::explain_stored_asset(db, "HO-IDLE", s.run_id).reproduced());
}

TEST_F(InputCatalogue, ClassWithYearsButNoEvents) {
  Connection db = file.open();
  db.exec("INSERT INTO asset VALUES ('HO-IDLE', 'hoist-fixture', '2018-01-10', 9000, NULL);");
  const app::RunSummary s = review();
  EXPECT_EQ(s.rows_rejected, 0);
  EXPECT_EQ(count("SELECT cost_a FROM tenure_class_latest WHERE asset_class = 'hoist-fixture'"), 0);
  EXPECT_EQ(count("SELECT cost_g FROM tenure_class_latest WHERE asset_class = 'hoist-fixture'"), 0);
  EXPECT_EQ(count("SELECT count(*) FROM tenure_latest WHERE asset_id = 'HO-IDLE'"), 1);
  expect_only_finite_numbers();
}

// Assets far older than the class's max_life_years (12): weighed for one more year, and due.
TEST_F(InputCatalogue, AssetsOlderThanMaxLife) {
  Connection db = file.open();
  db.exec("INSERT INTO asset VALUES ('AGED-20', 'pump-fixture', '2006-01-15', 15000, NULL);"
          "INSERT INTO asset VALUES ('AGED-40', 'pump-fixture', '1986-01-15', 15000, NULL);");
  for (int year = 1986; year <= 2025; ++year) {
    db.exec(fmt::format("INSERT INTO cost_event VALUES ('AGED-40', '{}-06-01', {}, 'repair')",
                        year, fixtures::noiseless_cost(year - 1985)));
    if (year >= 2006) {
      db.exec(fmt::format("INSERT INTO cost_event VALUES ('AGED-20', '{}-06-01', {}, 'repair')",
                          year, fixtures::noiseless_cost(year - 2005)));
    }
  }
  const app::RunSummary s = review();
  EXPECT_EQ(s.rows_rejected, 0);
  EXPECT_EQ(count("SELECT age_years FROM tenure_latest WHERE asset_id = 'AGED-40'"), 40);
  EXPECT_EQ(count("SELECT count(*) FROM tenure_due WHERE asset_id IN ('AGED-20', 'AGED-40')"), 2);
  EXPECT_EQ(count("SELECT max(defender_best_years) FROM tenure_latest WHERE asset_id IN "
                  "('AGED-20', 'AGED-40')"),
            1);
  expect_only_finite_numbers();
}

}  // namespace
}  // namespace tenure::db
