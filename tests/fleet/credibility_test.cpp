// Credibility-weighted asset level of fleet/credibility.h. All values hand computed from
// factor = 1 + z (r - 1), z = m / (m + 3) (SPEC 6).
#include "fleet/credibility.h"

#include <gtest/gtest.h>

#include <vector>

namespace tenure::fleet {
namespace {

// Class curve 1000, 1100, 1200, ... (linear, a = 1000, g = 100).
const CostCurve kCurve{CostModel::linear, 1000, 100, 0.9, 40, 0, 10, false};

TEST(Credibility, NoCompleteYearsKeepsTheClassLevel) {
  const Credibility c = credibility({}, kCurve);
  EXPECT_EQ(c.years, 0);
  EXPECT_EQ(c.weight, 0);
  EXPECT_EQ(c.factor, 1);
  EXPECT_FALSE(c.measured);
}

TEST(Credibility, OneCostlyYearMovesAQuarterOfTheWay) {
  const std::vector<Money> costs = {1500};
  const Credibility c = credibility(costs, kCurve);
  EXPECT_DOUBLE_EQ(c.ratio, 1.5);    // 1500 / 1000
  EXPECT_DOUBLE_EQ(c.weight, 0.25);  // 1 / (1 + 3)
  EXPECT_DOUBLE_EQ(c.factor, 1.125);
  EXPECT_TRUE(c.measured);
}

TEST(Credibility, ThreeYearsWeighHalf) {
  const std::vector<Money> dear = {1100, 1210, 1320};   // 3630 against 3300
  const Credibility above = credibility(dear, kCurve);
  EXPECT_DOUBLE_EQ(above.ratio, 1.1);
  EXPECT_DOUBLE_EQ(above.weight, 0.5);
  EXPECT_DOUBLE_EQ(above.factor, 1.05);
  const std::vector<Money> cheap = {500, 550, 600};     // 1650 against 3300
  const Credibility below = credibility(cheap, kCurve);
  EXPECT_DOUBLE_EQ(below.ratio, 0.5);
  EXPECT_DOUBLE_EQ(below.factor, 0.75);
}

TEST(Credibility, NonPositivePredictionIsNotMeasured) {
  const CostCurve falling{CostModel::linear, 100, -200, 0.5, 10, 0, 2, false};  // 100, -100, ...
  const std::vector<Money> costs = {80, 90};
  const Credibility c = credibility(costs, falling);
  EXPECT_FALSE(c.measured);
  EXPECT_EQ(c.ratio, 1);
  EXPECT_EQ(c.factor, 1);
  EXPECT_DOUBLE_EQ(c.weight, 0.4);  // 2 / 5
}

}  // namespace
}  // namespace tenure::fleet
