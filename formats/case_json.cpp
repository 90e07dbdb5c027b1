// Reading case files and writing case results (see case_json.h).
#include "formats/case_json.h"

#include <fmt/format.h>

#include "core/checks.h"
#include "core/errors.h"
#include "formats/analysis_json.h"
#include "formats/challengers_output.h"
#include "formats/depreciation_json.h"
#include "formats/json_path.h"
#include "formats/at_stake_output.h"
#include "formats/json_text.h"
#include "replacement/challengers.h"

namespace tenure::formats {
namespace {

using nlohmann::json;
using replacement::Ownership;

// Operating costs and market values: non-empty, each an amount >= 0.
std::vector<Money> read_amounts(const JsonObject& asset, std::string_view key) {
  std::vector<Money> amounts = asset.numbers(key);
  for (std::size_t i = 0; i < amounts.size(); ++i) {
    const std::string where = index_path(asset.path_of(key), i);
    require_non_negative(amounts[i], where);
    require_amount(amounts[i], where);
  }
  return amounts;
}

// The years ahead of one asset and its depreciation; first_cost and value_now are set already.
void read_years_ahead(const JsonObject& asset, Ownership& owned) {
  owned.operating_costs = read_amounts(asset, "operating_costs");
  owned.market_values = read_amounts(asset, "market_values");
  if (owned.market_values.size() != owned.operating_costs.size()) {
    throw InputError(asset.path_of("market_values"),
                     fmt::format("has {} values but operating_costs has {}; give one market "
                                 "value for the end of each year",
                                 owned.market_values.size(), owned.operating_costs.size()));
  }
  const depreciation::Spec spec = read_depreciation(asset.object("depreciation"));
  owned.depreciation = make_checked_method(spec, owned.first_cost, asset.path_of("depreciation"));
}

Money first_cost(const JsonObject& asset) {
  const Money cost = asset.number("first_cost");
  require_positive(cost, asset.path_of("first_cost"));
  require_amount(cost, asset.path_of("first_cost"));
  return cost;
}

Ownership read_challenger(const JsonObject& asset) {
  asset.allow_only({"first_cost", "operating_costs", "market_values", "depreciation"});
  Ownership owned{};
  owned.first_cost = first_cost(asset);
  owned.age_years = 0;
  owned.value_now = owned.first_cost;
  read_years_ahead(asset, owned);
  return owned;
}

// One of the several-challengers form: a named challenger, its operating costs times its
// cost_factor (> 0, default 1).
replacement::NamedChallenger read_named_challenger(const JsonObject& asset) {
  asset.allow_only({"name", "first_cost", "cost_factor", "operating_costs", "market_values",
                    "depreciation"});
  replacement::NamedChallenger named{asset.string("name"), {}};
  const double cost_factor = asset.optional_number("cost_factor").value_or(1);
  require_positive(cost_factor, asset.path_of("cost_factor"));
  Ownership& owned = named.asset;
  owned.first_cost = first_cost(asset);
  owned.age_years = 0;
  owned.value_now = owned.first_cost;
  read_years_ahead(asset, owned);
  for (Money& cost : owned.operating_costs) cost *= cost_factor;
  return named;
}

std::vector<replacement::NamedChallenger> read_challengers(const JsonObject& root) {
  std::vector<replacement::NamedChallenger> challengers;
  std::vector<std::string> names;
  for (const JsonObject& asset : root.objects("challengers")) {
    challengers.push_back(read_named_challenger(asset));
    names.push_back(challengers.back().name);
  }
  replacement::validate_challenger_names(names, root.path_of("challengers"));
  return challengers;
}

Ownership read_defender(const JsonObject& asset) {
  asset.allow_only({"first_cost", "age_years", "market_value_now", "operating_costs",
                    "market_values", "depreciation"});
  Ownership owned{};
  owned.first_cost = first_cost(asset);
  owned.age_years = asset.whole_number("age_years", 0);
  owned.value_now = asset.number("market_value_now");
  require_non_negative(owned.value_now, asset.path_of("market_value_now"));
  require_amount(owned.value_now, asset.path_of("market_value_now"));
  read_years_ahead(asset, owned);
  return owned;
}

json decision_to_json(const replacement::Decision& decision, const review::CaseVerdict& verdict) {
  const review::VerdictFinding& finding = verdict.finding;
  json timing = json::array();
  for (std::size_t k = 0; k < decision.timing.present_worth.size(); ++k) {
    timing.push_back({{"keep_years", k}, {"present_worth_cost", decision.timing.present_worth[k]}});
  }
  json out = {{"basis", replacement::to_string(decision.basis)},
          {"verdict", review::to_string(finding.verdict)},
          {"replace_after_years", decision.timing.keep_years},
          {"reason", finding.reason},
          {"challenger_euac", decision.challenger_euac},
          {"challenger_esl_years", decision.challenger_esl},
          {"defender_euac", decision.defender_euac},
          {"defender_best_years", decision.defender_best_years},
          {"timing", std::move(timing)}};
  out.update(at_stake_to_json(verdict.at_stake));
  if (!decision.challenger_euac_by_year.empty()) {
    out["challenger_by_year"] = challenger_by_year_to_json(decision);
  }
  return out;
}

json study_period_to_json(const replacement::StudyPeriod& study, replacement::Basis basis) {
  json options = json::array();
  for (const replacement::StudyOption& option : study.options) {
    options.push_back({{"defender_years", option.defender_years},
                       {"present_worth_cost", option.present_worth_cost}});
  }
  return {{"years", study.years},
          {"basis", replacement::to_string(basis)},
          {"options", std::move(options)},
          {"best_defender_years", study.best_defender_years}};
}

}  // namespace

replacement::Case read_case(std::string_view json_text) {
  const json document = parse_json_text(json_text);
  const JsonObject root(document, "$");
  root.allow_only({"marr", "income_tax_rate", "after_tax_marr", "capital_gains_tax_rate",
                   "lead_time_years", "review_margin", "challenger", "challengers",
                   "improvement", "defender", "study_period_years"});
  replacement::Case input{};
  input.rates = tax::Rates::make(root.number("marr"), root.number("income_tax_rate"),
                                 root.optional_number("after_tax_marr"),
                                 root.optional_number("capital_gains_tax_rate"));
  if (root.has("challengers")) {
    if (root.has("challenger")) {
      throw InputError(root.path_of("challengers"),
                       "give either challenger or challengers, not both");
    }
    input.challengers = read_challengers(root);
  } else {
    input.challenger = read_challenger(root.object("challenger"));
  }
  input.improvement = root.optional_number("improvement").value_or(0);
  replacement::validate_improvement(input.improvement, root.path_of("improvement"));
  if (const auto defender = root.optional_object("defender")) {
    input.defender = read_defender(*defender);
  }
  input.study_period_years = root.optional_whole_number("study_period_years", 1);
  input.lead_time_years = root.optional_whole_number("lead_time_years", 0, 100).value_or(1);
  input.review_margin = root.optional_number("review_margin").value_or(0.05);
  if (input.review_margin < 0 || input.review_margin >= 1) {
    throw InputError(root.path_of("review_margin"), "must be in [0, 1)");
  }
  return input;
}

json case_result_to_json(const replacement::Case& input, const replacement::CaseResult& result) {
  const tax::Rates& rates = input.rates;
  json out = {{"basis", replacement::to_string(result.basis)},
              {"rates",
               {{"marr", rates.marr},
                {"income_tax_rate", rates.income_tax_rate},
                {"after_tax_marr", rates.after_tax_marr},
                {"capital_gains_tax_rate", rates.capital_gains_tax_rate}}},
              {"challenger", asset_analysis_to_json(result.challenger, "esl_years")}};
  if (!result.challengers.empty()) {
    out["challengers"] = challengers_to_json(input.challengers, result);
    out["chosen_challenger"] = input.challengers[result.chosen].name;
  }
  if (input.improvement > 0) out["improvement"] = input.improvement;
  if (result.defender) {
    json defender = asset_analysis_to_json(*result.defender, "best_years");
    defender["opportunity_cost"] = opportunity_cost_to_json(result.defender->table.start);
    out["defender"] = std::move(defender);
  }
  if (result.decision) {
    out["decision"] = decision_to_json(*result.decision, review::case_verdict(input, result));
  }
  if (result.study_period) {
    out["study_period"] = study_period_to_json(*result.study_period, result.basis);
  }
  return out;
}

}  // namespace tenure::formats
