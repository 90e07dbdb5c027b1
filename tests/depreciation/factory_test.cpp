// make_method: each spec builds its method, and the method's checks reach the caller.
#include <gtest/gtest.h>

#include "depreciation/method.h"
#include "depreciation/schedule.h"
#include "input_error_matcher.h"

namespace tenure::depreciation {
namespace {

using testing::throws_input_error;

TEST(MakeMethod, EachSpecBuildsItsMethod) {
  EXPECT_EQ(make_method(StraightLineSpec{5, 0})->name(), "straight_line");
  EXPECT_EQ(make_method(DecliningBalanceSpec{5, 2.0, 0, true})->name(), "declining_balance");
  EXPECT_EQ(make_method(SumOfYearsDigitsSpec{5, 0})->name(), "sum_of_years_digits");
  EXPECT_EQ(make_method(MacrsSpec{7})->name(), "macrs");
  EXPECT_EQ(make_method(NoDepreciationSpec{})->name(), "none");
}

TEST(MakeMethod, BuiltMethodUsesItsParameters) {
  // Closed form (method.h example): (11000 - 1000) / 5.
  EXPECT_EQ(make_method(StraightLineSpec{5, 1000})->deductions(11000),
            (std::vector<Money>{2000, 2000, 2000, 2000, 2000}));
  // Pub 946 Table A-1, 7-year column: 8 table years.
  EXPECT_EQ(make_method(MacrsSpec{7})->deductions(1000).size(), 8u);
  EXPECT_TRUE(make_method(NoDepreciationSpec{})->deductions(1000).empty());
}

TEST(MakeMethod, HeaderExampleSchedule) {
  // schedule.h example, Pub 946 Table A-1 5-year column on 10000.
  const Schedule s(*make_method(MacrsSpec{5}), 10000);
  EXPECT_NEAR(s.deduction(2), 3200, 1e-9);
  EXPECT_NEAR(s.book_value(2), 4800, 1e-9);
  EXPECT_NEAR(s.deduction_if_sold(3), 960, 1e-9);
  EXPECT_NEAR(s.book_value_if_sold(3), 3840, 1e-9);
}

TEST(MakeMethod, ParameterErrorsPassThrough) {
  EXPECT_TRUE(throws_input_error([] { make_method(MacrsSpec{8}); }, "recovery_years",
                                 "must be one of 3, 5, 7, 10, 15, 20"));
  EXPECT_TRUE(throws_input_error([] { make_method(StraightLineSpec{0, 0}); }, "life_years",
                                 "must be a whole number of years >= 1"));
  EXPECT_TRUE(throws_input_error([] { make_method(DecliningBalanceSpec{5, 0, 0, false}); },
                                 "rate", "must be > 0"));
}

}  // namespace
}  // namespace tenure::depreciation
