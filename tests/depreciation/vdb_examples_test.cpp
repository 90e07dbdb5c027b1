// Declining balance against a spreadsheet vendor's documented examples: Microsoft Excel's VDB
// (with the switch to straight line) and DDB (without it) function documentation, both using a
// cost of 2400, a salvage of 300 and a life of 10 years. The values below are from memory of
// those documentation pages. Our schedules are in whole periods, so a VDB "life" in days or
// months is modelled as a schedule of that many periods.
#include <gtest/gtest.h>

#include <numeric>
#include <vector>

#include "depreciation/declining_balance.h"

namespace tenure::depreciation {
namespace {

constexpr double kHalfCent = 0.005;  // the documentation prints two decimals

constexpr Money kCost = 2400;
constexpr Money kSalvage = 300;

std::vector<Money> vdb(Years periods, double factor) {
  return DecliningBalance(DecliningBalanceSpec{periods, factor, kSalvage, true}).deductions(kCost);
}

std::vector<Money> ddb(Years periods) {
  return DecliningBalance(DecliningBalanceSpec{periods, 2.0, kSalvage, false}).deductions(kCost);
}

// Sum of periods first..last (1-based, inclusive): VDB(..., first - 1, last, ...).
Money periods_sum(const std::vector<Money>& d, Years first, Years last) {
  return std::accumulate(d.begin() + (first - 1), d.begin() + last, 0.0);
}

// Microsoft VDB function documentation examples, from memory.
TEST(VdbExamples, FirstDay) { EXPECT_NEAR(vdb(3650, 2.0)[0], 1.32, kHalfCent); }
TEST(VdbExamples, FirstMonth) { EXPECT_NEAR(vdb(120, 2.0)[0], 40.00, kHalfCent); }
TEST(VdbExamples, FirstYear) { EXPECT_NEAR(vdb(10, 2.0)[0], 480.00, kHalfCent); }

TEST(VdbExamples, SixthToEighteenthMonth) {
  // VDB(2400, 300, 120, 6, 18) = 396.31: periods 7..18 of a 120-period schedule.
  EXPECT_NEAR(periods_sum(vdb(120, 2.0), 7, 18), 396.31, kHalfCent);
}

TEST(VdbExamples, SixthToEighteenthMonthAtFactorOnePointFive) {
  // VDB(2400, 300, 120, 6, 18, 1.5) = 311.81.
  EXPECT_NEAR(periods_sum(vdb(120, 1.5), 7, 18), 311.81, kHalfCent);
}

// The documentation's VDB(2400, 300, 10, 0, 0.875, 1.5) = 315.00 ends at a fractional period;
// it does not apply to whole-year schedules and is not checked here.

// Microsoft DDB function documentation examples, from memory (factor 2, no switch).
TEST(DdbExamples, FirstDay) { EXPECT_NEAR(ddb(3650)[0], 1.32, kHalfCent); }
TEST(DdbExamples, FirstMonth) { EXPECT_NEAR(ddb(120)[0], 40.00, kHalfCent); }
TEST(DdbExamples, FirstYear) { EXPECT_NEAR(ddb(10)[0], 480.00, kHalfCent); }
TEST(DdbExamples, SecondYear) { EXPECT_NEAR(ddb(10)[1], 384.00, kHalfCent); }

TEST(DdbExamples, TenthYearStopsAtSalvage) {
  // DDB(2400, 300, 10, 10) = 22.12: 20% of 322.12 would take the book value below salvage.
  EXPECT_NEAR(ddb(10)[9], 22.12, kHalfCent);
}

}  // namespace
}  // namespace tenure::depreciation
