// Writing one review's results (see results_writer.h).
#include "db/results_writer.h"

#include <optional>

#include "core/version.h"

namespace tenure::db {
namespace {

using replacement::Basis;

std::optional<double> euac_on(const replacement::AssetAnalysis& a, Basis basis) {
  if (basis == Basis::after_tax && !a.after_tax) return std::nullopt;
  return a.on(basis).curve.best_euac;
}

std::optional<std::int64_t> esl_on(const replacement::AssetAnalysis& a, Basis basis) {
  if (basis == Basis::after_tax && !a.after_tax) return std::nullopt;
  return a.on(basis).curve.best_years;
}

std::int64_t insert_run(Connection& db, const RunRecord& run, const review::FleetData&,
                        const review::ReviewResult& result, const ReadReport& report) {
  Statement q(db,
              "INSERT INTO tenure_run(as_of, started_at, finished_at, policy_json, policy_sha256, "
              "rows_read, rows_rejected, status, basis, money, assets_reviewed, assets_retired, "
              "assets_not_yet_in_service, rows_after_as_of, tenure_version) VALUES (?1, ?2, "
              "strftime('%Y-%m-%dT%H:%M:%fZ','now'), ?3, ?4, ?5, ?6, 'ok', ?7, ?8, ?9, ?10, ?11, "
              "?12, ?13)");
  const review::Policy& policy = *run.policy;
  q.bind(1, run.as_of);
  q.bind(2, run.started_at);
  q.bind(3, run.policy_json);
  q.bind(4, run.policy_sha256);
  q.bind(5, report.rows_read);
  q.bind(6, static_cast<std::int64_t>(report.rejected.size()));
  q.bind(7, policy.rates.after_tax() ? "after_tax" : "before_tax");
  q.bind(8, policy.real_money() ? "real" : "nominal");
  q.bind(9, static_cast<std::int64_t>(result.assets.size()));
  q.bind(10, static_cast<std::int64_t>(result.retired));
  q.bind(11, static_cast<std::int64_t>(result.not_yet_in_service));
  q.bind(12, report.rows_after_as_of);
  q.bind(13, kVersion);
  q.run();
  return sqlite3_last_insert_rowid(db.handle());
}

}  // namespace

ResultsWriter::ResultsWriter(Connection& db, const RunRecord& run, const review::FleetData& data,
                             const review::ReviewResult& planned, const ReadReport& report)
    : db_(db),
      data_(data),
      run_id_(insert_run(db, run, data, planned, report)),
      asset_(db,
             "INSERT INTO tenure_asset_result(run_id, asset_id, asset_class, age_years, "
             "first_cost, book_value_now, market_value_now, market_value_source, cost_years, "
             "cost_ratio, credibility_factor, class_esl_years, defender_best_years, "
             "defender_euac, challenger_euac, defender_euac_before_tax, defender_euac_after_tax, "
             "marginal_cost_next_year, replace_after_years, verdict, reason, basis) VALUES "
             "(?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8, ?9, ?10, ?11, ?12, ?13, ?14, ?15, ?16, ?17, "
             "?18, ?19, ?20, ?21, ?22)"),
      curve_(db, "INSERT INTO tenure_euac_curve(run_id, asset_class, asset_id, role, basis, "
                 "years, euac, marginal_cost) VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8)"),
      flow_(db, "INSERT INTO tenure_cash_flow(run_id, asset_class, asset_id, role, year, "
                "operating_cost, depreciation, book_value, taxable_income, income_tax, "
                "after_tax_cash_flow, market_value, disposal_tax, net_proceeds) VALUES "
                "(?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8, ?9, ?10, ?11, ?12, ?13, ?14)") {
  Statement q(db_,
              "INSERT INTO tenure_class_result(run_id, asset_class, assets, challenger_first_cost, "
              "max_life_years, esl_years_before_tax, euac_before_tax, esl_years_after_tax, "
              "euac_after_tax, cost_model, cost_a, cost_g, cost_r2, asset_years, value_model, "
              "value_start, value_decline, valuations_used, note) VALUES (?1, ?2, ?3, ?4, ?5, "
              "?6, ?7, ?8, ?9, ?10, ?11, ?12, ?13, ?14, ?15, ?16, ?17, ?18, ?19)");
  for (const review::ClassModel& m : planned.classes) {
    q.bind(1, run_id_);
    q.bind(2, m.asset_class);
    q.bind(3, static_cast<std::int64_t>(m.assets));
    q.bind(4, m.policy->challenger_first_cost);
    q.bind(5, m.policy->max_life_years);
    if (m.challenger) {
      q.bind(6, esl_on(*m.challenger, Basis::before_tax));
      q.bind(7, euac_on(*m.challenger, Basis::before_tax));
      q.bind(8, esl_on(*m.challenger, Basis::after_tax));
      q.bind(9, euac_on(*m.challenger, Basis::after_tax));
    }
    if (m.cost_curve) {
      q.bind(10, fleet::name(m.cost_curve->model));
      q.bind(11, m.cost_curve->a);
      q.bind(12, m.cost_curve->g);
      q.bind(13, m.cost_curve->r2);
      q.bind(14, static_cast<std::int64_t>(m.cost_curve->asset_years));
    } else {
      q.bind(14, std::int64_t{0});
    }
    q.bind(15, fleet::name(m.value_curve.model));
    q.bind(16, m.value_curve.value_start);
    q.bind(17, m.value_curve.value_decline);
    q.bind(18, static_cast<std::int64_t>(m.value_curve.valuations_used));
    if (!m.note.empty()) q.bind(19, m.note);
    q.run();
    if (m.challenger) add_detail(m.asset_class, std::nullopt, "challenger", *m.challenger);
  }
}

void ResultsWriter::add_assets(std::span<const review::AssetReview> assets) {
  Statement& q = asset_;
  // In asset_id order (review::plan_review), so the primary-key index grows at its end.
  for (const review::AssetReview& r : assets) {
    const review::AssetRecord& record = data_.assets[r.asset];
    const review::DefenderInputs& in = r.inputs;
    q.bind(1, run_id_);
    q.bind(2, record.asset_id);
    q.bind(3, record.asset_class);
    q.bind(4, in.age_years);
    q.bind(5, record.first_cost);
    q.bind(6, r.book_value_now);
    q.bind(7, in.market_value_now);
    q.bind(8, in.market_value_source);
    q.bind(9, in.credibility.years);
    q.bind(10, in.credibility.ratio);
    q.bind(11, in.credibility.factor);
    if (r.decision) {
      const replacement::Decision& d = *r.decision;
      q.bind(12, r.class_esl_years);
      q.bind(13, d.defender_best_years);
      q.bind(14, d.defender_euac);
      q.bind(15, d.challenger_euac);
      q.bind(16, r.defender_euac_before_tax);
      q.bind(17, r.defender_euac_after_tax);
      q.bind(18, r.marginal_cost_next_year);
      q.bind(19, d.timing.keep_years);
    }
    q.bind(20, review::to_string(r.verdict));
    q.bind(21, r.reason);
    q.bind(22, replacement::to_string(r.basis));
    q.run();
    if (r.defender) add_detail(record.asset_class, record.asset_id, "defender", *r.defender);
  }
}

void ResultsWriter::add_rejected(const ReadReport& report) {
  Statement q(db_, "INSERT INTO tenure_rejected(run_id, source, row_ref, reason) VALUES (?1, ?2, ?3, ?4)");
  for (const Rejection& r : report.rejected) {
    q.bind(1, run_id_);
    q.bind(2, r.source);
    q.bind(3, r.row_ref);
    q.bind(4, r.reason);
    q.run();
  }
}

void ResultsWriter::add_detail(const std::string& asset_class,
                               const std::optional<std::string>& asset_id, const char* role,
                               const replacement::AssetAnalysis& a) {
  // Curves on both bases and the after-tax cash-flow table of one analysed asset.
  for (Basis basis : {Basis::before_tax, Basis::after_tax}) {
    if (basis == Basis::after_tax && !a.after_tax) continue;
    const replacement::LifeCurve& curve = a.on(basis).curve;
    for (std::size_t n = 0; n < curve.euac.size(); ++n) {
      curve_.bind(1, run_id_);
      curve_.bind(2, asset_class);
      curve_.bind(3, asset_id);
      curve_.bind(4, role);
      curve_.bind(5, replacement::to_string(basis));
      curve_.bind(6, static_cast<std::int64_t>(n + 1));
      curve_.bind(7, curve.euac[n]);
      curve_.bind(8, curve.marginal_costs[n]);
      curve_.run();
    }
  }
  for (const replacement::AfterTaxYear& y : a.table.years) {
    flow_.bind(1, run_id_);
    flow_.bind(2, asset_class);
    flow_.bind(3, asset_id);
    flow_.bind(4, role);
    flow_.bind(5, static_cast<std::int64_t>(y.kept.year));
    flow_.bind(6, y.kept.operating_cost);
    flow_.bind(7, y.kept.depreciation);
    flow_.bind(8, y.kept.book_value);
    flow_.bind(9, y.kept.taxable_income);
    flow_.bind(10, y.kept.income_tax);
    flow_.bind(11, y.kept.after_tax_cash_flow);
    flow_.bind(12, y.sale.market_value);
    flow_.bind(13, y.sale.tax);
    flow_.bind(14, y.sale.net_proceeds);
    flow_.run();
  }
}

}  // namespace tenure::db
