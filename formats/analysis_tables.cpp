// The year-by-year tables of one asset's analysis (see analysis_tables.h).
#include "formats/analysis_tables.h"

#include <fmt/format.h>

#include "formats/text_table.h"
#include "interest/factors.h"

namespace tenure::formats {

std::string basis_words(replacement::Basis basis) {
  return basis == replacement::Basis::after_tax ? "after-tax" : "before-tax";
}

std::string marked(Money amount, bool best) { return money(amount) + (best ? " *" : "  "); }

std::string kept_cash_flows(const std::string& who, const replacement::AfterTaxTable& flows,
                            const AuditFigures& audit) {
  std::vector<std::string> headers{"year"};
  if (audit.age_at_start) headers.push_back("age at\nend");
  headers.insert(headers.end(), {"operating\ncost", "depreciation", "book\nvalue",
                                 "taxable\nincome", "income\ntax", "after-tax\ncost"});
  if (const auto rate = audit.present_worth_rate) headers.push_back("PW at\n" + percent(*rate));
  TextTable kept(headers);
  for (const replacement::AfterTaxYear& year : flows.years) {
    const tax::YearFlow& k = year.kept;
    std::vector<std::string> row{std::to_string(k.year)};
    if (const auto age = audit.age_at_start) row.push_back(std::to_string(*age + k.year));
    row.insert(row.end(),
               {money(k.operating_cost), money(k.depreciation), money(k.book_value),
                money(k.taxable_income), money(k.income_tax), money(-k.after_tax_cash_flow)});
    if (const auto rate = audit.present_worth_rate) {
      row.push_back(money(-k.after_tax_cash_flow * interest::pf(*rate, k.year)));
    }
    kept.add_row(std::move(row));
  }
  return fmt::format(
      "{}: after-tax cost of each year kept past its end\n{}  after-tax cost = operating cost + "
      "income tax; money is positive for cost: a negative tax is saved\n",
      who, kept.render());
}

std::string sold_cash_flows(const std::string& who, const replacement::AfterTaxTable& flows) {
  TextTable sold({"year", "market\nvalue", "depreciation", "book\nvalue", "gain", "disposal\ntax",
                  "net\nproceeds", "after-tax\ncost"});
  for (const replacement::AfterTaxYear& year : flows.years) {
    sold.add_row({std::to_string(year.kept.year), money(year.sale.market_value),
                  money(year.sold.depreciation), money(year.sale.book_value), money(year.sale.gain),
                  money(year.sale.tax), money(year.sale.net_proceeds),
                  money(-year.sold.after_tax_cash_flow)});
  }
  return fmt::format(
      "{}: if sold at the end of the year (that year takes the disposal-year deduction)\n{}"
      "  net proceeds = market value - disposal tax, money received; after-tax cost as when kept\n",
      who, sold.render());
}

std::string cash_flow_tables(const std::string& who, const replacement::AfterTaxTable& flows,
                             const AuditFigures& audit) {
  return kept_cash_flows(who, flows, audit) + "\n" + sold_cash_flows(who, flows);
}

std::string life_curve_table(const replacement::AssetAnalysis& asset, const AuditFigures& audit) {
  std::vector<std::string> headers{"years\nkept"};
  if (audit.age_at_start) headers.push_back("age at\nend");
  if (const auto basis = audit.pw_cost_basis) {
    headers.push_back("PW of cost,\n" + basis_words(*basis));
  }
  headers.insert(headers.end(), {"EUAC\nbefore tax", "marginal cost\nbefore tax"});
  if (asset.after_tax) {
    headers.insert(headers.end(), {"EUAC\nafter tax", "marginal cost\nafter tax"});
  }
  TextTable table(headers);
  const replacement::LifeCurve& before = asset.before_tax.curve;
  for (std::size_t n = 0; n < before.euac.size(); ++n) {
    const auto kept = static_cast<Years>(n + 1);
    std::vector<std::string> row{std::to_string(kept)};
    if (const auto age = audit.age_at_start) row.push_back(std::to_string(*age + kept));
    if (const auto basis = audit.pw_cost_basis) {
      row.push_back(money(asset.on(*basis).costs.pw_cost(kept)));
    }
    row.push_back(marked(before.euac[n], kept == before.best_years));
    row.push_back(money(before.marginal_costs[n]));
    if (asset.after_tax) {
      const replacement::LifeCurve& after = asset.after_tax->curve;
      row.push_back(marked(after.euac[n], kept == after.best_years));
      row.push_back(money(after.marginal_costs[n]));
    }
    table.add_row(std::move(row));
  }
  return table.render();
}

std::string opportunity_cost_table(const tax::SaleFlow& now, const AuditFigures& audit) {
  TextTable table({"selling now instead of keeping", "amount"}, 1);
  table.add_row({"market value now", money(now.market_value)});
  table.add_row({"book value now", money(now.book_value)});
  if (audit.gain_on_sale) table.add_row({"gain on a sale now", money(now.gain)});
  table.add_row({"tax on a sale now", money(now.tax)});
  table.add_row({"given up by keeping (after tax)", money(now.net_proceeds)});
  return table.render();
}

}  // namespace tenure::formats
