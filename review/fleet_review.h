// The nightly review of a whole fleet (SPEC 6): per class its curves and challenger, per asset in
// service its defender analysis and verdict. Pure computation on validated FleetData; db/ reads
// the data before and writes the results, as they come, while the rest is analysed.
//
//   ReviewResult result = review_fleet(data, policy);
//   for (const AssetReview& a : result.assets) if (a.due()) ...;
//
// or in two steps, to store each run of analysed assets while the others are analysed:
//
//   ReviewResult result = plan_review(data, policy);      // classes, which assets, their order
//   analyse_assets(data, policy, result, {}, [&](std::span<const AssetReview> done) { store(done); });
#pragma once

#include <cstddef>
#include <functional>
#include <span>
#include <string_view>
#include <vector>

#include "review/asset_review.h"
#include "review/class_model.h"
#include "review/fleet_data.h"
#include "review/policy.h"

namespace tenure::review {

struct ReviewResult {
  std::vector<ClassModel> classes;  // by class name
  std::vector<AssetReview> assets;  // assets in service at the as-of date, by asset_id
  std::size_t retired = 0;          // accepted assets retired by the as-of date (curves only)
  std::size_t not_yet_in_service = 0;  // put in service after the as-of date: not weighed

  // The model of a class by name; throws RuntimeFailure for a class the review did not build.
  const ClassModel& class_named(std::string_view name) const;
};

// Called now and then with (assets done, assets to do), for a progress display.
using Progress = std::function<void(std::size_t, std::size_t)>;
// Called with consecutive runs of analysed assets, in the order of ReviewResult::assets.
using AssetsReady = std::function<void(std::span<const AssetReview>)>;

// Builds every class model and lists the assets to analyse (only their `asset` index is set).
ReviewResult plan_review(const FleetData& data, const Policy& policy);

// Analyses the planned assets on all cores; detail (the full analysis) is kept per
// policy.detail. `progress` and `ready` are called on the calling thread only, `ready` in order
// and as soon as each run is complete, while the other threads go on analysing. A failure in
// either stops the analysis and is rethrown.
void analyse_assets(const FleetData& data, const Policy& policy, ReviewResult& planned,
                    const Progress& progress = {}, const AssetsReady& ready = {});

// plan_review then analyse_assets.
ReviewResult review_fleet(const FleetData& data, const Policy& policy, const Progress& progress = {});

}  // namespace tenure::review
