// The stored tables, column by column (see tables.h). A new stored figure is one line here: its
// column, with `since` set to the schema version that adds it (nullable, so rows of older runs
// read as NULL) and `in_views` when the latest views should show it.
#include "results/tables.h"

#include <algorithm>
#include <initializer_list>

#include "results/stored_words.h"

namespace tenure::results {
namespace {

constexpr Column<RunRow> kRunColumns[] = {
    column<&RunRow::run_id>("run_id", "INTEGER PRIMARY KEY", {.assigned_by_database = true}),
    column<&RunRow::as_of>("as_of", "TEXT NOT NULL"),
    column<&RunRow::started_at>("started_at", "TEXT NOT NULL"),
    column<&RunRow::finished_at>("finished_at", "TEXT"),
    column<&RunRow::policy_json>("policy_json", "TEXT NOT NULL"),
    column<&RunRow::policy_sha256>("policy_sha256", "TEXT NOT NULL"),
    column<&RunRow::rows_read>("rows_read", "INTEGER NOT NULL"),
    column<&RunRow::rows_rejected>("rows_rejected", "INTEGER NOT NULL"),
    column<&RunRow::status>("status", "TEXT NOT NULL CHECK (status IN ('ok', 'failed'))"),
    column<&RunRow::basis>("basis", "TEXT NOT NULL", {.note = "'after_tax' or 'before_tax'"}),
    column<&RunRow::money>("money", "TEXT NOT NULL",
                           {.note = "'real' (costs restated by cost_escalation) or 'nominal'"}),
    column<&RunRow::assets_reviewed>("assets_reviewed", "INTEGER NOT NULL"),
    column<&RunRow::assets_retired>("assets_retired", "INTEGER NOT NULL"),
    column<&RunRow::assets_not_yet_in_service>("assets_not_yet_in_service", "INTEGER NOT NULL"),
    column<&RunRow::rows_after_as_of>(
        "rows_after_as_of", "INTEGER NOT NULL",
        {.note = "events and valuations dated after as_of: not counted"}),
    column<&RunRow::tenure_version>("tenure_version", "TEXT NOT NULL"),
    column<&RunRow::scenario>(
        "scenario", "TEXT",
        {.note = "NULL: a baseline run; else the what-if run's name", .since = 2}),
};

constexpr Column<ClassRow> kClassColumns[] = {
    column<&ClassRow::asset_class>("asset_class", "TEXT NOT NULL"),
    column<&ClassRow::assets>("assets", "INTEGER NOT NULL", {.in_views = true}),
    column<&ClassRow::challenger_first_cost>("challenger_first_cost", "REAL NOT NULL",
                                             {.in_views = true}),
    column<&ClassRow::max_life_years>("max_life_years", "INTEGER NOT NULL", {.in_views = true}),
    column<&ClassRow::esl_years_before_tax>("esl_years_before_tax", "INTEGER"),
    column<&ClassRow::euac_before_tax>("euac_before_tax", "REAL"),
    column<&ClassRow::esl_years_after_tax>("esl_years_after_tax", "INTEGER"),
    column<&ClassRow::euac_after_tax>("euac_after_tax", "REAL"),
    column<&ClassRow::cost_model>("cost_model", "TEXT"),
    column<&ClassRow::cost_a>("cost_a", "REAL"),
    column<&ClassRow::cost_g>("cost_g", "REAL"),
    column<&ClassRow::cost_r2>("cost_r2", "REAL"),
    column<&ClassRow::asset_years>("asset_years", "INTEGER NOT NULL"),
    column<&ClassRow::value_model>("value_model", "TEXT NOT NULL"),
    column<&ClassRow::value_start>("value_start", "REAL NOT NULL"),
    column<&ClassRow::value_decline>("value_decline", "REAL NOT NULL"),
    column<&ClassRow::valuations_used>("valuations_used", "INTEGER NOT NULL"),
    column<&ClassRow::note>("note", "TEXT", {.in_views = true}),
    column<&ClassRow::esl_band_low>(
        "esl_band_low", "INTEGER",
        {.note = "shortest life within esl_band of the least EUAC", .since = 2, .in_views = true}),
    column<&ClassRow::esl_band_high>(
        "esl_band_high", "INTEGER",
        {.note = "longest life within esl_band of the least EUAC", .since = 2, .in_views = true}),
    column<&ClassRow::esl_p10>("esl_p10", "INTEGER",
                               {.note = "10th percentile of the life over 200 bootstrap refits",
                                .since = 2,
                                .in_views = true}),
    column<&ClassRow::esl_p90>("esl_p90", "INTEGER",
                               {.note = "90th percentile of the life over 200 bootstrap refits",
                                .since = 2,
                                .in_views = true}),
};

constexpr Column<AssetRow> kAssetColumns[] = {
    column<&AssetRow::asset_id>("asset_id", "TEXT NOT NULL"),
    column<&AssetRow::asset_class>("asset_class", "TEXT NOT NULL"),
    column<&AssetRow::age_years>("age_years", "INTEGER NOT NULL"),
    column<&AssetRow::first_cost>("first_cost", "REAL NOT NULL", {.in_views = true}),
    column<&AssetRow::book_value_now>("book_value_now", "REAL NOT NULL", {.in_views = true}),
    column<&AssetRow::market_value_now>("market_value_now", "REAL NOT NULL", {.in_views = true}),
    column<&AssetRow::market_value_source>("market_value_source", "TEXT NOT NULL",
                                           {.in_views = true}),
    column<&AssetRow::cost_years>("cost_years", "INTEGER NOT NULL",
                                  {.note = "complete age-years of its own cost history"}),
    column<&AssetRow::cost_ratio>("cost_ratio", "REAL NOT NULL",
                                  {.note = "its observed / class-predicted cost"}),
    column<&AssetRow::credibility_factor>(
        "credibility_factor", "REAL NOT NULL",
        {.note = "1 + z (ratio - 1), z = m / (m + 3)", .in_views = true}),
    column<&AssetRow::class_esl_years>("class_esl_years", "INTEGER"),
    column<&AssetRow::defender_best_years>("defender_best_years", "INTEGER", {.in_views = true}),
    column<&AssetRow::defender_euac>("defender_euac", "REAL"),
    column<&AssetRow::challenger_euac>("challenger_euac", "REAL"),
    column<&AssetRow::defender_euac_before_tax>("defender_euac_before_tax", "REAL"),
    column<&AssetRow::defender_euac_after_tax>("defender_euac_after_tax", "REAL"),
    column<&AssetRow::marginal_cost_next_year>("marginal_cost_next_year", "REAL"),
    column<&AssetRow::replace_after_years>("replace_after_years", "INTEGER"),
    column<&AssetRow::verdict>("verdict",
                               "TEXT NOT NULL CHECK (verdict IN ('keep', 'review', 'replace'))"),
    column<&AssetRow::reason>("reason", "TEXT NOT NULL"),
    column<&AssetRow::basis>("basis", "TEXT NOT NULL"),
    column<&AssetRow::delay_cost>("delay_cost", "REAL", {.since = 2, .in_views = true}),
    column<&AssetRow::early_cost>("early_cost", "REAL", {.since = 2, .in_views = true}),
    column<&AssetRow::repair_limit>("repair_limit", "REAL", {.since = 2, .in_views = true}),
    column<&AssetRow::break_even_price>("break_even_price", "REAL",
                                        {.since = 2, .in_views = true}),
    column<&AssetRow::break_even_cost_factor>("break_even_cost_factor", "REAL",
                                              {.since = 2, .in_views = true}),
    column<&AssetRow::close_call>("close_call", "INTEGER CHECK (close_call IN (0, 1))",
                                  {.since = 2, .in_views = true}),
    column<&AssetRow::challenger>(
        "challenger", "TEXT",
        {.note = "the class challenger weighed, by name; NULL in the one-challenger form",
         .since = 3,
         .in_views = true}),
};

constexpr Column<CurveRow> kCurveColumns[] = {
    column<&CurveRow::asset_class>("asset_class", "TEXT NOT NULL"),
    column<&CurveRow::asset_id>("asset_id", "TEXT", {.note = "NULL for the class challenger"}),
    column<&CurveRow::role>("role", "TEXT NOT NULL CHECK (role IN ('challenger', 'defender'))"),
    column<&CurveRow::basis>("basis", "TEXT NOT NULL"),
    column<&CurveRow::years>("years", "INTEGER NOT NULL"),
    column<&CurveRow::euac>("euac", "REAL NOT NULL"),
    column<&CurveRow::marginal_cost>("marginal_cost", "REAL NOT NULL"),
};

constexpr Column<CashFlowRow> kCashFlowColumns[] = {
    column<&CashFlowRow::asset_class>("asset_class", "TEXT NOT NULL"),
    column<&CashFlowRow::asset_id>("asset_id", "TEXT", {.note = "NULL for the class challenger"}),
    column<&CashFlowRow::role>("role", "TEXT NOT NULL CHECK (role IN ('challenger', 'defender'))"),
    column<&CashFlowRow::year>("year", "INTEGER NOT NULL", {.note = "years kept"}),
    column<&CashFlowRow::operating_cost>("operating_cost", "REAL NOT NULL"),
    column<&CashFlowRow::depreciation>("depreciation", "REAL NOT NULL"),
    column<&CashFlowRow::book_value>("book_value", "REAL NOT NULL"),
    column<&CashFlowRow::taxable_income>("taxable_income", "REAL NOT NULL"),
    column<&CashFlowRow::income_tax>("income_tax", "REAL NOT NULL"),
    column<&CashFlowRow::after_tax_cash_flow>("after_tax_cash_flow", "REAL NOT NULL"),
    column<&CashFlowRow::market_value>("market_value", "REAL NOT NULL",
                                       {.note = "if sold at the end of this year"}),
    column<&CashFlowRow::disposal_tax>("disposal_tax", "REAL NOT NULL"),
    column<&CashFlowRow::net_proceeds>("net_proceeds", "REAL NOT NULL"),
};

constexpr Column<RejectedRow> kRejectedColumns[] = {
    column<&RejectedRow::source>("source", "TEXT NOT NULL",
                                 {.note = "the input relation, as named by the policy's sources"}),
    column<&RejectedRow::row_ref>("row_ref", "TEXT NOT NULL"),
    column<&RejectedRow::reason>("reason", "TEXT NOT NULL"),
};

constexpr Index kCurveIndexes[] = {
    {"tenure_euac_curve_by_asset", "(run_id, asset_class, asset_id)"}};
constexpr Index kCashFlowIndexes[] = {
    {"tenure_cash_flow_by_asset", "(run_id, asset_class, asset_id)"}};
constexpr Index kRejectedIndexes[] = {{"tenure_rejected_by_run", "(run_id)"}};

template <class Row>
int newest_of(std::span<const Column<Row>> columns) {
  int newest = 1;
  for (const Column<Row>& c : columns) newest = std::max(newest, c.options.since);
  return newest;
}

}  // namespace

const char* to_string(MoneyTerms terms) { return terms == MoneyTerms::real ? "real" : "nominal"; }
const char* to_string(RunStatus status) { return status == RunStatus::ok ? "ok" : "failed"; }
const char* to_string(Role role) { return role == Role::challenger ? "challenger" : "defender"; }

bool more_urgent(const AssetRow& a, const AssetRow& b) {
  if (a.delay_cost.has_value() != b.delay_cost.has_value()) return a.delay_cost.has_value();
  if (a.delay_cost && *a.delay_cost != *b.delay_cost) return *a.delay_cost > *b.delay_cost;
  const bool a_now = a.verdict == review::Verdict::replace;
  const bool b_now = b.verdict == review::Verdict::replace;
  if (a_now != b_now) return a_now;
  return a.asset_id < b.asset_id;
}

const Table<RunRow>& run_table() {
  static const Table<RunRow> table{"tenure_run", false, kRunColumns, {}, {}};
  return table;
}

const Table<ClassRow>& class_table() {
  static const Table<ClassRow> table{
      "tenure_class_result", true, kClassColumns, "PRIMARY KEY (run_id, asset_class)", {}};
  return table;
}

const Table<AssetRow>& asset_table() {
  static const Table<AssetRow> table{
      "tenure_asset_result", true, kAssetColumns, "PRIMARY KEY (run_id, asset_id)", {}};
  return table;
}

const Table<CurveRow>& curve_table() {
  static const Table<CurveRow> table{"tenure_euac_curve", true, kCurveColumns, {}, kCurveIndexes};
  return table;
}

const Table<CashFlowRow>& cash_flow_table() {
  static const Table<CashFlowRow> table{
      "tenure_cash_flow", true, kCashFlowColumns, {}, kCashFlowIndexes};
  return table;
}

const Table<RejectedRow>& rejected_table() {
  static const Table<RejectedRow> table{
      "tenure_rejected", true, kRejectedColumns, {}, kRejectedIndexes};
  return table;
}

int newest_column_version() {
  return std::max({newest_of(run_table().columns), newest_of(class_table().columns),
                   newest_of(asset_table().columns), newest_of(curve_table().columns),
                   newest_of(cash_flow_table().columns), newest_of(rejected_table().columns)});
}

}  // namespace tenure::results
