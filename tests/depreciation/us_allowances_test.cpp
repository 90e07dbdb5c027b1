// Section 179 and the special depreciation allowance around MACRS and MACRS ADS (SPEC 13, IRS
// Publication 946 order: the 179 amount, then the allowance on the rest, then the method), on
// invented amounts; the method's percentages are Pub 946 Table A-1's.
#include "depreciation/us_allowances.h"

#include <gtest/gtest.h>

#include <vector>

#include "depreciation/schedule.h"
#include "input_error_matcher.h"

namespace tenure::depreciation {
namespace {

using testing::throws_input_error;

constexpr double kMoneyTolerance = 1e-9;  // money of a few thousand: rounding noise only

void expect_deductions(const std::vector<Money>& actual, const std::vector<Money>& expected) {
  ASSERT_EQ(actual.size(), expected.size());
  for (std::size_t k = 0; k < actual.size(); ++k) {
    EXPECT_NEAR(actual[k], expected[k], kMoneyTolerance) << "year " << k + 1;
  }
}

// Basis 10000, E = 2000, b = 0.5: year 1 takes 2000 + 0.5 x 8000 = 6000, and 5-year MACRS
// (Table A-1: 20, 32, 19.2, 11.52, 11.52, 5.76 %) depreciates the remaining 4000.
TEST(UsAllowances, Section179ThenBonusThenTheMethod) {
  const auto method =
      make_method(MacrsSpec{5, MacrsConvention::half_year, std::nullopt, {2000.0, 0.5}});
  EXPECT_EQ(method->name(), "macrs");
  expect_deductions(method->deductions(10000), {6000 + 800, 1280, 768, 460.8, 460.8, 230.4});
}

TEST(UsAllowances, BonusAloneOnAds) {
  // 40% allowance on 10000, ADS 5 years on 6000 (10, 20, 20, 20, 20, 10 %).
  const auto method = make_method(MacrsAdsSpec{5, {std::nullopt, 0.4}});
  expect_deductions(method->deductions(10000), {4000 + 600, 1200, 1200, 1200, 1200, 600});
}

TEST(UsAllowances, FullBonusDeductsTheWholeBasisInYearOne) {
  const Schedule s(
      *make_method(MacrsSpec{7, MacrsConvention::half_year, std::nullopt, {std::nullopt, 1.0}}),
      50000);
  EXPECT_NEAR(s.deduction(1), 50000, kMoneyTolerance);
  EXPECT_NEAR(s.book_value(1), 0, kMoneyTolerance);
  EXPECT_NEAR(s.deduction_if_sold(1), 50000, kMoneyTolerance);
  EXPECT_NEAR(s.book_value_if_sold(3), 0, kMoneyTolerance);
}

// Rule (4): a sale in year 1 or later keeps the expensed amounts; MACRS's half year applies to
// its own part. Basis 10000, E = 2000, b = 0.5: MACRS on 4000.
TEST(UsAllowances, DisposalYearRuleAppliesToTheMethodsPartOnly) {
  const Schedule s(
      *make_method(MacrsSpec{5, MacrsConvention::half_year, std::nullopt, {2000.0, 0.5}}), 10000);
  EXPECT_NEAR(s.deduction_if_sold(1), 6000 + 400, kMoneyTolerance);
  EXPECT_NEAR(s.book_value_if_sold(1), 3600, kMoneyTolerance);
  EXPECT_NEAR(s.deduction_if_sold(3), 384, kMoneyTolerance);
  EXPECT_NEAR(s.book_value_if_sold(3), 10000 - 6800 - 1280 - 384, kMoneyTolerance);
}

TEST(UsAllowances, Checks) {
  const auto macrs = make_method(MacrsSpec{5});
  EXPECT_TRUE(throws_input_error(
      [&] {
        UsAllowancesFirst m(macrs, {-1.0, std::nullopt});
      },
      "section_179", "must be >= 0"));
  for (double b : {-0.1, 1.01}) {
    EXPECT_TRUE(throws_input_error(
        [&] {
          UsAllowancesFirst m(macrs, {std::nullopt, b});
        },
        "bonus", "must be between 0 and 1"))
        << b;
  }
  const UsAllowancesFirst too_much(macrs, {12000.0, std::nullopt});
  EXPECT_TRUE(throws_input_error([&] { too_much.deductions(10000); }, "section_179",
                                 "must not exceed the basis"));
  // A 179 amount equal to the basis is allowed: everything in year 1.
  const UsAllowancesFirst all(macrs, {10000.0, std::nullopt});
  EXPECT_NEAR(all.deductions(10000).front(), 10000, kMoneyTolerance);
}

}  // namespace
}  // namespace tenure::depreciation
