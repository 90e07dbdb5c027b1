// The nightly review of a whole fleet (SPEC 6): per class its curves and challenger, per asset in
// service its defender analysis and verdict. Pure computation on validated FleetData; db/ reads
// the data before and writes the result after.
//
//   ReviewResult result = review_fleet(data, policy);
//   for (const AssetReview& a : result.assets) if (a.due()) ...;
#pragma once

#include <cstddef>
#include <functional>
#include <string_view>
#include <vector>

#include "review/asset_review.h"
#include "review/class_model.h"
#include "review/fleet_data.h"
#include "review/policy.h"

namespace tenure::review {

struct ReviewResult {
  std::vector<ClassModel> classes;  // by class name
  std::vector<AssetReview> assets;  // assets in service at the as-of date, in reading order
  std::size_t retired = 0;          // accepted assets retired by the as-of date (curves only)
  std::size_t not_yet_in_service = 0;  // put in service after the as-of date: not weighed

  // The model of a class by name; throws RuntimeFailure for a class the review did not build.
  const ClassModel& class_named(std::string_view name) const;
};

// Called now and then with (assets done, assets to do), for a progress display.
using Progress = std::function<void(std::size_t, std::size_t)>;

// Analyses every class and asset. Detail (the full analysis) is kept per policy.detail.
ReviewResult review_fleet(const FleetData& data, const Policy& policy, const Progress& progress = {});

}  // namespace tenure::review
