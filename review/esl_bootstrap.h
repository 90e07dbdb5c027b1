// How firmly a class's cost history fixes its economic life (SPEC 11 "Per class"): the economic
// life's 10th and 90th percentiles over 200 bootstrap refits of the class cost curve. Each refit
// draws as many assets as contributed cost years, with replacement, and refits the curve with
// the model the class fitted (fleet/curve_refit.h: from per-asset sums, so no cost year is read
// again); `life_on` gives the economic life of the challenger rebuilt on that curve
// (build_class_model in class_model.h passes the class's own challenger, on the verdict's basis).
//
//   std::vector<AssetSums> assets = ...;   // one per asset of the class
//   std::optional<EslSpread> s = bootstrap_esl("van-delivery", curve, assets, life_on);
//   s->p10; s->p90;   // e.g. 8 and 11 years around an economic life of 9
//
// Rules (cited by the code):
//   (1) The assets drawn from are those with at least one point of the curve's model (complete
//       cost years; for a geometric curve, a positive one), in asset_id order, so the draws do
//       not depend on the order the fleet was read in.
//   (2) The draws: StableRandom (core/stable_random.h) seeded with fnv1a_64 of the class name's
//       bytes; refit r = 1..200 draws its N indices with below(N), one after another, N the
//       number of assets of rule (1). A run is reproducible on any machine.
//   (3) Percentiles by nearest rank over the 200 lives, sorted: the p-th is the
//       ceil(p/100 x 200)-th smallest, so p10 is the 20th smallest and p90 the 180th. (Every
//       asset of rule (1) holds a point, so every draw refits.)
//   (4) No spread (nullopt) without an asset of rule (1) (the class then has no cost curve
//       either). A class of one such asset draws it every time, so each refit is the class
//       curve and p10 = p90 = its economic life; so does a class whose assets all lie on its
//       curve.
#pragma once

#include <cstdint>
#include <functional>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "core/types.h"
#include "fleet/cost_curve.h"
#include "fleet/curve_refit.h"

namespace tenure::review {

inline constexpr int kBootstrapRefits = 200;

// One asset as the bootstrap draws it.
struct AssetSums {
  std::string asset_id;
  fleet::CurveSums sums;  // fleet::curve_sums against the class curve
};

struct EslSpread {
  Years p10;
  Years p90;
  std::vector<Years> lives;  // the 200 refits' economic lives, in draw order
};

// Rule (2): the seed of a class's draws.
std::uint64_t bootstrap_seed(std::string_view asset_class);

// Rules (1) to (4); `curve` is the class's fitted cost curve, `assets` may come in any order.
std::optional<EslSpread> bootstrap_esl(
    std::string_view asset_class, const fleet::CostCurve& curve, std::vector<AssetSums> assets,
    const std::function<Years(const fleet::CostCurve&)>& life_on);

}  // namespace tenure::review
