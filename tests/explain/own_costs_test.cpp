// An asset's own cost history against its class curve, from raw events: totals per complete
// age-year, events in the current year or unusable counted apart, and the credibility factor of
// SPEC 6 (m, r = observed / predicted, z = m / (m + 3), factor = 1 + z (r - 1)) in closed form.
#include <gtest/gtest.h>

#include "explain/own_costs.h"

namespace tenure::explain {
namespace {

const fleet::CostCurve kCurve{fleet::CostModel::linear, 1000, 400, 1, 100, 0, 10, false};

TEST(OwnCosts, TotalsPerAgeYearAndTheCredibilityFactor) {
  results::InputAsset asset;
  asset.in_service_on = "2020-01-01";
  asset.first_cost = 16000;
  asset.events = {{"2020-03-01", 600},  {"2020-11-30", 500},   // age-year 1: 1100
                  {"2021-06-01", 1500},                        // age-year 2: 1500
                  {"2022-01-01", 2000},                        // age-year 3 starts on its day
                  {"2023-12-31", 2500},                        // age-year 4: 2500
                  {"2024-03-01", 999},                         // current year: not complete
                  {"2023-02-30", 50},                          // not a date
                  {"2019-12-31", 70}};                         // before in service
  asset.events_unreadable = 1;
  const auto own = own_costs(asset, *parse_iso_date("2024-06-30"), 0.0, kCurve);
  ASSERT_TRUE(own);
  ASSERT_EQ(own->years.size(), 4u);
  const double observed[] = {1100, 1500, 2000, 2500};
  const double predicted[] = {1000, 1400, 1800, 2200};
  for (int k = 0; k < 4; ++k) {
    EXPECT_EQ(own->years[k].age_year, k + 1);
    EXPECT_EQ(own->years[k].observed, observed[k]);
    EXPECT_EQ(own->years[k].class_curve, predicted[k]);
  }
  EXPECT_EQ(own->years[0].events, 2u);
  EXPECT_EQ(own->events_counted, 5u);
  EXPECT_EQ(own->events_not_complete, 1u);
  EXPECT_EQ(own->events_not_usable, 3u);  // the unreadable row, the bad date, before in service
  // Closed form: r = 7100 / 6400, z = 4 / 7.
  EXPECT_EQ(own->credibility.years, 4);
  EXPECT_DOUBLE_EQ(own->credibility.ratio, 7100.0 / 6400.0);
  EXPECT_DOUBLE_EQ(own->credibility.weight, 4.0 / 7.0);
  EXPECT_DOUBLE_EQ(own->credibility.factor, 1 + 4.0 / 7.0 * (7100.0 / 6400.0 - 1));
}

TEST(OwnCosts, NoCompleteYearMeansTheClassCurveAsIs) {
  results::InputAsset asset;
  asset.in_service_on = "2024-01-01";
  asset.first_cost = 16000;
  asset.events = {{"2024-02-01", 300}};
  const auto own = own_costs(asset, *parse_iso_date("2024-06-30"), 0.0, kCurve);
  ASSERT_TRUE(own);
  EXPECT_TRUE(own->years.empty());
  EXPECT_FALSE(own->credibility.measured);
  EXPECT_EQ(own->credibility.factor, 1.0);
}

TEST(OwnCosts, AnInputRowWithABadDateGivesNothing) {
  results::InputAsset asset;
  asset.in_service_on = "2024/01/01";
  EXPECT_FALSE(own_costs(asset, *parse_iso_date("2024-06-30"), 0.0, kCurve));
  asset.in_service_on = "2024-01-01";
  asset.retired_on = "2023-01-01";  // before in service
  EXPECT_FALSE(own_costs(asset, *parse_iso_date("2024-06-30"), 0.0, kCurve));
}

}  // namespace
}  // namespace tenure::explain
