// `tenure report` as a use case: what the report page draws, read from a database connection in
// one snapshot (report/report_page.h renders it).
//
//   report::ReportData data = read_report_data(db, std::nullopt);   // the latest run
//   std::string html = report::render_report(data);
#pragma once

#include <cstdint>
#include <optional>

#include "db/connection.h"
#include "report/report_data.h"

namespace tenure::app {

// Run `run_id` (default: the latest baseline run, db::read_run), its policy read once. Throws what
// db::read_run and explain::run_policy throw.
report::ReportData read_report_data(db::Connection& db, std::optional<std::int64_t> run_id);

}  // namespace tenure::app
