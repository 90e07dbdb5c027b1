// Straight-line depreciation: closed-form deductions and book values, and parameter checks.
#include "depreciation/straight_line.h"

#include <gtest/gtest.h>

#include <limits>
#include <numeric>

#include "depreciation/schedule.h"
#include "input_error_matcher.h"

namespace tenure::depreciation {
namespace {

using testing::throws_input_error;

constexpr double kMoneyTolerance = 1e-9;  // amounts of a few thousand; only rounding noise

TEST(StraightLine, EqualDeductionsOverTheLife) {
  // Closed form: (11000 - 1000) / 5 = 2000 a year.
  const auto d = StraightLine(StraightLineSpec{5, 1000}).deductions(11000);
  EXPECT_EQ(d, (std::vector<Money>{2000, 2000, 2000, 2000, 2000}));
}

TEST(StraightLine, BookValueAtTheEndOfTheLifeIsSalvage) {
  // Closed form: the deductions sum to basis - salvage.
  const Schedule s(StraightLine(StraightLineSpec{7, 500}), 10000);
  EXPECT_EQ(s.years(), 7);
  EXPECT_NEAR(s.deduction(3), 9500.0 / 7, kMoneyTolerance);
  EXPECT_NEAR(s.book_value(7), 500, kMoneyTolerance);
  EXPECT_NEAR(s.book_value(20), 500, kMoneyTolerance);
}

TEST(StraightLine, FullYearInTheDisposalYear) {
  const StraightLine method(StraightLineSpec{4, 0});
  EXPECT_EQ(method.disposal_year_fraction(2), 1.0);
  EXPECT_EQ(method.name(), "straight_line");
}

TEST(StraightLine, SalvageEqualToBasisDeductsNothing) {
  const auto d = StraightLine(StraightLineSpec{3, 800}).deductions(800);
  EXPECT_EQ(d, (std::vector<Money>{0, 0, 0}));
}

TEST(StraightLineChecks, LifeMustBeAtLeastOneYear) {
  for (Years life : {0, -1}) {
    EXPECT_TRUE(throws_input_error([life] { StraightLine(StraightLineSpec{life, 0}); },
                                   "life_years", "must be a whole number of years >= 1"));
  }
}

TEST(StraightLineChecks, SalvageMustBeFiniteAndNonNegative) {
  EXPECT_TRUE(throws_input_error([] { StraightLine(StraightLineSpec{5, -1}); }, "salvage",
                                 "must be >= 0"));
  const double nan = std::numeric_limits<double>::quiet_NaN();
  EXPECT_TRUE(throws_input_error([nan] { StraightLine(StraightLineSpec{5, nan}); }, "salvage",
                                 "must be a finite number"));
}

TEST(StraightLineChecks, SalvageMustNotExceedTheBasis) {
  const StraightLine method(StraightLineSpec{5, 1200});
  EXPECT_TRUE(throws_input_error([&] { method.deductions(1000); }, "salvage",
                                 "must not exceed the basis"));
}

}  // namespace
}  // namespace tenure::depreciation
