// The year-by-year tables of one asset's replacement analysis as aligned text: its after-tax cash
// flows, its EUAC and marginal cost by years kept, and what selling it now would bring. The one
// owner of these tables: `tenure case --format table` (case_table.cpp) prints them as they are,
// `tenure explain` (explain/analysis_text.cpp) adds its audit figures through AuditFigures.
//
//   std::string flows = cash_flow_tables("Defender", result.defender->table);
//   std::string curve = life_curve_table(*result.defender);
//   //   years           EUAC   marginal cost          EUAC   marginal cost
//   //    kept     before tax      before tax     after tax       after tax
//   //       1     1,234.56 *        1,234.56    1,000.00 *        1,000.00
//   AuditFigures audit{.present_worth_rate = 0.075};
//   flows = kept_cash_flows("7. Defender", defender.table, audit);   // one more column, PW
#pragma once

#include <optional>
#include <string>

#include "core/types.h"
#include "replacement/case_analysis.h"
#include "tax/cash_flows.h"

namespace tenure::formats {

// "after-tax" or "before-tax".
std::string basis_words(replacement::Basis basis);

// A money figure with " *" when it is the best point, two spaces otherwise (columns align).
std::string marked(Money amount, bool best);

// The figures an audit adds to the tables; the defaults add none.
struct AuditFigures {
  // The asset's age when the analysis starts: a column "age at end" (age + year) after the year
  // in the cash flows kept and in the EUAC table.
  std::optional<Years> age_at_start = std::nullopt;
  // The cash flows kept get a last column "PW at <rate>": each year's after-tax cost discounted
  // to now at this rate.
  std::optional<Rate> present_worth_rate = std::nullopt;
  // The EUAC table gets a column "PW of cost, <basis>" before the EUACs: the present worth of
  // the cost of keeping n years on this basis.
  std::optional<replacement::Basis> pw_cost_basis = std::nullopt;
  // The opportunity cost gets a row "gain on a sale now" (market value less book value).
  bool gain_on_sale = false;
};

// The after-tax cost of each year kept past its end (year, operating cost, depreciation, book
// value, taxable income, income tax, after-tax cost = operating cost + income tax), titled
// "<who>: after-tax cost of each year kept past its end", with a line on the signs under it.
// Money is positive for cost, as everywhere: a negative income tax is tax saved.
std::string kept_cash_flows(const std::string& who, const replacement::AfterTaxTable& flows,
                            const AuditFigures& audit = {});
// A sale at the end of each year, which takes the disposal-year deduction (year, market value,
// depreciation, book value, gain, disposal tax, net proceeds received, after-tax cost of the
// year), titled "<who>: if sold at the end of the year ...", with a line on the signs under it.
std::string sold_cash_flows(const std::string& who, const replacement::AfterTaxTable& flows);
// The two above, a blank line between them.
std::string cash_flow_tables(const std::string& who, const replacement::AfterTaxTable& flows,
                             const AuditFigures& audit = {});

// EUAC and marginal cost by years kept, before tax and, when the asset was analysed after tax,
// after tax; the best EUAC of each basis carries " *". The table only: the caller titles it.
std::string life_curve_table(const replacement::AssetAnalysis& asset,
                             const AuditFigures& audit = {});

// Selling now instead of keeping: market value now, book value now, the tax on a sale now
// (negative saves tax) and what keeping gives up after tax. The table only, untitled.
std::string opportunity_cost_table(const tax::SaleFlow& now, const AuditFigures& audit = {});

}  // namespace tenure::formats
