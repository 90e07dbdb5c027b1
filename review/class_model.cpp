// Class cost and value curves, the class challenger and how firm its life is (see class_model.h).
#include "review/class_model.h"

#include <algorithm>
#include <cmath>

#include <fmt/format.h>

#include "fleet/curve_refit.h"
#include "replacement/life_curve.h"

namespace tenure::review {
namespace {

replacement::Basis decision_basis(const tax::Rates& rates) {
  return rates.after_tax() ? replacement::Basis::after_tax : replacement::Basis::before_tax;
}

// The challenger's economic life on the decision's basis, computing that basis only.
Years economic_life(const replacement::Ownership& challenger, const tax::Rates& rates) {
  const replacement::KeepingCosts costs =
      rates.after_tax() ? replacement::after_tax_keeping_costs(challenger, rates)
                        : replacement::before_tax_keeping_costs(challenger, rates.marr);
  return replacement::life_curve(costs).best_years;
}

// The bootstrap of esl_bootstrap.h on the members' cost years, drawn against the class curve.
std::optional<EslSpread> spread_of(const ClassModel& model, const FleetData& data,
                                   const std::vector<std::size_t>& members,
                                   const tax::Rates& rates) {
  std::vector<AssetSums> assets;
  assets.reserve(members.size());
  for (std::size_t index : members) {
    const auto asset = static_cast<fleet::CostHistory::AssetIndex>(index);
    assets.push_back({data.assets[index].asset_id,
                      fleet::curve_sums(*model.cost_curve, data.costs.year_costs(asset))});
  }
  return bootstrap_esl(
      model.asset_class, *model.cost_curve, std::move(assets),
      [&](const fleet::CostCurve& refitted) {
        return economic_life(
            challenger_ownership(*model.policy, refitted, model.value_curve, model.depreciation),
            rates);
      });
}

bool all_finite(const replacement::AssetAnalysis& a) {
  const auto finite = [](const std::vector<Money>& xs) {
    return std::all_of(xs.begin(), xs.end(), [](double x) { return std::isfinite(x); });
  };
  for (const auto* on : {&a.before_tax, a.after_tax ? &*a.after_tax : nullptr}) {
    if (on && !(finite(on->curve.euac) && finite(on->curve.marginal_costs))) return false;
  }
  return true;
}

}  // namespace

Money ClassModel::cost_at(Years age_year, double factor) const {
  if (!cost_curve) return 0;
  return std::max(0.0, cost_curve->predict(age_year) * factor);
}

replacement::Ownership challenger_ownership(
    const ClassPolicy& policy, const fleet::CostCurve& cost_curve,
    const fleet::ValueCurve& value_curve,
    std::shared_ptr<const depreciation::Method> depreciation) {
  replacement::Ownership challenger;
  challenger.first_cost = policy.challenger_first_cost;
  challenger.age_years = 0;
  challenger.value_now = policy.challenger_first_cost;
  for (Years k = 1; k <= policy.max_life_years; ++k) {
    challenger.operating_costs.push_back(std::max(0.0, cost_curve.predict(k)));
    challenger.market_values.push_back(policy.challenger_first_cost * value_curve.fraction_at(k));
  }
  challenger.depreciation = std::move(depreciation);
  return challenger;
}

ClassModel make_class_model(const std::string& asset_class, const ClassPolicy& policy,
                            std::size_t assets, std::optional<fleet::CostCurve> cost_curve,
                            fleet::ValueCurve value_curve, const tax::Rates& rates,
                            double band_width) {
  ClassModel model{asset_class,
                   &policy,
                   assets,
                   depreciation::make_method(policy.depreciation),
                   std::move(cost_curve),
                   std::move(value_curve),
                   std::nullopt,
                   std::nullopt,
                   {},
                   std::nullopt,
                   std::nullopt,
                   {}};
  if (!model.cost_curve) {
    model.note = fmt::format("no complete year of cost history for class '{}', so its costs "
                             "cannot be estimated until it has one",
                             asset_class);
    return model;
  }
  replacement::Ownership challenger =
      challenger_ownership(policy, *model.cost_curve, model.value_curve, model.depreciation);
  bool clamped = false;
  for (Years k = 1; k <= policy.max_life_years; ++k) {
    clamped = clamped || model.cost_curve->predict(k) < 0;
  }
  if (clamped) {
    model.note = "the fitted cost curve falls below zero within the class's maximum life; "
                 "those years are read as zero cost";
  }
  const replacement::Basis basis = decision_basis(rates);
  model.challenger = replacement::analyse_asset(challenger, rates);
  if (!all_finite(*model.challenger)) {
    // Its assets then cannot be weighed (verdict_rule.h rule (0)); no figure is stored.
    model.challenger.reset();
    model.note = fmt::format("the challenger's figures for class '{}' overflow (they are not "
                             "finite numbers): its cost curve grows too fast over "
                             "max_life_years {}",
                             asset_class, policy.max_life_years);
    return model;
  }
  model.price_lines = replacement::price_lines(challenger, *model.challenger, rates, basis);
  model.band = esl_band(model.challenger->on(basis).curve.euac, band_width);
  model.challenger_input = std::move(challenger);
  return model;
}

ClassModel build_class_model(const std::string& asset_class, const ClassPolicy& policy,
                             const FleetData& data, const std::vector<std::size_t>& members,
                             const tax::Rates& rates, double band_width) {
  fleet::CostPool cost_pool;
  fleet::ValuationPool value_pool;
  for (std::size_t index : members) {
    const auto asset = static_cast<fleet::CostHistory::AssetIndex>(index);
    cost_pool.add_asset(data.costs.year_costs(asset));
    const AssetRecord& record = data.assets[index];
    for (const Valuation& v : data.valuations[index]) {
      value_pool.add(record.in_service, record.first_cost, v.valued_on, v.amount);
    }
  }
  ClassModel model = make_class_model(
      asset_class, policy, members.size(), fit_cost_curve(cost_pool, policy.cost_model),
      fleet::fit_value_curve(value_pool, policy.annual_decline), rates, band_width);
  if (!model.cost_curve && cost_pool.asset_years() > 0) {
    // Years there are, but a geometric curve has no logarithm of a cost of zero or less.
    model.note = fmt::format("none of the {} complete asset-years of class '{}' has a cost above "
                             "zero, which its cost_model geometric needs (or use linear or auto)",
                             cost_pool.asset_years(), asset_class);
  }
  if (model.challenger) model.spread = spread_of(model, data, members, rates);
  return model;
}

}  // namespace tenure::review
