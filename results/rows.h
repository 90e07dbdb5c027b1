// The rows of one stored review run (SPEC 7), as plain values: the run, its classes, its assets,
// the EUAC curves and cash-flow tables kept, and the rejected input rows. results/tables.h says
// which column of which tenure_ table holds each field; db/ writes and reads them through it,
// and explain/ and report/ work on them without touching SQLite. Stored words (verdict, basis,
// money, models, role) are enums here, parsed once when a row is read.
//
//   RunRow run = db::read_run(db, std::nullopt);           // the latest baseline run
//   AssetRow asset = *db::read_asset_result(db, run.run_id, "PU-0042");
//   asset.defender_euac;    // the figure explain must reproduce exactly
//   asset.due();            // verdict is review or replace
#pragma once

#include <cstdint>
#include <optional>
#include <string>

#include "core/types.h"
#include "fleet/cost_curve.h"
#include "fleet/value_curve.h"
#include "replacement/keeping_costs.h"
#include "review/verdict_rule.h"

namespace tenure::results {

// Whether a run's costs were restated into as-of money (real, with a real MARR) or not.
enum class MoneyTerms { real, nominal };
const char* to_string(MoneyTerms terms);  // "real" | "nominal"

enum class RunStatus { ok, failed };
const char* to_string(RunStatus status);  // "ok" | "failed"

// Who a stored curve or cash-flow row is about: the class challenger or one asset.
enum class Role { challenger, defender };
const char* to_string(Role role);  // "challenger" | "defender"

// A row of tenure_run.
struct RunRow {
  std::int64_t run_id = 0;  // given by the database when the row is inserted
  std::string as_of;        // YYYY-MM-DD
  std::string started_at;   // ISO 8601 UTC
  std::optional<std::string> finished_at;
  std::string policy_json;  // the policy text the run used, comments kept
  std::string policy_sha256;
  std::int64_t rows_read = 0;
  std::int64_t rows_rejected = 0;
  RunStatus status = RunStatus::ok;
  replacement::Basis basis = replacement::Basis::after_tax;
  MoneyTerms money = MoneyTerms::nominal;
  std::int64_t assets_reviewed = 0;
  std::int64_t assets_retired = 0;
  std::int64_t assets_not_yet_in_service = 0;
  std::int64_t rows_after_as_of = 0;  // events and valuations dated after as_of: not counted
  std::string tenure_version;
  // The what-if run's name (`tenure review --scenario`); none for a baseline run, the only runs
  // the nightly views follow (db/schema.h).
  std::optional<std::string> scenario;
};

// The rows below belong to one run: their tables key them by run_id (results/tables.h), which
// the writer binds and the readers select by, so the rows themselves do not carry it.

// A row of tenure_class_result. The cost curve columns are empty when the class had no complete
// year of costs (and then so are the challenger's figures).
struct ClassRow {
  std::string asset_class;
  std::int64_t assets = 0;
  Money challenger_first_cost = 0;
  Years max_life_years = 0;
  std::optional<Years> esl_years_before_tax;
  std::optional<Money> euac_before_tax;
  std::optional<Years> esl_years_after_tax;
  std::optional<Money> euac_after_tax;
  std::optional<fleet::CostModel> cost_model;
  std::optional<double> cost_a, cost_g, cost_r2;
  std::int64_t asset_years = 0;
  fleet::ValueModel value_model = fleet::ValueModel::policy;
  double value_start = 1;
  double value_decline = 0;
  std::int64_t valuations_used = 0;
  std::optional<std::string> note;  // why there is no challenger, or what was assumed
  // How firm the economic life is (SPEC 11 "Per class", on the run's basis; empty without a
  // challenger): the shortest and longest lives within esl_band of the least EUAC
  // (review/esl_band.h), and the life's 10th and 90th percentiles over the bootstrap refits
  // (review/esl_bootstrap.h).
  std::optional<Years> esl_band_low, esl_band_high;
  std::optional<Years> esl_p10, esl_p90;
};

// A row of tenure_asset_result. The optional figures are empty when the class could not be
// weighed.
struct AssetRow {
  std::string asset_id;
  std::string asset_class;
  Years age_years = 0;
  Money first_cost = 0;
  Money book_value_now = 0;
  Money market_value_now = 0;
  std::string market_value_source;  // "valuation of 2026-05-14" or "class value curve"
  int cost_years = 0;               // complete age-years of its own cost history
  double cost_ratio = 1;            // its observed / class-predicted cost
  double credibility_factor = 1;    // 1 + z (ratio - 1), z = m / (m + 3)
  std::optional<Years> class_esl_years;
  std::optional<Years> defender_best_years;
  std::optional<Money> defender_euac;
  std::optional<Money> challenger_euac;
  std::optional<Money> defender_euac_before_tax;
  std::optional<Money> defender_euac_after_tax;
  std::optional<Money> marginal_cost_next_year;
  std::optional<Years> replace_after_years;
  review::Verdict verdict = review::Verdict::review;
  std::string reason;
  replacement::Basis basis = replacement::Basis::after_tax;
  // What is at stake (SPEC 11, review/at_stake.h); empty when the class could not be weighed.
  std::optional<Money> delay_cost;
  std::optional<Money> early_cost;
  std::optional<Money> repair_limit;
  std::optional<Money> break_even_price;
  std::optional<double> break_even_cost_factor;
  std::optional<bool> close_call;
  // The several-challengers form (SPEC 14): the class challenger its verdict weighs.
  std::optional<std::string> challenger;

  bool due() const { return verdict != review::Verdict::keep; }
};

// The order of the morning list (`tenure due`, the report): the largest cost of waiting a year
// first (none last), then replace before review, then by asset_id.
bool more_urgent(const AssetRow& a, const AssetRow& b);

// A row of tenure_euac_curve: one point of a stored EUAC curve.
struct CurveRow {
  std::string asset_class;
  std::optional<std::string> asset_id;  // none for the class challenger
  Role role = Role::challenger;
  replacement::Basis basis = replacement::Basis::after_tax;
  Years years = 0;
  Money euac = 0;
  Money marginal_cost = 0;
};

// A row of tenure_cash_flow: one year kept of an after-tax cash-flow table.
struct CashFlowRow {
  std::string asset_class;
  std::optional<std::string> asset_id;  // none for the class challenger
  Role role = Role::challenger;
  Years year = 0;  // years kept
  Money operating_cost = 0;
  Money depreciation = 0;
  Money book_value = 0;
  Money taxable_income = 0;
  Money income_tax = 0;
  Money after_tax_cash_flow = 0;
  Money market_value = 0;  // if sold at the end of this year
  Money disposal_tax = 0;
  Money net_proceeds = 0;
};

// A row of tenure_rejected.
struct RejectedRow {
  std::string source;   // the input relation, as named by the policy's sources
  std::string row_ref;  // "position 17 (asset_id 'PU-0017')"
  std::string reason;
};

}  // namespace tenure::results
