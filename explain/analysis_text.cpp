// The year-by-year tables of `tenure explain` (see text_sections.h): the defender's future on the
// class curves, selling now, after-tax cash flows with present worth, EUAC and marginal cost by
// years kept, and the replacement timing.
#include <fmt/format.h>

#include "explain/text_sections.h"
#include "formats/text_table.h"
#include "interest/factors.h"

namespace tenure::explain::text {

using formats::money;
using formats::percent;
using formats::TextTable;
using replacement::Basis;

std::string defender_future(const Explanation& e) {
  const replacement::Ownership& own = e.review.inputs.ownership;
  TextTable t({"year kept", "age at its end", "operating cost", "market value at its end"});
  for (std::size_t n = 0; n < own.operating_costs.size(); ++n) {
    const auto k = static_cast<Years>(n + 1);
    t.add_row({std::to_string(k), std::to_string(own.age_years + k), money(own.operating_costs[n]),
               money(own.market_values[n])});
  }
  return section(fmt::format("5. Defender's future: class cost curve x factor {:.4f}, class value "
                             "curve x its first cost",
                             e.stored.credibility_factor),
                 t.render());
}

std::string selling_now(const Explanation& e) {
  const tax::SaleFlow& now = e.review.defender->table.start;
  TextTable t({"selling now instead of keeping", "amount"}, 1);
  t.add_row({"market value now", money(now.market_value)});
  t.add_row({"book value now", money(now.book_value)});
  t.add_row({"gain on a sale now", money(now.gain)});
  t.add_row({"tax on a sale now (negative saves tax)", money(now.tax)});
  t.add_row({"given up by keeping, after tax", money(now.net_proceeds)});
  return section("6. Defender: its opportunity cost (what keeping it gives up)", t.render());
}

std::string cash_flows(const std::string& who, const replacement::AfterTaxTable& table, Rate rate,
                       Years age) {
  // "age at end" only for an asset already owned; for a new one it equals the year.
  const bool aged = age > 0;
  std::vector<std::string> headers{"year", "operating cost", "depreciation", "book value",
                                   "taxable income", "income tax", "after-tax cash flow",
                                   "present worth at " + percent(rate)};
  if (aged) headers.insert(headers.begin() + 1, "age at end");
  TextTable kept(headers);
  TextTable sold({"year", "market value", "depreciation", "book value", "gain", "disposal tax",
                  "net proceeds", "after-tax cash flow"});
  for (const replacement::AfterTaxYear& y : table.years) {
    const std::string k = std::to_string(y.kept.year);
    std::vector<std::string> row{k, money(y.kept.operating_cost), money(y.kept.depreciation),
                                 money(y.kept.book_value), money(y.kept.taxable_income),
                                 money(y.kept.income_tax), money(y.kept.after_tax_cash_flow),
                                 money(y.kept.after_tax_cash_flow * interest::pf(rate, y.kept.year))};
    if (aged) row.insert(row.begin() + 1, std::to_string(age + y.kept.year));
    kept.add_row(std::move(row));
    sold.add_row({k, money(y.sale.market_value), money(y.sold.depreciation),
                  money(y.sale.book_value), money(y.sale.gain), money(y.sale.tax),
                  money(y.sale.net_proceeds), money(y.sold.after_tax_cash_flow)});
  }
  return fmt::format(
      "{0}: after-tax cash flows of each year kept past its end (what the owner receives; a cost "
      "is negative)\n{1}\n{0}: if sold at the end of the year (that year takes the disposal-year "
      "deduction)\n{2}",
      who, kept.render(), sold.render());
}

std::string euac_by_life(const std::string& title, const replacement::AssetAnalysis& a,
                         Basis basis, Years age) {
  const bool aged = age > 0;
  std::vector<std::string> headers{"years kept", "PW of cost, " + basis_words(basis),
                                   "EUAC before tax", "marginal cost before tax"};
  if (aged) headers.insert(headers.begin() + 1, "age at end");
  if (a.after_tax) headers.insert(headers.end(), {"EUAC after tax", "marginal cost after tax"});
  TextTable t(headers);
  const replacement::BasisAnalysis& on = a.on(basis);
  const replacement::LifeCurve& before = a.before_tax.curve;
  for (std::size_t n = 0; n < before.euac.size(); ++n) {
    const auto kept = static_cast<Years>(n + 1);
    std::vector<std::string> row{std::to_string(kept), money(on.costs.pw_cost(kept)),
                                 marked(before.euac[n], kept == before.best_years),
                                 money(before.marginal_costs[n])};
    if (aged) row.insert(row.begin() + 1, std::to_string(age + kept));
    if (a.after_tax) {
      const replacement::LifeCurve& after = a.after_tax->curve;
      row.push_back(marked(after.euac[n], kept == after.best_years));
      row.push_back(money(after.marginal_costs[n]));
    }
    t.add_row(std::move(row));
  }
  return section(title, t.render() +
                            "  EUAC(n) = PW of cost(n) x (A/P, i, n); marginal cost(k) = "
                            "(PW(k) - PW(k-1)) x (F/P, i, k)\n");
}

std::string timing(const Explanation& e) {
  const replacement::Decision& d = *e.review.decision;
  const replacement::KeepingCosts& costs = e.review.defender->on(d.basis).costs;
  const Rate i = costs.rate();
  TextTable t({"keep k more years", "age at replacement", "PW of keeping k years",
               "+ challenger forever (C*/i)(P/F,i,k)", "total present worth"});
  for (std::size_t k = 0; k < d.timing.present_worth.size(); ++k) {
    const auto years = static_cast<Years>(k);
    t.add_row({std::to_string(k), std::to_string(e.stored.age_years + years),
               money(costs.pw_cost(years)),
               money(d.challenger_euac / i * interest::pf(i, years)),
               marked(d.timing.present_worth[k], years == d.timing.keep_years)});
  }
  return section(
      fmt::format("10. Replacement timing ({} basis at {}; challenger repeated at its least EUAC "
                  "C* = {}; * = k*)",
                  basis_words(d.basis), percent(i), money(d.challenger_euac)),
      t.render() + fmt::format("  k* = {}: {}\n", d.timing.keep_years,
                               d.timing.keep_years == 0
                                   ? "replacing now is cheapest"
                                   : "keeping it " + formats::years(d.timing.keep_years) +
                                         " more, then replacing, is cheapest"));
}

}  // namespace tenure::explain::text
