// What the report draws (see report_run.h).
#include "app/report_run.h"

#include "db/run_reader.h"
#include "explain/explanation.h"
#include "report/report_page.h"

namespace tenure::app {

report::ReportData read_report_data(db::Connection& db, std::optional<std::int64_t> run_id) {
  db::Transaction snapshot(db, db::Transaction::Kind::deferred);
  report::ReportData data;
  data.run = db::read_run(db, run_id);
  data.policy = explain::run_policy(data.run);
  const std::int64_t id = data.run.run_id;
  data.classes = db::read_class_results(db, id);
  data.assets = db::read_asset_results(db, id);
  data.challenger_curves = db::read_challenger_curves(db, id);
  data.rejected = db::read_rejected(db, id, report::kMaxRejectedRows);
  data.due_before = db::due_in_previous_run(db, id);
  snapshot.commit();
  return data;
}

}  // namespace tenure::app
