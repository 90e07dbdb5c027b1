// Refitting a cost curve from per-asset sums (fleet/curve_refit.h): small fits worked by hand,
// the identity with fit_cost_curve on the same points (least squares is linear in y, so fitting
// the residuals of any curve and adding the curve back is the same fit), an asset drawn twice
// counting as two copies, one age, non-positive costs in a geometric fit, and no points. All
// cost series are invented.
#include "fleet/curve_refit.h"

#include <gtest/gtest.h>

#include <cmath>
#include <vector>

namespace tenure::fleet {
namespace {

constexpr double kClose = 1e-9;  // relative: the identity holds to rounding

CostCurve linear_curve(double a, double g) {
  return CostCurve{CostModel::linear, a, g, 0.9, 10, 0, 2, false};
}
CostCurve geometric_curve(double a, double g) {
  return CostCurve{CostModel::geometric, a, g, 0.9, 10, 0, 2, false};
}

CurveSums sums_of(const CostCurve& curve, const std::vector<std::vector<Money>>& assets) {
  CurveSums total;
  for (const auto& years : assets) total.add(curve_sums(curve, years));
  return total;
}

void expect_close(double actual, double expected, const char* what) {
  EXPECT_NEAR(actual, expected, kClose * std::max(1.0, std::abs(expected))) << what;
}

TEST(CurveRefit, LinearByHand) {
  // One asset, (x, y) = (0, 110), (1, 130): by hand the line is a = 110, g = 20, whatever
  // curve the residuals are taken from.
  for (const CostCurve& from : {linear_curve(100, 10), linear_curve(5000, -300)}) {
    const auto again = refit(from, curve_sums(from, std::vector<Money>{110, 130}));
    ASSERT_TRUE(again);
    expect_close(again->a, 110, "a");
    expect_close(again->g, 20, "g");
    EXPECT_EQ(again->model, CostModel::linear);
    EXPECT_FALSE(again->single_age);
    EXPECT_EQ(again->asset_years, 2u);
    EXPECT_EQ(again->assets, 1u);
  }
}

TEST(CurveRefit, GeometricByHandLeavesOutCostsWithoutALogarithm) {
  // Positive points (x, y) = (0, 200), (1, 300): by hand ln y is a line through them, a = 200,
  // 1 + g = 300 / 200 = 1.5. The year of 0 cost and the credit are left out (cost_curve.h
  // rule 2).
  const CostCurve from = geometric_curve(100, 0.1);
  const auto again = refit(from, curve_sums(from, std::vector<Money>{200, 300, 0, -40}));
  ASSERT_TRUE(again);
  expect_close(again->a, 200, "a");
  expect_close(again->g, 0.5, "g");
  EXPECT_EQ(again->asset_years, 2u);
}

TEST(CurveRefit, EqualsTheDirectFitOnTheSamePoints) {
  // Invented assets of different lengths and levels, some costs not positive.
  const std::vector<std::vector<Money>> assets = {{900, 1210, 1500, 1740, 2100},
                                                  {1100, 1300},
                                                  {700, 990, 0, 1600, 1850, 2300, 2420},
                                                  {1500},
                                                  {820, 1190, 1330, -50}};
  for (const CostModelChoice choice : {CostModelChoice::linear, CostModelChoice::geometric}) {
    CostPool pool;
    for (const auto& years : assets) pool.add_asset(years);
    const CostCurve direct = *fit_cost_curve(pool, choice);
    // Refitted from a curve well off the data, so the residuals are large.
    const CostCurve from =
        direct.model == CostModel::linear ? linear_curve(300, 50) : geometric_curve(300, 0.02);
    const auto again = refit(from, sums_of(from, assets));
    ASSERT_TRUE(again);
    SCOPED_TRACE(name(direct.model));
    expect_close(again->a, direct.a, "a");
    expect_close(again->g, direct.g, "g");
    EXPECT_EQ(again->asset_years, direct.asset_years);
    for (int k = 1; k <= 12; ++k) expect_close(again->predict(k), direct.predict(k), "predict");
  }
}

TEST(CurveRefit, AnAssetDrawnTwiceCountsTwice) {
  const CostCurve from = linear_curve(1000, 200);
  const std::vector<Money> first = {950, 1300, 1350}, second = {1200, 1500};
  CurveSums drawn;
  drawn.add(curve_sums(from, first), 2);
  drawn.add(curve_sums(from, second), 1);
  CostPool pool;  // the same points: the first asset's years twice
  pool.add_asset(first);
  pool.add_asset(first);
  pool.add_asset(second);
  const CostCurve direct = *fit_cost_curve(pool, CostModelChoice::linear);
  const auto again = refit(from, drawn);
  ASSERT_TRUE(again);
  expect_close(again->a, direct.a, "a");
  expect_close(again->g, direct.g, "g");
  EXPECT_EQ(again->assets, 3u);
  EXPECT_EQ(again->asset_years, 8u);
}

TEST(CurveRefit, PointsOnTheCurveGiveItsPredictionsBack) {
  // Residuals exactly zero: the curve's own predictions, to the last bit.
  const CostCurve from = linear_curve(1000, 400);
  const auto again = refit(from, sums_of(from, {{1000, 1400, 1800}, {1000, 1400}}));
  ASSERT_TRUE(again);
  for (int k = 1; k <= 15; ++k) EXPECT_EQ(again->predict(k), from.predict(k)) << k;
}

TEST(CurveRefit, OneAgeIsFlatAtTheMean) {
  // Every point at one age: by hand the linear mean is (1500 + 1700) / 2 = 1600 and the
  // geometric mean sqrt(1500 x 1700); g = 0 (cost_curve.h rule 5).
  const std::vector<std::vector<Money>> assets = {{0, 0, 1500}, {0, 0, 1700}};
  // (Linear: both assets' costs in age-year 1, as a linear fit counts zero costs too.)
  const CostCurve line = linear_curve(1000, 250);
  const auto flat = refit(line, sums_of(line, {{1500}, {1700}}));
  ASSERT_TRUE(flat);
  EXPECT_TRUE(flat->single_age);
  expect_close(flat->a, 1600, "linear a");
  EXPECT_EQ(flat->g, 0);
  const CostCurve geo = geometric_curve(900, 0.2);
  const auto geo_flat = refit(geo, sums_of(geo, assets));  // age-year 3: zeros have no log
  ASSERT_TRUE(geo_flat);
  EXPECT_TRUE(geo_flat->single_age);
  expect_close(geo_flat->a, std::sqrt(1500.0 * 1700.0), "geometric a");
  EXPECT_EQ(geo_flat->g, 0);
  expect_close(geo_flat->predict(9), geo_flat->a, "flat");
}

TEST(CurveRefit, NoPointNoCurve) {
  const CostCurve geo = geometric_curve(900, 0.2);
  const CurveSums none = curve_sums(geo, std::vector<Money>{0, -10});
  EXPECT_EQ(none.n, 0);
  EXPECT_EQ(none.assets, 0u);
  EXPECT_FALSE(refit(geo, none));
  EXPECT_FALSE(refit(linear_curve(1, 1), CurveSums{}));
}

}  // namespace
}  // namespace tenure::fleet
