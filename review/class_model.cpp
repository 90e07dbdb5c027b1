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

// The bootstrap of esl_bootstrap.h on the members' cost years, drawn against the class curve;
// each refit's life is the chosen challenger's.
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
  const ClassChallenger chosen =
      class_challengers(*model.policy, model.value_curve, model.depreciation)[model.chosen];
  return bootstrap_esl(model.asset_class, *model.cost_curve, std::move(assets),
                       [&](const fleet::CostCurve& refitted) {
                         return economic_life(
                             challenger_ownership(chosen, refitted, model.policy->max_life_years),
                             rates);
                       });
}

ChallengerFigures figures_of(const std::string& name, const replacement::AssetAnalysis& a) {
  ChallengerFigures f{name, a.before_tax.curve.best_years, a.before_tax.curve.best_euac,
                      std::nullopt, std::nullopt};
  if (a.after_tax) {
    f.esl_after_tax = a.after_tax->curve.best_years;
    f.euac_after_tax = a.after_tax->curve.best_euac;
  }
  return f;
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

std::vector<ClassChallenger> class_challengers(
    const ClassPolicy& policy, const fleet::ValueCurve& value_curve,
    const std::shared_ptr<const depreciation::Method>& depreciation) {
  if (policy.challengers.empty()) {
    return {{"", policy.challenger_first_cost, 1.0, value_curve, depreciation}};
  }
  std::vector<ClassChallenger> out;
  for (const ChallengerPolicy& c : policy.challengers) {
    out.push_back({c.name, c.first_cost, c.cost_factor,
                   c.annual_decline ? fleet::policy_value_curve(*c.annual_decline) : value_curve,
                   c.depreciation ? depreciation::make_method(*c.depreciation) : depreciation});
  }
  return out;
}

replacement::Ownership challenger_ownership(const ClassChallenger& c,
                                            const fleet::CostCurve& cost_curve,
                                            Years max_life_years) {
  replacement::Ownership challenger;
  challenger.first_cost = c.first_cost;
  challenger.age_years = 0;
  challenger.value_now = c.first_cost;
  for (Years k = 1; k <= max_life_years; ++k) {
    challenger.operating_costs.push_back(std::max(0.0, cost_curve.predict(k) * c.cost_factor));
    challenger.market_values.push_back(c.first_cost * c.value_curve.fraction_at(k));
  }
  challenger.depreciation = c.depreciation;
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
                   std::nullopt};
  model.challenger_price = policy.challenger_first_cost;
  if (!model.cost_curve) {
    model.note = fmt::format("no complete year of cost history for class '{}', so its costs "
                             "cannot be estimated until it has one",
                             asset_class);
    return model;
  }
  bool clamped = false;
  for (Years k = 1; k <= policy.max_life_years; ++k) {
    clamped = clamped || model.cost_curve->predict(k) < 0;
  }
  if (clamped) {
    model.note = "the fitted cost curve falls below zero within the class's maximum life; "
                 "those years are read as zero cost";
  }
  const replacement::Basis basis = decision_basis(rates);
  // Each challenger's ESL and least EUAC once for the class (SPEC 14); the best on the basis.
  const std::vector<ClassChallenger> listed =
      class_challengers(policy, model.value_curve, model.depreciation);
  std::vector<replacement::Ownership> inputs;
  std::vector<replacement::AssetAnalysis> analysed;
  for (const ClassChallenger& c : listed) {
    inputs.push_back(challenger_ownership(c, *model.cost_curve, policy.max_life_years));
    analysed.push_back(replacement::analyse_asset(inputs.back(), rates));
    if (!all_finite(analysed.back())) {
      // Its assets then cannot be weighed (verdict_rule.h rule (0)); no figure is stored.
      model.note = fmt::format("the challenger's figures for class '{}' overflow (they are not "
                               "finite numbers): its cost curve grows too fast over "
                               "max_life_years {}",
                               asset_class, policy.max_life_years);
      return model;
    }
  }
  model.chosen = replacement::best_challenger(analysed, basis);
  for (std::size_t i = 0; i < listed.size(); ++i) {
    model.challengers_weighed.push_back(figures_of(listed[i].name, analysed[i]));
  }
  model.chosen_name = listed[model.chosen].name;
  model.challenger_price = listed[model.chosen].first_cost;
  replacement::Ownership& chosen = inputs[model.chosen];
  model.challenger = std::move(analysed[model.chosen]);
  if (policy.improvement > 0) {
    model.later = replacement::improved_least_euacs(chosen, rates, basis, policy.improvement,
                                                    policy.max_life_years);
  }
  model.price_lines = replacement::price_lines(chosen, *model.challenger, rates, basis);
  model.band = esl_band(model.challenger->on(basis).curve.euac, band_width);
  model.challenger_input = std::move(chosen);
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
