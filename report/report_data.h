// What `tenure report` draws: one stored run as db/run_reader.h reads it, with the policy it was
// made with (app/report_run.h gathers both). render_report (report_page.h) needs nothing else;
// it recomputes the due assets' year-by-year figures with explain/rebuild.h, since the run keeps
// those tables only per the policy's detail.
//
//   ReportData data{run, policy, classes, assets, curves, rejected, due_before};
//   std::string html = render_report(data);
#pragma once

#include <memory>
#include <string>
#include <unordered_set>
#include <vector>

#include "results/rows.h"
#include "review/policy.h"

namespace tenure::report {

struct ReportData {
  results::RunRow run;
  std::shared_ptr<const review::Policy> policy;            // explain::run_policy(run)
  std::vector<results::ClassRow> classes;
  std::vector<results::AssetRow> assets;                // every asset the run reviewed
  std::vector<results::CurveRow> challenger_curves;      // per class and basis
  std::vector<results::RejectedRow> rejected;              // the first rejected rows
  std::unordered_set<std::string> due_before;              // due in the previous successful run
};

}  // namespace tenure::report
