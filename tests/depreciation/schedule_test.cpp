// Schedule: deductions, book values and the disposal-year rule of one method on one basis.
#include "depreciation/schedule.h"

#include <gtest/gtest.h>

#include <limits>

#include "depreciation/macrs.h"
#include "depreciation/no_depreciation.h"
#include "depreciation/straight_line.h"
#include "depreciation/sum_of_years_digits.h"
#include "input_error_matcher.h"

namespace tenure::depreciation {
namespace {

using testing::throws_input_error;

constexpr double kMoneyTolerance = 1e-9;  // amounts of a few thousand; only rounding noise

TEST(Schedule, DeductionIsZeroOutsideTheSchedule) {
  const Schedule s(StraightLine(StraightLineSpec{3, 0}), 3000);
  EXPECT_EQ(s.basis(), 3000);
  EXPECT_EQ(s.years(), 3);
  EXPECT_EQ(s.deduction(0), 0);
  EXPECT_EQ(s.deduction(-2), 0);
  EXPECT_EQ(s.deduction(1), 1000);
  EXPECT_EQ(s.deduction(4), 0);
}

TEST(Schedule, BookValueIsBasisLessDeductionsSoFar) {
  // Closed form, SYD over 4 years of 1000: 400, 300, 200, 100.
  const Schedule s(SumOfYearsDigits(SumOfYearsDigitsSpec{4, 0}), 1000);
  const std::vector<double> expected = {1000, 600, 300, 100, 0};
  for (Years y = 0; y <= 4; ++y) {
    EXPECT_NEAR(s.book_value(y), expected[static_cast<std::size_t>(y)], kMoneyTolerance) << y;
  }
  EXPECT_NEAR(s.book_value(9), 0, kMoneyTolerance);
}

TEST(Schedule, BookMethodsTakeAFullYearWhenSold) {
  // SPEC 6: book methods take a full year in the disposal year.
  const Schedule s(SumOfYearsDigits(SumOfYearsDigitsSpec{4, 0}), 1000);
  EXPECT_NEAR(s.deduction_if_sold(2), 300, kMoneyTolerance);
  EXPECT_NEAR(s.book_value_if_sold(2), 300, kMoneyTolerance);
  EXPECT_EQ(s.deduction_if_sold(5), 0);
  EXPECT_NEAR(s.book_value_if_sold(5), 0, kMoneyTolerance);
  EXPECT_EQ(s.book_value_if_sold(0), 1000);
}

TEST(Schedule, NoDepreciationKeepsTheBasis) {
  const Schedule s(NoDepreciation{}, 5000);
  EXPECT_EQ(s.years(), 0);
  EXPECT_EQ(s.deduction(1), 0);
  EXPECT_EQ(s.book_value(0), 5000);
  EXPECT_EQ(s.book_value(7), 5000);
  EXPECT_EQ(s.deduction_if_sold(3), 0);
  EXPECT_EQ(s.book_value_if_sold(3), 5000);
}

TEST(ScheduleChecks, BasisMustBeFiniteAndPositive) {
  const NoDepreciation none;
  EXPECT_TRUE(throws_input_error([&] { Schedule(none, 0); }, "basis", "must be > 0"));
  EXPECT_TRUE(throws_input_error([&] { Schedule(none, -10); }, "basis", "must be > 0"));
  const double nan = std::numeric_limits<double>::quiet_NaN();
  EXPECT_TRUE(throws_input_error([&] { Schedule(none, nan); }, "basis", "must be a finite number"));
}

TEST(ScheduleChecks, YearMustNotBeNegative) {
  const Schedule s(StraightLine(StraightLineSpec{3, 0}), 3000);
  EXPECT_TRUE(throws_input_error([&] { s.book_value(-1); }, "year", "must be >= 0"));
  EXPECT_TRUE(throws_input_error([&] { s.book_value_if_sold(-1); }, "year", "must be >= 0"));
}

TEST(ScheduleChecks, SalvageAboveBasisIsReportedFromTheMethod) {
  EXPECT_TRUE(throws_input_error([] { Schedule(StraightLine(StraightLineSpec{3, 5000}), 3000); },
                                 "salvage", "must not exceed the basis"));
}

TEST(ScheduleRows, RunToTheLastYearWithFullDeductions) {
  // Closed form, SYD over 4 years of 1000: 400, 300, 200, 100.
  const std::vector<ScheduleRow> rows =
      Schedule(SumOfYearsDigits(SumOfYearsDigitsSpec{4, 0}), 1000).rows();
  ASSERT_EQ(rows.size(), 4u);
  EXPECT_EQ(rows[0].year, 1);
  EXPECT_NEAR(rows[0].depreciation, 400, kMoneyTolerance);
  EXPECT_NEAR(rows[0].book_value, 600, kMoneyTolerance);
  EXPECT_EQ(rows[3].year, 4);
  EXPECT_NEAR(rows[3].book_value, 0, kMoneyTolerance);
}

TEST(ScheduleRows, StopAtTheDisposalYearWhichTakesTheDisposalRule) {
  const Schedule s(Macrs(MacrsSpec{5}), 10000);
  const std::vector<ScheduleRow> rows = s.rows(3);
  ASSERT_EQ(rows.size(), 3u);
  // IRS Publication 946, Table A-1, 5-year: 20.00%, 32.00%, then half of year 3's 19.20% (SPEC 6).
  EXPECT_NEAR(rows[1].depreciation, 3200, kMoneyTolerance);
  EXPECT_NEAR(rows[1].book_value, 4800, kMoneyTolerance);
  EXPECT_NEAR(rows[2].depreciation, 960, kMoneyTolerance);
  EXPECT_NEAR(rows[2].book_value, 3840, kMoneyTolerance);
  // Past the schedule's end the rows go on with nothing more to deduct.
  const std::vector<ScheduleRow> late =
      Schedule(StraightLine(StraightLineSpec{2, 0}), 1000).rows(4);
  ASSERT_EQ(late.size(), 4u);
  EXPECT_EQ(late[3].depreciation, 0);
  EXPECT_EQ(late[3].book_value, 0);
  EXPECT_TRUE(throws_input_error([&] { s.rows(0); }, "disposal_year", "must be >= 1"));
}

TEST(Schedule, BookValueNeverGoesBelowItsFloor) {
  // Rounded deductions summed can end a few ulps under the floor (-1.5e-11 was stored for a
  // MACRS unit): the last year takes only what is left. 3,000 invented bases with cents.
  const Spec specs[] = {MacrsSpec{5}, MacrsSpec{7}, MacrsSpec{20}, StraightLineSpec{7, 1234.57},
                        SumOfYearsDigitsSpec{9, 999.99},
                        DecliningBalanceSpec{6, 2.0, 777.77, true}};
  for (const Spec& spec : specs) {
    const auto method = make_method(spec);
    for (int i = 0; i < 500; ++i) {
      const Money basis = 20000 + i * 137.31;
      const Schedule s(*method, basis);
      Money deducted = 0;
      for (Years year = 0; year <= s.years(); ++year) {
        ASSERT_GE(s.book_value(year), method->salvage()) << method->name() << " " << basis;
        ASSERT_GE(s.book_value_if_sold(year), method->salvage()) << method->name() << " " << basis;
        deducted += s.deduction(year);
      }
      // Nothing is lost: the deductions add up to the basis less the floor (MACRS, SL, SYD and
      // DB with its switch all reach it), to the rounding of a sum.
      EXPECT_NEAR(deducted, basis - method->salvage(), 1e-9 * basis) << method->name();
    }
  }
}

}  // namespace
}  // namespace tenure::depreciation
