// Declining balance: the closed-form geometric deductions, the salvage floor, the switch to
// straight line, and parameter checks.
#include "depreciation/declining_balance.h"

#include <gtest/gtest.h>

#include <cmath>
#include <limits>
#include <numeric>

#include "input_error_matcher.h"

namespace tenure::depreciation {
namespace {

using testing::throws_input_error;

constexpr double kMoneyTolerance = 1e-9;  // amounts of a few thousand; only rounding noise

TEST(DecliningBalance, GeometricWhileAboveSalvage) {
  // Closed form: D_k = d * basis * (1 - d)^(k-1), d = 1.5 / 8, salvage 0 never binds.
  const double d = 1.5 / 8;
  const auto deductions = DecliningBalance(DecliningBalanceSpec{8, 1.5, 0, false}).deductions(9000);
  ASSERT_EQ(deductions.size(), 8u);
  for (Years k = 1; k <= 8; ++k) {
    EXPECT_NEAR(deductions[static_cast<std::size_t>(k - 1)], d * 9000 * std::pow(1 - d, k - 1),
                kMoneyTolerance);
  }
}

TEST(DecliningBalance, WithoutSwitchBookValueMayStayAboveSalvage) {
  // Closed form: DDB over 5 years leaves 10000 * 0.6^5 = 777.6 > salvage 100 at year 5.
  const auto d = DecliningBalance(DecliningBalanceSpec{5, 2.0, 100, false}).deductions(10000);
  EXPECT_NEAR(10000 - std::accumulate(d.begin(), d.end(), 0.0), 777.6, kMoneyTolerance);
}

TEST(DecliningBalance, NeverBelowSalvage) {
  for (double rate : {1.0, 1.5, 2.0, 3.0, 12.0}) {
    for (bool switch_to_sl : {false, true}) {
      const auto d = DecliningBalance(DecliningBalanceSpec{6, rate, 2000, switch_to_sl})
                         .deductions(10000);
      Money book_value = 10000;
      for (Money deduction : d) {
        EXPECT_GE(deduction, 0);
        book_value -= deduction;
        EXPECT_GE(book_value, 2000 - kMoneyTolerance) << "rate " << rate;
      }
    }
  }
}

TEST(DecliningBalance, RateAboveLifeStopsAtSalvageInYearOne) {
  // Closed form: d = 3 / 2 > 1, so year 1 takes everything above salvage and year 2 nothing.
  const auto d = DecliningBalance(DecliningBalanceSpec{2, 3.0, 100, false}).deductions(1000);
  EXPECT_EQ(d, (std::vector<Money>{900, 0}));
}

TEST(DecliningBalance, SwitchPicksStraightLineWhenLarger) {
  // Closed form, 150% over 4 years of 1000, salvage 0 (d = 0.375):
  //   year 1: DB 375 vs SL 1000/4 = 250 -> 375, BV 625
  //   year 2: DB 234.375 vs SL 625/3 = 208.33 -> 234.375, BV 390.625
  //   year 3: DB 146.484375 vs SL 390.625/2 = 195.3125 -> SL, BV 195.3125
  //   year 4: SL takes the rest, 195.3125.
  const auto with = DecliningBalance(DecliningBalanceSpec{4, 1.5, 0, true}).deductions(1000);
  const std::vector<double> expected = {375, 234.375, 195.3125, 195.3125};
  ASSERT_EQ(with.size(), expected.size());
  for (std::size_t k = 0; k < with.size(); ++k) EXPECT_NEAR(with[k], expected[k], kMoneyTolerance);

  const auto without = DecliningBalance(DecliningBalanceSpec{4, 1.5, 0, false}).deductions(1000);
  EXPECT_NEAR(without[2], 146.484375, kMoneyTolerance);
}

TEST(DecliningBalance, SwitchReachesSalvageAtTheEndOfTheLife) {
  const auto d = DecliningBalance(DecliningBalanceSpec{9, 2.0, 700, true}).deductions(15000);
  EXPECT_EQ(d.size(), 9u);
  EXPECT_NEAR(15000 - std::accumulate(d.begin(), d.end(), 0.0), 700, kMoneyTolerance);
}

TEST(DecliningBalance, Name) {
  EXPECT_EQ(DecliningBalance(DecliningBalanceSpec{3, 2.0, 0, true}).name(), "declining_balance");
}

TEST(DecliningBalanceChecks, RejectsBadParameters) {
  const double nan = std::numeric_limits<double>::quiet_NaN();
  EXPECT_TRUE(throws_input_error([] { DecliningBalance(DecliningBalanceSpec{0, 2.0, 0, true}); },
                                 "life_years", "must be a whole number of years >= 1"));
  EXPECT_TRUE(throws_input_error([] { DecliningBalance(DecliningBalanceSpec{5, 0.0, 0, true}); },
                                 "rate", "must be > 0"));
  EXPECT_TRUE(throws_input_error([] { DecliningBalance(DecliningBalanceSpec{5, -2.0, 0, true}); },
                                 "rate", "must be > 0"));
  EXPECT_TRUE(throws_input_error([nan] { DecliningBalance(DecliningBalanceSpec{5, nan, 0, true}); },
                                 "rate", "must be a finite number"));
  EXPECT_TRUE(throws_input_error([] { DecliningBalance(DecliningBalanceSpec{5, 2.0, -3, true}); },
                                 "salvage", "must be >= 0"));
  EXPECT_TRUE(throws_input_error(
      [nan] { DecliningBalance(DecliningBalanceSpec{5, 2.0, nan, true}); }, "salvage",
      "must be a finite number"));
  const DecliningBalance method(DecliningBalanceSpec{5, 2.0, 3000, true});
  EXPECT_TRUE(throws_input_error([&] { method.deductions(2000); }, "salvage",
                                 "must not exceed the basis"));
}

}  // namespace
}  // namespace tenure::depreciation
