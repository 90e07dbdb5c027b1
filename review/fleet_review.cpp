// The nightly review of a whole fleet (see fleet_review.h).
#include "review/fleet_review.h"

#include <algorithm>
#include <atomic>
#include <exception>
#include <map>
#include <mutex>
#include <optional>
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
  if (review.decision) review.decision->timing.present_worth = std::vector<Money>();
}

// Every class model, by class name. The classes are independent and each one's bootstrap
// (esl_bootstrap.h) is most of the work, so they are built on up to as many threads as there
// are cores (four at most), each taking the next class in turn; the first failure is rethrown.
std::vector<ClassModel> build_classes(
    const FleetData& data, const Policy& policy,
    const std::map<std::string, std::vector<std::size_t>, std::less<>>& members) {
  std::vector<const std::pair<const std::string, std::vector<std::size_t>>*> order;
  for (const auto& entry : members) {
    if (!policy.classes.contains(entry.first)) {
      throw RuntimeFailure("asset class '" + entry.first +
                           "' has no policy (the reader should reject it)");
    }
    order.push_back(&entry);
  }
  std::vector<std::optional<ClassModel>> built(order.size());
  std::atomic<std::size_t> next{0};
  std::exception_ptr failure;
  std::mutex failure_mutex;
  const auto build_next = [&] {
    for (std::size_t c = next.fetch_add(1); c < order.size(); c = next.fetch_add(1)) {
      try {
        const auto& [name, indices] = *order[c];
        built[c] = build_class_model(name, policy.classes.find(name)->second, data, indices,
                                     policy.rates, policy.esl_band);
      } catch (...) {
        std::lock_guard lock(failure_mutex);
        if (!failure) failure = std::current_exception();
      }
    }
  };
  const std::size_t threads =
      std::min<std::size_t>({order.size(), 4, std::max(1u, std::thread::hardware_concurrency())});
  std::vector<std::thread> helpers;
  for (std::size_t t = 1; t < threads; ++t) helpers.emplace_back(build_next);
  build_next();
  for (auto& helper : helpers) helper.join();
  if (failure) std::rethrow_exception(failure);
  std::vector<ClassModel> out;
  out.reserve(built.size());
  for (auto& model : built) out.push_back(std::move(*model));
  return out;
}

}  // namespace

ReviewResult plan_review(const FleetData& data, const Policy& policy) {
  std::map<std::string, std::vector<std::size_t>, std::less<>> members;
  for (const auto& [name, class_policy] : policy.classes) members[name];
  for (std::size_t i = 0; i < data.assets.size(); ++i) {
    members[data.assets[i].asset_class].push_back(i);
  }
  ReviewResult result;
  result.classes = build_classes(data, policy, members);
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
  // By asset_id: the order the results table's key grows in, so its index is appended to.
  std::sort(in_service.begin(), in_service.end(), [&data](std::size_t a, std::size_t b) {
    return data.assets[a].asset_id < data.assets[b].asset_id;
  });
  result.assets.resize(in_service.size());
  for (std::size_t j = 0; j < in_service.size(); ++j) result.assets[j].asset = in_service[j];
  return result;
}

void analyse_assets(const FleetData& data, const Policy& policy, ReviewResult& planned,
                    const Progress& progress, const AssetsReady& ready) {
  // Each asset's analysis is independent of the others': chunks of them are shared out among
  // the cores. This thread hands finished chunks to `ready` in order and, when the next one is
  // not finished yet, analyses a chunk itself.
  const std::size_t total = planned.assets.size();
  const std::size_t chunks = (total + kChunk - 1) / kChunk;
  std::vector<std::atomic<bool>> finished(chunks);
  std::atomic<std::size_t> next{0};
  std::atomic<bool> stop{false};
  std::exception_ptr failure;
  std::mutex failure_mutex;
  const auto fail = [&](std::exception_ptr e) {
    std::lock_guard lock(failure_mutex);
    if (!failure) failure = e;
    stop = true;
  };
  // Analyses one chunk; true when it was taken and finished (false: none left, or stopped).
  const auto analyse_next = [&] {
    const std::size_t c = next.fetch_add(1);
    if (c >= chunks) return false;
    try {
      for (std::size_t j = c * kChunk; j < std::min(total, (c + 1) * kChunk) && !stop; ++j) {
        const std::size_t i = planned.assets[j].asset;
        AssetReview review =
            review_asset(i, data, planned.class_named(data.assets[i].asset_class), policy);
        const bool keep_detail = policy.detail == Detail::all ||
                                 (policy.detail == Detail::due && review.due());
        if (!keep_detail) compact(review);
        planned.assets[j] = std::move(review);
      }
    } catch (...) {
      fail(std::current_exception());
    }
    // Every chunk taken is marked, also after a failure or a stop, so a thread waiting for it
    // wakes up and sees `stop`.
    finished[c].store(true, std::memory_order_release);
    finished[c].notify_all();
    return !stop;
  };
  const unsigned helpers = std::min(3u, std::max(1u, std::thread::hardware_concurrency()) - 1);
  std::vector<std::thread> threads;
  for (unsigned t = 0; t < helpers && total > kChunk; ++t) {
    threads.emplace_back([&] {
      while (analyse_next()) {
      }
    });
  }
  try {
    for (std::size_t delivered = 0; delivered < chunks && !stop;) {
      if (finished[delivered].load(std::memory_order_acquire)) {
        if (stop) break;
        const std::size_t first = delivered * kChunk;
        const std::size_t count = std::min(kChunk, total - first);
        if (ready) ready(std::span<const AssetReview>(planned.assets).subspan(first, count));
        ++delivered;
        if (progress) progress(first + count, total);
      } else if (!analyse_next()) {
        finished[delivered].wait(false, std::memory_order_acquire);
      }
    }
  } catch (...) {
    fail(std::current_exception());
  }
  for (auto& thread : threads) thread.join();
  if (failure) std::rethrow_exception(failure);
}

ReviewResult review_fleet(const FleetData& data, const Policy& policy, const Progress& progress) {
  ReviewResult result = plan_review(data, policy);
  analyse_assets(data, policy, result, progress);
  return result;
}

}  // namespace tenure::review
