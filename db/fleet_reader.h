// Reads the maintenance database's three input relations (SPEC 3) through the policy's sources
// into review::FleetData, in one sequential pass over each: no ORDER BY, no per-event storage.
// Bad rows never stop the run: each is skipped with a reason a person can act on, collected for
// tenure_rejected. The relations are only read (SELECT), never written.
//
//   check_sources(db, policy.sources);            // InputError naming a missing relation/column
//   FleetData data(as_of, policy.cost_escalation);
//   ReadReport report = read_fleet(db, policy, data);
//   report.rejected[0].reason;   // "occurred_on '2023-02-29' is not a valid date (YYYY-MM-DD)"
//
// Row references name the row's position in the scan ("position 17", not a rowid: views have
// none) and its key values.
//
// Rules (cited by the code):
//   (1) asset: asset_id present, valid UTF-8, at most 256 bytes, not seen before (a duplicate is
//       rejected, the first row kept); asset_class present and in the policy; in_service_on a
//       valid date; first_cost an amount > 0; retired_on NULL or a valid date not before
//       in_service_on.
//   (2) cost_event: asset_id of an accepted asset; occurred_on a valid date, not before
//       in_service_on and not after retired_on; amount an amount (negative is a credit).
//   (3) asset_valuation: as (2), with amount an amount >= 0.
//   An amount is a number stored as one (text is refused, never read as 0), finite, and at most
//   kMaxAmount (1e15) in magnitude: no equipment costs more, and sums, restatements and EUACs of
//   amounts near the double's limit (1e308) would overflow to infinity.
//   (4) Events and valuations dated after the as-of date are not bad rows: they are not counted
//       and are tallied in rows_after_as_of.
#pragma once

#include <cstdint>
#include <string>
#include <vector>

#include "db/connection.h"
#include "db/cost_ranges.h"
#include "db/row_checks.h"
#include "results/rows.h"
#include "review/fleet_data.h"
#include "review/policy.h"

namespace tenure::db {

// A rejected input row, as tenure_rejected stores it.
using Rejection = results::RejectedRow;

struct ReadReport {
  std::int64_t rows_read = 0;
  std::int64_t rows_after_as_of = 0;
  std::vector<Rejection> rejected;
};

// Throws InputError naming "$.sources.<key>" when a relation or one of its columns is missing.
void check_sources(Connection& db, const review::Sources& sources);

// Fills `data` (constructed with the as-of date and cost escalation) from the three relations,
// inside the caller's read transaction. A cost-event table whose rowids span at least
// `split_min_rows` is read in two halves at once where that is safe (cost_ranges.h).
ReadReport read_fleet(Connection& db, const review::Policy& policy, review::FleetData& data,
                      std::int64_t split_min_rows = kSplitMinRows);

}  // namespace tenure::db
