// `tenure report`: one self-contained static HTML page about a stored run, for the people who
// sign off a replacement plan. Inline CSS and inline SVG drawn by tenure; no script, font, image
// or link that fetches anything (a Content-Security-Policy forbids it), and a print layout.
//
// Sections: the run and its rates; the fleet at a glance (assets by verdict, newly due,
// rejected input rows); the classes (challenger, economic life, curves) with, per class, the
// challenger's EUAC before and after tax against years kept with the economic life marked, and
// the ages of the assets in service against that life; the due list with reasons; for each due
// asset its marginal cost of keeping against the challenger's least EUAC; the rejected rows; how
// to read the figures; the caution of SPEC 10.
//
//   std::ofstream("report.html") << render_report(data);
#pragma once

#include <cstddef>
#include <string>

#include "report/report_data.h"

namespace tenure::report {

// The due list shows at most this many assets and the per-asset charts at most kMaxAssetCharts,
// the most urgent first; the page says how many more there are (all are in tenure_due).
inline constexpr std::size_t kMaxDueRows = 1000;
// The due list shows the most urgent this many; the others are folded in a <details> under it.
inline constexpr std::size_t kOpenDueRows = 25;
inline constexpr std::size_t kMaxAssetCharts = 200;
// Rejected rows listed in the page (the count is always complete).
inline constexpr std::size_t kMaxRejectedRows = 20;

// Throws RuntimeFailure when a class row cannot be rebuilt.
std::string render_report(const ReportData& data);

}  // namespace tenure::report
