// The bad rows the demo injects on purpose, so that the nightly review's rejected-rows record
// (SPEC 3) has something to show and tests can check that every kind is rejected and none
// vanishes silently. Duplicate asset ids are not among them: asset_id is the PRIMARY KEY.
//
//   for (const BadRow& bad : summary.bad_rows)
//     // bad.relation "cost_event", bad.row_number 4711 (the rowid in a freshly written table)
#pragma once

#include <cstdint>
#include <string>
#include <string_view>

namespace tenure::demo {

enum class BadRowKind {
  unparseable_date,           // cost_event.occurred_on like "31/12/2024"
  impossible_date,            // cost_event.occurred_on like "2023-02-29"
  non_numeric_amount,         // cost_event.amount is the text "n/a"
  non_finite_amount,          // cost_event.amount is +infinity
  event_before_in_service,    // cost_event dated 40 days before its asset's in_service_on
  event_after_retirement,     // cost_event dated 30 days after its asset's retired_on
  unknown_asset,              // cost_event for an asset_id that is not in asset
  non_positive_first_cost,    // asset.first_cost is 0
  unparseable_in_service_on,  // asset.in_service_on like "2019/07/04"
  negative_valuation,         // asset_valuation.amount < 0
};

inline constexpr int kBadRowKindCount = 10;

// "unparseable_date", "impossible_date", ... (the enumerator's name).
std::string_view name(BadRowKind kind);

struct BadRow {
  BadRowKind kind;
  std::string_view relation;  // "asset", "cost_event" or "asset_valuation"
  std::int64_t row_number;    // 1-based position among the relation's rows as generated, which is
                              // the rowid when they are inserted in order into a new table
  std::string asset_id;       // the row's asset_id
  std::string detail;         // what is wrong, e.g. "occurred_on '2023-02-29'"
};

}  // namespace tenure::demo
