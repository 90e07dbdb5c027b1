// MACRS GDS half-year convention: the computed table against the published one, cell by cell,
// and the disposal-year rule on a schedule.
#include "depreciation/macrs.h"

#include <gtest/gtest.h>

#include <cmath>
#include <numeric>
#include <vector>

#include "depreciation/schedule.h"
#include "input_error_matcher.h"

namespace tenure::depreciation {
namespace {

using testing::throws_input_error;

constexpr double kMoneyTolerance = 1e-9;  // money here is a few thousand; only rounding noise

// The table in whole units of its last printed decimal: 10^decimals units per percent.
std::vector<long> in_printed_units(const std::vector<double>& percentages, int decimals) {
  const double scale = std::pow(10.0, decimals);
  std::vector<long> units;
  for (double p : percentages) units.push_back(std::lround(p * scale));
  return units;
}

struct PublishedColumn {
  Years recovery_years;
  int decimals;
  std::vector<double> percentages;
};

// IRS Publication 946, Appendix A, Table A-1 (GDS, half-year convention), typed from the printed
// table, from memory.
const std::vector<PublishedColumn> kTableA1 = {
    {3, 2, {33.33, 44.45, 14.81, 7.41}},
    {5, 2, {20.00, 32.00, 19.20, 11.52, 11.52, 5.76}},
    {7, 2, {14.29, 24.49, 17.49, 12.49, 8.93, 8.92, 8.93, 4.46}},
    {10, 2, {10.00, 18.00, 14.40, 11.52, 9.22, 7.37, 6.55, 6.55, 6.56, 6.55, 3.28}},
    {15, 2, {5.00, 9.50, 8.55, 7.70, 6.93, 6.23, 5.90, 5.90, 5.91, 5.90, 5.91, 5.90, 5.91, 5.90,
             5.91, 2.95}},
    {20, 3, {3.750, 7.219, 6.677, 6.177, 5.713, 5.285, 4.888, 4.522, 4.462, 4.461, 4.462, 4.461,
             4.462, 4.461, 4.462, 4.461, 4.462, 4.461, 4.462, 4.461, 2.231}},
};

TEST(MacrsTable, EqualsPublicationTableA1InEveryCell) {
  for (const PublishedColumn& column : kTableA1) {
    SCOPED_TRACE(::testing::Message() << column.recovery_years << "-year property");
    const auto computed = in_printed_units(macrs_percentages(column.recovery_years),
                                           column.decimals);
    const auto published = in_printed_units(column.percentages, column.decimals);
    EXPECT_EQ(computed, published);
  }
}

TEST(MacrsTable, EachColumnSumsToOneHundredPercent) {
  for (const PublishedColumn& column : kTableA1) {
    SCOPED_TRACE(::testing::Message() << column.recovery_years << "-year property");
    const auto units = in_printed_units(macrs_percentages(column.recovery_years), column.decimals);
    const long hundred_percent = std::lround(100 * std::pow(10.0, column.decimals));
    EXPECT_EQ(std::accumulate(units.begin(), units.end(), 0L), hundred_percent);
    EXPECT_EQ(units.size(), static_cast<std::size_t>(column.recovery_years + 1));
  }
}

// Cells that sit exactly on a half unit before rounding (closed form: 15-year year 4 is
// 7.695%, year 5 is 6.925%); the published table rounds them up (Pub 946 Table A-1).
TEST(MacrsTable, HalfUnitCellsRoundUp) {
  const auto fifteen = in_printed_units(macrs_percentages(15), 2);
  EXPECT_EQ(fifteen[3], 770);
  EXPECT_EQ(fifteen[4], 693);
}

TEST(MacrsTable, RejectsOtherRecoveryPeriods) {
  for (Years r : {0, 1, 4, 6, 27, 39, -5}) {
    EXPECT_TRUE(throws_input_error([r] { macrs_percentages(r); }, "recovery_years",
                                   "must be one of 3, 5, 7, 10, 15, 20"))
        << r;
    EXPECT_TRUE(throws_input_error([r] { Macrs method(MacrsSpec{r}); }, "recovery_years",
                                   "must be one of 3, 5, 7, 10, 15, 20"))
        << r;
  }
}

TEST(Macrs, DeductionsArePercentagesOfTheBasis) {
  const Macrs method(MacrsSpec{5});
  const auto d = method.deductions(10000);
  // Pub 946 Table A-1, 5-year column, times 10000.
  const std::vector<double> expected = {2000, 3200, 1920, 1152, 1152, 576};
  ASSERT_EQ(d.size(), expected.size());
  for (std::size_t k = 0; k < d.size(); ++k) EXPECT_NEAR(d[k], expected[k], kMoneyTolerance);
  EXPECT_EQ(method.name(), "macrs");
}

TEST(Macrs, HalfYearInTheDisposalYearBeforeTheLastTableYear) {
  const Macrs method(MacrsSpec{5});
  for (Years year = 1; year <= 5; ++year) EXPECT_EQ(method.disposal_year_fraction(year), 0.5);
  EXPECT_EQ(method.disposal_year_fraction(6), 1.0);
}

// SPEC 6 disposal rule on 5-year property with a basis of 10000 (Pub 946 Table A-1 percentages).
TEST(MacrsSchedule, DisposalYearRule) {
  const Schedule s(Macrs(MacrsSpec{5}), 10000);
  EXPECT_EQ(s.years(), 6);
  // Sold in year 3: half of 19.20%.
  EXPECT_NEAR(s.deduction(3), 1920, kMoneyTolerance);
  EXPECT_NEAR(s.deduction_if_sold(3), 960, kMoneyTolerance);
  EXPECT_NEAR(s.book_value_if_sold(3), 10000 - 2000 - 3200 - 960, kMoneyTolerance);
  // Sold in year 6, the last table year: the full 5.76%.
  EXPECT_NEAR(s.deduction_if_sold(6), 576, kMoneyTolerance);
  EXPECT_NEAR(s.book_value_if_sold(6), 0, kMoneyTolerance);
  // Sold in year 7: nothing left to deduct.
  EXPECT_EQ(s.deduction_if_sold(7), 0);
  EXPECT_NEAR(s.book_value_if_sold(7), 0, kMoneyTolerance);
}

TEST(MacrsSchedule, BookValues) {
  const Schedule s(Macrs(MacrsSpec{5}), 10000);
  // Closed form: 10000 less the cumulative Table A-1 percentages.
  const std::vector<double> expected = {10000, 8000, 4800, 2880, 1728, 576, 0};
  for (Years y = 0; y <= 6; ++y) {
    EXPECT_NEAR(s.book_value(y), expected[static_cast<std::size_t>(y)], kMoneyTolerance) << y;
  }
  EXPECT_NEAR(s.book_value(10), 0, kMoneyTolerance);
}

TEST(MacrsSchedule, TwentyYearPropertyRecoversTheWholeBasis) {
  const Schedule s(Macrs(MacrsSpec{20}), 250000);
  EXPECT_EQ(s.years(), 21);
  // Pub 946 Table A-1, 20-year column, year 1: 3.750%.
  EXPECT_NEAR(s.deduction(1), 9375, kMoneyTolerance);
  EXPECT_NEAR(s.book_value(21), 0, 1e-6);
}

}  // namespace
}  // namespace tenure::depreciation
