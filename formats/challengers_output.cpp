// Several challengers and their improved successors as JSON and text (see challengers_output.h).
#include "formats/challengers_output.h"

#include <fmt/format.h>

#include "formats/analysis_tables.h"
#include "formats/text_table.h"

namespace tenure::formats {
namespace {

using nlohmann::json;

json least_point(const replacement::BasisAnalysis& basis) {
  return {{"esl_years", basis.curve.best_years}, {"euac", basis.curve.best_euac}};
}

std::string least_cell(const replacement::BasisAnalysis& basis) {
  return fmt::format("{} at {}", money(basis.curve.best_euac), years(basis.curve.best_years));
}

}  // namespace

json challengers_to_json(std::span<const replacement::NamedChallenger> challengers,
                         const replacement::CaseResult& result) {
  json out = json::array();
  for (std::size_t i = 0; i < challengers.size(); ++i) {
    const replacement::AssetAnalysis& analysed = result.challengers[i];
    json one = {{"name", challengers[i].name},
                {"chosen", i == result.chosen},
                {"first_cost", challengers[i].asset.first_cost},
                {"before_tax", least_point(analysed.before_tax)}};
    if (analysed.after_tax) one["after_tax"] = least_point(*analysed.after_tax);
    out.push_back(std::move(one));
  }
  return out;
}

std::string challengers_table(std::span<const replacement::NamedChallenger> challengers,
                              const replacement::CaseResult& result) {
  const bool taxed = result.challenger.after_tax.has_value();
  std::vector<std::string> headers = {"challenger", "first cost", "least EUAC before tax"};
  if (taxed) headers.push_back("least EUAC after tax");
  headers.push_back("chosen");
  TextTable table(std::move(headers), 1);
  for (std::size_t i = 0; i < challengers.size(); ++i) {
    const replacement::AssetAnalysis& analysed = result.challengers[i];
    std::vector<std::string> row = {challengers[i].name, money(challengers[i].asset.first_cost),
                                    least_cell(analysed.before_tax)};
    if (taxed) row.push_back(least_cell(*analysed.after_tax));
    row.push_back(i == result.chosen ? "yes" : "");
    table.add_row(std::move(row));
  }
  return fmt::format(
      "Challengers (the least EUAC on the {} basis is weighed; the first listed on ties)\n{}",
      basis_words(result.basis), table.render());
}

json challenger_by_year_to_json(const replacement::Decision& decision) {
  json out = json::array();
  for (std::size_t k = 0; k < decision.challenger_euac_by_year.size(); ++k) {
    out.push_back({{"years_from_now", k},
                   {"least_euac", decision.challenger_euac_by_year[k]},
                   {"esl_years", decision.challenger_esl_by_year[k]}});
  }
  return out;
}

std::string challenger_by_year_table(const replacement::Decision& decision) {
  TextTable table({"bought in (years from now)", "least EUAC C*_k", "economic life"});
  for (std::size_t k = 0; k < decision.challenger_euac_by_year.size(); ++k) {
    table.add_row({std::to_string(k), money(decision.challenger_euac_by_year[k]),
                   years(decision.challenger_esl_by_year[k])});
  }
  return fmt::format("The challenger bought later ({} basis; technology improving)\n{}",
                     basis_words(decision.basis), table.render());
}

}  // namespace tenure::formats
