// One asset's analysis as JSON (see analysis_json.h).
#include "formats/analysis_json.h"

#include "interest/factors.h"

namespace tenure::formats {

using nlohmann::json;

json life_curve_to_json(const replacement::BasisAnalysis& analysis, const char* best_key,
                        const JsonAuditFigures& audit) {
  const replacement::LifeCurve& curve = analysis.curve;
  json points = json::array();
  for (std::size_t n = 0; n < curve.euac.size(); ++n) {
    const auto years = static_cast<Years>(n + 1);
    json point = {{"years", years}, {"euac", curve.euac[n]}};
    if (audit.pw_cost) point["pw_cost"] = analysis.costs.pw_cost(years);
    points.push_back(std::move(point));
  }
  json out = {{best_key, curve.best_years},
              {"euac", curve.best_euac},
              {"curve", std::move(points)},
              {"marginal_costs", curve.marginal_costs}};
  if (audit.pw_cost) out["rate"] = analysis.costs.rate();
  return out;
}

json cash_flows_to_json(const replacement::AfterTaxTable& table, const JsonAuditFigures& audit) {
  json rows = json::array();
  for (const replacement::AfterTaxYear& year : table.years) {
    const tax::YearFlow& kept = year.kept;
    json row = {{"year", kept.year},
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
                  {"after_tax_cash_flow", year.sold.after_tax_cash_flow}}}};
    if (const auto rate = audit.present_worth_rate) {
      row["present_worth"] = kept.after_tax_cash_flow * interest::pf(*rate, kept.year);
    }
    rows.push_back(std::move(row));
  }
  return rows;
}

json asset_analysis_to_json(const replacement::AssetAnalysis& asset, const char* best_key,
                            const JsonAuditFigures& audit) {
  json out = {{"before_tax", life_curve_to_json(asset.before_tax, best_key, audit)}};
  if (asset.after_tax) out["after_tax"] = life_curve_to_json(*asset.after_tax, best_key, audit);
  out["cash_flows"] = cash_flows_to_json(asset.table, audit);
  return out;
}

json opportunity_cost_to_json(const tax::SaleFlow& now) {
  return {{"market_value_now", now.market_value},
          {"book_value_now", now.book_value},
          {"tax_on_sale_now", now.tax},
          {"after_tax", now.net_proceeds}};
}

}  // namespace tenure::formats
