// The economic life's bootstrap percentiles (see esl_bootstrap.h). A refit counts how often each
// asset is drawn, then adds each drawn asset's sums times that count: one pass over the class's
// assets per refit, whatever their years.
#include "review/esl_bootstrap.h"

#include <algorithm>

#include "core/stable_random.h"

namespace tenure::review {
namespace {

// Rule (3): the ceil(p/100 x M)-th smallest of the sorted lives.
Years nearest_rank(const std::vector<Years>& sorted, std::size_t percent) {
  const std::size_t rank = (percent * sorted.size() + 99) / 100;
  return sorted[std::max<std::size_t>(rank, 1) - 1];
}

}  // namespace

std::uint64_t bootstrap_seed(std::string_view asset_class) { return fnv1a_64(asset_class); }

std::optional<EslSpread> bootstrap_esl(
    std::string_view asset_class, const fleet::CostCurve& curve, std::vector<AssetSums> assets,
    const std::function<Years(const fleet::CostCurve&)>& life_on) {
  // Rule (1).
  std::erase_if(assets, [](const AssetSums& a) { return !(a.sums.n > 0); });
  if (assets.empty()) return std::nullopt;  // rule (4)
  std::sort(assets.begin(), assets.end(),
            [](const AssetSums& a, const AssetSums& b) { return a.asset_id < b.asset_id; });
  std::vector<fleet::CurveSums> sums;
  sums.reserve(assets.size());
  for (const AssetSums& a : assets) sums.push_back(a.sums);

  // Rule (2).
  StableRandom random(bootstrap_seed(asset_class));
  const std::size_t count = sums.size();
  std::vector<std::uint32_t> times(count);
  EslSpread out{0, 0, {}};
  out.lives.reserve(kBootstrapRefits);
  for (int r = 0; r < kBootstrapRefits; ++r) {
    std::fill(times.begin(), times.end(), 0);
    for (std::size_t j = 0; j < count; ++j) ++times[random.below(count)];
    fleet::CurveSums drawn;
    // Every asset, drawn or not (times 0 adds nothing): no branch to mispredict.
    for (std::size_t i = 0; i < count; ++i) drawn.add(sums[i], times[i]);
    // Every asset of rule (1) has a point, so the draw always refits.
    out.lives.push_back(life_on(fleet::refit(curve, drawn).value()));
  }
  std::vector<Years> sorted = out.lives;
  std::sort(sorted.begin(), sorted.end());
  out.p10 = nearest_rank(sorted, 10);
  out.p90 = nearest_rank(sorted, 90);
  return out;
}

}  // namespace tenure::review
