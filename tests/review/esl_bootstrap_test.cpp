// The economic life's bootstrap percentiles (review/esl_bootstrap.h) on invented in-memory
// classes: the nearest-rank percentiles and the draw count of rules (2) and (3) by hand; a class
// whose assets all lie on its curve, and a class of one asset, give p10 = p90 = its economic
// life (rule 4); a noisy class gives the same draws twice and in another fleet order, and other
// draws under another class name. Whether p10 <= life <= p90 holds is not asserted: a bootstrap
// does not promise it. Every asset and cost here is invented.
#include "review/esl_bootstrap.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <vector>

#include "review/class_model.h"
#include "review_fixture.h"

namespace tenure::review {
namespace {

using testing::add_asset;
using testing::day;
using testing::Invented;

const tax::Rates kRates = tax::Rates::make(0.10, 0.25);  // after tax: the verdict's basis

// Sums of one asset on a flat invented curve, with `years` points.
AssetSums asset_with_years(const std::string& id, int years) {
  const fleet::CostCurve flat{fleet::CostModel::linear, 1000, 0, 0, 0, 0, 0, false};
  return {id, fleet::curve_sums(flat, std::vector<Money>(static_cast<std::size_t>(years), 1000))};
}

TEST(EslBootstrap, NearestRankPercentilesOfTwoHundredLives) {
  // Lives 1, 2, ..., 200 in call order: by hand the 20th smallest is 20, the 180th is 180.
  const fleet::CostCurve curve{fleet::CostModel::linear, 1000, 0, 0, 0, 0, 0, false};
  int calls = 0;
  const auto spread = bootstrap_esl("any", curve, {asset_with_years("A", 3)},
                                    [&](const fleet::CostCurve&) { return ++calls; });
  ASSERT_TRUE(spread);
  EXPECT_EQ(calls, kBootstrapRefits);
  EXPECT_EQ(spread->lives.size(), 200u);
  EXPECT_EQ(spread->p10, 20);
  EXPECT_EQ(spread->p90, 180);
}

TEST(EslBootstrap, EachRefitDrawsAsManyAssetsAsHaveCostYears) {
  // Four of the five assets have a complete year; rule (2) draws four per refit, which the
  // refitted curve counts.
  const fleet::CostCurve curve{fleet::CostModel::linear, 1000, 0, 0, 0, 0, 0, false};
  const std::vector<AssetSums> assets = {asset_with_years("A", 2), asset_with_years("B", 0),
                                         asset_with_years("C", 5), asset_with_years("D", 1),
                                         asset_with_years("E", 7)};
  const auto spread = bootstrap_esl(
      "any", curve, assets, [](const fleet::CostCurve& c) { return static_cast<Years>(c.assets); });
  ASSERT_TRUE(spread);
  for (const Years drawn : spread->lives) ASSERT_EQ(drawn, 4);
}

TEST(EslBootstrap, NoAssetWithCostYearsNoSpread) {
  const fleet::CostCurve curve{fleet::CostModel::linear, 1000, 0, 0, 0, 0, 0, false};
  const auto life = [](const fleet::CostCurve&) { return 1; };
  EXPECT_FALSE(bootstrap_esl("any", curve, {}, life));
  EXPECT_FALSE(bootstrap_esl("any", curve, {asset_with_years("A", 0)}, life));
}

// An invented pump class as of 2025-06-30: `count` assets of ages 1..14, costs on
// 900 + 260 (k - 1) times `noise(asset, k)`.
template <class Noise>
FleetData pump_class(int count, Noise noise, bool reversed = false) {
  FleetData data(day("2025-06-30"), 0);
  for (int j = 0; j < count; ++j) {
    const int n = reversed ? count - 1 - j : j;
    const int age = 1 + n % 14;
    std::vector<Money> costs;
    for (int k = 1; k <= age; ++k) costs.push_back((900 + 260.0 * (k - 1)) * noise(n, k));
    add_asset(data, "PU-" + std::to_string(1000 + n), "pump-duty",
              *Date::from_ymd(2025 - age, 1 + n % 12, 1 + n % 28), 18500, costs);
  }
  return data;
}

std::vector<std::size_t> everyone(const FleetData& data) {
  std::vector<std::size_t> members(data.assets.size());
  for (std::size_t i = 0; i < members.size(); ++i) members[i] = i;
  return members;
}

ClassModel model_of(const FleetData& data, const ClassPolicy& policy,
                    const std::string& name = "pump-duty") {
  return build_class_model(name, policy, data, everyone(data), kRates, 0.02);
}

Years after_tax_life(const ClassModel& m) { return m.challenger->after_tax->curve.best_years; }

TEST(EslBootstrap, AClassOnItsCurveHasNoSpread) {
  // Every cost exactly on the line (whole numbers, so stored exactly): each refit is the class
  // curve, so p10 = p90 = the economic life (rule 4). Linear and geometric.
  const FleetData on_line = pump_class(40, [](int, int) { return 1.0; });
  const ClassModel linear = model_of(on_line, testing::pump_policy());
  ASSERT_TRUE(linear.spread);
  EXPECT_EQ(linear.cost_curve->model, fleet::CostModel::linear);
  EXPECT_EQ(linear.spread->p10, after_tax_life(linear));
  EXPECT_EQ(linear.spread->p90, after_tax_life(linear));

  FleetData on_growth(day("2025-06-30"), 0);
  for (int n = 0; n < 30; ++n) {
    const int age = 1 + n % 12;
    std::vector<Money> costs;
    for (int k = 1; k <= age; ++k) costs.push_back(900 * std::pow(1.15, k - 1));
    add_asset(on_growth, "GE-" + std::to_string(n), "pump-duty",
              *Date::from_ymd(2025 - age, 3, 1 + n % 28), 18500, costs);
  }
  ClassPolicy geometric_policy = testing::pump_policy();
  geometric_policy.cost_model = fleet::CostModelChoice::geometric;
  const ClassModel geometric = model_of(on_growth, geometric_policy);
  ASSERT_TRUE(geometric.spread);
  EXPECT_EQ(geometric.spread->p10, after_tax_life(geometric));
  EXPECT_EQ(geometric.spread->p90, after_tax_life(geometric));
}

TEST(EslBootstrap, AClassOfOneAssetDrawsItEveryTime) {
  const FleetData one = pump_class(1, [](int, int k) { return 1 + 0.3 * std::sin(k); });
  const ClassModel model = model_of(one, testing::pump_policy());
  ASSERT_TRUE(model.spread);
  EXPECT_EQ(model.spread->p10, after_tax_life(model));
  EXPECT_EQ(model.spread->p90, after_tax_life(model));
}

TEST(EslBootstrap, AClassWithoutCostYearsHasNeitherBandNorSpread) {
  FleetData data(day("2025-06-30"), 0);
  add_asset(data, "PU-NEW", "pump-duty", day("2025-01-10"), 18500, {});
  const ClassModel model = model_of(data, testing::pump_policy());
  EXPECT_FALSE(model.challenger);
  EXPECT_FALSE(model.band);
  EXPECT_FALSE(model.spread);
}

// Invented noise: a level per asset and a factor per year, from a fixed generator.
double invented_noise(int asset, int year) {
  Invented per_asset(static_cast<std::uint64_t>(asset) + 7);
  Invented per_year(static_cast<std::uint64_t>(asset) * 1000 + static_cast<std::uint64_t>(year));
  return per_asset.uniform(0.5, 1.8) * per_year.uniform(0.6, 1.4);
}

TEST(EslBootstrap, ANoisyClassIsReproducibleAndSeededByItsName) {
  const FleetData fleet = pump_class(60, invented_noise);
  const FleetData reordered = pump_class(60, invented_noise, true);
  const ClassModel first = model_of(fleet, testing::pump_policy());
  ASSERT_TRUE(first.spread);
  const std::vector<Years>& lives = first.spread->lives;
  // The invented noise must move the life, or the checks below prove nothing.
  ASSERT_NE(*std::min_element(lives.begin(), lives.end()),
            *std::max_element(lives.begin(), lives.end()));

  const ClassModel again = model_of(fleet, testing::pump_policy());
  EXPECT_EQ(again.spread->lives, lives);
  EXPECT_EQ(again.spread->p10, first.spread->p10);
  EXPECT_EQ(again.spread->p90, first.spread->p90);

  // The same assets read in the opposite order: drawn in asset_id order, so the same draws.
  const ClassModel other_order = model_of(reordered, testing::pump_policy());
  EXPECT_EQ(other_order.spread->lives, lives);
  EXPECT_EQ(other_order.spread->p10, first.spread->p10);
  EXPECT_EQ(other_order.spread->p90, first.spread->p90);

  // Another class name seeds other draws.
  EXPECT_NE(bootstrap_seed("pump-duty"), bootstrap_seed("pump-standby"));
  const ClassModel renamed = model_of(fleet, testing::pump_policy(), "pump-standby");
  EXPECT_NE(renamed.spread->lives, lives);
}

}  // namespace
}  // namespace tenure::review
