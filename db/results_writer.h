// Writes one review's results (SPEC 7) in the caller's write transaction: the run row, per-class
// and per-asset results, EUAC curves and cash-flow tables (per the policy's detail), and the
// rejected rows, each as the row results/from_review.h makes of it, through its table's
// generated INSERT (db/table_sql.h). Assets are added in runs as the analysis finishes them
// (review::analyse_assets), in asset_id order.
//
//   Transaction tx(db, Transaction::Kind::immediate);
//   migrate(db);
//   ResultsWriter writer(db, run_row, data, planned);   // the run row and the classes
//   review::analyse_assets(data, policy, planned, {}, [&](auto done) { writer.add_assets(done); });
//   writer.add_rejected(report.rejected);
//   tx.commit();
#pragma once

#include <cstdint>
#include <optional>
#include <span>
#include <string>

#include "db/connection.h"
#include "db/table_sql.h"
#include "results/rows.h"
#include "review/fleet_review.h"

namespace tenure::db {

class ResultsWriter {
 public:
  // Inserts `run` (the database gives its run_id) and the class results, with the challengers'
  // detail, of `planned`, a review::plan_review result; `data` must outlive the writer.
  ResultsWriter(Connection& db, const results::RunRow& run, const review::FleetData& data,
                const review::ReviewResult& planned);
  std::int64_t run_id() const { return run_id_; }
  // Inserts analysed assets, with their detail where it was kept.
  void add_assets(std::span<const review::AssetReview> assets);
  void add_rejected(std::span<const results::RejectedRow> rows);

 private:
  void add_detail(const std::string& asset_class, const std::optional<std::string>& asset_id,
                  results::Role role, const replacement::AssetAnalysis& analysis);

  Connection& db_;
  const review::FleetData& data_;
  std::int64_t run_id_;
  TableWriter<results::AssetRow> assets_;
  TableWriter<results::CurveRow> curves_;
  TableWriter<results::CashFlowRow> flows_;
};

}  // namespace tenure::db
