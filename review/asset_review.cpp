// One asset's defender analysis and verdict (see asset_review.h).
#include "review/asset_review.h"

#include <algorithm>
#include <cmath>
#include <optional>
#include <string_view>

#include "depreciation/schedule.h"

namespace tenure::review {

Date one_year_before(Date as_of) {
  const int day = as_of.month() == 2 && as_of.day() == 29 ? 28 : as_of.day();
  // In the first year dates have (1400), the window starts at the first date there is.
  return Date::from_ymd(as_of.year() - 1, as_of.month(), day).value_or(*Date::from_ymd(1400, 1, 1));
}

DefenderInputs defender_inputs(std::size_t asset, const FleetData& data, const ClassModel& model) {
  const AssetRecord& record = data.assets[asset];
  const auto index = static_cast<fleet::CostHistory::AssetIndex>(asset);
  DefenderInputs in;
  in.age_years = completed_years(record.in_service, data.as_of);
  // Market value now: its latest valuation within the last 12 months, else the class curve.
  const Date window_start = one_year_before(data.as_of);
  const Valuation* latest = nullptr;
  for (const Valuation& v : data.valuations[asset]) {
    if (v.valued_on >= window_start && v.valued_on <= data.as_of &&
        (!latest || v.valued_on >= latest->valued_on)) {
      latest = &v;
    }
  }
  if (latest) {
    in.market_value_now = latest->amount;
    in.market_value_source = "valuation of " + latest->valued_on.to_iso();
  } else {
    in.market_value_now = record.first_cost * model.value_curve.fraction_at(in.age_years);
    in.market_value_source = "class value curve";
  }
  in.credibility = model.cost_curve
                       ? fleet::credibility(data.costs.year_costs(index), *model.cost_curve)
                       : fleet::Credibility{0, 1, 0, 1, false};
  in.ownership = defender_ownership(model, record.first_cost, in.age_years, in.market_value_now,
                                    in.credibility.factor);
  return in;
}

replacement::Ownership defender_ownership(const ClassModel& model, Money first_cost, Years age,
                                          Money market_value_now, double credibility_factor) {
  replacement::Ownership own;
  own.first_cost = first_cost;
  own.age_years = age;
  own.value_now = market_value_now;
  // SPEC 13: a policy's section 179 amount is for the class's challenger price; an asset of
  // another first cost takes it in proportion (us_allowances.h rule 5), never above its basis.
  own.depreciation = depreciation::section_179_of(model.policy->depreciation)
                         ? model.depreciation->scaled(first_cost /
                                                      model.policy->challenger_first_cost)
                         : model.depreciation;
  if (model.cost_curve) {
    const Years remaining = std::max(1, model.policy->max_life_years - age);
    for (Years k = 1; k <= remaining; ++k) {
      own.operating_costs.push_back(model.cost_at(age + k, credibility_factor));
      own.market_values.push_back(first_cost * model.value_curve.fraction_at(age + k));
    }
  }
  return own;
}

AssetReview review_asset(std::size_t asset, const FleetData& data, const ClassModel& model,
                         const Policy& policy) {
  return judge(asset, defender_inputs(asset, data, model), model, policy);
}

namespace {

// The first figure of `r` that is not a finite number, by the name it is stored or shown under;
// none when all are.
std::optional<std::string_view> first_non_finite(const AssetReview& r) {
  const auto bad = [](double x) { return !std::isfinite(x); };
  const replacement::Ownership& own = r.inputs.ownership;
  if (std::any_of(own.operating_costs.begin(), own.operating_costs.end(), bad)) {
    return "expected operating cost";
  }
  if (std::any_of(own.market_values.begin(), own.market_values.end(), bad)) {
    return "expected market value";
  }
  if (bad(r.inputs.market_value_now)) return "market_value_now";
  if (bad(r.book_value_now)) return "book_value_now";
  if (r.defender_euac_before_tax && bad(*r.defender_euac_before_tax)) {
    return "defender_euac_before_tax";
  }
  if (r.defender_euac_after_tax && bad(*r.defender_euac_after_tax)) return "defender_euac_after_tax";
  if (r.marginal_cost_next_year && bad(*r.marginal_cost_next_year)) {
    return "marginal_cost_next_year";
  }
  if (r.defender) {
    for (const auto* analysis : {&r.defender->before_tax, r.defender->after_tax ? &*r.defender->after_tax : nullptr}) {
      if (!analysis) continue;
      const replacement::LifeCurve& c = analysis->curve;
      if (std::any_of(c.euac.begin(), c.euac.end(), bad)) return "defender EUAC curve";
      if (std::any_of(c.marginal_costs.begin(), c.marginal_costs.end(), bad)) {
        return "defender marginal costs";
      }
    }
  }
  if (r.decision) {
    const std::vector<Money>& t = r.decision->timing.present_worth;
    if (std::any_of(t.begin(), t.end(), bad)) return "timing present worth";
  }
  if (r.at_stake) {
    const AtStake& s = *r.at_stake;
    if (s.delay_cost && bad(*s.delay_cost)) return "delay_cost";
    if (bad(s.early_cost)) return "early_cost";
    if (bad(s.repair_limit)) return "repair_limit";
    if (s.break_even_price && bad(*s.break_even_price)) return "break_even_price";
    if (s.break_even_cost_factor && bad(*s.break_even_cost_factor)) {
      return "break_even_cost_factor";
    }
  }
  return std::nullopt;
}

// Keeps what the asset is (its inputs as read) and drops every figure of its analysis.
void drop_analysis(AssetReview& r) {
  r.defender.reset();
  r.decision.reset();
  r.at_stake.reset();
  r.defender_euac_before_tax.reset();
  r.defender_euac_after_tax.reset();
  r.marginal_cost_next_year.reset();
  r.class_esl_years.reset();
  r.challenger.clear();
}

}  // namespace

AssetReview judge(std::size_t asset, DefenderInputs inputs, const ClassModel& model,
                  const Policy& policy) {
  const tax::Rates& rates = policy.rates;
  AssetReview r{};
  r.asset = asset;
  r.inputs = std::move(inputs);
  r.basis = rates.after_tax() ? replacement::Basis::after_tax : replacement::Basis::before_tax;
  if (!model.challenger) {
    r.book_value_now =
        depreciation::Schedule(*r.inputs.ownership.depreciation, r.inputs.ownership.first_cost)
            .book_value(r.inputs.age_years);
    r.finding = cannot_weigh(model.note);
    return r;
  }
  r.defender = std::make_unique<replacement::AssetAnalysis>(
      replacement::analyse_asset(r.inputs.ownership, rates));
  r.book_value_now = r.defender->table.start.book_value;
  r.decision = replacement::decide(*r.defender, *model.challenger, rates,
                                   model.later ? &*model.later : nullptr);
  const replacement::Decision& d = *r.decision;
  r.defender_euac_before_tax = r.defender->before_tax.curve.best_euac;
  if (r.defender->after_tax) r.defender_euac_after_tax = r.defender->after_tax->curve.best_euac;
  const replacement::BasisAnalysis& on_basis = r.defender->on(r.basis);
  r.marginal_cost_next_year = on_basis.curve.marginal_costs[0];
  r.class_esl_years = d.challenger_esl;
  r.challenger = model.chosen_name;
  r.finding = weigh(figures_of(d, *r.marginal_cost_next_year, on_basis.costs.max_years()),
                    r.inputs.age_years, policy.lead_time_years);
  r.at_stake = at_stake(d, *r.defender, r.inputs.ownership, model.price_lines,
                        model.challenger_price, rates, policy.review_margin);
  if (const auto figure = first_non_finite(r)) {  // rule (0): never stored
    drop_analysis(r);
    if (!std::isfinite(r.book_value_now)) r.book_value_now = 0;
    r.finding = overflowed(*figure);
  }
  return r;
}

}  // namespace tenure::review
