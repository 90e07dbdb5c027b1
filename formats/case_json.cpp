// Reading case files and writing case results (see case_json.h).
#include "formats/case_json.h"

#include <fmt/format.h>

#include "core/checks.h"
#include "core/errors.h"
#include "formats/depreciation_json.h"
#include "formats/json_path.h"
#include "formats/json_text.h"

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

// One life curve on one basis. `best_key` is "esl_years" for a challenger, "best_years" for a
// defender (SPEC 5).
json curve_to_json(const replacement::BasisAnalysis& analysis, const char* best_key) {
  const replacement::LifeCurve& curve = analysis.curve;
  json points = json::array();
  for (std::size_t n = 0; n < curve.euac.size(); ++n) {
    points.push_back({{"years", n + 1}, {"euac", curve.euac[n]}});
  }
  return {{best_key, curve.best_years},
          {"euac", curve.best_euac},
          {"curve", std::move(points)},
          {"marginal_costs", curve.marginal_costs}};
}

json cash_flows_to_json(const replacement::AfterTaxTable& table) {
  json rows = json::array();
  for (const replacement::AfterTaxYear& year : table.years) {
    const tax::YearFlow& kept = year.kept;
    rows.push_back({{"year", kept.year},
                    {"operating_cost", kept.operating_cost},
                    {"depreciation", kept.depreciation},
                    {"book_value", kept.book_value},
                    {"taxable_income", kept.taxable_income},
                    {"income_tax", kept.income_tax},
                    {"after_tax_cash_flow", kept.after_tax_cash_flow},
                    {"if_sold",
                     {{"market_value", year.sale.market_value},
                      {"depreciation", year.sold.depreciation},
                      {"book_value", year.sale.book_value},
                      {"gain", year.sale.gain},
                      {"disposal_tax", year.sale.tax},
                      {"net_proceeds", year.sale.net_proceeds},
                      {"after_tax_cash_flow", year.sold.after_tax_cash_flow}}}});
  }
  return rows;
}

json asset_to_json(const replacement::AssetAnalysis& asset, const char* best_key) {
  json out = {{"before_tax", curve_to_json(asset.before_tax, best_key)}};
  if (asset.after_tax) out["after_tax"] = curve_to_json(*asset.after_tax, best_key);
  out["cash_flows"] = cash_flows_to_json(asset.table);
  return out;
}

json decision_to_json(const replacement::Decision& decision, const review::VerdictFinding& finding) {
  json timing = json::array();
  for (std::size_t k = 0; k < decision.timing.present_worth.size(); ++k) {
    timing.push_back({{"keep_years", k}, {"present_worth_cost", decision.timing.present_worth[k]}});
  }
  return {{"basis", replacement::to_string(decision.basis)},
          {"verdict", review::to_string(finding.verdict)},
          {"replace_after_years", decision.timing.keep_years},
          {"reason", finding.reason},
          {"challenger_euac", decision.challenger_euac},
          {"challenger_esl_years", decision.challenger_esl},
          {"defender_euac", decision.defender_euac},
          {"defender_best_years", decision.defender_best_years},
          {"timing", std::move(timing)}};
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

review::VerdictFinding case_finding(const replacement::CaseResult& result) {
  const replacement::Decision& d = *result.decision;
  const replacement::BasisAnalysis& defender = result.defender->on(d.basis);
  return review::case_verdict(
      review::figures_of(d, defender.curve.marginal_costs[0], defender.costs.max_years()));
}

replacement::Case read_case(std::string_view json_text) {
  const json document = parse_json_text(json_text);
  const JsonObject root(document, "$");
  root.allow_only({"marr", "income_tax_rate", "after_tax_marr", "capital_gains_tax_rate",
                   "challenger", "defender", "study_period_years"});
  replacement::Case input{};
  input.rates = tax::Rates::make(root.number("marr"), root.number("income_tax_rate"),
                                 root.optional_number("after_tax_marr"),
                                 root.optional_number("capital_gains_tax_rate"));
  input.challenger = read_challenger(root.object("challenger"));
  if (const auto defender = root.optional_object("defender")) {
    input.defender = read_defender(*defender);
  }
  input.study_period_years = root.optional_whole_number("study_period_years", 1);
  return input;
}

json case_result_to_json(const replacement::CaseResult& result, const tax::Rates& rates) {
  json out = {{"basis", replacement::to_string(result.basis)},
              {"rates",
               {{"marr", rates.marr},
                {"income_tax_rate", rates.income_tax_rate},
                {"after_tax_marr", rates.after_tax_marr},
                {"capital_gains_tax_rate", rates.capital_gains_tax_rate}}},
              {"challenger", asset_to_json(result.challenger, "esl_years")}};
  if (result.defender) {
    json defender = asset_to_json(*result.defender, "best_years");
    const tax::SaleFlow& now = result.defender->table.start;
    defender["opportunity_cost"] = {{"market_value_now", now.market_value},
                                    {"book_value_now", now.book_value},
                                    {"tax_on_sale_now", now.tax},
                                    {"after_tax", now.net_proceeds}};
    out["defender"] = std::move(defender);
  }
  if (result.decision) out["decision"] = decision_to_json(*result.decision, case_finding(result));
  if (result.study_period) {
    out["study_period"] = study_period_to_json(*result.study_period, result.basis);
  }
  return out;
}

}  // namespace tenure::formats
