// What one stored review run left in the database (SPEC 7), as plain values: the run row, the
// class and asset result rows, the class challengers' EUAC curves and the rejected rows, plus the
// one asset's input row and cost events that `tenure explain` reads back. db/run_reader.h fills
// these from SQL; explain/ and report/ work on them without touching SQLite.
//
//   StoredRun run = db::read_run(db, std::nullopt);        // the latest successful run
//   StoredAsset asset = *db::read_asset_result(db, run.run_id, "PU-0042");
//   asset.defender_euac;    // the figure explain must reproduce exactly
#pragma once

#include <cstdint>
#include <optional>
#include <string>
#include <vector>

#include "core/types.h"

namespace tenure::explain {

// A row of tenure_run.
struct StoredRun {
  std::int64_t run_id = 0;
  std::string as_of;        // YYYY-MM-DD
  std::string started_at;
  std::string finished_at;
  std::string policy_json;  // the policy text the run used, comments kept
  std::string policy_sha256;
  std::int64_t rows_read = 0;
  std::int64_t rows_rejected = 0;
  std::string basis;        // after_tax | before_tax
  std::string money;        // real | nominal
  std::int64_t assets_reviewed = 0;
  std::int64_t assets_retired = 0;
  std::int64_t assets_not_yet_in_service = 0;
  std::int64_t rows_after_as_of = 0;
  std::string tenure_version;
};

// A row of tenure_class_result. The cost curve columns are empty when the class had no complete
// year of costs (and then so are the challenger's figures).
struct StoredClass {
  std::string asset_class;
  std::int64_t assets = 0;
  Money challenger_first_cost = 0;
  Years max_life_years = 0;
  std::optional<Years> esl_years_before_tax;
  std::optional<Money> euac_before_tax;
  std::optional<Years> esl_years_after_tax;
  std::optional<Money> euac_after_tax;
  std::optional<std::string> cost_model;  // linear | geometric
  std::optional<double> cost_a, cost_g, cost_r2;
  std::int64_t asset_years = 0;
  std::string value_model;                // fitted | policy
  double value_start = 1;
  double value_decline = 0;
  std::int64_t valuations_used = 0;
  std::string note;
};

// A row of tenure_asset_result. The optional figures are empty when the class could not be
// weighed.
struct StoredAsset {
  std::string asset_id;
  std::string asset_class;
  Years age_years = 0;
  Money first_cost = 0;
  Money book_value_now = 0;
  Money market_value_now = 0;
  std::string market_value_source;
  int cost_years = 0;
  double cost_ratio = 1;
  double credibility_factor = 1;
  std::optional<Years> class_esl_years;
  std::optional<Years> defender_best_years;
  std::optional<Money> defender_euac;
  std::optional<Money> challenger_euac;
  std::optional<Money> defender_euac_before_tax;
  std::optional<Money> defender_euac_after_tax;
  std::optional<Money> marginal_cost_next_year;
  std::optional<Years> replace_after_years;
  std::string verdict;  // keep | review | replace
  std::string reason;
  std::string basis;    // after_tax | before_tax

  bool due() const { return verdict != "keep"; }
};

// One point of a class challenger's stored EUAC curve (tenure_euac_curve, role 'challenger').
struct CurvePoint {
  std::string asset_class;
  std::string basis;  // after_tax | before_tax
  Years years = 0;
  Money euac = 0;
  Money marginal_cost = 0;
};

// A row of tenure_rejected.
struct RejectedRow {
  std::string source;
  std::string row_ref;
  std::string reason;
};

// One cost event of the asset as the input relation holds it now. Rows whose date is not text
// or whose amount is not a number are counted in InputAsset::events_unreadable instead.
struct CostEventRow {
  std::string occurred_on;
  Money amount = 0;
};

// The asset's row in the input relation (policy sources.assets) and its cost events
// (sources.costs), read again for `tenure explain`: the run stores totals, not events.
struct InputAsset {
  std::string in_service_on;
  std::optional<std::string> retired_on;
  Money first_cost = 0;
  std::vector<CostEventRow> events;
  std::size_t events_unreadable = 0;
};

}  // namespace tenure::explain
