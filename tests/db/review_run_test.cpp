// The nightly review end to end on fixture databases built by code (fixtures/fleets): exact
// class curves, class economic life equal to the case analysis of the same series, verdicts equal
// to the case analysis of each asset as a defender, input tables untouched, a review killed
// before its commit, and a missing relation refused before anything is written.
#include <gtest/gtest.h>

#include <csignal>
#include <sys/wait.h>
#include <unistd.h>

#include <fmt/format.h>

#include "app/review_run.h"
#include "core/errors.h"
#include "db_test_support.h"
#include "fixtures/fleets/fixture_fleets.h"
#include "formats/case_json.h"
#include "formats/policy_json.h"
#include "replacement/case_analysis.h"
#include "replacement/stakes.h"
#include "review/verdict_rule.h"

namespace tenure::db {
namespace {

using testing_support::relation_digest;
using testing_support::scalar;
using testing_support::TempDatabase;
using testing_support::text_of;

constexpr double kExact = 1e-9;  // relative: the fits see noiseless data

// The rates of the fixture policy at income tax rate `tax` (fixtures::noiseless_policy).
tax::Rates r_rates(double tax) { return tax::Rates::make(0.10, tax); }

class NoiselessFleet : public ::testing::TestWithParam<double> {
 protected:
  void SetUp() override {
    Connection db = file.open();
    fixtures::create_input_tables(db.handle());
    fixtures::add_noiseless_fleet(db.handle());
  }
  app::RunSummary review(const char* as_of = fixtures::kAsOf) {
    Connection db = file.open();
    return app::run_review(db, {fixtures::noiseless_policy(GetParam()), parse_iso_date(as_of), {}, {}});
  }
  TempDatabase file;
};

TEST_P(NoiselessFleet, FittedCurvesAreExact) {
  review();
  Connection db = file.open();
  EXPECT_EQ(text_of(db, "SELECT cost_model FROM tenure_class_latest"), "linear");
  EXPECT_NEAR(scalar(db, "SELECT cost_a FROM tenure_class_latest"), fixtures::kCostA, kExact * 1000);
  EXPECT_NEAR(scalar(db, "SELECT cost_g FROM tenure_class_latest"), fixtures::kCostG, kExact * 1000);
  EXPECT_NEAR(scalar(db, "SELECT cost_r2 FROM tenure_class_latest"), 1.0, kExact);
  EXPECT_EQ(text_of(db, "SELECT value_model FROM tenure_class_latest"), "fitted");
  EXPECT_NEAR(scalar(db, "SELECT value_start FROM tenure_class_latest"), fixtures::kValueStart, kExact);
  EXPECT_NEAR(scalar(db, "SELECT value_decline FROM tenure_class_latest"), fixtures::kValueDecline, kExact);
}


TEST_P(NoiselessFleet, ClassEconomicLifeEqualsTheCaseAnalysis) {
  review();
  Connection db = file.open();
  const auto result = replacement::analyse(
      formats::read_case(fixtures::noiseless_challenger_case(GetParam())));
  const auto& before = result.challenger.before_tax.curve;
  EXPECT_EQ(scalar(db, "SELECT esl_years_before_tax FROM tenure_class_latest"), before.best_years);
  EXPECT_NEAR(scalar(db, "SELECT euac_before_tax FROM tenure_class_latest"), before.best_euac,
              1e-6 * before.best_euac);
  if (GetParam() > 0) {
    const auto& after = result.challenger.after_tax->curve;
    EXPECT_EQ(scalar(db, "SELECT esl_years_after_tax FROM tenure_class_latest"), after.best_years);
    EXPECT_NEAR(scalar(db, "SELECT euac_after_tax FROM tenure_class_latest"), after.best_euac,
                1e-6 * after.best_euac);
  }
}

// SPEC 11 "Per class" on the noiseless fleet: the band by its rule (EUAC(n) <= 1.02 x least, the
// policy's default esl_band, restated here) on the case analysis's curve; every asset lies on
// the class curve, so each bootstrap refit is that curve and p10 = p90 = the economic life.
TEST_P(NoiselessFleet, ClassLifeBandAndPercentilesFollowTheCaseAnalysis) {
  review();
  Connection db = file.open();
  const auto result = replacement::analyse(
      formats::read_case(fixtures::noiseless_challenger_case(GetParam())));
  const auto& curve = result.challenger.on(result.basis).curve;
  int low = 0, high = 0;
  for (std::size_t n = 0; n < curve.euac.size(); ++n) {
    if (curve.euac[n] <= 1.02 * curve.best_euac * (1 + kExact)) {
      if (low == 0) low = static_cast<int>(n) + 1;
      high = static_cast<int>(n) + 1;
    }
  }
  ASSERT_GT(low, 0);
  EXPECT_EQ(scalar(db, "SELECT esl_band_low FROM tenure_class_latest"), low);
  EXPECT_EQ(scalar(db, "SELECT esl_band_high FROM tenure_class_latest"), high);
  EXPECT_EQ(scalar(db, "SELECT esl_p10 FROM tenure_class_latest"), curve.best_years);
  EXPECT_EQ(scalar(db, "SELECT esl_p90 FROM tenure_class_latest"), curve.best_years);
}

TEST_P(NoiselessFleet, VerdictsEqualTheDefenderCaseAnalysis) {
  review();
  Connection db = file.open();
  const double tax = GetParam();
  const auto challenger =
      replacement::analyse(formats::read_case(fixtures::noiseless_challenger_case(tax)));
  const auto basis = challenger.basis;
  const double c_star = challenger.challenger.on(basis).curve.best_euac;
  const int esl = challenger.challenger.on(basis).curve.best_years;
  Statement q(db, "SELECT asset_id, age_years, first_cost, market_value_now, verdict, "
                  "replace_after_years, defender_euac, delay_cost, early_cost, repair_limit "
                  "FROM tenure_latest");
  int rows = 0;
  while (q.step()) {
    ++rows;
    const int age = static_cast<int>(q.integer(1));
    const double first_cost = q.real(2);
    std::vector<double> costs, values;
    for (int k = 1; k <= std::max(1, 12 - age); ++k) {
      costs.push_back(fixtures::noiseless_cost(age + k));
      values.push_back(first_cost * fixtures::kValueStart *
                       std::pow(1 - fixtures::kValueDecline, age + k));
    }
    const std::string defender = fmt::format(
        R"(, "defender": {{"first_cost": {:.17g}, "age_years": {}, "market_value_now": {:.17g},
            "operating_costs": [{:.17g}], "market_values": [{:.17g}],
            "depreciation": {{"method": "straight_line", "life_years": 8, "salvage": 0}}}}}})",
        first_cost, age, q.real(3), fmt::join(costs, ","), fmt::join(values, ","));
    std::string text = fixtures::noiseless_challenger_case(tax);
    text.pop_back();
    const auto r = replacement::analyse(formats::read_case(text + defender));
    const auto& d = *r.decision;
    SCOPED_TRACE(std::string(q.text(0)));
    EXPECT_EQ(q.integer(5), d.timing.keep_years);
    EXPECT_NEAR(q.real(6), d.defender_euac, 1e-6 * d.defender_euac);
    // The one verdict rule (review/verdict_rule.h, tested on its own) on the case's figures.
    EXPECT_EQ(d.challenger_euac, c_star);
    EXPECT_EQ(d.challenger_esl, esl);
    const auto& weighed = r.defender->on(r.basis);
    const review::VerdictFinding expected = review::weigh(
        review::figures_of(d, weighed.curve.marginal_costs[0], weighed.costs.max_years()), age, 1);
    EXPECT_EQ(std::string(q.text(4)), review::to_string(expected.verdict));
    // What is at stake, from the case's timing (replacement/stakes.h, tested on its own).
    const replacement::Stakes s =
        replacement::stakes(d.timing, replacement::repair_deduction_factor(r_rates(tax), r.basis));
    if (s.delay_cost) {
      EXPECT_NEAR(q.real(7), *s.delay_cost, 1e-6 * d.timing.present_worth[0]);
    } else {
      EXPECT_TRUE(q.is_null(7));
    }
    EXPECT_NEAR(q.real(8), s.early_cost, 1e-6 * d.timing.present_worth[0]);
    EXPECT_NEAR(q.real(9), s.repair_limit, 1e-6 * d.timing.present_worth[0]);
  }
  EXPECT_EQ(rows, 30);
}

TEST_P(NoiselessFleet, InputTablesAreNeverWritten) {
  Connection db = file.open();
  const std::string before = relation_digest(db, "asset") + relation_digest(db, "cost_event") +
                             relation_digest(db, "asset_valuation");
  review();
  review("2026-12-31");
  EXPECT_EQ(before, relation_digest(db, "asset") + relation_digest(db, "cost_event") +
                        relation_digest(db, "asset_valuation"));
}

TEST_P(NoiselessFleet, NewlyDueComparesWithThePreviousRun) {
  const app::RunSummary first = review("2024-06-30");
  EXPECT_EQ(first.newly_due, first.due);  // no earlier run: everything due is new
  const app::RunSummary second = review();
  Connection db = file.open();
  // Due now and not due at the first run, counted independently of the view.
  const double expected = scalar(db, fmt::format(
      "SELECT count(*) FROM tenure_asset_result AS now WHERE now.run_id = {} AND now.verdict "
      "<> 'keep' AND NOT EXISTS (SELECT 1 FROM tenure_asset_result AS b WHERE b.run_id = {} AND "
      "b.asset_id = now.asset_id AND b.verdict <> 'keep')",
      second.run_id, first.run_id));
  EXPECT_EQ(second.newly_due, expected);
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM tenure_newly_due"), expected);
  EXPECT_GT(expected, 0);
  EXPECT_LT(expected, second.due);
}

TEST_P(NoiselessFleet, KilledBeforeCommitLeavesThePreviousResults) {
  const app::RunSummary first = review();
  const pid_t child = fork();
  ASSERT_GE(child, 0);
  if (child == 0) {
    Connection db = file.open();
    app::run_review(db, {fixtures::noiseless_policy(GetParam()), parse_iso_date("2026-12-31"), {},
                    [] { std::raise(SIGKILL); }});
    _exit(0);
  }
  int status = 0;
  waitpid(child, &status, 0);
  ASSERT_TRUE(WIFSIGNALED(status));
  Connection db = file.open();
  EXPECT_EQ(text_of(db, "PRAGMA integrity_check"), "ok");
  EXPECT_EQ(scalar(db, "SELECT max(run_id) FROM tenure_run"), first.run_id);
  EXPECT_EQ(text_of(db, "SELECT as_of FROM tenure_run WHERE run_id = (SELECT DISTINCT run_id FROM tenure_latest)"),
            fixtures::kAsOf);
}

INSTANTIATE_TEST_SUITE_P(TaxRates, NoiselessFleet, ::testing::Values(0.0, 0.25));

TEST(ReviewRun, MissingRelationIsNamedAndNothingIsWritten) {
  TempDatabase file;
  Connection db = file.open();
  fixtures::create_input_tables(db.handle());
  db.exec("DROP TABLE asset_valuation");
  try {
    app::run_review(db, {fixtures::noiseless_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
    FAIL() << "expected an InputError";
  } catch (const InputError& e) {
    EXPECT_EQ(e.where(), "$.sources.valuations");
    EXPECT_EQ(e.rule(), "relation 'asset_valuation' does not exist in the database");
  }
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM sqlite_schema WHERE name LIKE 'tenure_%'"), 0);
}

TEST(ReviewRun, MissingColumnIsNamed) {
  TempDatabase file;
  Connection db = file.open();
  fixtures::create_input_tables(db.handle());
  db.exec("DROP TABLE cost_event; CREATE TABLE cost_event(asset_id TEXT, occurred_on TEXT, cost REAL)");
  try {
    app::run_review(db, {fixtures::noiseless_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
    FAIL() << "expected an InputError";
  } catch (const InputError& e) {
    EXPECT_EQ(std::string(e.what()), "$.sources.costs: relation 'cost_event' has no column 'amount'");
  }
}

}  // namespace
}  // namespace tenure::db
