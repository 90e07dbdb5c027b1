// Case results as text tables (see case_table.h).
#include "formats/case_table.h"

#include <fmt/format.h>

#include "formats/case_json.h"
#include "formats/caution.h"
#include "formats/text_table.h"

namespace tenure::formats {
namespace {

using replacement::AssetAnalysis;
using replacement::Basis;

const char* basis_words(Basis basis) {
  return basis == Basis::after_tax ? "after-tax" : "before-tax";
}

// The best point of a curve carries " *"; the others two spaces, so the numbers stay aligned.
std::string marked(Money amount, bool best) { return money(amount) + (best ? " *" : "  "); }

std::string rates_table(const tax::Rates& rates) {
  TextTable table({"rate", "per year"}, 1);
  table.add_row({"MARR before tax", percent(rates.marr)});
  table.add_row({"income tax rate", percent(rates.income_tax_rate)});
  table.add_row({"after-tax MARR", percent(rates.after_tax_marr)});
  table.add_row({"capital gains tax rate", percent(rates.capital_gains_tax_rate)});
  return "Rates used\n" + table.render();
}

std::string curve_table(const std::string& title, const AssetAnalysis& asset) {
  std::vector<std::string> headers{"years kept", "EUAC before tax", "marginal cost"};
  if (asset.after_tax) {
    headers.insert(headers.end(), {"EUAC after tax", "marginal cost after tax"});
  }
  TextTable table(headers);
  const replacement::LifeCurve& before = asset.before_tax.curve;
  for (std::size_t n = 0; n < before.euac.size(); ++n) {
    const auto kept = static_cast<Years>(n + 1);
    std::vector<std::string> row{std::to_string(kept),
                                 marked(before.euac[n], kept == before.best_years),
                                 money(before.marginal_costs[n])};
    if (asset.after_tax) {
      const replacement::LifeCurve& after = asset.after_tax->curve;
      row.push_back(marked(after.euac[n], kept == after.best_years));
      row.push_back(money(after.marginal_costs[n]));
    }
    table.add_row(std::move(row));
  }
  return title + "\n" + table.render();
}

std::string cash_flow_tables(const std::string& name, const replacement::AfterTaxTable& flows) {
  TextTable kept({"year", "operating cost", "depreciation", "book value", "taxable income",
                  "income tax", "after-tax cash flow"});
  TextTable sold({"year", "market value", "depreciation", "book value", "gain", "disposal tax",
                  "net proceeds", "after-tax cash flow"});
  for (const replacement::AfterTaxYear& year : flows.years) {
    const std::string k = std::to_string(year.kept.year);
    kept.add_row({k, money(year.kept.operating_cost), money(year.kept.depreciation),
                  money(year.kept.book_value), money(year.kept.taxable_income),
                  money(year.kept.income_tax), money(year.kept.after_tax_cash_flow)});
    sold.add_row({k, money(year.sale.market_value), money(year.sold.depreciation),
                  money(year.sale.book_value), money(year.sale.gain), money(year.sale.tax),
                  money(year.sale.net_proceeds), money(year.sold.after_tax_cash_flow)});
  }
  return fmt::format(
      "{0}: after-tax cash flows of each year kept past its end (what the owner receives; a "
      "cost is negative)\n{1}\n{0}: if sold at the end of the year (the year takes the "
      "disposal-year deduction)\n{2}",
      name, kept.render(), sold.render());
}

std::string opportunity_cost(const tax::SaleFlow& now) {
  TextTable table({"selling now instead of keeping", "amount"}, 1);
  table.add_row({"market value now", money(now.market_value)});
  table.add_row({"book value now", money(now.book_value)});
  table.add_row({"tax on a sale now", money(now.tax)});
  table.add_row({"given up by keeping (after tax)", money(now.net_proceeds)});
  return "Defender: its opportunity cost\n" + table.render();
}

std::string decision_text(const replacement::Decision& decision,
                          const review::VerdictFinding& finding) {
  TextTable timing({"keep defender (years)", "present worth of cost"});
  for (std::size_t k = 0; k < decision.timing.present_worth.size(); ++k) {
    timing.add_row(
        {std::to_string(k), marked(decision.timing.present_worth[k],
                                   static_cast<Years>(k) == decision.timing.keep_years)});
  }
  const std::string verdict =
      finding.verdict == review::Verdict::replace
          ? "REPLACE now"
          : "KEEP for " + years(decision.timing.keep_years) + ", then replace";
  return fmt::format(
      "Replacement timing ({} basis; the challenger repeated at its least EUAC {}; * = best)\n"
      "{}\nDecision: {}\n  {}\n",
      basis_words(decision.basis), money(decision.challenger_euac), timing.render(), verdict,
      finding.reason);
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

std::string case_result_to_table(const replacement::CaseResult& result, const tax::Rates& rates) {
  std::vector<std::string> sections;
  sections.push_back(rates_table(rates));
  sections.push_back(fmt::format("Decision basis: {}", basis_words(result.basis)) + "\n");
  sections.push_back(
      curve_table("Challenger: EUAC and marginal cost by years kept (* = economic service life)",
                  result.challenger));
  sections.push_back(cash_flow_tables("Challenger", result.challenger.table));
  if (result.defender) {
    sections.push_back(opportunity_cost(result.defender->table.start));
    sections.push_back(
        curve_table("Defender: EUAC and marginal cost by more years kept (* = best remaining life)",
                    *result.defender));
    sections.push_back(cash_flow_tables("Defender", result.defender->table));
  }
  if (result.decision) sections.push_back(decision_text(*result.decision, case_finding(result)));
  if (result.study_period) {
    sections.push_back(study_period_text(*result.study_period, result.basis));
  }
  sections.push_back(std::string(kCaution) + "\n");
  return fmt::format("{}", fmt::join(sections, "\n"));
}

}  // namespace tenure::formats
