// app::check_repair end to end on a stored run of the noiseless fixture fleet (fixtures/fleets),
// with a few invented rows the run cannot weigh: the repair limit and k* after repairing equal
// replacement::stakes and replacement::after_repair of an independent case analysis of each
// asset (the case built from the fixture's formulas, as tests/db/review_run_test.cpp does for the
// verdicts), before and after tax; repair at and below the limit, replace above it; the exact
// sentences for a retired, rejected, not yet in service, unweighable and unlisted asset; an
// unknown asset and a bad estimate refused naming them; an older run by --run; a stored figure
// that no longer reproduces refused. Test data invented.
#include "app/repair_check.h"

#include <fmt/format.h>
#include <gtest/gtest.h>

#include <cmath>
#include <limits>
#include <string>
#include <vector>

#include "../db/db_test_support.h"
#include "app/review_run.h"
#include "core/errors.h"
#include "core/money_text.h"
#include "fixtures/fleets/fixture_fleets.h"
#include "formats/case_json.h"
#include "replacement/case_analysis.h"
#include "replacement/stakes.h"

namespace tenure::app {
namespace {

using testing_support::TempDatabase;

// The fixture policy (fixtures::noiseless_policy) with a second class, "pump-spare", whose only
// asset has no complete year of costs, so the class has no cost curve. Invented.
std::string policy(double tax, const std::string& sources = "") {
  return fmt::format(R"({{
  // Invented test policy.
  "marr": 0.10, "income_tax_rate": {}, "review_margin": 0.05, "detail": "all", {}
  "classes": {{
    "pump-fixture": {{"challenger_first_cost": 20000, "max_life_years": 12,
      "depreciation": {{"method": "straight_line", "life_years": 8, "salvage": 0}},
      "market_value": {{"annual_decline": 0.2}}, "cost_model": "linear"}},
    "pump-spare": {{"challenger_first_cost": 9000, "max_life_years": 10,
      "depreciation": {{"method": "straight_line", "life_years": 5, "salvage": 0}},
      "market_value": {{"annual_decline": 0.2}}, "cost_model": "linear"}}}}}})",
                     tax, sources);
}

// The rows the run of 2026-06-30 cannot weigh, each for one reason. PF-RET's one complete year
// costs exactly the curve's 1000, so the class fit stays exact.
void add_unweighed_rows(db::Connection& db) {
  db.exec(
      "INSERT INTO asset VALUES ('PF-RET', 'pump-fixture', '2024-01-15', 18000, '2025-04-30');"
      "INSERT INTO cost_event VALUES ('PF-RET', '2024-07-15', 1000, 'repair');"
      "INSERT INTO asset VALUES ('PF-BAD', 'pump-fixture', '2019-05-15', 0, NULL);"
      "INSERT INTO asset VALUES ('PF-NEW', 'pump-fixture', '2026-09-15', 18000, NULL);"
      "INSERT INTO asset VALUES ('PS-001', 'pump-spare', '2026-01-15', 9000, NULL);");
}


// The asset as the defender of a case file: its costs on the curve at ages a+1.. (credibility
// factor 1: its own costs are exactly on the curve), values on the value curve.
replacement::CaseResult case_of(double tax, int age, double first_cost, double value_now) {
  std::vector<double> costs, values;
  for (int k = 1; k <= std::max(1, 12 - age); ++k) {
    costs.push_back(fixtures::noiseless_cost(age + k));
    values.push_back(first_cost * fixtures::kValueStart *
                     std::pow(1 - fixtures::kValueDecline, age + k));
  }
  std::string text = fixtures::noiseless_challenger_case(tax);
  text.pop_back();
  text += fmt::format(
      R"(, "defender": {{"first_cost": {:.17g}, "age_years": {}, "market_value_now": {:.17g},
          "operating_costs": [{:.17g}], "market_values": [{:.17g}],
          "depreciation": {{"method": "straight_line", "life_years": 8, "salvage": 0}}}}}})",
      first_cost, age, value_now, fmt::join(costs, ","), fmt::join(values, ","));
  return replacement::analyse(formats::read_case(text));
}

class RepairCheckRun : public ::testing::TestWithParam<double> {
 protected:
  void SetUp() override {
    db::Connection db = file.open();
    fixtures::create_input_tables(db.handle());
    fixtures::add_noiseless_fleet(db.handle());
    add_unweighed_rows(db);
    review(fixtures::kAsOf);
  }
  void review(const char* as_of) {
    db::Connection db = file.open();
    run_review(db, {policy(GetParam()), parse_iso_date(as_of), {}, {}});
  }
  RepairCheck check(const std::string& asset, double estimate,
                    std::optional<std::int64_t> run = std::nullopt) {
    db::Connection db = file.open();
    return check_repair(db, asset, estimate, run);
  }
  // The reason of an asset the run did not weigh.
  std::string why_not(const std::string& asset, review::NotWeighed expected) {
    const RepairCheck c = check(asset, 300);
    EXPECT_FALSE(c.weighing) << asset;
    EXPECT_EQ(c.not_weighed, expected) << asset;
    return c.reason;
  }
  TempDatabase file;
};

TEST_P(RepairCheckRun, LimitAndYearsAfterRepairingEqualTheCaseAnalysis) {
  const double tax = GetParam();
  const tax::Rates rates = tax::Rates::make(0.10, tax);
  db::Connection db = file.open();
  db::Statement q(db,
                  "SELECT asset_id, age_years, first_cost, market_value_now FROM tenure_latest "
                  "WHERE asset_class = 'pump-fixture' ORDER BY asset_id");
  int repairs = 0, replace_now = 0;
  while (q.step()) {
    const std::string asset(q.text(0));
    SCOPED_TRACE(asset);
    const auto r = case_of(tax, static_cast<int>(q.integer(1)), q.real(2), q.real(3));
    const replacement::Timing& timing = r.decision->timing;
    const double factor = replacement::repair_deduction_factor(rates, r.basis);
    const double limit = replacement::stakes(timing, factor).repair_limit;
    const double tolerance = 1e-6 * timing.present_worth[0];  // the fits are exact to ~1e-12

    const RepairCheck below = check(asset, limit / 2);
    ASSERT_TRUE(below.weighing);
    EXPECT_NEAR(below.weighing->repair_limit, limit, tolerance);
    EXPECT_EQ(below.weighing->keep_years, timing.keep_years);
    if (timing.keep_years == 0) {
      // Replacing now is cheapest already: the limit is 0, and even a free repair is no answer.
      ++replace_now;
      EXPECT_EQ(below.weighing->repair_limit, 0);
      EXPECT_EQ(check(asset, 0).weighing->verdict, review::RepairVerdict::replace);
      continue;
    }
    ++repairs;
    EXPECT_EQ(below.weighing->verdict, review::RepairVerdict::repair);
    EXPECT_EQ(below.weighing->keep_years_if_repaired,
              replacement::after_repair(timing, limit / 2, factor).keep_years);
    // By hand: the repair adds one constant to every T(k), k >= 1, so their least stays where it
    // was: repaired, the unit is kept the run's k* years.
    EXPECT_EQ(below.weighing->keep_years_if_repaired, timing.keep_years);

    const double above = limit * 1.01 + 1;
    const RepairCheck over = check(asset, above);
    EXPECT_EQ(over.weighing->verdict, review::RepairVerdict::replace);
    EXPECT_EQ(over.weighing->keep_years_if_repaired,
              replacement::after_repair(timing, above, factor).keep_years);
    EXPECT_EQ(over.weighing->keep_years_if_repaired, 0);
    // SPEC 11: repair when R <= repair_limit, so the limit itself is still a repair.
    const RepairCheck at = check(asset, below.weighing->repair_limit);
    EXPECT_EQ(at.weighing->verdict, review::RepairVerdict::repair);
    EXPECT_EQ(at.weighing->keep_years_if_repaired, timing.keep_years);
  }
  EXPECT_GT(repairs, 0);
  EXPECT_GT(replace_now, 0);
}

TEST_P(RepairCheckRun, NetCostIsTheEstimateLessThePresentWorthOfItsDeduction) {
  const RepairCheck c = check("PF-010", 1000);
  ASSERT_TRUE(c.weighing);
  // By hand: after tax the repair is expensed and deducted at the end of year 1, at the after-tax
  // MARR 0.10 x (1 - 0.25) = 0.075: 1 - 0.25 / 1.075. Before tax it costs all of itself.
  const double factor = GetParam() > 0 ? 1 - 0.25 / 1.075 : 1.0;
  EXPECT_NEAR(c.weighing->deduction_factor, factor, 1e-15);
  EXPECT_NEAR(c.weighing->net_cost, 1000 * factor, 1e-12);
  EXPECT_EQ(c.basis,
            GetParam() > 0 ? replacement::Basis::after_tax : replacement::Basis::before_tax);
  EXPECT_EQ(c.asset_class, "pump-fixture");
  EXPECT_EQ(c.run_id, 1);
  EXPECT_EQ(c.as_of, fixtures::kAsOf);
  EXPECT_EQ(c.estimate, 1000);
}

TEST_P(RepairCheckRun, TheReasonGivesTheNumbers) {
  const RepairCheck c = check("PF-010", 250);
  ASSERT_TRUE(c.weighing);
  ASSERT_EQ(c.weighing->verdict, review::RepairVerdict::repair);
  const std::string basis = GetParam() > 0 ? "after-tax" : "before-tax";
  EXPECT_EQ(c.reason,
            fmt::format("Repair: the estimate of 250.00 is within the repair limit of {} on "
                        "{} {} basis; repaired, keeping it {} year{} more and then replacing it "
                        "is cheapest.",
                        tenure::money(c.weighing->repair_limit), GetParam() > 0 ? "an" : "a", basis,
                        c.weighing->keep_years, c.weighing->keep_years == 1 ? "" : "s"));
}

TEST_P(RepairCheckRun, AssetsTheRunDidNotWeighSayWhy) {
  EXPECT_EQ(why_not("PF-RET", review::NotWeighed::retired),
            "asset 'PF-RET' was retired on 2025-04-30: there is nothing to repair");
  EXPECT_EQ(why_not("PF-BAD", review::NotWeighed::rejected),
            "asset 'PF-BAD' was rejected by run 1: first_cost 0 must be greater than 0");
  EXPECT_EQ(why_not("PF-NEW", review::NotWeighed::not_yet_in_service),
            "asset 'PF-NEW' goes into service on 2026-09-15, after run 1's as-of date "
            "2026-06-30: the run did not weigh it");
  EXPECT_EQ(why_not("PS-001", review::NotWeighed::cannot_weigh),
            "asset 'PS-001' cannot be weighed: no complete year of cost history for class "
            "'pump-spare', so its costs cannot be estimated until it has one");
  {
    db::Connection db = file.open();
    db.exec("INSERT INTO asset VALUES ('PF-LATE', 'pump-fixture', '2020-03-15', 18000, NULL)");
  }
  EXPECT_EQ(why_not("PF-LATE", review::NotWeighed::not_in_run),
            "asset 'PF-LATE' is in the asset relation but not in run 1: it was most likely added "
            "after the run (run 'tenure review' to weigh it)");
}

TEST_P(RepairCheckRun, UnknownAssetIsBadInputNamingIt) {
  try {
    check("PF-999", 300);
    FAIL() << "expected an InputError";
  } catch (const InputError& e) {
    EXPECT_EQ(std::string(e.what()), "ASSET: no asset 'PF-999' in the asset relation");
  }
}

TEST_P(RepairCheckRun, EstimateOutsideZeroTo1e15IsRefusedNamingIt) {
  for (const double bad :
       {-1.0, -1e-300, 1e15 * (1 + 1e-15), 1e300, std::numeric_limits<double>::infinity(),
        std::numeric_limits<double>::quiet_NaN()}) {
    SCOPED_TRACE(bad);
    try {
      check("PF-010", bad);
      ADD_FAILURE() << "expected an InputError";
    } catch (const InputError& e) {
      EXPECT_EQ(std::string(e.what()), "estimate: must be a finite amount >= 0 and at most 1e15");
    }
  }
  // The bounds themselves are amounts.
  EXPECT_TRUE(check("PF-010", 0).weighing);
  EXPECT_EQ(check("PF-010", 1e15).weighing->verdict, review::RepairVerdict::replace);
}

TEST_P(RepairCheckRun, ReadsTheLatestRunOrTheOneNamed) {
  review("2027-06-30");
  EXPECT_EQ(check("PF-010", 300).run_id, 2);
  EXPECT_EQ(check("PF-010", 300).as_of, "2027-06-30");
  const RepairCheck first = check("PF-010", 300, 1);
  EXPECT_EQ(first.run_id, 1);
  EXPECT_EQ(first.as_of, fixtures::kAsOf);
  // PF-NEW went into service between the two runs.
  EXPECT_EQ(check("PF-NEW", 300).not_weighed, std::nullopt);
  EXPECT_EQ(check("PF-NEW", 300, 1).not_weighed, review::NotWeighed::not_yet_in_service);
  try {
    check("PF-010", 300, 9);
    FAIL() << "expected an InputError";
  } catch (const InputError& e) {
    EXPECT_EQ(std::string(e.what()), "--run: no successful run 9");
  }
}

TEST_P(RepairCheckRun, AStoredFigureThatIsNotReproducedIsAFailure) {
  {
    db::Connection db = file.open();
    db.exec(
        "UPDATE tenure_asset_result SET repair_limit = repair_limit + 1 "
        "WHERE asset_id = 'PF-010'");
  }
  try {
    check("PF-010", 300);
    FAIL() << "expected a RuntimeFailure";
  } catch (const RuntimeFailure& e) {
    EXPECT_EQ(std::string(e.what()).rfind(
                  "the stored figures of asset 'PF-010' in run 1 are not reproduced by the "
                  "recomputation (see 'tenure explain'): repair_limit: stored ",
                  0),
              0u)
        << e.what();
  }
}

INSTANTIATE_TEST_SUITE_P(TaxRates, RepairCheckRun, ::testing::Values(0.0, 0.25));

TEST(RepairCheck, RejectedRowsAreFoundUnderTheRelationThePolicyNames) {
  TempDatabase file;
  db::Connection db = file.open();
  fixtures::create_input_tables(db.handle());
  fixtures::add_noiseless_fleet(db.handle(), 6);
  add_unweighed_rows(db);
  db.exec("CREATE VIEW v_unit AS SELECT * FROM asset");
  run_review(db, {policy(0.25, R"("sources": {"assets": "v_unit"},)"),
                  parse_iso_date(fixtures::kAsOf),
                  {},
                  {}});
  const RepairCheck c = check_repair(db, "PF-BAD", 300, std::nullopt);
  EXPECT_EQ(c.not_weighed, review::NotWeighed::rejected);
  EXPECT_EQ(c.reason, "asset 'PF-BAD' was rejected by run 1: first_cost 0 must be greater than 0");
}

TEST(RepairCheck, ADatabaseWithoutARunIsNamed) {
  TempDatabase file;
  db::Connection db = file.open();
  fixtures::create_input_tables(db.handle());
  try {
    check_repair(db, "PF-001", 300, std::nullopt);
    FAIL() << "expected an InputError";
  } catch (const InputError& e) {
    EXPECT_EQ(std::string(e.what()),
              "--db: no review run in this database (run 'tenure review' first)");
  }
}

}  // namespace
}  // namespace tenure::app
