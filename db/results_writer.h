// Writes one review's results (SPEC 7) in the caller's write transaction: the run row, per-class
// and per-asset results, EUAC curves and cash-flow tables (per the policy's detail), and the
// rejected rows. Every value is bound; statements are prepared once and reused.
//
//   Transaction tx(db, Transaction::Kind::immediate);
//   migrate(db);
//   std::int64_t run_id = write_results(db, run, data, result, report);
//   tx.commit();
#pragma once

#include <cstdint>
#include <string>

#include "db/connection.h"
#include "db/fleet_reader.h"
#include "review/fleet_review.h"

namespace tenure::db {

struct RunRecord {
  std::string as_of;        // YYYY-MM-DD
  std::string started_at;   // ISO 8601 UTC
  std::string policy_json;  // as given
  std::string policy_sha256;
  const review::Policy* policy;
};

std::int64_t write_results(Connection& db, const RunRecord& run, const review::FleetData& data,
                           const review::ReviewResult& result, const ReadReport& report);

}  // namespace tenure::db
