// The weighted least-squares line of fleet/line_fit.h.
#include "fleet/line_fit.h"

#include <gtest/gtest.h>

namespace tenure::fleet {
namespace {

TEST(LineFit, WeightsCountAsRepeatedPoints) {
  // Closed form: points (0, 1) twice, (1, 3), (2, 2) give the same line weighted or repeated.
  LineFit repeated, weighted;
  for (auto [x, y] : {std::pair{0.0, 1.0}, {0.0, 1.0}, {1.0, 3.0}, {2.0, 2.0}}) repeated.add(x, y);
  weighted.add(0, 1, 2);
  weighted.add(1, 3);
  weighted.add(2, 2);
  // Hand computed: mean x 0.75, mean y 1.75, Sxx 2.75, Sxy 1.75: slope 7/11, intercept 14/11.
  EXPECT_NEAR(repeated.slope(), 7.0 / 11, 1e-15);
  EXPECT_NEAR(repeated.intercept(), 14.0 / 11, 1e-15);
  EXPECT_NEAR(weighted.slope(), 7.0 / 11, 1e-15);
  EXPECT_NEAR(weighted.intercept(), 14.0 / 11, 1e-15);
  EXPECT_EQ(weighted.points(), 3u);
  EXPECT_EQ(weighted.weight(), 4.0);
}

TEST(LineFit, OneDistinctXLeavesTheSlopeUndetermined) {
  LineFit fit;
  fit.add(3.7, 1);
  fit.add(3.7, 5);
  EXPECT_FALSE(fit.x_varies());
  EXPECT_EQ(fit.mean_y(), 3);
  fit.add(4.0, 5);
  EXPECT_TRUE(fit.x_varies());
}

}  // namespace
}  // namespace tenure::fleet
