// What the nightly review weighs (review/fleet_review.h plan_review, SPEC 3 and 6): assets
// retired by the as-of date (retired_on <= as_of) and assets put in service after it are counted
// and not reviewed; the others are listed by asset_id (byte order, the order of the results
// table's key); every class of the policy gets a model, by class name. The fleet is invented;
// the expected lists and counts follow by hand from its dates.
#include <gtest/gtest.h>

#include <string>
#include <vector>

#include "core/errors.h"
#include "review/fleet_review.h"
#include "review_fixture.h"

namespace tenure::review {
namespace {

using testing::add_asset;
using testing::day;

struct Fixture {
  FleetData data{day("2025-06-30"), 0};
  Policy policy = testing::invented_policy();

  Fixture() {
    // A class with a policy and no assets at all (invented).
    policy.classes.emplace("compressor",
                           ClassPolicy{30000, 12, depreciation::StraightLineSpec{10, 0}, 0.1,
                                       fleet::CostModelChoice::linear});
    // Invented assets, added in no particular order; index in the comment.
    /*0*/ add_asset(data, "VN-0002", "van-delivery", day("2019-04-01"), 48000,
                    {4000, 4800, 5600, 6400, 7200, 8000});
    /*1*/ add_asset(data, "PU-10", "pump-duty", day("2021-05-05"), 18000, {900, 1100, 1300, 1500});
    /*2*/ add_asset(data, "PU-0003", "pump-duty", day("2015-02-01"), 16000,
                    {800, 1000, 1200, 1400, 1600, 1800, 2000, 2200, 2400}, day("2024-12-31"));
    /*3*/ add_asset(data, "PU-0001", "pump-duty", day("2025-06-30"), 18500, {});
    /*4*/ add_asset(data, "PU-0007", "pump-duty", day("2025-07-01"), 18500, {});
    /*5*/ add_asset(data, "VN-0001", "van-delivery", day("2020-01-15"), 45000,
                    {4200, 5000, 5800, 6600, 7400}, day("2025-06-30"));
    /*6*/ add_asset(data, "PU-9", "pump-duty", day("2018-08-20"), 17500,
                    {950, 1150, 1350, 1550, 1750, 1950}, day("2025-07-01"));
    /*7*/ add_asset(data, "AB-0001", "van-delivery", day("2022-03-01"), 51000, {4100, 4900, 5700});
  }
};

TEST(PlanReview, CountsRetiredAndNotYetInServiceAndListsTheRestByAssetId) {
  const Fixture f;
  const ReviewResult planned = plan_review(f.data, f.policy);
  // By hand: retired by 2025-06-30 are PU-0003 (2024-12-31) and VN-0001 (on the as-of date
  // itself); PU-0007 starts the day after; PU-9 retires the day after, so it is still weighed,
  // and PU-0001 starts on the as-of date, so it is weighed at age 0.
  EXPECT_EQ(planned.retired, 2u);
  EXPECT_EQ(planned.not_yet_in_service, 1u);
  // By hand, in byte order: "AB-0001" < "PU-0001" < "PU-10" < "PU-9" < "VN-0002" ('1' < '9').
  const std::vector<std::size_t> expected = {7, 3, 1, 6, 0};
  std::vector<std::size_t> listed;
  for (const AssetReview& a : planned.assets) listed.push_back(a.asset);
  EXPECT_EQ(listed, expected);
  for (const AssetReview& a : planned.assets) {
    EXPECT_TRUE(a.finding.reason.empty()) << "planned only, not judged yet: " << a.asset;
    EXPECT_EQ(a.defender, nullptr);
  }
}

TEST(PlanReview, EveryPolicyClassHasAModelByName) {
  const Fixture f;
  const ReviewResult planned = plan_review(f.data, f.policy);
  ASSERT_EQ(planned.classes.size(), 3u);
  EXPECT_EQ(planned.classes[0].asset_class, "compressor");
  EXPECT_EQ(planned.classes[1].asset_class, "pump-duty");
  EXPECT_EQ(planned.classes[2].asset_class, "van-delivery");
  // Accepted assets of each class, retired and not yet in service included (class_model.h), by
  // hand from the fixture: pumps 1, 2, 3, 4, 6; vans 0, 5, 7.
  EXPECT_EQ(planned.classes[0].assets, 0u);
  EXPECT_EQ(planned.classes[1].assets, 5u);
  EXPECT_EQ(planned.classes[2].assets, 3u);
  // The class without assets has no cost history, so no challenger; the others have both.
  EXPECT_FALSE(planned.classes[0].cost_curve);
  EXPECT_FALSE(planned.classes[0].challenger);
  EXPECT_TRUE(planned.classes[1].challenger);
  EXPECT_TRUE(planned.classes[2].challenger);
  // Retired assets feed the curves: the pumps' pooled complete years are 4 + 9 + 6 = 19 and the
  // vans' 6 + 5 + 3 = 14 (by hand from the fixture's cost lists).
  EXPECT_EQ(planned.classes[1].cost_curve->asset_years, 19u);
  EXPECT_EQ(planned.classes[2].cost_curve->asset_years, 14u);
  EXPECT_EQ(&planned.class_named("pump-duty"), &planned.classes[1]);
  EXPECT_EQ(&planned.class_named("compressor"), &planned.classes[0]);
  EXPECT_THROW(planned.class_named("forklift"), RuntimeFailure);
  EXPECT_THROW(planned.class_named("pump"), RuntimeFailure);
}

TEST(PlanReview, AClassWithoutAPolicyIsAFailure) {
  Fixture f;
  add_asset(f.data, "FL-0001", "forklift", day("2021-01-01"), 30000, {1000});
  EXPECT_THROW(plan_review(f.data, f.policy), RuntimeFailure);
}

TEST(ReviewFleet, JudgesThePlannedAssetsAsReviewAssetDoes) {
  const Fixture f;
  const ReviewResult result = review_fleet(f.data, f.policy);
  EXPECT_EQ(result.retired, 2u);
  EXPECT_EQ(result.not_yet_in_service, 1u);
  const std::vector<std::size_t> expected = {7, 3, 1, 6, 0};
  ASSERT_EQ(result.assets.size(), expected.size());
  for (std::size_t j = 0; j < expected.size(); ++j) {
    const AssetReview& got = result.assets[j];
    SCOPED_TRACE(f.data.assets[got.asset].asset_id);
    EXPECT_EQ(got.asset, expected[j]);
    const AssetReview alone = review_asset(
        got.asset, f.data, result.class_named(f.data.assets[got.asset].asset_class), f.policy);
    EXPECT_EQ(got.finding.verdict, alone.finding.verdict);
    EXPECT_EQ(got.finding.reason, alone.finding.reason);
    EXPECT_EQ(got.inputs.age_years, alone.inputs.age_years);
    EXPECT_EQ(got.defender_euac_after_tax, alone.defender_euac_after_tax);
    EXPECT_EQ(got.class_esl_years, alone.class_esl_years);
    EXPECT_FALSE(got.finding.reason.empty());
  }
  // By hand: PU-0001 went into service on the as-of date.
  EXPECT_EQ(result.assets[1].inputs.age_years, 0);
}

}  // namespace
}  // namespace tenure::review
