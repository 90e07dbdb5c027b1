// One asset's computation as text: the asset, its class, its own costs and the verdict's rule
// (see explain_text.h; the year-by-year tables are in analysis_text.cpp).
#include "explain/explain_text.h"

#include <cmath>

#include <fmt/format.h>

#include "depreciation/schedule.h"
#include "explain/esl_words.h"
#include "explain/text_sections.h"
#include "formats/caution.h"
#include "formats/depreciation_json.h"
#include "formats/tax_rules_text.h"
#include "formats/text_table.h"
#include "review/verdict_reasons.h"

namespace tenure::explain {
namespace text {

using formats::money;
using formats::percent;
using formats::TextTable;
using formats::years;

std::string section(const std::string& title, const std::string& body) {
  return title + "\n" + body;
}

std::string depreciation_words(const depreciation::Spec& spec) {
  const nlohmann::json object = formats::depreciation_to_json(spec);
  std::string out = object.at("method").get<std::string>();
  for (const auto& [key, value] : object.items()) {
    if (key != "method") out += fmt::format(", {} {}", key, value.dump());
  }
  return out;
}

namespace {

std::string ratio(double value) { return fmt::format("{:.4f}", value); }

const review::ClassPolicy& class_policy(const Explanation& e) { return *e.model.policy; }

// Where the market value now came from, in words with the numbers behind it.
std::string market_value_words(const Explanation& e) {
  const results::AssetRow& a = e.stored;
  if (a.market_value_source != "class value curve") {
    return "its latest valuation within 12 months of the as-of date (" + a.market_value_source + ")";
  }
  const fleet::ValueCurve& v = e.model.value_curve;
  return fmt::format("class value curve: {} x (1 - {})^{} x first cost", ratio(v.value_start),
                     ratio(v.value_decline), a.age_years);
}

bool close(double a, double b) {
  return std::abs(a - b) <= 1e-9 * std::max(std::abs(a), std::abs(b));
}

// The band recomputed here from the rebuilt challenger, against the run's.
std::string band_words(const Explanation& e) {
  const results::ClassRow& c = e.stored_class;
  const review::EslBand& band = *e.model.band;
  std::string out = fmt::format(
      "{}: the lives whose {} EUAC is within esl_band {} of the least; recomputed here from the "
      "challenger's EUAC curve (section 10)",
      life_span_words(band.low, band.high), basis_words(e.review.basis),
      percent(e.policy->esl_band));
  if (!c.esl_band_low || !c.esl_band_high) return out + "; not stored by this run";
  if (*c.esl_band_low == band.low && *c.esl_band_high == band.high) {
    return out + ", as the run stored it";
  }
  return out + "; the run stored " + life_span_words(c.esl_band_low, c.esl_band_high);
}

// The stored bootstrap percentiles: their refits need every asset's cost years.
std::string spread_words(const Explanation& e) {
  const results::ClassRow& c = e.stored_class;
  if (!c.esl_p10 || !c.esl_p90) return "not stored by this run";
  return fmt::format(
      "{}: 10th to 90th percentile of the {} economic life over {} refits of the cost curve on "
      "the class's assets resampled with replacement; as the run stored it (the refits need "
      "every asset's cost years, which explain does not read)",
      life_span_words(c.esl_p10, c.esl_p90), basis_words(e.review.basis), review::kBootstrapRefits);
}

}  // namespace

std::string inputs(const Explanation& e) {
  const results::AssetRow& a = e.stored;
  const review::ClassPolicy& p = class_policy(e);
  const std::string assets = e.policy->sources.assets;
  TextTable t({"input", "value", "where it comes from"}, 3);
  t.wrap_last_column(formats::kLineWidth);
  t.add_row({"asset", a.asset_id, "relation '" + assets + "'"});
  t.add_row({"class", a.asset_class, "relation '" + assets + "'; its policy below"});
  if (e.input) {
    t.add_row({"in service on", e.input->in_service_on, "relation '" + assets + "'"});
  } else {
    t.add_row({"in service on", "-", "the asset is no longer in relation '" + assets + "'"});
  }
  t.add_row({"age", years(a.age_years), "completed age-years at the as-of date " + e.run.as_of});
  t.add_row({"first cost", money(a.first_cost), "relation '" + assets + "': the depreciation basis"});
  t.add_row({"depreciation", depreciation_words(p.depreciation),
             "the class policy, on the asset's own first cost"});
  t.add_row({"book value now", money(a.book_value_now),
             fmt::format("first cost less the full deductions of its first {}", years(a.age_years))});
  t.add_row({"market value now", money(a.market_value_now), market_value_words(e)});
  t.add_row({"credibility factor", ratio(a.credibility_factor),
             "its own cost level against the class curve (section 4)"});
  const Years remaining = std::max(1, p.max_life_years - a.age_years);
  t.add_row({"years weighed", fmt::format("1..{}", remaining),
             fmt::format("max(1, max_life_years {} - age {})", p.max_life_years, a.age_years)});
  return section("1. Inputs", t.render());
}

std::string rates_and_money(const Explanation& e) {
  const review::Policy& p = *e.policy;
  TextTable t({"rate or rule", "value", "meaning"}, 3);
  t.wrap_last_column(formats::kLineWidth);
  t.add_row({"MARR before tax", percent(p.rates.marr), "per year"});
  t.add_row({"income tax rate", percent(p.rates.income_tax_rate),
             "effective combined rate; 0 means before-tax only"});
  t.add_row({"after-tax MARR", percent(p.rates.after_tax_marr), "per year"});
  t.add_row({"capital gains tax rate", percent(p.rates.capital_gains_tax_rate),
             "on a sale above the original first cost"});
  t.add_row({"cost escalation", percent(p.cost_escalation),
             "per year, restating past costs into as-of money"});
  t.add_row({"lead time", years(p.lead_time_years),
             "a replacement this near is to be budgeted or ordered now: review"});
  t.add_row({"review margin", percent(p.review_margin),
             "a break-even price this near the price is a close call"});
  t.add_row({"economic life band", percent(p.esl_band),
             "lives whose EUAC is within this of the least are near-best (esl_band)"});
  t.add_row({"money", p.real_money() ? "real" : "nominal",
             p.real_money() ? "costs restated to " + e.run.as_of +
                                  " money, so the MARR is a real rate (no inflation in it)"
                            : "costs as recorded, so the MARR is a nominal rate"});
  t.add_row({"decision basis", basis_words(e.review.basis),
             "discounting at " + percent(e.basis_rate())});
  t.add_row({"currency", "money units", "as recorded in the database; tenure converts nothing"});
  return section("2. Policy rates and money", t.render());
}

std::string class_curves(const Explanation& e) {
  const results::ClassRow& c = e.stored_class;
  const review::ClassPolicy& p = class_policy(e);
  TextTable t({"curve", "value"}, 2);
  t.wrap_last_column(formats::kLineWidth);
  if (const auto& curve = e.model.cost_curve) {
    if (curve->model == fleet::CostModel::linear) {
      t.add_row({"cost curve", fmt::format("linear: cost of age-year k = a + g (k - 1), a = {}, "
                                           "g = {} a year",
                                           money(curve->a), money(curve->g))});
    } else {
      t.add_row({"cost curve", fmt::format("geometric: cost of age-year k = a (1 + g)^(k - 1), "
                                           "a = {}, g = {:.2f}% a year",
                                           money(curve->a), curve->g * 100)});
    }
    t.add_row({"fit quality", fmt::format("r2 = {:.3f} on {} asset-years of {} assets "
                                          "(policy cost_model: {})",
                                          curve->r2, c.asset_years, c.assets,
                                          fleet::name(curve->model))});
  } else {
    t.add_row({"cost curve", "none: no complete year of cost history in the class"});
  }
  const fleet::ValueCurve& v = e.model.value_curve;
  t.add_row({"value curve", fmt::format("fraction of first cost at age x = {} x (1 - {})^x",
                                        ratio(v.value_start), ratio(v.value_decline))});
  t.add_row({"value fit", v.model == fleet::ValueModel::fitted
                              ? fmt::format("log-linear on {} valuations", v.valuations_used)
                              : "the policy's annual_decline (fewer than 3 usable valuations)"});
  const std::string chosen =
      e.model.chosen_name.empty()
          ? std::string()
          : fmt::format("'{}' (the best of the {} listed on the decision's basis): ",
                        e.model.chosen_name, p.challengers.size());
  t.add_row({"challenger", fmt::format("{}a new unit at {}, kept 1..{} years, depreciation {}",
                                       chosen, money(e.model.challenger_price), p.max_life_years,
                                       depreciation_words(e.model.challenger_depreciation()))});
  if (const auto& ch = e.model.challenger) {
    t.add_row({"economic life before tax", fmt::format("{}, least EUAC {}",
                                                       years(ch->before_tax.curve.best_years),
                                                       money(ch->before_tax.curve.best_euac))});
    if (ch->after_tax) {
      t.add_row({"economic life after tax", fmt::format("{}, least EUAC {}",
                                                        years(ch->after_tax->curve.best_years),
                                                        money(ch->after_tax->curve.best_euac))});
    }
    t.add_row({"near-best lives", band_words(e)});
    t.add_row({"bootstrap spread", spread_words(e)});
  }
  if (!e.model.note.empty()) t.add_row({"note", e.model.note});
  std::string body = t.render();
  if (const std::string firmness = esl_sentence(c, e.review.basis, e.policy->esl_band);
      !firmness.empty()) {
    body += formats::wrap_words("in short (as stored): " + firmness, formats::kLineWidth, "  ",
                                "    ");
  }
  return section(fmt::format("3. Class curves: {} ({} assets)", c.asset_class, c.assets), body);
}

std::string own_costs(const Explanation& e) {
  const results::AssetRow& a = e.stored;
  const std::string title = fmt::format(
      "4. Own cost history against the class curve ({} money, escalation {} a year)",
      e.run.as_of, percent(e.policy->cost_escalation));
  const std::string stored =
      fmt::format("  stored by the run: m = {}, r = {}, factor = {}\n", a.cost_years,
                  ratio(a.cost_ratio), ratio(a.credibility_factor));
  if (!e.model.cost_curve) return section(title, "  no class cost curve to compare with\n" + stored);
  if (!e.input) {
    return section(title, fmt::format("  the asset is no longer in relation '{}': its events "
                                      "cannot be read again\n",
                                      e.policy->sources.assets) +
                              stored);
  }
  if (!e.own) {
    return section(title, "  its input row no longer holds valid dates; events not read again\n" +
                              stored);
  }
  const OwnCosts& own = *e.own;
  TextTable t({"age-year", "events", "observed cost", "class curve", "observed / curve"});
  Money observed = 0;
  Money predicted = 0;
  for (const OwnYear& y : own.years) {
    observed += y.observed;
    predicted += y.class_curve;
    t.add_row({std::to_string(y.age_year), std::to_string(y.events), money(y.observed),
               money(y.class_curve), y.class_curve > 0 ? ratio(y.observed / y.class_curve) : "-"});
  }
  t.add_row({"total", std::to_string(own.events_counted), money(observed), money(predicted),
             predicted > 0 ? ratio(observed / predicted) : "-"});
  const fleet::Credibility& cr = own.credibility;
  std::string body = t.render();
  const auto line = [](const std::string& words) {
    return formats::wrap_words(words, formats::kLineWidth, "  ", "    ");
  };
  body += line(fmt::format(
      "events: {} counted, {} in the current age-year or after the as-of date (not complete), "
      "{} not usable",
      own.events_counted, own.events_not_complete, own.events_not_usable));
  if (cr.measured) {
    body += line(fmt::format(
        "credibility: m = {} complete years, r = observed / curve = {}, z = m / (m + 3) = {}, "
        "factor = 1 + z (r - 1) = {}",
        cr.years, ratio(cr.ratio), ratio(cr.weight), ratio(cr.factor)));
  } else {
    body += line(fmt::format("credibility: not measured (m = {}, or the curve predicts no cost): "
                             "factor = 1, the class curve as is",
                             cr.years));
  }
  const bool agrees = cr.years == a.cost_years && close(cr.ratio, a.cost_ratio) &&
                      close(cr.factor, a.credibility_factor);
  body += stored;
  body += agrees ? "  the events read now agree with the run (to 1e-9)\n"
                 : "  the events read now DIFFER from the run: the input rows changed since; "
                   "everything below uses the stored factor\n";
  return section(title, body);
}

std::string verdict_rule(const Explanation& e) {
  const review::VerdictFinding& f = e.review.finding;
  std::string body = review::rule_in_words();
  if (f.figures) {
    const review::VerdictFigures& d = *f.figures;
    const auto holds = [](bool test) { return test ? "yes" : "no"; };
    TextTable t({"test", "figures", "holds"}, 2);
    t.add_row({"k* = 0", fmt::format("k* = {}", d.keep_years), holds(d.keep_years == 0)});
    t.add_row({"age >= economic life",
               fmt::format("{} against {}", years(f.age), years(d.challenger_esl)),
               holds(f.past_economic_life)});
    t.add_row({"k* <= lead time",
               fmt::format("k* = {} against lead_time_years {}", d.keep_years, f.lead_time_years),
               holds(f.within_lead_time)});
    body += t.render();
  }
  body += fmt::format("  verdict: {}\n", review::to_string(f.verdict)) +
          formats::wrap_words(f.reason, formats::kLineWidth, "  ", "  ");
  return section("14. Verdict", body);
}

}  // namespace text

namespace {

std::string headline(const Explanation& e) {
  const review::AssetReview& r = e.review;
  const std::string verdict = review::verdict_headline(r.finding);
  std::string out = fmt::format(
      "tenure explain: asset {} (class {}), {} as of {}\n\nVerdict: {}, {} basis\n",
      e.stored.asset_id, e.stored.asset_class, run_name(e.run), e.run.as_of, verdict,
      text::basis_words(r.basis));
  out += formats::wrap_words(r.finding.reason, formats::kLineWidth, "  ", "  ");
  if (e.reproduced()) {
    out += "Check: the stored figures (EUACs, next year's marginal cost, k*, verdict, reason) are "
           "reproduced\nexactly by recomputing from the stored inputs.\n";
  } else {
    out += "CHECK FAILED: stored figures differ from the recomputation:\n";
    for (const std::string& d : e.differences) out += "  " + d + "\n";
  }
  return out;
}

}  // namespace

std::string explanation_to_text(const Explanation& e) {
  std::vector<std::string> sections{headline(e), text::inputs(e), text::rates_and_money(e),
                                    text::class_curves(e), text::own_costs(e)};
  if (e.review.defender && e.model.challenger) {
    const replacement::AssetAnalysis& d = *e.review.defender;
    const replacement::AssetAnalysis& c = *e.model.challenger;
    sections.push_back(text::defender_future(e));
    sections.push_back(text::selling_now(e));
    sections.push_back(text::kept_flows(
        fmt::format("7. Defender (year t ends at age {} + t)", e.stored.age_years), d.table,
        e.basis_rate()));
    sections.push_back(text::sold_flows("8. Defender", d.table));
    sections.push_back(text::euac_by_life(
        "9. EUAC and marginal cost by more years kept: defender (* = best remaining life)", d,
        e.review.basis, e.stored.age_years,
        text::PwCostSections{"given up now (section 6)", "section 7", "section 8"}));
    sections.push_back(text::euac_by_life(
        "10. EUAC and marginal cost by years kept: challenger (* = economic service life)", c,
        e.review.basis, 0,
        text::PwCostSections{"its price (section 3)", "section 11", "section 12"}));
    sections.push_back(text::kept_flows("11. Challenger", c.table, e.basis_rate()));
    sections.push_back(text::sold_flows("12. Challenger", c.table));
    sections.push_back(text::timing(e));
  } else {
    sections.push_back(text::section("5-13. Analysis", "  not possible: " + e.model.note + "\n"));
  }
  sections.push_back(text::verdict_rule(e));
  if (e.review.at_stake) sections.push_back(text::at_stake(e));
  sections.push_back(
      formats::wrap_words(fmt::format("Tax rules used (class {}): {}.", e.stored.asset_class,
                                      formats::tax_rules_sentence(e.model.policy->depreciation)),
                          formats::kLineWidth, "", "  ") +
      formats::wrap_words(fmt::format("Note: {}.", formats::kTaxRulesCaution), formats::kLineWidth,
                          "", "  "));
  sections.push_back(std::string(formats::kCaution) + "\n");
  return fmt::format("{}", fmt::join(sections, "\n"));
}

}  // namespace tenure::explain
