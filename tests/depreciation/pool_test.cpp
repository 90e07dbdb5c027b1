// The pooled regime (depreciation/pool.h): d times the undepreciated balance each year, half the
// first year's under the half-year rule, a first-year allowance first where one applies, the
// balance carried on past the listed years, and the refusals of its parameters. Golden values
// are worked by hand beside each check from the rules as the sources state them: the half-year
// rule of Canada's capital cost allowance, "in the first year ... depreciated at half the normal
// rate, i.e. d/2" (University of Waterloo course notes,
// https://www.nlpdf.com/pdf/12f4fd/www-arts-uwaterloo-ca); the UK's part-claimed first-year
// allowance, the rest joining the pool for writing-down allowances from the next period (from
// memory). Rates are the user's input; the classes named are examples, amounts invented.
#include "depreciation/pool.h"

#include <gtest/gtest.h>

#include <cmath>
#include <limits>

#include "depreciation/schedule.h"
#include "depreciation/straight_line.h"
#include "input_error_matcher.h"

namespace tenure::depreciation {
namespace {

using testing::throws_input_error;

constexpr double kMoneyTolerance = 1e-9;  // amounts up to 10^5; only rounding noise

TEST(Pool, HalfYearRuleTakesHalfTheRateInYearOne) {
  // A 30% class (Canada's class 10) on 100,000: year 1 15% = 15,000; year 2 30% of 85,000 =
  // 25,500; year 3 30% of 59,500 = 17,850, leaving 41,650.
  const Schedule s(Pool(PoolSpec{0.30, true, std::nullopt}), 100000);
  EXPECT_NEAR(s.deduction(1), 15000, kMoneyTolerance);
  EXPECT_NEAR(s.deduction(2), 25500, kMoneyTolerance);
  EXPECT_NEAR(s.deduction(3), 17850, kMoneyTolerance);
  EXPECT_NEAR(s.book_value(3), 41650, kMoneyTolerance);
  // The Waterloo notes' example, class 8 (20%) on 150,000, worked by the rule: 15,000, 27,000,
  // 21,600, 17,280.
  const Schedule class8(Pool(PoolSpec{0.20, true, std::nullopt}), 150000);
  const double expected[] = {15000, 27000, 21600, 17280};
  for (Years y = 1; y <= 4; ++y) {
    EXPECT_NEAR(class8.deduction(y), expected[y - 1], kMoneyTolerance) << y;
  }
}

TEST(Pool, WithoutTheHalfYearRuleYearOneTakesTheFullRate) {
  // An 18% pool on 10,000: 1,800, then 18% of 8,200 = 1,476.
  const Schedule s(Pool(PoolSpec{0.18, false, std::nullopt}), 10000);
  EXPECT_NEAR(s.deduction(1), 1800, kMoneyTolerance);
  EXPECT_NEAR(s.deduction(2), 1476, kMoneyTolerance);
  EXPECT_NEAR(s.book_value(2), 6724, kMoneyTolerance);
}

TEST(Pool, FirstYearAllowanceComesFirstAndTheRestJoinsThePool) {
  // pool.h example: 40% first-year allowance, then 18% of 6,000 = 1,080, 18% of 4,920 = 885.60.
  const Schedule uk(Pool(PoolSpec{0.18, false, 0.40}), 10000);
  EXPECT_NEAR(uk.deduction(1), 4000, kMoneyTolerance);
  EXPECT_NEAR(uk.deduction(2), 1080, kMoneyTolerance);
  EXPECT_NEAR(uk.deduction(3), 885.6, kMoneyTolerance);
  // Canada's accelerated first year on a 30% class as f = 0.45: 45%, then 30% of 55% = 16.5%.
  const Schedule class10(Pool(PoolSpec{0.30, false, 0.45}), 10000);
  EXPECT_NEAR(class10.deduction(1), 4500, kMoneyTolerance);
  EXPECT_NEAR(class10.deduction(2), 1650, kMoneyTolerance);
  // Immediate expensing, f = 1: the whole addition in year 1, nothing left to write down.
  const Schedule expensed(Pool(PoolSpec{0.06, false, 1.0}), 10000);
  EXPECT_EQ(expensed.years(), 1);
  EXPECT_EQ(expensed.deduction(1), 10000);
  EXPECT_EQ(expensed.book_value(1), 0);
  EXPECT_EQ(expensed.deduction(5), 0);
  EXPECT_EQ(expensed.book_value(30), 0);
}

TEST(Pool, ARateOfOneWritesTheAdditionOffInOneOrTwoYears) {
  // d = 1: the whole balance each year; with the half-year rule half in year 1, half in year 2.
  EXPECT_EQ(Pool(PoolSpec{1.0, false, std::nullopt}).deductions(800), (std::vector<Money>{800}));
  EXPECT_EQ(Pool(PoolSpec{1.0, true, std::nullopt}).deductions(800),
            (std::vector<Money>{400, 400}));
}

TEST(Pool, ListsYearsUntilTheBalanceIsUnderOnePercent) {
  // Rule (5). 30% with the half-year rule: the balance is 0.85 x 0.7^(y-1) of the addition,
  // under 0.01 first at y = 14 (0.85 x 0.7^12 = 0.0118, x 0.7 = 0.0083).
  const Schedule s(Pool(PoolSpec{0.30, true, std::nullopt}), 1000);
  EXPECT_EQ(s.years(), 14);
  EXPECT_GE(s.book_value(13), 10);
  EXPECT_LT(s.book_value(14), 10);
  EXPECT_EQ(s.rows().size(), 14u);
  // A slow pool stops listing at 100 years: 0.1% a year leaves 90% of the addition after 100.
  EXPECT_EQ(Pool(PoolSpec{0.001, false, std::nullopt}).deductions(1000).size(), 100u);
}

TEST(Pool, TheBalanceGoesOnFallingPastTheListedYears) {
  // Closed form of rules (1) and (3): BV(y) = C (1 - d/2) (1 - d)^(y-1), D(y) = d BV(y-1), for
  // any y, before and past the 14 listed years; a sale takes the full year.
  const double d = 0.30;
  const Schedule s(Pool(PoolSpec{d, true, std::nullopt}), 1000);
  for (Years y : {2, 10, 14, 15, 40, 200}) {
    const double before = 1000 * (1 - d / 2) * std::pow(1 - d, y - 2);
    const double after = before * (1 - d);
    EXPECT_NEAR(s.book_value(y), after, 1e-12 * 1000) << y;
    EXPECT_NEAR(s.deduction(y), d * before, 1e-12 * 1000) << y;
    EXPECT_EQ(s.deduction_if_sold(y), s.deduction(y)) << y;
    EXPECT_EQ(s.book_value_if_sold(y), s.book_value(y)) << y;
  }
  // Rows to a year of sale past the listing go on with the tail.
  const std::vector<ScheduleRow> rows = s.rows(20);
  ASSERT_EQ(rows.size(), 20u);
  EXPECT_NEAR(rows[19].book_value, 1000 * 0.85 * std::pow(0.7, 19), 1e-12 * 1000);
  EXPECT_GT(rows[19].depreciation, 0);
}

TEST(Pool, IsAPoolToSaleRulesAndHoldsNoAmount) {
  const Pool pool(PoolSpec{0.20, true, std::nullopt});
  EXPECT_EQ(pool.name(), "pool");
  EXPECT_EQ(pool.pool_rate(), 0.20);
  EXPECT_EQ(Schedule(pool, 5000).pool_rate(), 0.20);
  EXPECT_EQ(pool.salvage(), 0);
  EXPECT_EQ(pool.disposal_year_fraction(1), 1.0);
  EXPECT_EQ(pool.disposal_year_fraction(7), 1.0);
  // scaled(f) on f x the basis deducts f times as much, in as many listed years (method.h).
  const std::vector<Money> base = pool.deductions(1000);
  const std::vector<Money> bigger = pool.scaled(3.5)->deductions(3500);
  ASSERT_EQ(bigger.size(), base.size());
  for (std::size_t k = 0; k < base.size(); ++k) EXPECT_NEAR(bigger[k], 3.5 * base[k], 1e-9);
  // Every other method is no pool.
  const StraightLine sl(StraightLineSpec{5, 0});
  EXPECT_EQ(sl.pool_rate(), std::nullopt);
  EXPECT_EQ(Schedule(sl, 5000).pool_rate(), std::nullopt);
}

TEST(PoolChecks, RateAndAllowanceAreFractionsOfTheBalance) {
  const std::string rule = "must be > 0 and <= 1";
  const double nan = std::numeric_limits<double>::quiet_NaN();
  for (double rate : {0.0, -0.1, 1.5, nan}) {
    EXPECT_TRUE(throws_input_error(
        [&] {
          Pool(PoolSpec{rate, true, std::nullopt});
        },
        "rate", rule))
        << rate;
  }
  for (double f : {0.0, -0.2, 1.2, nan}) {
    EXPECT_TRUE(throws_input_error(
        [&] {
          Pool(PoolSpec{0.18, false, f});
        },
        "first_year_allowance", rule))
        << f;
  }
}

TEST(PoolChecks, HalfYearRuleAndFirstYearAllowanceAreRefusedTogether) {
  EXPECT_TRUE(throws_input_error(
      [] {
        Pool(PoolSpec{0.30, true, 0.45});
      },
      "half_year_rule",
      "must be false with a first_year_allowance: the allowance is "
      "the year-1 deduction and the rest is written down from year 2"));
}

}  // namespace
}  // namespace tenure::depreciation
