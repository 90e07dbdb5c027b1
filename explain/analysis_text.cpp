// The year-by-year tables of `tenure explain` (see text_sections.h): the defender's future on the
// class curves, selling now, after-tax cash flows with present worth, EUAC and marginal cost by
// years kept, and the replacement timing.
#include <algorithm>

#include <fmt/format.h>

#include "explain/text_sections.h"
#include "formats/analysis_tables.h"
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
  return section(
      "6. Defender: its opportunity cost (what keeping it gives up)",
      formats::opportunity_cost_table(e.review.defender->table.start, {.gain_on_sale = true}));
}

namespace {

// "age at end" only for an asset already owned; for a new one it equals the year.
std::optional<Years> age_column(Years age) { return age > 0 ? std::optional(age) : std::nullopt; }

}  // namespace

std::string kept_flows(const std::string& who, const replacement::AfterTaxTable& table, Rate rate) {
  return formats::kept_cash_flows(who, table, {.present_worth_rate = rate});
}

std::string sold_flows(const std::string& who, const replacement::AfterTaxTable& table) {
  return formats::sold_cash_flows(who, table);
}

std::string pw_cost_tie(const replacement::AssetAnalysis& a, const PwCostSections& from) {
  const replacement::AfterTaxTable& table = a.table;
  const Rate i = a.after_tax->costs.rate();
  const Years n = std::min<Years>(2, static_cast<Years>(table.years.size()));
  Money kept_before = 0;  // the present worths of years 1..n-1 kept
  for (Years t = 1; t < n; ++t) {
    kept_before += -table.years[t - 1].kept.after_tax_cash_flow * interest::pf(i, t);
  }
  const replacement::AfterTaxYear& last = table.years[n - 1];
  const std::string rule = fmt::format(
      "PW of cost(n) = {} + the PWs of years 1 to n-1 kept ({}) + (after-tax cost - net proceeds) "
      "of year n sold ({}) x (P/F, i, n); for n = {}:",
      from.start, from.kept, from.sold, n);
  const std::string numbers = fmt::format(
      "{} + {} + ({} - {}) x {:.6f} = {}", money(table.start.net_proceeds), money(kept_before),
      money(-last.sold.after_tax_cash_flow), money(last.sale.net_proceeds), interest::pf(i, n),
      money(a.after_tax->costs.pw_cost(n)));
  return formats::wrap_words(rule, formats::kLineWidth, "  ", "  ") +
         formats::wrap_words(numbers, formats::kLineWidth, "    ", "      ");
}

std::string euac_by_life(const std::string& title, const replacement::AssetAnalysis& a,
                         Basis basis, Years age, const std::optional<PwCostSections>& tie) {
  std::string body =
      formats::life_curve_table(a, {.age_at_start = age_column(age), .pw_cost_basis = basis}) +
      "  EUAC(n) = PW of cost(n) x (A/P, i, n); marginal cost(k) = (PW(k) - PW(k-1)) x (F/P, i, "
      "k)\n";
  // The after-tax tables tie to the after-tax PW of cost (the before-tax one has no taxes).
  if (tie && basis == Basis::after_tax && a.after_tax && !a.table.years.empty()) {
    body += pw_cost_tie(a, *tie);
  }
  return section(title, body);
}

std::string timing(const Explanation& e) {
  const replacement::Decision& d = *e.review.decision;
  const replacement::KeepingCosts& costs = e.review.defender->on(d.basis).costs;
  const Rate i = costs.rate();
  TextTable t({"keep k\nmore years", "age at\nreplacement", "PW of keeping\nk years",
               "+ challenger forever\n(C*/i)(P/F,i,k)", "total present\nworth"});
  for (std::size_t k = 0; k < d.timing.present_worth.size(); ++k) {
    const auto years = static_cast<Years>(k);
    t.add_row({std::to_string(k), std::to_string(e.stored.age_years + years),
               money(costs.pw_cost(years)),
               money(d.challenger_euac / i * interest::pf(i, years)),
               marked(d.timing.present_worth[k], years == d.timing.keep_years)});
  }
  return section(
      fmt::format("13. Replacement timing ({} basis at {}; * = k*)", basis_words(d.basis),
                  percent(i)),
      t.render() +
          fmt::format("  the challenger is repeated forever at its least EUAC C* = {}\n",
                      money(d.challenger_euac)) +
          fmt::format("  k* = {}: {}\n", d.timing.keep_years,
                               d.timing.keep_years == 0
                                   ? "replacing now is cheapest"
                                   : "keeping it " + formats::years(d.timing.keep_years) +
                                         " more, then replacing, is cheapest"));
}

}  // namespace tenure::explain::text
