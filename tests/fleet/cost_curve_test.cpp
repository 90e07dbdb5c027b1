// The class cost curve of fleet/cost_curve.h: exact fits on noiseless data, the automatic choice,
// R^2 on the cost scale and the degenerate pools.
#include "fleet/cost_curve.h"

#include <gtest/gtest.h>

#include <cmath>
#include <vector>

#include "core/errors.h"

namespace tenure::fleet {
namespace {

constexpr double kExact = 1e-9;  // relative tolerance for fits of noiseless data

void expect_relative(double actual, double expected, double tolerance) {
  EXPECT_NEAR(actual, expected, tolerance * std::abs(expected)) << "expected " << expected;
}

// Assets observed for 3..8 complete years each, costs from `cost_of_year`.
template <typename CostOfYear>
CostPool pool_of(CostOfYear cost_of_year) {
  CostPool pool;
  for (int years = 3; years <= 8; ++years) {
    std::vector<Money> year_costs;
    for (int k = 1; k <= years; ++k) year_costs.push_back(cost_of_year(k));
    pool.add_asset(year_costs);
  }
  return pool;
}

TEST(CostCurve, LinearFitIsExactOnNoiselessData) {
  // Closed form: y = 1000 + 150 (k - 1).
  const CostPool pool = pool_of([](int k) { return 1000.0 + 150.0 * (k - 1); });
  const auto curve = fit_cost_curve(pool, CostModelChoice::linear);
  ASSERT_TRUE(curve);
  EXPECT_EQ(curve->model, CostModel::linear);
  expect_relative(curve->a, 1000, kExact);
  expect_relative(curve->g, 150, kExact);
  EXPECT_NEAR(curve->r2, 1.0, 1e-12);
  EXPECT_EQ(curve->asset_years, 33u);  // 3 + 4 + ... + 8
  EXPECT_EQ(curve->assets, 6u);
  EXPECT_FALSE(curve->single_age);
  expect_relative(curve->predict(10), 1000 + 150 * 9, kExact);
}

TEST(CostCurve, GeometricFitIsExactOnNoiselessData) {
  // Closed form: y = 800 * 1.12^(k - 1).
  const CostPool pool = pool_of([](int k) { return 800.0 * std::pow(1.12, k - 1); });
  const auto curve = fit_cost_curve(pool, CostModelChoice::geometric);
  ASSERT_TRUE(curve);
  EXPECT_EQ(curve->model, CostModel::geometric);
  expect_relative(curve->a, 800, kExact);
  expect_relative(curve->g, 0.12, kExact);
  EXPECT_NEAR(curve->r2, 1.0, 1e-12);
  EXPECT_EQ(curve->excluded_non_positive, 0u);
  expect_relative(curve->predict(10), 800 * std::pow(1.12, 9), kExact);
}

TEST(CostCurve, AutomaticPicksTheModelThatMadeTheData) {
  const auto linear = fit_cost_curve(pool_of([](int k) { return 1000.0 + 150.0 * (k - 1); }),
                                     CostModelChoice::automatic);
  ASSERT_TRUE(linear);
  EXPECT_EQ(linear->model, CostModel::linear);
  const auto geometric = fit_cost_curve(pool_of([](int k) { return 800.0 * std::pow(1.25, k - 1); }),
                                        CostModelChoice::automatic);
  ASSERT_TRUE(geometric);
  EXPECT_EQ(geometric->model, CostModel::geometric);
  expect_relative(geometric->g, 0.25, kExact);
}

TEST(CostCurve, RSquaredMatchesAHandComputedExample) {
  // Points (age-year, cost): (1, 90), (1, 110), (2, 300), (3, 200). Hand computed with exact
  // fractions: g = 700/11, a = 1400/11, SSE = 182200/11, SST = 27700, R^2 = 1225/3047.
  CostPool pool;
  pool.add(1, 90);
  pool.add(1, 110);
  pool.add(2, 300);
  pool.add(3, 200);
  const auto curve = fit_cost_curve(pool, CostModelChoice::linear);
  ASSERT_TRUE(curve);
  expect_relative(curve->a, 1400.0 / 11, kExact);
  expect_relative(curve->g, 700.0 / 11, kExact);
  expect_relative(curve->r2, 1225.0 / 3047, kExact);
  EXPECT_EQ(curve->assets, 0u);  // points added one by one name no asset
}

TEST(CostCurve, GeometricRSquaredIsOnTheCostScaleOverAllPoints) {
  const std::vector<std::pair<int, Money>> points = {{1, 100}, {1, 0}, {2, 130}, {3, 150},
                                                     {3, 190}, {4, 260}};
  CostPool pool;
  for (auto [k, y] : points) pool.add(k, y);
  const auto curve = fit_cost_curve(pool, CostModelChoice::geometric);
  ASSERT_TRUE(curve);
  EXPECT_EQ(curve->asset_years, 5u);
  EXPECT_EQ(curve->excluded_non_positive, 1u);
  // Closed form, brute force: least squares of ln y on k - 1 over the positive points, then
  // 1 - SSE/SST of the costs themselves over all six points.
  double sx = 0, sy = 0, sxx = 0, sxy = 0, n = 0;
  for (auto [k, y] : points) {
    if (y <= 0) continue;
    const double x = k - 1, ly = std::log(y);
    sx += x, sy += ly, sxx += x * x, sxy += x * ly, n += 1;
  }
  const double slope = (n * sxy - sx * sy) / (n * sxx - sx * sx);
  const double a = std::exp((sy - slope * sx) / n);
  expect_relative(curve->a, a, kExact);
  expect_relative(curve->g, std::exp(slope) - 1, kExact);
  double mean = 0;
  for (auto [k, y] : points) mean += y / points.size();
  double sse = 0, sst = 0;
  for (auto [k, y] : points) {
    const double fitted = a * std::exp(slope * (k - 1));
    sse += (y - fitted) * (y - fitted);
    sst += (y - mean) * (y - mean);
  }
  expect_relative(curve->r2, 1 - sse / sst, kExact);
}

TEST(CostCurve, NoPointsMeansNoCurve) {
  const CostPool empty;
  EXPECT_FALSE(fit_cost_curve(empty, CostModelChoice::linear));
  EXPECT_FALSE(fit_cost_curve(empty, CostModelChoice::automatic));
  CostPool credits_only;
  credits_only.add(1, -50);
  credits_only.add(2, 0);
  EXPECT_FALSE(fit_cost_curve(credits_only, CostModelChoice::geometric));
  const auto automatic = fit_cost_curve(credits_only, CostModelChoice::automatic);
  ASSERT_TRUE(automatic);
  EXPECT_EQ(automatic->model, CostModel::linear);
}

TEST(CostCurve, OneDistinctAgeGivesAFlatCurve) {
  CostPool pool;
  pool.add(2, 100);
  pool.add(2, 400);
  const auto linear = fit_cost_curve(pool, CostModelChoice::automatic);
  ASSERT_TRUE(linear);
  EXPECT_EQ(linear->model, CostModel::linear);  // both r2 are 0: a tie goes to linear
  EXPECT_TRUE(linear->single_age);
  EXPECT_DOUBLE_EQ(linear->a, 250);  // closed form: arithmetic mean
  EXPECT_EQ(linear->g, 0);
  EXPECT_EQ(linear->r2, 0);
  const auto geometric = fit_cost_curve(pool, CostModelChoice::geometric);
  ASSERT_TRUE(geometric);
  EXPECT_TRUE(geometric->single_age);
  expect_relative(geometric->a, 200, kExact);  // closed form: geometric mean sqrt(100 * 400)
  EXPECT_EQ(geometric->predict(7), geometric->a);
}

TEST(CostCurve, EqualCostsHaveNothingToExplain) {
  const CostPool pool = pool_of([](int) { return 500.0; });
  const auto curve = fit_cost_curve(pool, CostModelChoice::automatic);
  ASSERT_TRUE(curve);
  EXPECT_EQ(curve->model, CostModel::linear);
  EXPECT_EQ(curve->r2, 0);
  EXPECT_NEAR(curve->a, 500, 1e-9);
  EXPECT_NEAR(curve->g, 0, 1e-9);
}

TEST(CostCurve, RejectsBadPointsAndAges) {
  CostPool pool;
  EXPECT_THROW(pool.add(0, 10), InputError);
  EXPECT_THROW(pool.add(1, std::nan("")), InputError);
  pool.add(1, 10);
  pool.add(2, 20);
  EXPECT_THROW(fit_cost_curve(pool, CostModelChoice::linear)->predict(0), InputError);
}

TEST(CostCurve, NamesMatchThePolicy) {
  EXPECT_EQ(cost_model_choice_from_name("auto"), CostModelChoice::automatic);
  EXPECT_EQ(cost_model_choice_from_name("linear"), CostModelChoice::linear);
  EXPECT_EQ(cost_model_choice_from_name("geometric"), CostModelChoice::geometric);
  EXPECT_FALSE(cost_model_choice_from_name("Linear"));
  EXPECT_EQ(name(CostModel::geometric), "geometric");
}

}  // namespace
}  // namespace tenure::fleet
