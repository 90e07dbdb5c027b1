// The class cost curve (SPEC 6 "Fleet data"): what a unit of the class costs to run in age-year
// k, fitted by least squares on the pooled complete asset-years of the class's assets.
//
//   CostPool pool;
//   for (auto asset : assets_of_class) pool.add_asset(history.year_costs(asset));
//   std::optional<CostCurve> curve = fit_cost_curve(pool, CostModelChoice::automatic);
//   if (curve) curve->predict(6);   // expected restated cost of age-year 6
//
// Rules:
//   (1) Points are (k, y): y is one asset's restated cost of its complete age-year k.
//   (2) linear: y = a + g (k - 1), least squares on y. geometric: y = a (1 + g)^(k - 1), least
//       squares on ln y; points with y <= 0 have no logarithm and are left out of that fit (and
//       counted in excluded_non_positive).
//   (3) r2 = 1 - SSE / SST on the original cost scale over ALL points of the pool, with
//       SSE = sum (y - predict(k))^2 and SST = sum (y - mean y)^2, for both models: so the two
//       are compared on the same points and the same scale. A geometric r2 can be negative.
//       When SST is zero (all costs equal, to 1e-12 relative) r2 is 0.
//   (4) automatic picks geometric only when its r2 exceeds linear's by more than kTieTolerance;
//       ties, and pools where no geometric fit exists, go to linear.
//   (5) When the points of a fit have a single distinct age the slope is undetermined: the curve
//       is flat (g = 0, single_age = true, r2 = 0) at the arithmetic mean (linear) or the
//       geometric mean of the positive costs (geometric, what its log fit gives).
//   (6) No curve (nullopt) when the pool is empty, or when geometric is asked for and no point is
//       positive.
//   (7) predict() extrapolates the formula as is; it clamps nothing (a falling linear curve can
//       predict a negative cost at high ages).
#pragma once

#include <cstddef>
#include <optional>
#include <span>
#include <string_view>
#include <vector>

#include "core/types.h"

namespace tenure::fleet {

enum class CostModel { linear, geometric };
// The policy's "cost_model": "linear" | "geometric" | "auto" (automatic).
enum class CostModelChoice { linear, geometric, automatic };

std::string_view name(CostModel model);  // "linear" | "geometric"
// nullopt for any other text (the policy reader reports it).
std::optional<CostModelChoice> cost_model_choice_from_name(std::string_view text);

// Pooled asset-years of one class, kept as running statistics per age-year (memory O(ages)).
class CostPool {
 public:
  // Statistics of the points at one age-year.
  struct AgeGroup {
    std::size_t count = 0;           // points
    double mean = 0;                 // mean cost
    double sum_sq_dev = 0;           // sum of (cost - mean)^2
    std::size_t positive_count = 0;  // points with cost > 0
    double mean_log = 0;             // mean ln(cost) over those
  };

  // One asset's complete years: year_costs[k-1] is its cost of age-year k.
  void add_asset(std::span<const Money> year_costs);
  // One asset-year. Throws InputError naming "age_year" (< 1) or "cost" (not finite).
  void add(int age_year, Money cost);

  std::size_t asset_years() const { return asset_years_; }
  std::size_t assets() const { return assets_; }  // add_asset calls with at least one year
  std::span<const AgeGroup> groups() const { return groups_; }  // [k-1] = age-year k

 private:
  std::vector<AgeGroup> groups_;
  std::size_t asset_years_ = 0;
  std::size_t assets_ = 0;
};

struct CostCurve {
  CostModel model;
  Money a;       // cost of age-year 1
  double g;      // linear: increase per year in money; geometric: growth rate per year
  double r2;     // rule (3)
  std::size_t asset_years;            // points that entered the fit
  std::size_t excluded_non_positive;  // points left out of a geometric fit; 0 for linear
  std::size_t assets;                 // assets in the pool
  bool single_age;                    // rule (5): flat because all points share one age

  // Rule (2) at age-year k >= 1; throws InputError naming "age_year" otherwise.
  Money predict(int age_year) const;
};

// Rules (2) to (6).
std::optional<CostCurve> fit_cost_curve(const CostPool& pool, CostModelChoice choice);

}  // namespace tenure::fleet
