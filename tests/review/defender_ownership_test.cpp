// The nightly defender's future (SPEC 6 "Nightly defender", review/asset_review.h):
// defender_ownership weighs max(1, max_life_years - age) more years, with costs on the class
// curve at ages a+1, a+2, ... times the credibility factor and market values of its first cost
// times the class value fraction at those ages; defender_inputs feeds it the factor measured on
// the asset's own costs. The class curves are invented; expected values follow by hand from
// their closed forms (linear cost a + g (k - 1), value fraction (1 - decline)^age).
#include <gtest/gtest.h>

#include <cmath>
#include <optional>
#include <vector>

#include "review/asset_review.h"
#include "review/class_model.h"
#include "review_fixture.h"

namespace tenure::review {
namespace {

using testing::day;

const ClassPolicy kPolicy{18500, 10, depreciation::MacrsSpec{7}, 0.2,
                          fleet::CostModelChoice::linear};
const tax::Rates kRates = tax::Rates::make(0.10, 0.25);

// Linear class curve a = 1,000, g = 200: 1,000 at age-year 1, 1,200 at 2, ... (invented).
ClassModel rising_model() {
  return make_class_model(
      "pump-duty", kPolicy, 1,
      fleet::CostCurve{fleet::CostModel::linear, 1000, 200, 0.9, 30, 0, 10, false},
      fleet::policy_value_curve(0.2), kRates, 0.02);
}

struct Row {
  const char* comment;
  Years age;
  double factor;
  Years years;            // by hand: max(1, 10 - age)
  Money first_cost;       // of the asset (the value curve scales it)
  Money first_year_cost;  // by hand: the cost of the first year weighed
  Money last_cost;        // by hand: the cost of the last year weighed
};

TEST(DefenderOwnership, YearsCostsAndValuesFromTheClassCurves) {
  const ClassModel model = rising_model();
  const std::vector<Row> rows = {
      {"age 3: 7 more years, ages 4..10, 1,600 to 2,800", 3, 1.0, 7, 10000, 1600, 2800},
      {"age 3 at factor 1.25: 1.25 x 1,600 = 2,000 to 1.25 x 2,800 = 3,500", 3, 1.25, 7, 10000,
       2000, 3500},
      {"age 2 at factor 0.5: 8 years, 0.5 x 1,400 = 700 to 0.5 x 2,800 = 1,400", 2, 0.5, 8, 20000,
       700, 1400},
      {"age 0: the whole maximum life, 10 years, 1,000 to 2,800", 0, 1.0, 10, 10000, 1000, 2800},
      {"age 9: one year left, age 10 at 2,800", 9, 1.0, 1, 10000, 2800, 2800},
      {"age 10, at the maximum life: still one year, age 11 at 3,000", 10, 1.0, 1, 10000, 3000,
       3000},
      {"age 14, past the maximum life: one year, age 15 at 3,800", 14, 1.0, 1, 10000, 3800, 3800},
  };
  for (const Row& row : rows) {
    SCOPED_TRACE(row.comment);
    const replacement::Ownership own =
        defender_ownership(model, row.first_cost, row.age, 4321, row.factor);
    EXPECT_EQ(own.first_cost, row.first_cost);
    EXPECT_EQ(own.age_years, row.age);
    EXPECT_EQ(own.value_now, 4321);
    EXPECT_EQ(own.depreciation, model.depreciation);  // the class policy's method, made once
    ASSERT_EQ(own.max_years(), row.years);
    ASSERT_EQ(own.market_values.size(), own.operating_costs.size());
    EXPECT_DOUBLE_EQ(own.operating_costs.front(), row.first_year_cost);
    EXPECT_DOUBLE_EQ(own.operating_costs.back(), row.last_cost);
    for (Years k = 1; k <= row.years; ++k) {
      SCOPED_TRACE(k);
      const Years age_year = row.age + k;
      // Closed forms of the two invented curves.
      EXPECT_DOUBLE_EQ(own.operating_costs[k - 1], row.factor * (1000 + 200 * (age_year - 1)));
      EXPECT_DOUBLE_EQ(own.market_values[k - 1], row.first_cost * std::pow(0.8, age_year));
    }
  }
}

TEST(DefenderOwnership, MarketValuesByHand) {
  // Age 3, first cost 10,000: 10,000 x 0.8^4 = 4,096 and 10,000 x 0.8^5 = 3,276.8 (by hand).
  const replacement::Ownership own = defender_ownership(rising_model(), 10000, 3, 5120, 1.0);
  ASSERT_GE(own.market_values.size(), 2u);
  EXPECT_DOUBLE_EQ(own.market_values[0], 4096);
  EXPECT_DOUBLE_EQ(own.market_values[1], 3276.8);
}

TEST(DefenderOwnership, CostsBelowZeroAreReadAsZero) {
  // Falling curve a = 1,000, g = -300 (invented): ages 3, 4, 5 give 400, 100, -200; the class
  // model reads a negative cost as zero (class_model.h), so 400, 100, 0, 0, ...
  const ClassModel model =
      make_class_model("pump-duty", kPolicy, 1,
                       fleet::CostCurve{fleet::CostModel::linear, 1000, -300, 0.5, 10, 0, 4, false},
                       fleet::policy_value_curve(0.2), kRates, 0.02);
  const replacement::Ownership own = defender_ownership(model, 10000, 2, 6400, 1.0);
  ASSERT_EQ(own.max_years(), 8);  // by hand: 10 - 2
  EXPECT_DOUBLE_EQ(own.operating_costs[0], 400);
  EXPECT_DOUBLE_EQ(own.operating_costs[1], 100);
  for (std::size_t k = 2; k < own.operating_costs.size(); ++k) {
    EXPECT_EQ(own.operating_costs[k], 0) << "year " << k + 1;
  }
}

// SPEC 13: a policy's section 179 amount (here 9,250, half the challenger's 18,500) is taken in
// proportion by an asset of another first cost: 5,000 on 10,000, then MACRS 7-year (Pub 946
// Table A-1, 14.29% in year 1) on the other 5,000. Without it, 9,250 would stand on 10,000.
TEST(DefenderOwnership, Section179IsInProportionToTheAssetsFirstCost) {
  const ClassPolicy policy{18500, 10,
                           depreciation::MacrsSpec{7, depreciation::MacrsConvention::half_year,
                                                   std::nullopt, {9250.0, std::nullopt}},
                           0.2, fleet::CostModelChoice::linear};
  const ClassModel model = make_class_model("pump-duty", policy, 0, std::nullopt,
                                            fleet::policy_value_curve(0.2), kRates, 0.02);
  const replacement::Ownership own = defender_ownership(model, 10000, 0, 10000, 1.0);
  EXPECT_NEAR(own.depreciation->deductions(10000).front(), 5000 + 0.1429 * 5000, 1e-9);
  // An asset cheaper than the 179 amount is not refused: 2,000 expenses 1,000.
  const replacement::Ownership cheap = defender_ownership(model, 2000, 0, 2000, 1.0);
  EXPECT_NEAR(cheap.depreciation->deductions(2000).front(), 1000 + 0.1429 * 1000, 1e-9);
}

TEST(DefenderOwnership, WithoutACostCurveTheSeriesAreEmpty) {
  const ClassModel model = make_class_model("pump-duty", kPolicy, 0, std::nullopt,
                                            fleet::policy_value_curve(0.2), kRates, 0.02);
  const replacement::Ownership own = defender_ownership(model, 10000, 3, 5120, 1.0);
  EXPECT_TRUE(own.operating_costs.empty());
  EXPECT_TRUE(own.market_values.empty());
  EXPECT_EQ(own.first_cost, 10000);
  EXPECT_EQ(own.age_years, 3);
  EXPECT_EQ(own.value_now, 5120);
  EXPECT_EQ(own.depreciation, model.depreciation);
}

TEST(DefenderInputs, CredibilityFactorScalesTheFutureCosts) {
  // An asset 3 years old whose complete years cost 1,500, 1,800 and 2,100 against the class's
  // 1,000, 1,200 and 1,400: r = 5,400 / 3,600 = 1.5, z = 3 / (3 + 3) = 0.5, factor
  // 1 + 0.5 x 0.5 = 1.25 (by hand, SPEC 6); its year at age 4 costs 1.25 x 1,600 = 2,000.
  const ClassModel model = rising_model();
  FleetData data(day("2025-06-30"), 0);
  const std::size_t asset = testing::add_asset(data, "PU-0001", "pump-duty", day("2022-01-10"),
                                               10000, {1500, 1800, 2100});
  const DefenderInputs in = defender_inputs(asset, data, model);
  EXPECT_EQ(in.age_years, 3);
  EXPECT_EQ(in.credibility.years, 3);
  EXPECT_TRUE(in.credibility.measured);
  EXPECT_DOUBLE_EQ(in.credibility.ratio, 1.5);
  EXPECT_DOUBLE_EQ(in.credibility.weight, 0.5);
  EXPECT_DOUBLE_EQ(in.credibility.factor, 1.25);
  ASSERT_EQ(in.ownership.max_years(), 7);  // by hand: 10 - 3
  EXPECT_DOUBLE_EQ(in.ownership.operating_costs[0], 2000);
  EXPECT_DOUBLE_EQ(in.ownership.operating_costs[6], 3500);  // by hand: 1.25 x 2,800
  // And it is what defender_ownership makes of the same numbers.
  const replacement::Ownership direct =
      defender_ownership(model, 10000, 3, in.market_value_now, in.credibility.factor);
  EXPECT_EQ(in.ownership.operating_costs, direct.operating_costs);
  EXPECT_EQ(in.ownership.market_values, direct.market_values);
}

TEST(DefenderInputs, NoCostYearsKeepsTheClassLevel) {
  // No complete year of its own (m = 0): factor 1, the class curve as is (SPEC 6).
  const ClassModel model = rising_model();
  FleetData data(day("2025-06-30"), 0);
  const std::size_t asset =
      testing::add_asset(data, "PU-0002", "pump-duty", day("2024-09-01"), 10000, {});
  const DefenderInputs in = defender_inputs(asset, data, model);
  EXPECT_EQ(in.age_years, 0);
  EXPECT_EQ(in.credibility.years, 0);
  EXPECT_FALSE(in.credibility.measured);
  EXPECT_EQ(in.credibility.factor, 1);
  ASSERT_EQ(in.ownership.max_years(), 10);
  EXPECT_DOUBLE_EQ(in.ownership.operating_costs[0], 1000);  // by hand: a, age-year 1
}

}  // namespace
}  // namespace tenure::review
