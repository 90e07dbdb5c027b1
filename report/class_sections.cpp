// Per class: the challenger's EUAC before and after tax against years kept with the economic
// life marked and the band of near-best lives shaded, how firm the life is in words, and the
// ages of the assets in service against that life (see page_model.h).
#include <algorithm>
#include <map>

#include <fmt/format.h>

#include "explain/esl_words.h"
#include "formats/tax_rules_text.h"
#include "formats/text_table.h"
#include "report/html.h"
#include "report/page_model.h"
#include "report/palette.h"
#include "report/svg_chart.h"

namespace tenure::report {
namespace {

// The challenger's stored curve on one basis, as chart points.
std::vector<std::pair<double, double>> curve_points(const PageModel& m,
                                                    const std::string& asset_class,
                                                    replacement::Basis basis) {
  std::vector<std::pair<double, double>> out;
  for (const results::CurveRow& p : m.data->challenger_curves) {
    if (p.asset_class == asset_class && p.basis == basis) out.emplace_back(p.years, p.euac);
  }
  return out;
}

void add_least(Chart& chart, const std::string& name, const std::optional<Years>& years,
               const std::optional<Money>& euac, const char* colour) {
  if (!years || !euac) return;
  chart.series.push_back({fmt::format("{}: least EUAC {} at {}", name, formats::money(*euac),
                                      formats::years(*years)),
                          {{*years, *euac}}, colour, Stroke::solid, Marker::diamond});
}

std::string euac_chart(const PageModel& m, const results::ClassRow& c) {
  Chart chart{fmt::format("{}: what a new unit costs a year, by years kept", c.asset_class),
              "years kept (life of a new unit)", "EUAC (money units per year)"};
  chart.series.push_back({"before tax", curve_points(m, c.asset_class, replacement::Basis::before_tax),
                          colour::kBlue, Stroke::solid, Marker::circle});
  const auto after = curve_points(m, c.asset_class, replacement::Basis::after_tax);
  if (!after.empty()) {
    chart.series.push_back({"after tax", after, colour::kVermillion, Stroke::dashed,
                            Marker::square});
  }
  add_least(chart, "before tax", c.esl_years_before_tax, c.euac_before_tax, colour::kBlue);
  if (!after.empty()) {
    add_least(chart, "after tax", c.esl_years_after_tax, c.euac_after_tax, colour::kVermillion);
  }
  if (const auto esl = m.esl(c)) {
    chart.vlines.push_back({static_cast<double>(*esl),
                            fmt::format("economic life ({}): {}",
                                        m.after_tax() ? "after tax" : "before tax",
                                        formats::years(*esl)),
                            colour::kReddishPurple, Stroke::dotted});
  }
  // The band of near-best lives, half a year either side so that a band of one life shows.
  if (c.esl_band_low && c.esl_band_high) {
    chart.shades.push_back(
        {*c.esl_band_low - 0.5, *c.esl_band_high + 0.5,
         fmt::format("lives within {} of the least EUAC: {}", formats::percent(m.policy->esl_band),
                     explain::life_span_words(c.esl_band_low, c.esl_band_high)),
         colour::kBluishGreen});
  }
  chart.x_range = std::make_pair(0.0, static_cast<double>(c.max_life_years));
  return render_chart(chart);
}

std::string age_chart(const PageModel& m, const results::ClassRow& c) {
  std::map<Years, std::size_t> ages;
  Years oldest = 0;
  for (const results::AssetRow& a : m.data->assets) {
    if (a.asset_class != c.asset_class) continue;
    ++ages[a.age_years];
    oldest = std::max(oldest, a.age_years);
  }
  const auto esl = m.esl(c);
  Chart chart{fmt::format("{}: ages of the units in service", c.asset_class),
              "age (completed years)", "units in service"};
  chart.integer_y = true;
  for (const auto& [age, count] : ages) {
    const bool past = esl && age >= *esl;
    chart.bars.push_back({static_cast<double>(age), static_cast<double>(age) + 1,
                          static_cast<double>(count), past ? colour::kOrange : colour::kSkyBlue,
                          past ? "at or past economic life" : "short of economic life"});
  }
  if (esl) {
    chart.vlines.push_back({static_cast<double>(*esl),
                            fmt::format("economic life {}", formats::years(*esl)), colour::kInk,
                            Stroke::dashed});
  }
  const Years right = std::max({oldest + 1, esl.value_or(0) + 1, c.max_life_years});
  chart.x_range = std::make_pair(0.0, static_cast<double>(right));
  return render_chart(chart);
}

}  // namespace

std::string class_sections(const PageModel& m) {
  std::string out =
      "<section id=\"classes\"><h2>Classes: economic life and the fleet's ages</h2>"
      "<p>For each class, the left chart shows what a new unit (the challenger) costs per year "
      "for each number of years it is kept; the least point is the class's economic life. The "
      "right chart shows how old the units in service are against that life.</p>";
  for (const results::ClassRow& c : m.data->classes) {
    const auto model = m.models.find(c.asset_class);
    out += fmt::format("<section class=\"class\" id=\"class-{}\"><h3>{}</h3>",
                       &c - m.data->classes.data(), escape(c.asset_class));
    if (!c.cost_model) {
      out += fmt::format("<p class=\"warn\">{}</p></section>",
                         escape(model == m.models.end() ? c.note.value_or("")
                                                        : model->second.note));
      continue;
    }
    const auto esl = m.esl(c);
    out += fmt::format(
        "<p>A new unit costs {}; kept {}, its least EUAC is {} a year ({}). Cost curve {}, "
        "fitted on {} asset-years.</p>",
        formats::money(c.challenger_first_cost), esl ? formats::years(*esl) : "-",
        money_cell(m.least_euac(c)), m.after_tax() ? "after tax" : "before tax",
        escape(fleet::name(*c.cost_model)), grouped(static_cast<double>(c.asset_years), 0));
    if (c.esl_band_low || c.esl_p10) {
      out += fmt::format(
          "<p>How firm that life is: {}. A narrow band means other lives cost clearly more; "
          "percentiles close together mean the class's cost history fixes the life well.</p>",
          escape(explain::esl_sentence(c, m.data->run.basis, m.policy->esl_band)));
    }
    if (c.note) out += "<p class=\"warn\">" + escape(*c.note) + "</p>";
    if (const auto policy = m.policy->classes.find(c.asset_class);
        policy != m.policy->classes.end()) {
      out += fmt::format("<p class=\"tax-rules\">Tax rules used: {}; {}.</p>",
                         escape(formats::tax_rules_sentence(policy->second.depreciation)),
                         escape(std::string(formats::kTaxRulesCaution)));
    }
    const std::string band_caption =
        c.esl_band_low
            ? fmt::format(
                  " The green shade spans the lives whose {} EUAC is within "
                  "{} (esl_band) of the least.",
                  m.after_tax() ? "after-tax" : "before-tax", formats::percent(m.policy->esl_band))
            : "";
    out += fmt::format(
        "<div class=\"charts\"><figure>{}<figcaption>Before tax at the MARR (solid), after tax "
        "at the after-tax MARR (dashed); diamonds mark each least EUAC.{}</figcaption></figure>"
        "<figure>{}<figcaption>Each bar counts the units of one age; orange bars are at or past "
        "the economic life.</figcaption></figure></div></section>",
        euac_chart(m, c), band_caption, age_chart(m, c));
  }
  return out + "</section>";
}

}  // namespace tenure::report
