// explain_asset rebuilds a stored asset's analysis from the stored curve parameters and inputs
// with the review's own code: every figure equals, to the last bit, the case analysis of the same
// series (replacement::analyse, built independently in pump_fixture.h), for young and old
// defenders, before and after tax; a stored figure off by one unit in the last place is named.
#include <gtest/gtest.h>

#include <cmath>
#include <set>

#include <fmt/format.h>

#include "core/errors.h"
#include "explain/explanation.h"
#include "explain/rebuild.h"
#include "pump_fixture.h"

namespace tenure::explain {
namespace {

using testing::PumpFixture;

class ExplainAsset : public ::testing::TestWithParam<std::tuple<int, double>> {};

TEST_P(ExplainAsset, ReproducesTheCaseAnalysisExactly) {
  const auto [age, tax] = GetParam();
  PumpFixture f(age, tax);
  const Explanation e = explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt);
  // Everything but the review's wording of the reason (left empty in the fixture) agrees.
  ASSERT_EQ(e.differences.size(), 1u) << ::testing::PrintToString(e.differences);
  EXPECT_EQ(e.differences[0].rfind("reason: stored , recomputed ", 0), 0u) << e.differences[0];
  EXPECT_EQ(e.review.finding.verdict, f.stored.verdict);
  // The recomputed tables are the case analysis's, bit for bit.
  const replacement::CaseResult& r = *f.result;
  EXPECT_EQ(e.review.defender->before_tax.curve.euac, r.defender->before_tax.curve.euac);
  EXPECT_EQ(e.review.defender->before_tax.curve.marginal_costs,
            r.defender->before_tax.curve.marginal_costs);
  EXPECT_EQ(e.review.decision->timing.present_worth, r.decision->timing.present_worth);
  EXPECT_EQ(e.model.challenger->before_tax.curve.euac, r.challenger.before_tax.curve.euac);
  if (tax > 0) {
    EXPECT_EQ(e.review.defender->after_tax->curve.euac, r.defender->after_tax->curve.euac);
  }
  // With the review's reason stored, nothing differs.
  f.stored.reason = e.review.finding.reason;
  EXPECT_TRUE(explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt).reproduced());
}

INSTANTIATE_TEST_SUITE_P(AgesAndTaxes, ExplainAsset,
                         ::testing::Combine(::testing::Values(0, 2, 5, 9, 11, 14),
                                            ::testing::Values(0.0, 0.25)));

TEST(ExplainAsset, FixtureCoversEveryVerdict) {
  std::set<review::Verdict> seen;
  for (int age = 0; age <= 14; ++age) seen.insert(PumpFixture(age).stored.verdict);
  EXPECT_EQ(seen, (std::set<review::Verdict>{review::Verdict::keep, review::Verdict::review,
                                             review::Verdict::replace}));
}

TEST(ExplainAsset, NamesAStoredFigureOffByOneUnitInTheLastPlace) {
  PumpFixture f(5);
  f.stored.reason = explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt).review.finding.reason;
  const double stored = *f.stored.defender_euac;
  f.stored.defender_euac = std::nextafter(stored, 1e300);
  const Explanation e = explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt);
  ASSERT_EQ(e.differences.size(), 1u);
  EXPECT_EQ(e.differences[0], fmt::format("defender_euac: stored {:.17g}, recomputed {:.17g}",
                                          *f.stored.defender_euac, stored));
  EXPECT_FALSE(e.reproduced());
}

TEST(ExplainAsset, NamesAChangedVerdictAndKStar) {
  PumpFixture f(9);
  f.stored.reason = explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt).review.finding.reason;
  f.stored.verdict = review::Verdict::keep;
  f.stored.replace_after_years = *f.stored.replace_after_years + 1;
  const Explanation e = explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt);
  ASSERT_EQ(e.differences.size(), 2u);
  EXPECT_EQ(e.differences[0].rfind("replace_after_years: stored ", 0), 0u);
  EXPECT_EQ(e.differences[1].rfind("verdict: stored keep, recomputed ", 0), 0u);
}

TEST(ExplainAsset, ClassWithoutCostCurveIsUnderReviewWithItsNote) {
  PumpFixture f(5);
  f.stored_class.cost_model.reset();
  f.stored_class.cost_a.reset();
  f.stored_class.cost_g.reset();
  // Without a cost curve the run stores no challenger figures for the class either.
  for (auto* life : {&f.stored_class.esl_years_before_tax, &f.stored_class.esl_years_after_tax,
                     &f.stored_class.esl_band_low, &f.stored_class.esl_band_high,
                     &f.stored_class.esl_p10, &f.stored_class.esl_p90}) {
    life->reset();
  }
  f.stored_class.euac_before_tax.reset();
  f.stored_class.euac_after_tax.reset();
  for (auto* figure : {&f.stored.defender_euac, &f.stored.challenger_euac,
                       &f.stored.defender_euac_before_tax, &f.stored.defender_euac_after_tax,
                       &f.stored.marginal_cost_next_year}) {
    figure->reset();
  }
  f.stored.class_esl_years.reset();
  f.stored.defender_best_years.reset();
  f.stored.replace_after_years.reset();
  for (auto* figure : {&f.stored.delay_cost, &f.stored.early_cost, &f.stored.repair_limit,
                       &f.stored.break_even_price, &f.stored.break_even_cost_factor}) {
    figure->reset();
  }
  f.stored.close_call.reset();
  f.stored.verdict = review::Verdict::review;
  const Explanation e = explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt);
  EXPECT_FALSE(e.review.defender);
  EXPECT_EQ(e.review.finding.verdict, review::Verdict::review);
  EXPECT_NE(e.review.finding.reason.find("no complete year of cost history"), std::string::npos);
  ASSERT_EQ(e.differences.size(), 1u);  // only the empty stored reason
}

TEST(ExplainAsset, UnknownClassInThePolicyIsAFailure) {
  PumpFixture f(5);
  f.stored_class.asset_class = "not-in-policy";
  EXPECT_THROW(explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt), RuntimeFailure);
}

TEST(ExplainAsset, UnreadableStoredPolicyNamesIt) {
  PumpFixture f(5);
  f.run.policy_json = "{\"marr\": }";
  try {
    run_policy(f.run);
    FAIL() << "expected an InputError";
  } catch (const InputError& e) {
    EXPECT_EQ(e.where(), "policy_json");
  }
}

}  // namespace
}  // namespace tenure::explain
