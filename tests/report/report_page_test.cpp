// The report page from an invented stored run (tests/explain/pump_fixture.h): self-contained
// (no script, nothing fetched), every database text escaped, the caution of SPEC 10, one EUAC
// and one age chart per class and one marginal-cost chart per due asset (up to the cap), the
// due list in order, newly due and rejected rows counted.
#include <gtest/gtest.h>

#include <algorithm>

#include <fmt/format.h>

#include "explain/explanation.h"
#include "formats/caution.h"
#include "formats/text_table.h"
#include "report/html.h"
#include "report/report_page.h"
#include "tests/explain/pump_fixture.h"

namespace tenure::report {
namespace {

using explain::testing::PumpFixture;

std::size_t count(const std::string& text, const std::string& what) {
  std::size_t n = 0;
  for (std::size_t at = text.find(what); at != std::string::npos; at = text.find(what, at + 1)) ++n;
  return n;
}

// A stored asset `age` years old, consistent with its recomputation.
results::AssetRow asset(int age, const std::string& id) {
  PumpFixture f(age);
  f.stored.reason =
      explain::explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt).review.finding.reason;
  f.stored.asset_id = id;
  return f.stored;
}

ReportData invented_run() {
  PumpFixture f(0);
  ReportData data;
  data.run = f.run;
  data.policy = f.policy;
  data.run.rows_read = 1234;
  data.run.rows_rejected = 2;
  data.classes = {f.stored_class};
  for (const auto basis : {replacement::Basis::before_tax, replacement::Basis::after_tax}) {
    const auto& curve = f.result->challenger.on(basis).curve;
    for (std::size_t n = 0; n < curve.euac.size(); ++n) {
      data.challenger_curves.push_back({"pump-fixture", std::nullopt, results::Role::challenger,
                                        basis, static_cast<Years>(n + 1), curve.euac[n],
                                        curve.marginal_costs[n]});
    }
  }
  data.classes[0].esl_years_before_tax = f.result->challenger.before_tax.curve.best_years;
  data.classes[0].euac_before_tax = f.result->challenger.before_tax.curve.best_euac;
  data.classes[0].esl_years_after_tax = f.result->challenger.after_tax->curve.best_years;
  data.classes[0].euac_after_tax = f.result->challenger.after_tax->curve.best_euac;
  for (int age = 0; age <= 11; ++age) data.assets.push_back(asset(age, fmt::format("PF-{:03}", age)));
  data.assets.push_back(asset(11, "<script>alert('x')</script>"));
  data.rejected = {{"cost_event", "row 3 (asset_id '<img src=x>')", "amount 'n/a' is not a number"},
                   {"asset", "row 9", "first_cost 0 must be greater than 0"}};
  data.due_before = {"PF-011"};
  return data;
}

std::size_t due_count(const ReportData& data) {
  std::size_t n = 0;
  for (const auto& a : data.assets) n += a.due() ? 1 : 0;
  return n;
}

TEST(ReportPage, IsSelfContainedAndEscapesDatabaseText) {
  const std::string html = render_report(invented_run());
  EXPECT_EQ(html.rfind("<!DOCTYPE html>\n<html lang=\"en\">", 0), 0u);
  EXPECT_NE(html.find("Content-Security-Policy\" content=\"default-src 'none'"), std::string::npos);
  EXPECT_EQ(html.find("<script"), std::string::npos);
  EXPECT_EQ(html.find("<img"), std::string::npos);
  EXPECT_NE(html.find("&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt;"), std::string::npos);
  EXPECT_NE(html.find("&lt;img src=x&gt;"), std::string::npos);
  for (const char* fetches : {"<link", "src=\"", "url(", "@import", "https://"}) {
    EXPECT_EQ(html.find(fetches), std::string::npos) << fetches;
  }
  // The only http: text is the SVG namespace, which is a name, not a request.
  EXPECT_EQ(count(html, "http://"), count(html, "http://www.w3.org/2000/svg"));
}

TEST(ReportPage, CarriesTheCaution) {
  const std::string html = render_report(invented_run());
  EXPECT_NE(html.find(escape(formats::kCaution)), std::string::npos);
}

TEST(ReportPage, DrawsTheClassChartsAndOneChartPerDueAsset) {
  const ReportData data = invented_run();
  const std::string html = render_report(data);
  const std::size_t due = due_count(data);
  ASSERT_GT(due, 2u);
  ASSERT_LT(due, data.assets.size());
  EXPECT_EQ(count(html, "<svg "), 2 + due);
  EXPECT_NE(html.find(fmt::format(">economic life (after tax): {} years<",
                                  *data.classes[0].esl_years_after_tax)),
            std::string::npos);
  EXPECT_NE(html.find(">units in service<"), std::string::npos);
  EXPECT_NE(html.find(">age at the end of the year kept<"), std::string::npos);
  EXPECT_NE(html.find(fmt::format("Due: {} assets to review or replace", due)), std::string::npos);
  // All due were new but PF-011, which was due in the previous run.
  EXPECT_NE(html.find(fmt::format("<div class=\"n\">{}</div><div class=\"what\">newly due", due - 1)),
            std::string::npos);
  EXPECT_NE(html.find("2 input rows could not be used"), std::string::npos);
}

// SPEC 11 "Per class" on the class EUAC chart and in the class paragraph.
TEST(ReportPage, ShadesTheNearBestLivesAndNamesThePercentiles) {
  ReportData data = invented_run();
  results::ClassRow& c = data.classes[0];
  ASSERT_TRUE(c.esl_band_low && c.esl_band_high && c.esl_p10 && c.esl_p90);
  const std::string html = render_report(data);
  EXPECT_EQ(count(html, "<rect class=\"shade\""), 1u);  // the EUAC chart's, not the ages'
  // By hand from the chart's geometry: x = 0..max_life_years on 72..536, the shade from half a
  // year before the band's shortest life to half a year after its longest (cut to the axis).
  const double left = 72 + (*c.esl_band_low - 0.5) / c.max_life_years * 464;
  const double right =
      72 + std::min(*c.esl_band_high + 0.5, 1.0 * c.max_life_years) / c.max_life_years * 464;
  EXPECT_NE(html.find(fmt::format("<rect class=\"shade\" x=\"{:.1f}\" y=\"44.0\" width=\"{:.1f}\"",
                                  left, right - left)),
            std::string::npos);
  EXPECT_NE(html.find(fmt::format(">lives within 2.00% of the least EUAC: {} to {} years<",
                                  *c.esl_band_low, *c.esl_band_high)),
            std::string::npos);
  EXPECT_NE(html.find("The green shade spans the lives whose after-tax EUAC is within 2.00% "
                      "(esl_band) of the least."),
            std::string::npos);
  EXPECT_NE(html.find(fmt::format("bootstrap 10th-90th percentile: {} to {} years (200 refits",
                                  *c.esl_p10, *c.esl_p90)),
            std::string::npos);

  // A run stored before these figures: no shade and no sentence.
  c.esl_band_low = c.esl_band_high = c.esl_p10 = c.esl_p90 = std::nullopt;
  const std::string older = render_report(data);
  EXPECT_EQ(count(older, "class=\"shade\""), 0u);
  EXPECT_EQ(older.find("How firm that life is"), std::string::npos);
}

TEST(ReportPage, ListsReplaceBeforeReview) {
  const std::string html = render_report(invented_run());
  const std::size_t list = html.find("<table class=\"due\">");
  ASSERT_NE(list, std::string::npos);
  const std::size_t last_replace = html.rfind("badge replace\">REPLACE", html.find("</table>", list));
  const std::size_t first_review = html.find("badge review\">REVIEW", list);
  ASSERT_NE(first_review, std::string::npos);
  EXPECT_LT(last_replace, first_review);
}

TEST(ReportPage, CapsThePerAssetCharts) {
  ReportData data = invented_run();
  const results::AssetRow old = asset(11, "x");
  for (std::size_t i = 0; i < kMaxAssetCharts; ++i) {
    results::AssetRow copy = old;
    copy.asset_id = fmt::format("EXTRA-{:04}", i);
    data.assets.push_back(copy);
  }
  const std::string html = render_report(data);
  EXPECT_EQ(count(html, "<svg "), 2 + kMaxAssetCharts);
  EXPECT_NE(html.find(fmt::format("Charts are drawn for the first {} due assets", kMaxAssetCharts)),
            std::string::npos);
}

TEST(ReportPage, ClassWithoutCostCurveShowsItsNoteAndNoCharts) {
  ReportData data = invented_run();
  data.assets.clear();
  data.challenger_curves.clear();
  data.classes[0].cost_model.reset();
  data.classes[0].note = "no complete year of cost history for class 'pump-fixture'";
  const std::string html = render_report(data);
  EXPECT_EQ(count(html, "<svg "), 0u);
  EXPECT_NE(html.find("no complete year of cost history for class &#39;pump-fixture&#39;"),
            std::string::npos);
  EXPECT_NE(html.find("No asset is due in this run."), std::string::npos);
}

// The page opens short (issue 16): caution and glossary near the top, then the contents, the
// capital and the due list, then the class sections, then the per-unit cards, each a closed
// <details>; every link on the page goes to an id the page has.
TEST(ReportPage, OpensShortWithTheDueListFirstAndTheCardsFolded) {
  const ReportData data = invented_run();
  const std::string html = render_report(data);
  const auto at = [&html](const std::string& what) {
    const std::size_t found = html.find(what);
    EXPECT_NE(found, std::string::npos) << what;
    return found;
  };
  const std::size_t caution = at("id=\"caution\""), glossary = at("id=\"guide\""),
                    toc = at("id=\"contents\""), capital = at("id=\"capital\""),
                    due = at("id=\"due\""), classes = at("id=\"classes\""),
                    cards = at("id=\"due-charts\"");
  EXPECT_LT(caution, glossary);
  EXPECT_LT(glossary, toc);
  EXPECT_LT(toc, capital);
  EXPECT_LT(capital, due);
  EXPECT_LT(due, classes);
  EXPECT_LT(classes, cards);
  EXPECT_NE(html.find("<details class=\"glossary\"><summary>"), std::string::npos);
  // One closed card per due asset, none open and none outside a <details>.
  EXPECT_EQ(count(html, "<details class=\"card\" id=\"due-"), due_count(data));
  EXPECT_EQ(count(html, "<details class=\"card\" open"), 0u);
  EXPECT_EQ(count(html, "<article class=\"card\""), 0u);
  // The charts of the cards are inside them.
  const std::size_t first_card = html.find("<details class=\"card\"");
  EXPECT_LT(first_card, html.find(">age at the end of the year kept<"));
}

TEST(ReportPage, EveryLinkGoesToAnIdOnThePage) {
  const std::string html = render_report(invented_run());
  std::size_t links = 0;
  for (std::size_t at = html.find("href=\""); at != std::string::npos;
       at = html.find("href=\"", at + 1)) {
    const std::size_t start = at + 6;
    const std::string target = html.substr(start, html.find('"', start) - start);
    ASSERT_EQ(target.front(), '#') << target;  // nothing outside the page
    EXPECT_EQ(count(html, "id=\"" + target.substr(1) + "\""), 1u) << target;
    ++links;
  }
  // The contents: the glossary, the glance, capital, due list, classes, one class, cards,
  // rejected rows; and each due asset of the list links to its card.
  EXPECT_GE(links, 8 + due_count(invented_run()));
  for (const char* section : {"#guide", "#glance", "#capital", "#due", "#classes", "#class-0",
                              "#due-charts", "#rejected"}) {
    EXPECT_NE(html.find(fmt::format("<li><a href=\"{}\">", section)), std::string::npos)
        << section;
  }
}

// Capital for the units due: the new unit's price (the fixture's 20,000) times the units due of
// each verdict, counted here from the stored rows.
TEST(ReportPage, SumsTheCapitalOfTheUnitsDue) {
  const ReportData data = invented_run();
  std::size_t replace = 0, review = 0;
  for (const results::AssetRow& a : data.assets) {
    if (a.verdict == review::Verdict::replace) ++replace;
    if (a.verdict == review::Verdict::review) ++review;
  }
  ASSERT_GT(replace, 0u);
  ASSERT_GT(review, 0u);
  const std::string html = render_report(data);
  const double price = explain::testing::kChallengerCost;
  EXPECT_NE(html.find(fmt::format(
                "<a href=\"#class-0\">pump-fixture</a></td><td class=\"num\">{}</td>"
                "<td class=\"num\">{}</td><td class=\"num\">20,000.00</td><td class=\"num\">{}"
                "</td><td class=\"num\">{}</td>",
                replace, review, formats::money(replace * price),
                formats::money((replace + review) * price))),
            std::string::npos)
      << html.substr(html.find("id=\"capital\""), 2000);
  EXPECT_NE(html.find(fmt::format("<tfoot><tr><th>Total</th><td class=\"num\">{}</td>",
                                  replace)),
            std::string::npos);
}

// A long due list shows the most urgent kOpenDueRows and folds the others.
TEST(ReportPage, FoldsTheLessUrgentDueAssets) {
  ReportData data = invented_run();
  const results::AssetRow old = asset(11, "x");
  for (std::size_t i = 0; i < kOpenDueRows; ++i) {
    results::AssetRow copy = old;
    copy.asset_id = fmt::format("EXTRA-{:04}", i);
    data.assets.push_back(copy);
  }
  const std::string html = render_report(data);
  const std::size_t folded = html.find("<details class=\"more-due\" id=\"due-more\">");
  ASSERT_NE(folded, std::string::npos);
  EXPECT_EQ(count(html.substr(0, folded), "<tbody class=\"item\">"), kOpenDueRows);
  EXPECT_NE(html.find(fmt::format("<summary>The other {} due assets",
                                  due_count(data) - kOpenDueRows)),
            std::string::npos);
}

}  // namespace
}  // namespace tenure::report
