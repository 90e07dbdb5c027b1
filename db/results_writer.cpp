// Writing one review's results (see results_writer.h).
#include "db/results_writer.h"

#include "results/from_review.h"

namespace tenure::db {
namespace {

std::int64_t insert_run(Connection& db, const results::RunRow& run) {
  TableWriter<results::RunRow>(db, results::run_table()).insert(run);
  return sqlite3_last_insert_rowid(db.handle());
}

}  // namespace

ResultsWriter::ResultsWriter(Connection& db, const results::RunRow& run,
                             const review::FleetData& data, const review::ReviewResult& planned)
    : db_(db),
      data_(data),
      run_id_(insert_run(db, run)),
      assets_(db, results::asset_table()),
      curves_(db, results::curve_table()),
      flows_(db, results::cash_flow_table()) {
  TableWriter<results::ClassRow> classes(db_, results::class_table());
  for (const review::ClassModel& m : planned.classes) {
    classes.insert(results::class_row(m), run_id_);
    if (m.challenger) {
      add_detail(m.asset_class, std::nullopt, results::Role::challenger, *m.challenger);
    }
  }
}

void ResultsWriter::add_assets(std::span<const review::AssetReview> assets) {
  // In asset_id order (review::plan_review), so the primary-key index grows at its end.
  for (const review::AssetReview& r : assets) {
    const review::AssetRecord& record = data_.assets[r.asset];
    assets_.insert(results::asset_row(r, record), run_id_);
    if (r.defender) {
      add_detail(record.asset_class, record.asset_id, results::Role::defender, *r.defender);
    }
  }
}

void ResultsWriter::add_rejected(std::span<const results::RejectedRow> rows) {
  TableWriter<results::RejectedRow> rejected(db_, results::rejected_table());
  for (const results::RejectedRow& row : rows) rejected.insert(row, run_id_);
}

void ResultsWriter::add_detail(const std::string& asset_class,
                               const std::optional<std::string>& asset_id, results::Role role,
                               const replacement::AssetAnalysis& a) {
  // Curves on both bases and the after-tax cash-flow table of one analysed asset.
  for (const results::CurveRow& row : results::curve_rows(asset_class, asset_id, role, a)) {
    curves_.insert(row, run_id_);
  }
  for (const results::CashFlowRow& row :
       results::cash_flow_rows(asset_class, asset_id, role, a.table)) {
    flows_.insert(row, run_id_);
  }
}

}  // namespace tenure::db
