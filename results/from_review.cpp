// Rows of what the review computed (see from_review.h).
#include "results/from_review.h"

#include <cmath>

namespace tenure::results {

using replacement::Basis;

Basis basis_of(const review::Policy& policy) {
  return policy.rates.after_tax() ? Basis::after_tax : Basis::before_tax;
}

MoneyTerms money_of(const review::Policy& policy) {
  return policy.real_money() ? MoneyTerms::real : MoneyTerms::nominal;
}

ClassRow class_row(const review::ClassModel& m) {
  ClassRow row;
  row.asset_class = m.asset_class;
  row.assets = static_cast<std::int64_t>(m.assets);
  row.challenger_first_cost = m.challenger_price;
  row.max_life_years = m.policy->max_life_years;
  if (m.challenger) {
    const replacement::LifeCurve& before = m.challenger->before_tax.curve;
    row.esl_years_before_tax = before.best_years;
    row.euac_before_tax = before.best_euac;
    if (m.challenger->after_tax) {
      row.esl_years_after_tax = m.challenger->after_tax->curve.best_years;
      row.euac_after_tax = m.challenger->after_tax->curve.best_euac;
    }
  }
  if (m.cost_curve) {
    row.cost_model = m.cost_curve->model;
    row.cost_a = m.cost_curve->a;
    row.cost_g = m.cost_curve->g;
    // A fit whose predictions overflow at the highest ages has no finite r2: none is stored.
    if (std::isfinite(m.cost_curve->r2)) row.cost_r2 = m.cost_curve->r2;
    row.asset_years = static_cast<std::int64_t>(m.cost_curve->asset_years);
  }
  row.value_model = m.value_curve.model;
  row.value_start = m.value_curve.value_start;
  row.value_decline = m.value_curve.value_decline;
  row.valuations_used = static_cast<std::int64_t>(m.value_curve.valuations_used);
  if (!m.note.empty()) row.note = m.note;
  if (m.band) {
    row.esl_band_low = m.band->low;
    row.esl_band_high = m.band->high;
  }
  if (m.spread) {
    row.esl_p10 = m.spread->p10;
    row.esl_p90 = m.spread->p90;
  }
  return row;
}

AssetRow asset_row(const review::AssetReview& r, const review::AssetRecord& record) {
  const review::DefenderInputs& in = r.inputs;
  AssetRow row;
  row.asset_id = record.asset_id;
  row.asset_class = record.asset_class;
  row.age_years = in.age_years;
  row.first_cost = record.first_cost;
  row.book_value_now = r.book_value_now;
  row.market_value_now = in.market_value_now;
  row.market_value_source = in.market_value_source;
  row.cost_years = in.credibility.years;
  row.cost_ratio = in.credibility.ratio;
  row.credibility_factor = in.credibility.factor;
  if (r.decision) {
    const replacement::Decision& d = *r.decision;
    row.class_esl_years = r.class_esl_years;
    row.defender_best_years = d.defender_best_years;
    row.defender_euac = d.defender_euac;
    row.challenger_euac = d.challenger_euac;
    row.defender_euac_before_tax = r.defender_euac_before_tax;
    row.defender_euac_after_tax = r.defender_euac_after_tax;
    row.marginal_cost_next_year = r.marginal_cost_next_year;
    row.replace_after_years = d.timing.keep_years;
    if (!r.challenger.empty()) row.challenger = r.challenger;
  }
  if (r.at_stake) {
    const review::AtStake& s = *r.at_stake;
    row.delay_cost = s.delay_cost;
    row.early_cost = s.early_cost;
    row.repair_limit = s.repair_limit;
    row.break_even_price = s.break_even_price;
    row.break_even_cost_factor = s.break_even_cost_factor;
    row.close_call = s.close_call;
  }
  row.verdict = r.finding.verdict;
  row.reason = r.finding.reason;
  row.basis = r.basis;
  return row;
}

std::vector<CurveRow> curve_rows(const std::string& asset_class,
                                 const std::optional<std::string>& asset_id, Role role,
                                 const replacement::AssetAnalysis& a) {
  std::vector<CurveRow> rows;
  for (Basis basis : {Basis::before_tax, Basis::after_tax}) {
    if (basis == Basis::after_tax && !a.after_tax) continue;
    const replacement::LifeCurve& curve = a.on(basis).curve;
    for (std::size_t n = 0; n < curve.euac.size(); ++n) {
      rows.push_back({asset_class, asset_id, role, basis, static_cast<Years>(n + 1), curve.euac[n],
                      curve.marginal_costs[n]});
    }
  }
  return rows;
}

std::vector<CashFlowRow> cash_flow_rows(const std::string& asset_class,
                                        const std::optional<std::string>& asset_id, Role role,
                                        const replacement::AfterTaxTable& table) {
  std::vector<CashFlowRow> rows;
  for (const replacement::AfterTaxYear& y : table.years) {
    rows.push_back({asset_class, asset_id, role, static_cast<Years>(y.kept.year),
                    y.kept.operating_cost, y.kept.depreciation, y.kept.book_value,
                    y.kept.taxable_income, y.kept.income_tax, y.kept.after_tax_cash_flow,
                    y.sale.market_value, y.sale.tax, y.sale.net_proceeds});
  }
  return rows;
}

}  // namespace tenure::results
