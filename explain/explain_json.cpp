// One asset's computation as JSON (see explain_json.h).
#include "explain/explain_json.h"

#include <cmath>

#include "formats/analysis_json.h"
#include "formats/at_stake_output.h"
#include "formats/caution.h"
#include "formats/depreciation_json.h"
#include "formats/tax_rules_text.h"
#include "interest/factors.h"

namespace tenure::explain {
namespace {

using nlohmann::json;

template <class T>
json optional_value(const std::optional<T>& value) {
  return value ? json(*value) : json(nullptr);
}

json inputs(const Explanation& e) {
  const results::AssetRow& a = e.stored;
  json out = {{"asset_id", a.asset_id},
              {"asset_class", a.asset_class},
              {"in_service_on", e.input ? json(e.input->in_service_on) : json(nullptr)},
              {"age_years", a.age_years},
              {"first_cost", a.first_cost},
              {"depreciation", formats::depreciation_to_json(e.model.policy->depreciation)},
              {"book_value_now", a.book_value_now},
              {"market_value_now", a.market_value_now},
              {"market_value_source", a.market_value_source},
              {"credibility_factor", a.credibility_factor},
              {"years_weighed", std::max(1, e.model.policy->max_life_years - a.age_years)}};
  return out;
}

json rates(const Explanation& e) {
  const review::Policy& p = *e.policy;
  return {{"marr", p.rates.marr},
          {"income_tax_rate", p.rates.income_tax_rate},
          {"after_tax_marr", p.rates.after_tax_marr},
          {"capital_gains_tax_rate", p.rates.capital_gains_tax_rate},
          {"cost_escalation", p.cost_escalation},
          {"lead_time_years", p.lead_time_years},
          {"review_margin", p.review_margin},
          {"esl_band", p.esl_band},
          {"money", p.real_money() ? "real" : "nominal"},
          {"basis", replacement::to_string(e.review.basis)},
          {"basis_rate", e.basis_rate()},
          {"currency", "money units as recorded in the database"}};
}

json class_json(const Explanation& e) {
  const results::ClassRow& c = e.stored_class;
  const review::ClassPolicy& p = *e.model.policy;
  json cost = nullptr;
  if (const auto& k = e.model.cost_curve) {
    cost = {{"model", fleet::name(k->model)}, {"a", k->a},           {"g", k->g},
            {"r2", k->r2},                    {"asset_years", c.asset_years}};
  }
  const fleet::ValueCurve& v = e.model.value_curve;
  json challenger = {{"first_cost", e.model.challenger_price},
                     {"max_life_years", p.max_life_years},
                     {"depreciation", formats::depreciation_to_json(e.model.challenger_depreciation())},
                     {"esl_years_before_tax", optional_value(c.esl_years_before_tax)},
                     {"euac_before_tax", optional_value(c.euac_before_tax)},
                     {"esl_years_after_tax", optional_value(c.esl_years_after_tax)},
                     {"euac_after_tax", optional_value(c.euac_after_tax)}};
  if (!e.model.chosen_name.empty()) challenger["name"] = e.model.chosen_name;
  // The band recomputed from the rebuilt challenger; the percentiles only as stored (their
  // refits need every asset's cost years).
  json band = nullptr;
  if (const auto& b = e.model.band) band = {{"low", b->low}, {"high", b->high}};
  return {{"asset_class", c.asset_class},
          {"assets", c.assets},
          {"esl_band_low", optional_value(c.esl_band_low)},
          {"esl_band_high", optional_value(c.esl_band_high)},
          {"esl_p10", optional_value(c.esl_p10)},
          {"esl_p90", optional_value(c.esl_p90)},
          {"esl_band", e.policy->esl_band},
          {"esl_band_recomputed", std::move(band)},
          {"bootstrap_refits", review::kBootstrapRefits},
          {"cost_curve", std::move(cost)},
          {"value_curve",
           {{"model", fleet::name(v.model)},
            {"value_start", v.value_start},
            {"value_decline", v.value_decline},
            {"valuations_used", v.valuations_used}}},
          {"challenger", std::move(challenger)},
          {"note", e.model.note}};
}

json cost_history(const Explanation& e) {
  const results::AssetRow& a = e.stored;
  json out = {{"stored", {{"years", a.cost_years},
                          {"ratio", a.cost_ratio},
                          {"factor", a.credibility_factor}}}};
  if (!e.own) {
    out["years"] = nullptr;
    return out;
  }
  const OwnCosts& own = *e.own;
  json years = json::array();
  for (const OwnYear& y : own.years) {
    years.push_back({{"age_year", y.age_year},
                     {"events", y.events},
                     {"observed", y.observed},
                     {"class_curve", y.class_curve}});
  }
  const fleet::Credibility& cr = own.credibility;
  const auto close = [](double x, double y) {
    return std::abs(x - y) <= 1e-9 * std::max(std::abs(x), std::abs(y));
  };
  out["years"] = std::move(years);
  out["credibility"] = {{"years", cr.years},     {"ratio", cr.ratio}, {"weight", cr.weight},
                        {"factor", cr.factor},   {"measured", cr.measured}};
  out["agrees_with_run"] = cr.years == a.cost_years && close(cr.ratio, a.cost_ratio) &&
                           close(cr.factor, a.credibility_factor);
  out["events"] = {{"counted", own.events_counted},
                   {"not_complete", own.events_not_complete},
                   {"not_usable", own.events_not_usable}};
  return out;
}

json timing(const Explanation& e) {
  const replacement::Decision& d = *e.review.decision;
  const replacement::KeepingCosts& costs = e.review.defender->on(d.basis).costs;
  const Rate i = costs.rate();
  json rows = json::array();
  for (std::size_t k = 0; k < d.timing.present_worth.size(); ++k) {
    const auto years = static_cast<Years>(k);
    rows.push_back({{"keep_years", years},
                    {"pw_keeping", costs.pw_cost(years)},
                    {"pw_challenger_after", d.challenger_euac / i * interest::pf(i, years)},
                    {"present_worth_cost", d.timing.present_worth[k]}});
  }
  return {{"basis", replacement::to_string(d.basis)},
          {"rate", i},
          {"challenger_least_euac", d.challenger_euac},
          {"rows", std::move(rows)},
          {"replace_after_years", d.timing.keep_years}};
}

json verdict(const Explanation& e) {
  const review::AssetReview& r = e.review;
  const replacement::Decision* d = r.decision ? &*r.decision : nullptr;
  return {{"verdict", review::to_string(r.finding.verdict)},
          {"reason", r.finding.reason},
          {"basis", replacement::to_string(r.basis)},
          {"replace_after_years", d ? json(d->timing.keep_years) : json(nullptr)},
          {"defender_euac", d ? json(d->defender_euac) : json(nullptr)},
          {"defender_best_years", d ? json(d->defender_best_years) : json(nullptr)},
          {"challenger_euac", d ? json(d->challenger_euac) : json(nullptr)},
          {"class_esl_years", optional_value(r.class_esl_years)},
          {"marginal_cost_next_year", optional_value(r.marginal_cost_next_year)},
          {"lead_time_years", e.policy->lead_time_years},
          {"review_margin", e.policy->review_margin},
          {"at_stake", r.at_stake ? formats::at_stake_to_json(*r.at_stake) : json(nullptr)}};
}

json ownership(const replacement::Ownership& own, const depreciation::Spec& spec) {
  return {{"first_cost", own.first_cost},
          {"operating_costs", own.operating_costs},
          {"market_values", own.market_values},
          {"depreciation", formats::depreciation_to_json(spec)}};
}

}  // namespace

json equivalent_case(const Explanation& e) {
  if (!e.model.challenger_input) return nullptr;
  const tax::Rates& r = e.policy->rates;
  const depreciation::Spec& spec = e.model.policy->depreciation;
  const replacement::Ownership& d = e.review.inputs.ownership;
  json defender = ownership(d, spec);
  defender["age_years"] = d.age_years;
  defender["market_value_now"] = d.value_now;
  return {{"marr", r.marr},
          {"income_tax_rate", r.income_tax_rate},
          {"after_tax_marr", r.after_tax_marr},
          {"capital_gains_tax_rate", r.capital_gains_tax_rate},
          {"lead_time_years", e.policy->lead_time_years},
          {"review_margin", e.policy->review_margin},
          {"challenger", ownership(*e.model.challenger_input, spec)},
          {"defender", std::move(defender)}};
}

json explanation_to_json(const Explanation& e) {
  json out = {{"asset_id", e.stored.asset_id},
              {"asset_class", e.stored.asset_class},
              {"run",
               {{"run_id", e.run.run_id},
                {"as_of", e.run.as_of},
                {"scenario", e.run.scenario ? json(*e.run.scenario) : json(nullptr)},
                {"basis", replacement::to_string(e.run.basis)},
                {"money", results::to_string(e.run.money)},
                {"tenure_version", e.run.tenure_version},
                {"policy_sha256", e.run.policy_sha256}}},
              {"check", {{"reproduced", e.reproduced()}, {"differences", e.differences}}},
              {"inputs", inputs(e)},
              {"rates", rates(e)},
              {"class", class_json(e)},
              {"cost_history", cost_history(e)}};
  if (e.review.defender && e.model.challenger) {
    const replacement::Ownership& own = e.review.inputs.ownership;
    const formats::JsonAuditFigures audit{.present_worth_rate = e.basis_rate(), .pw_cost = true};
    json defender = formats::asset_analysis_to_json(*e.review.defender, "best_years", audit);
    defender["future"] = {{"operating_costs", own.operating_costs},
                          {"market_values", own.market_values}};
    defender["opportunity_cost"] =
        formats::opportunity_cost_to_json(e.review.defender->table.start);
    out["defender"] = std::move(defender);
    out["challenger"] = formats::asset_analysis_to_json(*e.model.challenger, "esl_years", audit);
    out["timing"] = timing(e);
    out["equivalent_case"] = equivalent_case(e);
  }
  out["verdict"] = verdict(e);
  out["tax_rules"] = {{"used", formats::tax_rules_sentence(e.model.policy->depreciation)},
                      {"caution", formats::kTaxRulesCaution}};
  out["caution"] = formats::kCaution;
  return out;
}

}  // namespace tenure::explain
