// A class with no complete year of costs (SPEC 6, review/asset_review.h): its assets cannot be
// weighed, so each gets the verdict review with a reason naming the missing cost history and no
// figures, while the other classes of the same fleet are analysed as usual. The fleet is
// invented; the expected book value is worked by hand.
#include <gtest/gtest.h>

#include <string>

#include "fleet/cost_history.h"
#include "review/fleet_review.h"
#include "review_fixture.h"

namespace tenure::review {
namespace {

using testing::add_asset;
using testing::day;

TEST(MissingCosts, AClassWithoutACompleteCostYearIsUnderReview) {
  FleetData data(day("2025-06-30"), 0);
  Policy policy = testing::invented_policy();
  policy.classes.emplace("compressor", ClassPolicy{30000, 12, depreciation::StraightLineSpec{10, 0},
                                                   0.1, fleet::CostModelChoice::linear});
  // Compressors that have not completed an age-year: two in service for less than a year, and
  // one retired before its first anniversary, each with a cost in that incomplete year (an
  // age-year without events is still a complete year, of cost 0; these have none). Invented.
  const std::size_t older = add_asset(data, "CP-0001", "compressor", day("2024-09-01"), 30000, {});
  const std::size_t newer = add_asset(data, "CP-0002", "compressor", day("2025-01-01"), 28000, {});
  const std::size_t gone =
      add_asset(data, "CP-0003", "compressor", day("2023-01-01"), 29000, {}, day("2023-10-01"));
  const auto at = [](std::size_t i) { return static_cast<fleet::CostHistory::AssetIndex>(i); };
  ASSERT_EQ(data.costs.add_event(at(older), day("2025-03-01"), 700),
            fleet::EventFate::outside_complete_years);
  ASSERT_EQ(data.costs.add_event(at(newer), day("2025-05-01"), 300),
            fleet::EventFate::outside_complete_years);
  ASSERT_EQ(data.costs.add_event(at(gone), day("2023-05-01"), 500),
            fleet::EventFate::outside_complete_years);
  // A pump with a cost history, in the same fleet.
  const std::size_t pump = add_asset(data, "PU-0001", "pump-duty", day("2020-04-01"), 18000,
                                     {900, 1150, 1400, 1650, 1900});

  const ReviewResult result = review_fleet(data, policy);
  const ClassModel& compressors = result.class_named("compressor");
  EXPECT_FALSE(compressors.cost_curve);
  EXPECT_FALSE(compressors.challenger);
  EXPECT_EQ(compressors.assets, 3u);
  EXPECT_EQ(result.retired, 1u);
  ASSERT_EQ(result.assets.size(), 3u);
  for (const AssetReview& r : result.assets) {
    if (r.asset == pump) continue;
    SCOPED_TRACE(data.assets[r.asset].asset_id);
    EXPECT_EQ(r.finding.verdict, Verdict::review);
    EXPECT_TRUE(r.due());
    // The key words of the reason: what is missing, and for which class.
    EXPECT_NE(r.finding.reason.find("cost history"), std::string::npos) << r.finding.reason;
    EXPECT_NE(r.finding.reason.find("compressor"), std::string::npos) << r.finding.reason;
    EXPECT_EQ(r.defender, nullptr);
    EXPECT_FALSE(r.decision);
    EXPECT_FALSE(r.class_esl_years);
    EXPECT_FALSE(r.defender_euac_before_tax);
    EXPECT_FALSE(r.defender_euac_after_tax);
    EXPECT_FALSE(r.marginal_cost_next_year);
    EXPECT_TRUE(r.inputs.ownership.operating_costs.empty());
    // The same as judging it alone.
    const AssetReview alone = review_asset(r.asset, data, compressors, policy);
    EXPECT_EQ(r.finding.verdict, alone.finding.verdict);
    EXPECT_EQ(r.finding.reason, alone.finding.reason);
  }
  // By hand: both are in their first year (age 0), so their book values are their first costs
  // (book value at year 0 is the basis, depreciation/schedule.h).
  EXPECT_EQ(result.assets[0].asset, older);
  EXPECT_EQ(result.assets[0].inputs.age_years, 0);
  EXPECT_DOUBLE_EQ(result.assets[0].book_value_now, 30000);
  EXPECT_EQ(result.assets[1].asset, newer);
  EXPECT_DOUBLE_EQ(result.assets[1].book_value_now, 28000);

  // The pump's class has a cost curve: it is weighed, with figures.
  const AssetReview& weighed = result.assets[2];
  ASSERT_EQ(weighed.asset, pump);
  EXPECT_TRUE(weighed.decision);
  EXPECT_TRUE(weighed.class_esl_years);
  EXPECT_TRUE(weighed.defender_euac_after_tax);
  EXPECT_TRUE(weighed.marginal_cost_next_year);
}

}  // namespace
}  // namespace tenure::review
