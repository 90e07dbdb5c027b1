// The report page: its working model and its assembly (see report_page.h).
#include "report/report_page.h"

#include <algorithm>

#include <fmt/format.h>

#include "core/errors.h"
#include "explain/explanation.h"
#include "explain/rebuild.h"
#include "formats/text_table.h"
#include "report/html.h"
#include "report/page_model.h"

namespace tenure::report {
namespace {

PageModel build_model(const ReportData& data) {
  PageModel m{&data, data.policy, {}, {}, {}, {}, 0};
  for (const results::ClassRow& c : data.classes) {
    m.models.emplace(c.asset_class, explain::rebuild_class_model(c, *m.policy));
  }
  for (const results::AssetRow& a : data.assets) {
    VerdictCounts& in_class = m.counts_by_class[a.asset_class];
    for (VerdictCounts* counts : {&m.counts, &in_class}) {
      switch (a.verdict) {
        case review::Verdict::replace: ++counts->replace; break;
        case review::Verdict::review: ++counts->review; break;
        case review::Verdict::keep: ++counts->keep; break;
      }
    }
    if (!a.due()) continue;
    const bool newly = !data.due_before.contains(a.asset_id);
    m.newly_due += newly ? 1 : 0;
    m.due.push_back({&a, newly, std::nullopt});
  }
  std::sort(m.due.begin(), m.due.end(), [](const DueAsset& x, const DueAsset& y) {
    return results::more_urgent(*x.stored, *y.stored);
  });
  // Only the charted assets need their year-by-year figures: recompute those, as explain does.
  for (std::size_t i = 0; i < std::min(m.due.size(), kMaxAssetCharts); ++i) {
    DueAsset& due = m.due[i];
    const auto model = m.models.find(due.stored->asset_class);
    if (model == m.models.end()) {
      throw RuntimeFailure(fmt::format("run {} has no row for class '{}'", data.run.run_id,
                                       due.stored->asset_class));
    }
    due.again = explain::recompute(*due.stored, model->second, *m.policy);
    due.reproduced = explain::differences(*due.stored, *due.again).empty();
  }
  return m;
}

}  // namespace

bool PageModel::after_tax() const { return data->run.basis == replacement::Basis::after_tax; }

std::optional<Years> PageModel::esl(const results::ClassRow& c) const {
  return after_tax() ? c.esl_years_after_tax : c.esl_years_before_tax;
}

std::optional<Money> PageModel::least_euac(const results::ClassRow& c) const {
  return after_tax() ? c.euac_after_tax : c.euac_before_tax;
}

std::string verdict_badge(review::Verdict verdict) {
  const char* shown = verdict == review::Verdict::replace  ? "REPLACE"
                      : verdict == review::Verdict::review ? "REVIEW"
                                                           : "KEEP";
  return fmt::format("<span class=\"badge {}\">{}</span>", review::to_string(verdict), shown);
}

std::string money_cell(const std::optional<Money>& amount) {
  return amount ? formats::money(*amount) : "-";
}

std::string render_report(const ReportData& data) {
  const PageModel m = build_model(data);
  const std::string title = fmt::format("Equipment replacement review, {} as of {}",
                                        explain::run_name(data.run), data.run.as_of);
  return fmt::format(
      "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n"
      // Nothing may be fetched: no scripts, fonts, images or connections; styles are inline.
      "<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; "
      "style-src 'unsafe-inline'; img-src data:\">\n"
      "<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n"
      "<meta name=\"generator\" content=\"tenure {}\">\n<title>{}</title>\n<style>{}</style>\n"
      "</head>\n<body>\n<main>\n{}{}{}{}{}{}{}{}{}{}{}</main>\n</body>\n</html>\n",
      escape(data.run.tenure_version), escape(title), page_style(), run_header(m), caution_box(),
      glossary(m), contents(m), fleet_glance(m), capital_summary(m), due_list(m),
      class_sections(m), due_charts(m), rejected_rows(m), footer(m));
}

}  // namespace tenure::report
