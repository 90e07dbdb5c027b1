// Class cost and value curves and the class challenger (see class_model.h).
#include "review/class_model.h"

#include <algorithm>

#include <fmt/format.h>

namespace tenure::review {

Money ClassModel::cost_at(Years age_year, double factor) const {
  if (!cost_curve) return 0;
  return std::max(0.0, cost_curve->predict(age_year) * factor);
}

ClassModel make_class_model(const std::string& asset_class, const ClassPolicy& policy,
                            std::size_t assets, std::optional<fleet::CostCurve> cost_curve,
                            fleet::ValueCurve value_curve, const tax::Rates& rates) {
  ClassModel model{asset_class,
                   &policy,
                   assets,
                   depreciation::make_method(policy.depreciation),
                   std::move(cost_curve),
                   std::move(value_curve),
                   std::nullopt,
                   std::nullopt,
                   {},
                   {}};
  if (!model.cost_curve) {
    model.note = fmt::format("no complete year of cost history for class '{}', so its costs "
                             "cannot be estimated",
                             asset_class);
    return model;
  }
  replacement::Ownership challenger;
  challenger.first_cost = policy.challenger_first_cost;
  challenger.age_years = 0;
  challenger.value_now = policy.challenger_first_cost;
  bool clamped = false;
  for (Years k = 1; k <= policy.max_life_years; ++k) {
    clamped = clamped || model.cost_curve->predict(k) < 0;
    challenger.operating_costs.push_back(model.cost_at(k));
    challenger.market_values.push_back(policy.challenger_first_cost *
                                       model.value_curve.fraction_at(k));
  }
  challenger.depreciation = model.depreciation;
  if (clamped) {
    model.note = "the fitted cost curve falls below zero within the class's maximum life; "
                 "those years are read as zero cost";
  }
  model.challenger = replacement::analyse_asset(challenger, rates);
  model.price_lines = replacement::price_lines(
      challenger, *model.challenger, rates,
      rates.after_tax() ? replacement::Basis::after_tax : replacement::Basis::before_tax);
  model.challenger_input = std::move(challenger);
  return model;
}

ClassModel build_class_model(const std::string& asset_class, const ClassPolicy& policy,
                             const FleetData& data, const std::vector<std::size_t>& members,
                             const tax::Rates& rates) {
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
  return make_class_model(asset_class, policy, members.size(),
                          fit_cost_curve(cost_pool, policy.cost_model),
                          fleet::fit_value_curve(value_pool, policy.annual_decline), rates);
}

}  // namespace tenure::review
