// The nightly review of a whole fleet (see fleet_review.h).
#include "review/fleet_review.h"

#include <algorithm>
#include <map>

#include "core/errors.h"

namespace tenure::review {

const ClassModel& ReviewResult::class_named(std::string_view name) const {
  const auto it = std::lower_bound(classes.begin(), classes.end(), name,
                                   [](const ClassModel& m, std::string_view n) {
                                     return m.asset_class < n;
                                   });
  if (it == classes.end() || it->asset_class != name) {
    throw RuntimeFailure("review result has no class '" + std::string(name) + "'");
  }
  return *it;
}

ReviewResult review_fleet(const FleetData& data, const Policy& policy, const Progress& progress) {
  std::map<std::string, std::vector<std::size_t>, std::less<>> members;
  for (const auto& [name, class_policy] : policy.classes) members[name];
  for (std::size_t i = 0; i < data.assets.size(); ++i) {
    members[data.assets[i].asset_class].push_back(i);
  }
  ReviewResult result;
  for (const auto& [name, indices] : members) {
    const auto policy_it = policy.classes.find(name);
    if (policy_it == policy.classes.end()) {
      throw RuntimeFailure("asset class '" + name + "' has no policy (the reader should reject it)");
    }
    result.classes.push_back(build_class_model(name, policy_it->second, data, indices, policy.rates));
  }
  const std::size_t total = data.assets.size();
  for (std::size_t i = 0; i < total; ++i) {
    if (progress && i % 4096 == 0) progress(i, total);
    const AssetRecord& record = data.assets[i];
    if (record.retired_on && *record.retired_on <= data.as_of) {
      ++result.retired;
      continue;
    }
    if (record.in_service > data.as_of) {
      ++result.not_yet_in_service;
      continue;
    }
    AssetReview review = review_asset(i, data, result.class_named(record.asset_class), policy);
    const bool keep_detail = policy.detail == Detail::all ||
                             (policy.detail == Detail::due && review.due());
    if (!keep_detail) review.defender.reset();
    result.assets.push_back(std::move(review));
  }
  if (progress) progress(total, total);
  return result;
}

}  // namespace tenure::review
