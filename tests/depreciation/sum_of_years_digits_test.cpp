// Sum-of-years'-digits depreciation: closed-form deductions and parameter checks.
#include "depreciation/sum_of_years_digits.h"

#include <gtest/gtest.h>

#include <limits>
#include <numeric>

#include "input_error_matcher.h"

namespace tenure::depreciation {
namespace {

using testing::throws_input_error;

constexpr double kMoneyTolerance = 1e-9;  // amounts of a few thousand; only rounding noise

TEST(SumOfYearsDigits, DeductionsFallByEqualSteps) {
  // Closed form: digits 4, 3, 2, 1 over their sum 10, of 1000 - 0.
  const auto d = SumOfYearsDigits(SumOfYearsDigitsSpec{4, 0}).deductions(1000);
  ASSERT_EQ(d.size(), 4u);
  const std::vector<double> expected = {400, 300, 200, 100};
  for (std::size_t k = 0; k < d.size(); ++k) EXPECT_NEAR(d[k], expected[k], kMoneyTolerance);
}

TEST(SumOfYearsDigits, YearKOfLife) {
  // Closed form: (basis - salvage) * (L - k + 1) / (L(L+1)/2), L = 5, sum of digits 15.
  const auto d = SumOfYearsDigits(SumOfYearsDigitsSpec{5, 1500}).deductions(16500);
  for (Years k = 1; k <= 5; ++k) {
    EXPECT_NEAR(d[static_cast<std::size_t>(k - 1)], 15000.0 * (5 - k + 1) / 15, kMoneyTolerance);
  }
}

TEST(SumOfYearsDigits, SumsToBasisLessSalvage) {
  for (Years life : {1, 2, 7, 30}) {
    const auto d = SumOfYearsDigits(SumOfYearsDigitsSpec{life, 2500}).deductions(40000);
    EXPECT_EQ(d.size(), static_cast<std::size_t>(life));
    EXPECT_NEAR(std::accumulate(d.begin(), d.end(), 0.0), 37500, kMoneyTolerance) << life;
  }
}

TEST(SumOfYearsDigits, Name) {
  EXPECT_EQ(SumOfYearsDigits(SumOfYearsDigitsSpec{3, 0}).name(), "sum_of_years_digits");
}

TEST(SumOfYearsDigitsChecks, RejectsBadParameters) {
  EXPECT_TRUE(throws_input_error([] { SumOfYearsDigits(SumOfYearsDigitsSpec{0, 0}); },
                                 "life_years", "must be a whole number of years >= 1"));
  EXPECT_TRUE(throws_input_error([] { SumOfYearsDigits(SumOfYearsDigitsSpec{5, -0.01}); },
                                 "salvage", "must be >= 0"));
  const double inf = std::numeric_limits<double>::infinity();
  EXPECT_TRUE(throws_input_error([inf] { SumOfYearsDigits(SumOfYearsDigitsSpec{5, inf}); },
                                 "salvage", "must be a finite number"));
  const SumOfYearsDigits method(SumOfYearsDigitsSpec{5, 5000});
  EXPECT_TRUE(throws_input_error([&] { method.deductions(4999); }, "salvage",
                                 "must not exceed the basis"));
}

}  // namespace
}  // namespace tenure::depreciation
