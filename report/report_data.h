// What `tenure report` draws: one stored run as db/run_reader.h reads it. render_report
// (report_page.h) needs nothing else; it recomputes the due assets' year-by-year figures with
// explain/rebuild.h, since the run keeps those tables only per the policy's detail.
//
//   ReportData data{run, classes, assets, curves, rejected, due_before};
//   std::string html = render_report(data);
#pragma once

#include <string>
#include <unordered_set>
#include <vector>

#include "explain/stored_run.h"

namespace tenure::report {

struct ReportData {
  explain::StoredRun run;
  std::vector<explain::StoredClass> classes;
  std::vector<explain::StoredAsset> assets;                // every asset the run reviewed
  std::vector<explain::CurvePoint> challenger_curves;      // per class and basis
  std::vector<explain::RejectedRow> rejected;              // the first rejected rows
  std::unordered_set<std::string> due_before;              // due in the previous successful run
};

}  // namespace tenure::report
