// Writes one review's results (SPEC 7) in the caller's write transaction: the run row, per-class
// and per-asset results, EUAC curves and cash-flow tables (per the policy's detail), and the
// rejected rows. Every value is bound; statements are prepared once and reused. Assets are
// added in runs as the analysis finishes them (review::analyse_assets), in asset_id order.
//
//   Transaction tx(db, Transaction::Kind::immediate);
//   migrate(db);
//   ResultsWriter writer(db, run, data, planned, report);   // the run row and the classes
//   review::analyse_assets(data, policy, planned, {}, [&](auto done) { writer.add_assets(done); });
//   writer.add_rejected(report);
//   tx.commit();
#pragma once

#include <cstdint>
#include <optional>
#include <span>
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

class ResultsWriter {
 public:
  // Inserts the run row and the class results (with the challengers' detail) of `planned`, a
  // review::plan_review result; `data` and `run.policy` must outlive the writer.
  ResultsWriter(Connection& db, const RunRecord& run, const review::FleetData& data,
                const review::ReviewResult& planned, const ReadReport& report);
  std::int64_t run_id() const { return run_id_; }
  // Inserts analysed assets, with their detail where it was kept.
  void add_assets(std::span<const review::AssetReview> assets);
  void add_rejected(const ReadReport& report);

 private:
  void add_detail(const std::string& asset_class, const std::optional<std::string>& asset_id,
                  const char* role, const replacement::AssetAnalysis& analysis);

  Connection& db_;
  const review::FleetData& data_;
  std::int64_t run_id_;
  Statement asset_;
  Statement curve_;
  Statement flow_;
};

}  // namespace tenure::db
