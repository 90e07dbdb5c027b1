// Case results as text tables (see case_table.h).
#include "formats/case_table.h"

#include <fmt/format.h>

#include "formats/analysis_tables.h"
#include "formats/case_json.h"
#include "formats/at_stake_output.h"
#include "formats/caution.h"
#include "formats/challengers_output.h"
#include "formats/text_table.h"
#include "review/verdict_reasons.h"

namespace tenure::formats {
namespace {

using replacement::Basis;

std::string rates_table(const tax::Rates& rates) {
  TextTable table({"rate", "per year"}, 1);
  table.add_row({"MARR before tax", percent(rates.marr)});
  table.add_row({"income tax rate", percent(rates.income_tax_rate)});
  table.add_row({"after-tax MARR", percent(rates.after_tax_marr)});
  table.add_row({"capital gains tax rate", percent(rates.capital_gains_tax_rate)});
  return "Rates used\n" + table.render();
}

std::string decision_text(const replacement::Decision& decision,
                          const review::CaseVerdict& case_verdict) {
  const review::VerdictFinding& finding = case_verdict.finding;
  TextTable timing({"keep defender (years)", "present worth of cost"});
  for (std::size_t k = 0; k < decision.timing.present_worth.size(); ++k) {
    timing.add_row(
        {std::to_string(k), marked(decision.timing.present_worth[k],
                                   static_cast<Years>(k) == decision.timing.keep_years)});
  }
  const std::string chain =
      decision.challenger_euac_by_year.empty()
          ? fmt::format("the challenger repeated at its least EUAC {}",
                        money(decision.challenger_euac))
          : std::string("the challenger bought after k years at its least EUAC C*_k");
  return fmt::format(
      "{}{}\nDecision: {}\n{}\nWhat is at stake ({} basis, present worth now)\n{}",
      wrap_words(fmt::format("Replacement timing ({} basis; * = best; {})",
                             basis_words(decision.basis), chain),
                 kLineWidth, "", "  "),
      timing.render(), review::verdict_headline(finding),
      wrap_words(finding.reason, kLineWidth, "  ", "  "), basis_words(decision.basis),
      at_stake_table(case_verdict.at_stake));
}

std::string study_period_text(const replacement::StudyPeriod& study, Basis basis) {
  TextTable table({"defender years", "challenger years", "present worth of cost"});
  for (const replacement::StudyOption& option : study.options) {
    table.add_row(
        {std::to_string(option.defender_years), std::to_string(study.years - option.defender_years),
         marked(option.present_worth_cost, option.defender_years == study.best_defender_years)});
  }
  return fmt::format("Study period of {} ({} basis; * = best)\n{}", years(study.years),
                     basis_words(basis), table.render());
}

}  // namespace

std::string case_result_to_table(const replacement::Case& input,
                                 const replacement::CaseResult& result) {
  const tax::Rates& rates = input.rates;
  std::vector<std::string> sections;
  sections.push_back(rates_table(rates));
  sections.push_back(fmt::format("Decision basis: {}", basis_words(result.basis)) + "\n");
  if (!result.challengers.empty()) {
    sections.push_back(challengers_table(input.challengers, result));
  }
  const std::string challenger =
      result.challengers.empty()
          ? std::string("Challenger")
          : fmt::format("Challenger '{}'", input.challengers[result.chosen].name);
  sections.push_back(challenger + (result.challengers.empty() ? "" : " (chosen)") +
                     ": EUAC and marginal cost by years kept (* = economic service life)\n" +
                     life_curve_table(result.challenger));
  sections.push_back(cash_flow_tables(challenger, result.challenger.table));
  if (result.defender) {
    sections.push_back("Defender: its opportunity cost\n" +
                       opportunity_cost_table(result.defender->table.start));
    sections.push_back(
        "Defender: EUAC and marginal cost by more years kept (* = best remaining life)\n" +
        life_curve_table(*result.defender));
    sections.push_back(cash_flow_tables("Defender", result.defender->table));
  }
  if (result.decision && !result.decision->challenger_euac_by_year.empty()) {
    sections.push_back(challenger_by_year_table(*result.decision));
  }
  if (result.decision) {
    sections.push_back(decision_text(*result.decision, review::case_verdict(input, result)));
  }
  if (result.study_period) {
    sections.push_back(study_period_text(*result.study_period, result.basis));
  }
  sections.push_back(std::string(kCaution) + "\n");
  return fmt::format("{}", fmt::join(sections, "\n"));
}

}  // namespace tenure::formats
