// The due list with reasons, and for each due asset its marginal cost of keeping one more year
// against the challenger's least EUAC (see page_model.h).
#include <algorithm>

#include <fmt/format.h>

#include "formats/text_table.h"
#include "report/html.h"
#include "report/page_model.h"
#include "report/palette.h"
#include "report/report_page.h"
#include "report/svg_chart.h"

namespace tenure::report {
namespace {

std::string years_cell(const std::optional<Years>& n) {
  return n ? std::to_string(*n) : std::string("-");
}

std::string replace_words(const results::AssetRow& a) {
  if (!a.replace_after_years) return "-";
  if (*a.replace_after_years == 0) return "now";
  return "after " + formats::years(*a.replace_after_years);
}

std::string marginal_chart(const DueAsset& due) {
  const results::AssetRow& a = *due.stored;
  const review::AssetReview& r = *due.again;
  const replacement::LifeCurve& curve = r.defender->on(r.basis).curve;
  const replacement::Decision& d = *r.decision;
  Chart chart{fmt::format("{}: cost of keeping one more year", a.asset_id),
              "age at the end of the year kept", "money units per year"};
  chart.width = 360;  // drawn about 300 pixels wide in a card: text stays readable
  chart.height = 300;
  Series marginal{"marginal cost of that year", {}, colour::kBlue, Stroke::solid,
                  Marker::circle};
  for (std::size_t k = 0; k < curve.marginal_costs.size(); ++k) {
    marginal.points.emplace_back(a.age_years + static_cast<double>(k + 1), curve.marginal_costs[k]);
  }
  chart.series.push_back(std::move(marginal));
  chart.hlines.push_back({d.challenger_euac,
                          "new unit: least EUAC " + formats::money(d.challenger_euac),
                          colour::kVermillion, Stroke::dashed});
  const Years k = d.timing.keep_years;
  chart.vlines.push_back({static_cast<double>(a.age_years + k),
                          k == 0 ? fmt::format("replace now (age {})", a.age_years)
                                 : fmt::format("replace at age {}", a.age_years + k),
                          colour::kReddishPurple, Stroke::dotted});
  // Half a year of room each side, so a "replace now" line stands clear of the axis.
  chart.x_range = std::make_pair(a.age_years - 0.5,
                                 a.age_years + static_cast<double>(curve.marginal_costs.size()) + 0.5);
  return render_chart(chart);
}

}  // namespace

std::string due_list(const PageModel& m) {
  std::string out = fmt::format(
      "<section id=\"due\"><h2>Due: {} assets to review or replace</h2>", m.due.size());
  if (m.due.empty()) return out + "<p>No asset is due in this run.</p></section>";
  out += "<p>The largest cost of waiting a year first (what replacing a year after the best time "
         "costs, in present worth). EUACs and costs are on the decision basis; <span "
         "class=\"new\">new</span> marks an asset that was not due in the previous run, <span "
         "class=\"close\">close call</span> one whose break-even price is within the review "
         "margin of a new unit's price.</p>";
  std::string first;  // the most urgent kOpenDueRows, shown
  std::string rest;   // the others, folded
  const std::size_t shown = std::min(m.due.size(), kMaxDueRows);
  for (std::size_t i = 0; i < shown; ++i) {
    const DueAsset& due = m.due[i];
    const results::AssetRow& a = *due.stored;
    // One <tbody> per asset: its figures, then its reason across the whole width.
    (i < kOpenDueRows ? first : rest) += fmt::format(
        "<tbody class=\"item\"><tr><td class=\"id\">{}{}</td><td class=\"id\">{}</td>"
        "<td>{}{}{}</td><td class=\"num\">{}</td><td class=\"num\">{}</td><td class=\"num\">"
        "{}</td><td class=\"num\">{}</td><td class=\"num\">{}</td><td class=\"num\">{}</td>"
        "<td class=\"num\">{}</td><td class=\"num\">{}</td></tr><tr><td></td><td "
        "colspan=\"10\" class=\"reason\">{}</td></tr></tbody>",
        i < kMaxAssetCharts ? fmt::format("<a href=\"#due-{}\">{}</a>", i, escape(a.asset_id))
                            : escape(a.asset_id),
        due.reproduced ? "" : " <span class=\"badge replace\">CHECK</span>",
        escape(a.asset_class), verdict_badge(a.verdict),
        due.newly_due ? " <span class=\"new\">new</span>" : "",
        a.close_call.value_or(false) ? " <span class=\"close\">close call</span>" : "",
        a.age_years, years_cell(a.class_esl_years), money_cell(a.defender_euac),
        money_cell(a.challenger_euac), money_cell(a.marginal_cost_next_year), replace_words(a),
        money_cell(a.delay_cost), money_cell(a.repair_limit), escape(a.reason));
  }
  const auto table = [](const std::string& items) {
    return fmt::format(
        "<table class=\"due\"><thead><tr><th>Asset</th><th>Class</th><th>Verdict</th>"
        "<th class=\"num\">Age</th><th class=\"num\">Economic life</th><th class=\"num\">"
        "Least EUAC if kept</th><th class=\"num\">Least EUAC of a new unit</th><th "
        "class=\"num\">Next year's marginal cost</th><th class=\"num\">Replace</th><th "
        "class=\"num\">Waiting a year costs</th><th class=\"num\">Repair limit</th></tr>"
        "</thead>{}</table>",
        items);
  };
  out += table(first);
  if (shown > kOpenDueRows) {
    out += fmt::format("<details class=\"more-due\" id=\"due-more\"><summary>The other {} due "
                       "assets, less urgent (click to open)</summary>{}</details>",
                       shown - kOpenDueRows, table(rest));
  }
  if (shown < m.due.size()) {
    out += fmt::format("<p>{} more due assets are not listed here; the view "
                       "<code>tenure_due</code> holds them all.</p>",
                       m.due.size() - shown);
  }
  const bool all_reproduced = std::all_of(m.due.begin(), m.due.end(),
                                          [](const DueAsset& d) { return d.reproduced; });
  if (!all_reproduced) {
    out += "<p class=\"warn\">CHECK: for the marked assets the stored figures differ from a "
           "recomputation from the stored inputs; run <code>tenure explain</code> on them.</p>";
  }
  return out + "</section>";
}

std::string due_charts(const PageModel& m) {
  if (m.due.empty()) return "";
  std::string out = fmt::format(
      "<section id=\"due-charts\"><h2>Each due asset: keep another year?</h2><p>The solid line "
      "is what keeping the unit each further year adds ({}); the dashed line is what a new unit "
      "costs a year at its economic life. Where the solid line stays above the dashed one, "
      "another year costs more than a new unit. The dotted line marks the cheapest moment to "
      "replace. Each card opens with a click on its line.</p><div class=\"cards\">",
      m.after_tax() ? "after tax" : "before tax");
  const std::size_t shown = std::min(m.due.size(), kMaxAssetCharts);
  for (std::size_t i = 0; i < shown; ++i) {
    const DueAsset& due = m.due[i];
    const results::AssetRow& a = *due.stored;
    // Closed until clicked: the summary line names the asset, the chart and reason are inside.
    out += fmt::format("<details class=\"card\" id=\"due-{}\"><summary><h3>{} {}{}</h3>"
                       "<p class=\"sub\">{} &middot; age {} &middot; economic life {} &middot; "
                       "replace {}</p></summary>",
                       i, escape(a.asset_id), verdict_badge(a.verdict),
                       due.newly_due ? "<span class=\"new\">new</span>" : "",
                       escape(a.asset_class), a.age_years, years_cell(a.class_esl_years),
                       replace_words(a));
    if (due.again && due.again->defender && due.again->decision) out += marginal_chart(due);
    out += "<p class=\"reason\">" + escape(a.reason) + "</p></details>";
  }
  out += "</div>";
  if (shown < m.due.size()) {
    out += fmt::format("<p>Charts are drawn for the first {} due assets; <code>tenure explain"
                       "</code> shows any other.</p>",
                       shown);
  }
  return out + "</section>";
}

}  // namespace tenure::report
