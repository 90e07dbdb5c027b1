// The threaded analysis of a planned review (review/fleet_review.h analyse_assets): on an
// invented fleet of a few thousand assets (chunks of 256, so the helper threads take part), each
// result is bit for bit what review_asset gives for that asset alone, `ready` gets consecutive
// runs in order covering every asset once, `progress` ends at (total, total), both are called on
// the calling thread, detail is kept as the policy says, and a failure, in `ready`, in `progress`
// or in an asset's analysis, stops the analysis and reaches the caller.
#include <gtest/gtest.h>

#include <bit>
#include <cstdint>
#include <optional>
#include <span>
#include <stdexcept>
#include <thread>
#include <utility>
#include <vector>

#include "core/errors.h"
#include "review/fleet_review.h"
#include "review_fixture.h"

namespace tenure::review {
namespace {

constexpr std::size_t kAssets = 3000;  // about 2,900 weighed: a dozen chunks of 256

// Bitwise equality of doubles, so "the same figures" cannot hide a last-place difference.
bool same_bits(double a, double b) {
  return std::bit_cast<std::uint64_t>(a) == std::bit_cast<std::uint64_t>(b);
}
bool same_bits(const std::optional<double>& a, const std::optional<double>& b) {
  return a.has_value() == b.has_value() && (!a || same_bits(*a, *b));
}
bool same_bits(const std::vector<double>& a, const std::vector<double>& b) {
  if (a.size() != b.size()) return false;
  for (std::size_t k = 0; k < a.size(); ++k) {
    if (!same_bits(a[k], b[k])) return false;
  }
  return true;
}

// The summary every asset keeps, whatever the detail.
void expect_same_summary(const AssetReview& got, const AssetReview& alone) {
  EXPECT_EQ(got.asset, alone.asset);
  EXPECT_EQ(got.finding.verdict, alone.finding.verdict);
  EXPECT_EQ(got.finding.reason, alone.finding.reason);
  EXPECT_EQ(got.basis, alone.basis);
  EXPECT_TRUE(same_bits(got.book_value_now, alone.book_value_now));
  EXPECT_TRUE(same_bits(got.defender_euac_before_tax, alone.defender_euac_before_tax));
  EXPECT_TRUE(same_bits(got.defender_euac_after_tax, alone.defender_euac_after_tax));
  EXPECT_TRUE(same_bits(got.marginal_cost_next_year, alone.marginal_cost_next_year));
  EXPECT_EQ(got.class_esl_years, alone.class_esl_years);
  const DefenderInputs& a = got.inputs;
  const DefenderInputs& b = alone.inputs;
  EXPECT_EQ(a.age_years, b.age_years);
  EXPECT_TRUE(same_bits(a.market_value_now, b.market_value_now));
  EXPECT_EQ(a.market_value_source, b.market_value_source);
  EXPECT_EQ(a.credibility.years, b.credibility.years);
  EXPECT_TRUE(same_bits(a.credibility.ratio, b.credibility.ratio));
  EXPECT_TRUE(same_bits(a.credibility.factor, b.credibility.factor));
  EXPECT_EQ(a.credibility.measured, b.credibility.measured);
  ASSERT_EQ(got.decision.has_value(), alone.decision.has_value());
  if (got.decision) {
    EXPECT_EQ(got.decision->timing.keep_years, alone.decision->timing.keep_years);
    EXPECT_TRUE(same_bits(got.decision->defender_euac, alone.decision->defender_euac));
    EXPECT_TRUE(same_bits(got.decision->challenger_euac, alone.decision->challenger_euac));
    EXPECT_EQ(got.decision->defender_best_years, alone.decision->defender_best_years);
  }
}

// The year-by-year detail, kept for an asset in detail.
void expect_same_detail(const AssetReview& got, const AssetReview& alone) {
  EXPECT_TRUE(
      same_bits(got.inputs.ownership.operating_costs, alone.inputs.ownership.operating_costs));
  EXPECT_TRUE(same_bits(got.inputs.ownership.market_values, alone.inputs.ownership.market_values));
  ASSERT_EQ(got.defender != nullptr, alone.defender != nullptr);
  if (got.defender) {
    EXPECT_TRUE(
        same_bits(got.defender->before_tax.curve.euac, alone.defender->before_tax.curve.euac));
    EXPECT_TRUE(same_bits(got.defender->before_tax.curve.marginal_costs,
                          alone.defender->before_tax.curve.marginal_costs));
    ASSERT_EQ(got.defender->after_tax.has_value(), alone.defender->after_tax.has_value());
    if (got.defender->after_tax) {
      EXPECT_TRUE(
          same_bits(got.defender->after_tax->curve.euac, alone.defender->after_tax->curve.euac));
    }
  }
  if (got.decision && alone.decision) {
    EXPECT_TRUE(
        same_bits(got.decision->timing.present_worth, alone.decision->timing.present_worth));
  }
}

// Everything the callbacks saw.
struct Calls {
  std::vector<std::pair<std::size_t, std::size_t>> runs;      // (first position, count)
  std::vector<std::pair<std::size_t, std::size_t>> progress;  // (done, total)
  bool off_thread = false;
  bool unjudged = false;  // a delivered asset without its reason yet
};

// The callbacks that record into `calls`; positions are measured against planned.assets.
std::pair<Progress, AssetsReady> recorders(Calls& calls, const ReviewResult& planned) {
  const std::thread::id caller = std::this_thread::get_id();
  Progress progress = [&calls, caller](std::size_t done, std::size_t total) {
    if (std::this_thread::get_id() != caller) calls.off_thread = true;
    calls.progress.emplace_back(done, total);
  };
  AssetsReady ready = [&calls, &planned, caller](std::span<const AssetReview> run) {
    if (std::this_thread::get_id() != caller) calls.off_thread = true;
    calls.runs.emplace_back(static_cast<std::size_t>(run.data() - planned.assets.data()),
                            run.size());
    for (const AssetReview& a : run) {
      if (a.finding.reason.empty()) calls.unjudged = true;
    }
  };
  return {progress, ready};
}

class AnalyseAssets : public ::testing::Test {
 protected:
  static void SetUpTestSuite() { fleet_ = new FleetData(testing::invented_fleet(kAssets)); }
  static void TearDownTestSuite() {
    delete fleet_;
    fleet_ = nullptr;
  }
  static const FleetData& fleet() { return *fleet_; }

 private:
  static FleetData* fleet_;
};
FleetData* AnalyseAssets::fleet_ = nullptr;

TEST_F(AnalyseAssets, EqualsReviewAssetOneByOneAndDeliversEveryRunInOrder) {
  const Policy policy = testing::invented_policy(Detail::all);
  ReviewResult planned = plan_review(fleet(), policy);
  const std::size_t total = planned.assets.size();
  // The fixture is what the test needs: several chunks, and assets left out both ways.
  ASSERT_GT(total, 8 * 256u);
  EXPECT_GT(planned.retired, 0u);
  EXPECT_GT(planned.not_yet_in_service, 0u);
  EXPECT_EQ(total + planned.retired + planned.not_yet_in_service, kAssets);

  Calls calls;
  auto [progress, ready] = recorders(calls, planned);
  analyse_assets(fleet(), policy, planned, progress, ready);

  // ready: consecutive runs, in order, from the first asset to the last, each once.
  ASSERT_FALSE(calls.runs.empty());
  std::size_t next = 0;
  for (const auto& [first, count] : calls.runs) {
    EXPECT_EQ(first, next);
    EXPECT_GT(count, 0u);
    next = first + count;
  }
  EXPECT_EQ(next, total);
  EXPECT_GT(calls.runs.size(), 1u);  // delivered as runs, not all at the end
  EXPECT_FALSE(calls.unjudged);
  // progress: never backwards, always out of the same total, ending at (total, total).
  ASSERT_FALSE(calls.progress.empty());
  for (std::size_t k = 0; k < calls.progress.size(); ++k) {
    EXPECT_EQ(calls.progress[k].second, total);
    if (k > 0) {
      EXPECT_GE(calls.progress[k].first, calls.progress[k - 1].first);
    }
  }
  EXPECT_EQ(calls.progress.back(), std::make_pair(total, total));
  EXPECT_FALSE(calls.off_thread);

  // Each result is what the asset gets alone, on this thread.
  std::size_t verdicts[3] = {0, 0, 0};
  for (std::size_t j = 0; j < total; ++j) {
    const AssetReview& got = planned.assets[j];
    const AssetRecord& record = fleet().assets[got.asset];
    SCOPED_TRACE(record.asset_id);
    if (j > 0) {
      EXPECT_LT(fleet().assets[planned.assets[j - 1].asset].asset_id, record.asset_id);
    }
    const AssetReview alone =
        review_asset(got.asset, fleet(), planned.class_named(record.asset_class), policy);
    expect_same_summary(got, alone);
    expect_same_detail(got, alone);
    ++verdicts[static_cast<int>(got.finding.verdict)];
    if (::testing::Test::HasFailure()) break;  // one asset's differences are enough to read
  }
  // The invented fleet exercises every verdict (a check on the fixture, not a golden value).
  EXPECT_GT(verdicts[static_cast<int>(Verdict::keep)], 0u);
  EXPECT_GT(verdicts[static_cast<int>(Verdict::review)], 0u);
  EXPECT_GT(verdicts[static_cast<int>(Verdict::replace)], 0u);
}

TEST_F(AnalyseAssets, DetailIsKeptAsThePolicySays) {
  for (Detail detail : {Detail::none, Detail::due}) {
    SCOPED_TRACE(detail == Detail::none ? "none" : "due");
    const Policy policy = testing::invented_policy(detail);
    ReviewResult result = review_fleet(fleet(), policy);
    for (const AssetReview& got : result.assets) {
      const AssetRecord& record = fleet().assets[got.asset];
      SCOPED_TRACE(record.asset_id);
      const bool kept = detail == Detail::due && got.due();
      EXPECT_EQ(got.defender != nullptr, kept);
      EXPECT_EQ(got.inputs.ownership.operating_costs.empty(), !kept);
      ASSERT_TRUE(got.decision);  // every class here has a cost history
      EXPECT_EQ(got.decision->timing.present_worth.empty(), !kept);
      // The summary is the same as the asset's own review, detail or not.
      const AssetReview alone =
          review_asset(got.asset, fleet(), result.class_named(record.asset_class), policy);
      expect_same_summary(got, alone);
      if (kept) expect_same_detail(got, alone);
      if (::testing::Test::HasFailure()) return;
    }
  }
}

struct Stop : std::runtime_error {
  Stop() : std::runtime_error("stop here") {}
};

TEST_F(AnalyseAssets, AnExceptionFromReadyStopsTheAnalysisAndIsRethrown) {
  const Policy policy = testing::invented_policy();
  ReviewResult planned = plan_review(fleet(), policy);
  int ready_calls = 0;
  int progress_calls = 0;
  const AssetsReady ready = [&](std::span<const AssetReview>) {
    if (++ready_calls == 3) throw Stop();
  };
  const Progress progress = [&](std::size_t, std::size_t) { ++progress_calls; };
  EXPECT_THROW(analyse_assets(fleet(), policy, planned, progress, ready), Stop);
  EXPECT_EQ(ready_calls, 3);     // nothing delivered after the failure
  EXPECT_EQ(progress_calls, 2);  // progress follows each run delivered before it
}

TEST_F(AnalyseAssets, AnExceptionFromProgressStopsTheAnalysisAndIsRethrown) {
  const Policy policy = testing::invented_policy();
  ReviewResult planned = plan_review(fleet(), policy);
  int ready_calls = 0;
  const AssetsReady ready = [&](std::span<const AssetReview>) { ++ready_calls; };
  const Progress progress = [](std::size_t, std::size_t) { throw Stop(); };
  EXPECT_THROW(analyse_assets(fleet(), policy, planned, progress, ready), Stop);
  EXPECT_EQ(ready_calls, 1);
}

TEST_F(AnalyseAssets, AFailingAssetStopsTheAnalysisBeforeItsRunIsDelivered) {
  const Policy policy = testing::invented_policy();
  FleetData data = testing::invented_fleet(kAssets);
  ReviewResult planned = plan_review(data, policy);
  // After planning, the asset at position 1,000 (in the fourth chunk of 256) gets a first cost
  // no depreciation schedule accepts (invented fault): its analysis throws InputError.
  const std::size_t bad = 1000;
  data.assets[planned.assets[bad].asset].first_cost = -1;
  Calls calls;
  auto [progress, ready] = recorders(calls, planned);
  EXPECT_THROW(analyse_assets(data, policy, planned, progress, ready), InputError);
  for (const auto& [first, count] : calls.runs) {
    EXPECT_LE(first + count, bad) << "the failing asset's run, or one after it, was delivered";
  }
  EXPECT_FALSE(calls.off_thread);
}

TEST(AnalyseAssetsSmall, OneChunkOnTheCallingThreadAndNothingToDo) {
  // Fewer than 256 assets: one run, no helper threads; an empty plan calls nothing.
  const FleetData data = testing::invented_fleet(97);
  const Policy policy = testing::invented_policy();
  ReviewResult planned = plan_review(data, policy);
  ASSERT_GT(planned.assets.size(), 0u);
  Calls calls;
  auto [progress, ready] = recorders(calls, planned);
  analyse_assets(data, policy, planned, progress, ready);
  ASSERT_EQ(calls.runs.size(), 1u);
  EXPECT_EQ(calls.runs[0], std::make_pair(std::size_t{0}, planned.assets.size()));
  EXPECT_EQ(calls.progress.back(), std::make_pair(planned.assets.size(), planned.assets.size()));
  for (const AssetReview& got : planned.assets) {
    const AssetRecord& record = data.assets[got.asset];
    expect_same_summary(
        got, review_asset(got.asset, data, planned.class_named(record.asset_class), policy));
  }

  ReviewResult nothing = plan_review(FleetData(data.as_of, 0), policy);
  ASSERT_TRUE(nothing.assets.empty());
  Calls none;
  auto [no_progress, no_ready] = recorders(none, nothing);
  EXPECT_NO_THROW(analyse_assets(data, policy, nothing, no_progress, no_ready));
  EXPECT_TRUE(none.runs.empty());
}

}  // namespace
}  // namespace tenure::review
