// The break-evens of replacement/break_even.h and the stakes of replacement/stakes.h, proved the
// way SPEC 11 asks: recompute the case at the break-even price or cost factor and find the two
// options equal (to 1e-6 relative), and the verdict flipping on either side of it; the lines are
// exact where they are evaluated again; the stakes are worked by hand on a small timing. The
// series are invented.
#include <gtest/gtest.h>

#include <algorithm>

#include "replacement/break_even.h"
#include "replacement/case_analysis.h"
#include "replacement/stakes.h"

namespace tenure::replacement {
namespace {

constexpr double kRelative = 1e-6;

Ownership challenger(Money price = 60000) {
  const double s = price / 60000;
  return {price,
          0,
          price,
          {4000, 5500, 7000, 8500, 10000, 12500},
          {45000 * s, 36000 * s, 29000 * s, 23000 * s, 18000 * s, 14000 * s},
          depreciation::make_method(depreciation::StraightLineSpec{5, 0})};
}

Ownership defender(double factor = 1) {
  std::vector<Money> costs = {9000, 10500, 12000, 14500};
  for (Money& c : costs) c *= factor;
  return {38000, 4, 14000, costs, {11000, 8500, 6500, 5000},
          depreciation::make_method(depreciation::MacrsSpec{5})};
}

struct Weighed {
  Decision decision;
  AssetAnalysis defender;
};

Weighed weigh(const Ownership& c, const Ownership& d, const tax::Rates& rates) {
  AssetAnalysis def = analyse_asset(d, rates);
  Decision decision = decide(def, analyse_asset(c, rates), rates);
  return {decision, std::move(def)};
}

class BreakEven : public ::testing::TestWithParam<double> {  // the income tax rate
 protected:
  tax::Rates rates = tax::Rates::make(0.10, GetParam());
  Basis basis = GetParam() > 0 ? Basis::after_tax : Basis::before_tax;
};

TEST_P(BreakEven, PriceLinesAreExactAtOtherPrices) {
  const Ownership c = challenger();
  const auto lines = price_lines(c, analyse_asset(c, rates), rates, basis);
  for (Money price : {1000.0, 45000.0, 90000.0}) {
    const auto euac = analyse_asset(challenger(price), rates).on(basis).curve.euac;
    for (std::size_t n = 0; n < euac.size(); ++n) {
      EXPECT_NEAR(lines[n].slope * price + lines[n].intercept, euac[n], kRelative * euac[n]);
    }
  }
}

TEST_P(BreakEven, AtTheBreakEvenPriceBothOptionsCostTheSame) {
  const Ownership c = challenger();
  const Weighed now = weigh(c, defender(), rates);
  const auto lines = price_lines(c, analyse_asset(c, rates), rates, basis);
  const auto be = break_even_price(lines, now.decision.defender_euac);
  ASSERT_TRUE(be);
  // At P_be the challenger's least EUAC is the defender's: T(0) equals the least T(k).
  const Weighed at = weigh(challenger(be->value), defender(), rates);
  EXPECT_NEAR(at.decision.challenger_euac, at.decision.defender_euac,
              kRelative * at.decision.defender_euac);
  const auto& t = at.decision.timing.present_worth;
  EXPECT_NEAR(t[0], *std::min_element(t.begin() + 1, t.end()), kRelative * t[0]);
  // Cheaper than P_be: replace now; dearer: keep.
  EXPECT_EQ(weigh(challenger(be->value * 0.99), defender(), rates).decision.timing.keep_years, 0);
  EXPECT_GT(weigh(challenger(be->value * 1.01), defender(), rates).decision.timing.keep_years, 0);
}

TEST_P(BreakEven, AtTheBreakEvenCostFactorBothOptionsCostTheSame) {
  const Ownership c = challenger();
  const Weighed now = weigh(c, defender(), rates);
  const auto lines = cost_factor_lines(defender(), now.defender, rates, basis);
  const auto be = break_even_cost_factor(lines, now.decision.challenger_euac);
  ASSERT_TRUE(be);
  // The lines are the defender's EUACs at factor 1 and exact at another factor.
  const auto doubled = analyse_asset(defender(2), rates).on(basis).curve.euac;
  for (std::size_t k = 0; k < lines.size(); ++k) {
    EXPECT_NEAR(lines[k].slope + lines[k].intercept, now.defender.on(basis).curve.euac[k],
                kRelative * doubled[k]);
    EXPECT_NEAR(2 * lines[k].slope + lines[k].intercept, doubled[k], kRelative * doubled[k]);
  }
  const Weighed at = weigh(c, defender(be->value), rates);
  EXPECT_NEAR(at.decision.defender_euac, at.decision.challenger_euac,
              kRelative * at.decision.challenger_euac);
  // Costlier than f_be times its costs: replace now; cheaper: keep.
  EXPECT_EQ(weigh(c, defender(be->value * 1.01), rates).decision.timing.keep_years, 0);
  EXPECT_GT(weigh(c, defender(be->value * 0.99), rates).decision.timing.keep_years, 0);
}

INSTANTIATE_TEST_SUITE_P(TaxRates, BreakEven, ::testing::Values(0.0, 0.25, 0.4));

TEST(BreakEvenLines, NoneWhereNoLineCrossesInRange) {
  // Rising lines only count; a price of 0 or less, or above 1e15, is none.
  EXPECT_FALSE(break_even_price(std::vector<Line>{{0, 5}, {-1, 3}}, 10));
  EXPECT_FALSE(break_even_price(std::vector<Line>{{1, 20}}, 10));       // x = -10
  EXPECT_FALSE(break_even_price(std::vector<Line>{{1e-9, 0}}, 1e7));    // x = 1e16
  const auto price = break_even_price(std::vector<Line>{{2, 1}, {1, 4}}, 10);  // 4.5 or 6
  ASSERT_TRUE(price);
  EXPECT_DOUBLE_EQ(price->value, 6);
  EXPECT_EQ(price->line, 1u);
  // A year with no operating cost cheaper than C* keeps the defender whatever the factor.
  EXPECT_FALSE(break_even_cost_factor(std::vector<Line>{{0, 5}, {3, 1}}, 10));
  const auto factor = break_even_cost_factor(std::vector<Line>{{0, 12}, {3, 1}}, 10);  // 3
  ASSERT_TRUE(factor);
  EXPECT_DOUBLE_EQ(factor->value, 3);
}

TEST(Stakes, WorkedByHandOnASmallTiming) {
  // T = 10, 8, 7, 9: k* = 2. Waiting a year: 9 - 7 = 2; replacing now: 10 - 7 = 3; repair
  // limit: (10 - 7) / factor.
  const Timing t{{10, 8, 7, 9}, 2};
  const Stakes s = stakes(t, 0.8);
  ASSERT_TRUE(s.delay_cost);
  EXPECT_DOUBLE_EQ(*s.delay_cost, 2);
  EXPECT_DOUBLE_EQ(s.early_cost, 3);
  EXPECT_DOUBLE_EQ(s.repair_limit, 3 / 0.8);
  // k* the last year weighed: no delay cost.
  EXPECT_FALSE(stakes({{10, 8, 7}, 2}, 1).delay_cost);
  // Replace now: no early cost, no repair worth making.
  const Stakes now = stakes({{5, 6, 7}, 0}, 1);
  EXPECT_DOUBLE_EQ(now.early_cost, 0);
  EXPECT_DOUBLE_EQ(now.repair_limit, 0);
  EXPECT_DOUBLE_EQ(*now.delay_cost, 1);
}

TEST(Stakes, AfterTaxTheRepairIsExpensedAtTheEndOfYearOne) {
  // 1 - t / (1 + i): 1 - 0.25 / 1.075 (after-tax MARR 0.075), by hand.
  const auto rates = tax::Rates::make(0.10, 0.25);
  EXPECT_NEAR(repair_deduction_factor(rates, Basis::after_tax), 1 - 0.25 / 1.075, 1e-15);
  EXPECT_DOUBLE_EQ(repair_deduction_factor(rates, Basis::before_tax), 1);
  // After a repair of R the kept options cost R x factor more; replacing now costs the same.
  const Timing t{{10, 8, 7, 9}, 2};
  const Timing repaired = after_repair(t, 2.5, 0.8);
  EXPECT_DOUBLE_EQ(repaired.present_worth[0], 10);
  EXPECT_DOUBLE_EQ(repaired.present_worth[2], 9);
  EXPECT_EQ(repaired.keep_years, 2);
  EXPECT_EQ(after_repair(t, 3.76, 0.8).keep_years, 0);  // above the limit of 3.75
}

}  // namespace
}  // namespace tenure::replacement
