// MACRS ADS, straight line with the half-year convention (SPEC 13): the shape of IRS Publication
// 946 Table A-8, the disposal-year rule and the period's check.
#include "depreciation/macrs_ads.h"

#include <gtest/gtest.h>

#include <numeric>
#include <vector>

#include "depreciation/schedule.h"
#include "input_error_matcher.h"

namespace tenure::depreciation {
namespace {

using testing::throws_input_error;

constexpr double kMoneyTolerance = 1e-9;  // money of a few thousand: rounding noise only

// Pub 946 Table A-8, 5-year column (as quoted in issue 14): 10, 20, 20, 20, 20, 10 percent.
TEST(MacrsAds, FiveYearsIsTableA8Shape) {
  const MacrsAds ads(MacrsAdsSpec{5});
  const auto d = ads.deductions(10000);
  const std::vector<double> expected = {1000, 2000, 2000, 2000, 2000, 1000};
  ASSERT_EQ(d.size(), expected.size());
  for (std::size_t k = 0; k < d.size(); ++k) EXPECT_NEAR(d[k], expected[k], kMoneyTolerance);
  EXPECT_EQ(ads.name(), "macrs_ads");
}

// Closed form of the straight line: half of basis / L first and last, basis / L between, summing
// to the basis; for L = 12 the first year is 1/24 of it.
TEST(MacrsAds, TwelveYearsRecoversTheBasis) {
  const auto d = MacrsAds(MacrsAdsSpec{12}).deductions(24000);
  ASSERT_EQ(d.size(), 13u);
  EXPECT_NEAR(d.front(), 1000, kMoneyTolerance);
  EXPECT_NEAR(d[6], 2000, kMoneyTolerance);
  EXPECT_NEAR(d.back(), 1000, kMoneyTolerance);
  EXPECT_NEAR(std::accumulate(d.begin(), d.end(), 0.0), 24000, kMoneyTolerance);
}

TEST(MacrsAds, HalfYearOnDisposalBeforeTheLastYear) {
  const Schedule s(MacrsAds(MacrsAdsSpec{5}), 10000);
  EXPECT_NEAR(s.deduction_if_sold(3), 1000, kMoneyTolerance);
  EXPECT_NEAR(s.book_value_if_sold(3), 10000 - 1000 - 2000 - 1000, kMoneyTolerance);
  EXPECT_NEAR(s.deduction_if_sold(6), 1000, kMoneyTolerance);
  EXPECT_NEAR(s.book_value_if_sold(6), 0, kMoneyTolerance);
}

TEST(MacrsAds, RejectsAPeriodBelowOneYear) {
  for (Years l : {0, -3}) {
    EXPECT_TRUE(throws_input_error([l] { MacrsAds m(MacrsAdsSpec{l}); }, "recovery_years",
                                   "must be a whole number of years >= 1"))
        << l;
  }
}

}  // namespace
}  // namespace tenure::depreciation
