// The nightly review of a whole fleet (see fleet_review.h).
#include "review/fleet_review.h"

#include <algorithm>
#include <atomic>
#include <exception>
#include <map>
#include <mutex>
#include <thread>

#include "core/errors.h"

namespace tenure::review {

constexpr std::size_t kChunk = 256;  // assets taken at a time by each thread

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

namespace {

// Drops what the results do not keep for an asset out of detail: its year-by-year series. (Each
// is replaced by a new empty object: `v = {}` would keep the old capacity.)
void compact(AssetReview& review) {
  review.defender.reset();
  review.inputs.ownership.operating_costs = std::vector<Money>();
  review.inputs.ownership.market_values = std::vector<Money>();
  if (review.decision) {
    review.decision->timing.present_worth = std::vector<Money>();
    review.decision->reason = std::string();  // the review writes its own reason
  }
}

}  // namespace

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
  // Assets in service at the as-of date get a verdict; retired ones fed the curves only.
  std::vector<std::size_t> in_service;
  for (std::size_t i = 0; i < data.assets.size(); ++i) {
    const AssetRecord& record = data.assets[i];
    if (record.retired_on && *record.retired_on <= data.as_of) {
      ++result.retired;
    } else if (record.in_service > data.as_of) {
      ++result.not_yet_in_service;
    } else {
      in_service.push_back(i);
    }
  }
  // Each asset's analysis is independent of the others': share them out among the cores. The
  // progress callback is only called from this thread.
  result.assets.resize(in_service.size());
  const std::size_t total = in_service.size();
  std::atomic<std::size_t> next{0}, done{0};
  std::exception_ptr failure;
  std::mutex failure_mutex;
  const auto work = [&](bool reports_progress) {
    try {
      for (std::size_t k; (k = next.fetch_add(kChunk)) < total;) {
        for (std::size_t j = k; j < std::min(total, k + kChunk); ++j) {
          const std::size_t i = in_service[j];
          AssetReview review =
              review_asset(i, data, result.class_named(data.assets[i].asset_class), policy);
          const bool keep_detail = policy.detail == Detail::all ||
                                   (policy.detail == Detail::due && review.due());
          if (!keep_detail) compact(review);
          result.assets[j] = std::move(review);
        }
        const std::size_t so_far = done.fetch_add(std::min(kChunk, total - k));
        if (reports_progress && progress) progress(so_far, total);
      }
    } catch (...) {
      std::lock_guard lock(failure_mutex);
      if (!failure) failure = std::current_exception();
      next.store(total);
    }
  };
  const unsigned helpers = std::min(3u, std::max(1u, std::thread::hardware_concurrency()) - 1);
  std::vector<std::thread> threads;
  for (unsigned t = 0; t < helpers && total > kChunk; ++t) threads.emplace_back(work, false);
  work(true);
  for (auto& thread : threads) thread.join();
  if (failure) std::rethrow_exception(failure);
  if (progress) progress(done.load(), total);
  return result;
}

}  // namespace tenure::review
