// The report page's working model, built once by report_page.cpp and read by the section
// renderers (summary_sections.cpp, class_sections.cpp, due_sections.cpp). Internal to report/.
#pragma once

#include <map>
#include <optional>
#include <memory>
#include <string>
#include <vector>

#include "report/report_data.h"
#include "review/asset_review.h"
#include "review/class_model.h"
#include "review/policy.h"

namespace tenure::report {

struct DueAsset {
  const results::AssetRow* stored;
  bool newly_due;
  // Recomputed with the year-by-year analysis for the assets that get a chart (the first
  // kMaxAssetCharts); `reproduced` says whether it equals the stored row.
  std::optional<review::AssetReview> again;
  bool reproduced = true;
};

struct VerdictCounts {
  std::size_t keep = 0, review = 0, replace = 0;
  std::size_t total() const { return keep + review + replace; }
};

struct PageModel {
  const ReportData* data;
  std::shared_ptr<const review::Policy> policy;
  std::map<std::string, review::ClassModel, std::less<>> models;  // by class
  VerdictCounts counts;
  std::map<std::string, VerdictCounts, std::less<>> counts_by_class;
  std::vector<DueAsset> due;  // results::more_urgent first: the largest cost of waiting a year
  std::size_t newly_due = 0;

  bool after_tax() const;
  // The class's economic life on the run's basis; nullopt without a challenger.
  std::optional<Years> esl(const results::ClassRow& c) const;
  std::optional<Money> least_euac(const results::ClassRow& c) const;
};

// The pieces of the page, in page order.
std::string page_style();
std::string run_header(const PageModel& m);
std::string caution_box();
// How to read the figures, folded in a <details> near the top.
std::string glossary(const PageModel& m);
// Links to every section and class below (their ids).
std::string contents(const PageModel& m);
std::string fleet_glance(const PageModel& m);
// Per class: the units due and the price of a new unit times them, with the total.
std::string capital_summary(const PageModel& m);
std::string due_list(const PageModel& m);
std::string class_sections(const PageModel& m);
// One card per due asset (up to kMaxAssetCharts), each a closed <details> with the asset in its
// summary line and its chart inside.
std::string due_charts(const PageModel& m);
std::string rejected_rows(const PageModel& m);
std::string footer(const PageModel& m);

// "<span class=\"badge replace\">REPLACE</span>" for replace, and so on.
std::string verdict_badge(review::Verdict verdict);
// Money for a table cell, whole units with separators; "-" when absent.
std::string money_cell(const std::optional<Money>& amount);

}  // namespace tenure::report
