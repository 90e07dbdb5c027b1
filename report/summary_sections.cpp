// The report's run header, caution, glossary, contents, fleet summary, capital for the units
// due, rejected rows and footer (see page_model.h).
#include <algorithm>
#include <map>

#include <fmt/format.h>

#include "explain/explanation.h"
#include "formats/caution.h"
#include "formats/text_table.h"
#include "report/html.h"
#include "report/page_model.h"
#include "report/report_page.h"

namespace tenure::report {
namespace {

std::string share(std::size_t part, std::size_t whole) {
  return whole == 0 ? "0%" : fmt::format("{:.0f}%", 100.0 * static_cast<double>(part) /
                                                        static_cast<double>(whole));
}

std::string tile(const char* kind, std::size_t n, const std::string& what) {
  return fmt::format("<div class=\"tile {}\"><div class=\"n\">{}</div><div class=\"what\">{}</div>"
                     "</div>",
                     kind, grouped(static_cast<double>(n), 0), what);
}

// One segment of the verdict bar; its word and count show inside when it is wide enough.
std::string segment(const char* kind, const char* word, std::size_t n, std::size_t total) {
  if (n == 0) return "";
  const double percent = 100.0 * static_cast<double>(n) / static_cast<double>(total);
  return fmt::format("<span class=\"{}\" style=\"width:{:.3f}%\" title=\"{} {}\">{}</span>", kind,
                     percent, word, n,
                     percent >= 9 ? fmt::format("{} {}", word, n) : std::string());
}

std::string cost_curve_words(const results::ClassRow& c) {
  if (!c.cost_model) return "none (no complete cost year)";
  return fmt::format("{}, r&sup2; {:.2f}, {} asset-years", escape(fleet::name(*c.cost_model)),
                     c.cost_r2.value_or(0), grouped(static_cast<double>(c.asset_years), 0));
}

std::string value_curve_words(const results::ClassRow& c) {
  if (c.value_model == fleet::ValueModel::fitted) {
    return fmt::format("fitted on {} valuations: {:.1f}% a year", c.valuations_used,
                       c.value_decline * 100);
  }
  return fmt::format("policy decline {:.1f}% a year", c.value_decline * 100);
}

std::string class_table(const PageModel& m) {
  std::string rows;
  for (const results::ClassRow& c : m.data->classes) {
    const auto counts = m.counts_by_class.find(c.asset_class);
    const VerdictCounts n = counts == m.counts_by_class.end() ? VerdictCounts{} : counts->second;
    const auto esl = m.esl(c);
    rows += fmt::format(
        "<tr><td class=\"id\"><a href=\"#class-{}\">{}</a></td><td class=\"num\">{}</td><td class=\"num\">{}"
        "</td><td class=\"num\">{}</td><td class=\"num\">{}</td><td class=\"num\">{}</td>"
        "<td class=\"num\">{}</td><td class=\"num\">{}</td><td>{}</td><td>{}</td></tr>",
        &c - m.data->classes.data(), escape(c.asset_class), n.total(), n.keep, n.review,
        n.replace, esl ? formats::years(*esl) : "-", money_cell(m.least_euac(c)),
        formats::money(c.challenger_first_cost), cost_curve_words(c), value_curve_words(c));
  }
  return fmt::format(
      "<table><thead><tr><th>Class</th><th class=\"num\">In service</th><th class=\"num\">Keep"
      "</th><th class=\"num\">Review</th><th class=\"num\">Replace</th><th class=\"num\">"
      "Economic life</th><th class=\"num\">New unit: least EUAC</th><th class=\"num\">New "
      "unit: cost</th><th>Cost curve</th><th>Value curve</th></tr></thead><tbody>{}</tbody>"
      "</table>",
      rows);
}

}  // namespace

std::string run_header(const PageModel& m) {
  const results::RunRow& run = m.data->run;
  const review::Policy& p = *m.policy;
  std::string money =
      p.real_money()
          ? fmt::format("<b>real</b>: past costs restated to {} money at {} a year, so the "
                        "MARR is a real rate",
                        escape(run.as_of), formats::percent(p.cost_escalation))
          : std::string("<b>nominal</b>: costs as recorded, so the MARR is a nominal rate");
  return fmt::format(
      "<header class=\"run\"><p class=\"kicker\">Equipment replacement review &middot; "
      "decision support</p><h1>Which units to keep, review or replace: {}, as of {}</h1>"
      "<ul class=\"facts\"><li>Decision basis <b>{}</b></li><li>MARR <b>{}</b> before tax, "
      "<b>{}</b> after tax</li><li>Income tax <b>{}</b></li><li>Lead time <b>{}</b></li>"
      "<li>Review margin <b>{}</b></li>"
      "<li>Money {}</li><li>Amounts in <b>money units</b> as recorded in the database</li></ul>"
      "</header>",
      escape(explain::run_name(run)), escape(run.as_of), m.after_tax() ? "after tax" : "before tax",
      formats::percent(p.rates.marr), formats::percent(p.rates.after_tax_marr),
      formats::percent(p.rates.income_tax_rate), formats::years(p.lead_time_years),
      formats::percent(p.review_margin), money);
}

std::string fleet_glance(const PageModel& m) {
  const VerdictCounts& n = m.counts;
  const results::RunRow& run = m.data->run;
  const std::size_t due = n.review + n.replace;
  std::string out = "<section id=\"glance\"><h2>The fleet at a glance</h2><div class=\"tiles\">";
  out += tile("", n.total(), "assets in service reviewed");
  out += tile("keep", n.keep, "keep: cheaper than a new unit for now");
  out += tile("review", n.review, "review: at or past economic life, or due within the lead time");
  out += tile("replace", n.replace, "replace: keeping any longer costs more");
  out += tile("newly", m.newly_due, "newly due since the previous run");
  out += tile("rejected", static_cast<std::size_t>(run.rows_rejected), "input rows rejected");
  out += "</div>";
  if (n.total() > 0) {
    out += fmt::format("<div class=\"bar\" role=\"img\" aria-label=\"Keep {0}, review {1}, replace "
                       "{2}\">{3}{4}{5}</div>",
                       n.keep, n.review, n.replace, segment("keep", "Keep", n.keep, n.total()),
                       segment("review", "Review", n.review, n.total()),
                       segment("replace", "Replace", n.replace, n.total()));
    out += fmt::format("<p class=\"bar-key\">Keep {} ({}) &middot; Review {} ({}) &middot; "
                       "Replace {} ({})</p>",
                       n.keep, share(n.keep, n.total()), n.review, share(n.review, n.total()),
                       n.replace, share(n.replace, n.total()));
  }
  out += fmt::format(
      "<p>Of {} assets in service, <b>{} are due</b> (review or replace); {} of them were not "
      "due in the previous run. {} retired assets fed the cost curves only; {} are not yet in "
      "service. The run read {} input rows and rejected {}.</p>",
      n.total(), due, m.newly_due, run.assets_retired, run.assets_not_yet_in_service,
      grouped(static_cast<double>(run.rows_read), 0), run.rows_rejected);
  out += "<h3>By class</h3>" + class_table(m) + "</section>";
  return out;
}

std::string caution_box() {
  return fmt::format("<aside class=\"caution\" id=\"caution\"><strong>Read this first</strong>{}"
                     "</aside>",
                     escape(formats::kCaution));
}

std::string rejected_rows(const PageModel& m) {
  const results::RunRow& run = m.data->run;
  std::string out = "<section id=\"rejected\"><h2>Input rows rejected</h2>";
  if (run.rows_rejected == 0) return out + "<p>No input row was rejected.</p></section>";
  out += fmt::format(
      "<p>{} input rows could not be used and were skipped; the verdicts above rest on the other "
      "rows. Every one is listed with its reason in the table <code>tenure_rejected</code> "
      "(run {}). The first {}:</p>",
      grouped(static_cast<double>(run.rows_rejected), 0), run.run_id, m.data->rejected.size());
  std::string rows;
  for (const results::RejectedRow& r : m.data->rejected) {
    rows += fmt::format("<tr><td>{}</td><td>{}</td><td>{}</td></tr>", escape(r.source),
                        escape(r.row_ref), escape(r.reason));
  }
  out += fmt::format("<table><thead><tr><th>Relation</th><th>Row</th><th>Reason</th></tr></thead>"
                     "<tbody>{}</tbody></table>",
                     rows);
  return out + "</section>";
}

std::string glossary(const PageModel& m) {
  const results::RunRow& run = m.data->run;
  return fmt::format(
      "<section id=\"guide\"><details class=\"glossary\"><summary>How to read the figures: "
      "EUAC, economic life, defender, marginal cost, k*, verdicts, what is at stake</summary>"
      "<dl class=\"guide\">"
      "<dt>EUAC</dt><dd>Equivalent uniform annual cost: everything owning a unit for a given "
      "number of years costs (purchase or the sale given up, running costs, taxes, less what "
      "selling it then brings), spread evenly over those years at the MARR.</dd>"
      "<dt>Economic life</dt><dd>The number of years a new unit (the challenger) should be kept "
      "so that its EUAC is least.</dd>"
      "<dt>Defender</dt><dd>The unit already owned. Its least EUAC is over its best number of "
      "further years; keeping it gives up its sale value now.</dd>"
      "<dt>Marginal cost</dt><dd>What keeping the unit one more year adds: that year's running "
      "cost, the value it loses and the interest on that value. While it is below the "
      "challenger's least EUAC, another year is worth keeping.</dd>"
      "<dt>k*</dt><dd>The number of further years after which replacing is cheapest, with new "
      "units repeated at their least EUAC; 0 means replace now.</dd>"
      "<dt>Verdicts</dt><dd>Replace when k* is 0; review when the unit is at or past the "
      "class's economic life, or when replacing is cheapest within the lead time (it must be "
      "budgeted or ordered now); keep otherwise.</dd>"
      "<dt>At stake</dt><dd>Waiting a year costs: what replacing one year after the best time "
      "costs, in present worth now. Repair limit: the largest one-time repair now still worth "
      "making rather than replacing. Break-even price: the price of a new unit at which "
      "replacing now and keeping cost the same; a close call when it is within the review "
      "margin of the price.</dd>"
      "<dt>Capital</dt><dd>The price of a new unit of the class (its challenger's first cost) "
      "times the units due: what replacing them would take, before any sale of the old "
      "ones.</dd>"
      "<dt>Auditing one unit</dt><dd><code>tenure explain --db DATABASE ASSET --run {}</code> "
      "shows every input, table and step behind its verdict.</dd></dl></details></section>",
      run.run_id);
}

std::string contents(const PageModel& m) {
  std::string classes;
  for (std::size_t i = 0; i < m.data->classes.size(); ++i) {
    classes += fmt::format("<li><a href=\"#class-{}\">{}</a></li>", i,
                           escape(m.data->classes[i].asset_class));
  }
  const std::size_t cards = std::min(m.due.size(), kMaxAssetCharts);
  return fmt::format(
      "<nav id=\"contents\" aria-label=\"Contents\"><h2>Contents</h2><ol>"
      "<li><a href=\"#guide\">How to read the figures</a></li>"
      "<li><a href=\"#glance\">The fleet at a glance</a></li>"
      "<li><a href=\"#capital\">Capital for the units due, by class</a></li>"
      "<li><a href=\"#due\">Due: {} assets to review or replace</a></li>"
      "<li><a href=\"#classes\">Classes: economic life and the fleet's ages</a><ol>{}</ol></li>"
      "<li><a href=\"#due-charts\">Each due asset: keep another year? ({} cards, each opened "
      "by a click)</a></li>"
      "<li><a href=\"#rejected\">Input rows rejected</a></li></ol></nav>",
      m.due.size(), classes, cards);
}

std::string capital_summary(const PageModel& m) {
  struct Due {
    std::size_t replace = 0, review = 0;
  };
  std::map<std::string, Due, std::less<>> by_class;
  for (const DueAsset& due : m.due) {
    Due& d = by_class[due.stored->asset_class];
    ++(due.stored->verdict == review::Verdict::replace ? d.replace : d.review);
  }
  std::string rows;
  Due total;
  Money replace_capital = 0;
  Money due_capital = 0;
  for (const results::ClassRow& c : m.data->classes) {
    const auto found = by_class.find(c.asset_class);
    const Due d = found == by_class.end() ? Due{} : found->second;
    const Money price = c.challenger_first_cost;
    const auto count = [](std::size_t n) { return static_cast<double>(n); };
    total.replace += d.replace;
    total.review += d.review;
    replace_capital += count(d.replace) * price;
    due_capital += count(d.replace + d.review) * price;
    rows += fmt::format(
        "<tr><td class=\"id\"><a href=\"#class-{}\">{}</a></td><td class=\"num\">{}</td>"
        "<td class=\"num\">{}</td><td class=\"num\">{}</td><td class=\"num\">{}</td>"
        "<td class=\"num\">{}</td></tr>",
        &c - m.data->classes.data(), escape(c.asset_class), d.replace, d.review,
        formats::money(price), formats::money(count(d.replace) * price),
        formats::money(count(d.replace + d.review) * price));
  }
  return fmt::format(
      "<section id=\"capital\"><h2>Capital for the units due, by class</h2><p>What replacing "
      "the units due would take at the price of a new unit of each class (the challenger's first "
      "cost), before any sale of the old ones: the units to replace now, and all units due "
      "(replace and review).</p><table class=\"capital\"><thead><tr><th>Class</th>"
      "<th class=\"num\">Replace</th><th class=\"num\">Review</th><th class=\"num\">New "
      "unit: price</th><th class=\"num\">Capital to replace now</th><th class=\"num\">Capital "
      "for all due</th></tr></thead><tbody>{}</tbody><tfoot><tr><th>Total</th>"
      "<td class=\"num\">{}</td><td class=\"num\">{}</td><td></td><td class=\"num\">{}</td>"
      "<td class=\"num\">{}</td></tr></tfoot></table></section>",
      rows, total.replace, total.review, formats::money(replace_capital),
      formats::money(due_capital));
}

std::string footer(const PageModel& m) {
  const results::RunRow& run = m.data->run;
  return fmt::format(
      "<footer>Generated by tenure {} from review run {} (started {}, finished {}); policy "
      "SHA-256 {}. Every figure here is stored in the database's tenure_* tables.</footer>",
      escape(run.tenure_version), run.run_id, escape(run.started_at),
      escape(run.finished_at.value_or("")), escape(run.policy_sha256));
}

}  // namespace tenure::report
