// One asset's replacement analysis as JSON, money positive for cost and at full double precision:
// its life curves on each basis, its after-tax cash flows, and what selling it now would bring.
// The one owner of these objects: `tenure case` (case_json.cpp) writes them as SPEC 5 gives them,
// `tenure explain` (explain/explain_json.cpp) adds its audit figures through JsonAuditFigures.
//
//   nlohmann::json c = asset_analysis_to_json(result.challenger, "esl_years");
//   // {"before_tax": {"esl_years": 5, "euac": ..., "curve": [{"years": 1, "euac": ...}, ...],
//   //                 "marginal_costs": [...]},
//   //  "after_tax": {...}, "cash_flows": [{"year": 1, ..., "if_sold": {...}}, ...]}
//   asset_analysis_to_json(defender, "best_years", {.present_worth_rate = 0.075, .pw_cost = true});
//   // ... the same, plus "present_worth" per cash-flow row, "pw_cost" per point, "rate" per curve
#pragma once

#include <optional>

#include <nlohmann/json.hpp>

#include "core/types.h"
#include "replacement/case_analysis.h"
#include "tax/cash_flows.h"

namespace tenure::formats {

// The figures an audit adds to the objects; the defaults add none.
struct JsonAuditFigures {
  // Each cash-flow row gets "present_worth": its after-tax cash flow discounted at this rate.
  std::optional<Rate> present_worth_rate = std::nullopt;
  // Each curve point gets "pw_cost" (the present worth of the cost of keeping that many years),
  // and each curve the "rate" it was discounted at.
  bool pw_cost = false;
};

// One life curve on one basis: {best_key: n, "euac": least EUAC, "curve": [{"years", "euac"},
// ...], "marginal_costs": [...]}. `best_key` is "esl_years" for a challenger, "best_years" for a
// defender (SPEC 5).
nlohmann::json life_curve_to_json(const replacement::BasisAnalysis& analysis, const char* best_key,
                                  const JsonAuditFigures& audit = {});

// One row per year kept: year, operating_cost, depreciation, book_value, taxable_income,
// income_tax, after_tax_cash_flow, and "if_sold" {market_value, depreciation (the disposal-year
// deduction), book_value, gain, disposal_tax, net_proceeds, after_tax_cash_flow}.
nlohmann::json cash_flows_to_json(const replacement::AfterTaxTable& table,
                                  const JsonAuditFigures& audit = {});

// {"before_tax": curve, "after_tax": curve (when analysed after tax), "cash_flows": rows}.
nlohmann::json asset_analysis_to_json(const replacement::AssetAnalysis& asset, const char* best_key,
                                      const JsonAuditFigures& audit = {});

// Selling now instead of keeping: {market_value_now, book_value_now, tax_on_sale_now, after_tax}.
nlohmann::json opportunity_cost_to_json(const tax::SaleFlow& now);

}  // namespace tenure::formats
