// explain's text and JSON: every section, the tables with one row per year, present worths that
// are the after-tax cash flows discounted at the basis rate (closed form), the equivalent case
// file that `tenure case` would analyse to the same figures, and the caution of SPEC 10.
#include <gtest/gtest.h>

#include <cmath>

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "explain/esl_words.h"
#include "explain/explain_json.h"
#include "explain/explain_text.h"
#include "formats/case_json.h"
#include "formats/caution.h"
#include "pump_fixture.h"

namespace tenure::explain {
namespace {

using testing::PumpFixture;

Explanation reproduced_explanation(int age, double tax = 0.25) {
  PumpFixture f(age, tax);
  f.stored.reason = explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt).review.finding.reason;
  Explanation e = explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt);
  EXPECT_TRUE(e.reproduced());
  return e;
}

// Whitespace runs as one space: a phrase is found whether or not a table or a line wrapped it.
std::string squeezed(const std::string& text) {
  std::string out;
  for (char c : text) {
    const bool space = c == ' ' || c == '\n';
    if (space && (out.empty() || out.back() == ' ')) continue;
    out += space ? ' ' : c;
  }
  return out;
}

TEST(ExplainText, HasEverySectionInOrderTheVerdictAndTheCaution) {
  const Explanation e = reproduced_explanation(5);
  const std::string text = explanation_to_text(e);
  std::size_t at = 0;
  for (const char* heading :
       {"tenure explain: asset PF-TEST (class pump-fixture), run 7 as of 2026-06-30",
        "Verdict: ", "are reproduced\nexactly", "\n1. Inputs\n", "\n2. Policy rates and money\n",
        "\n3. Class curves: pump-fixture", "\n4. Own cost history against the class curve",
        "\n5. Defender's future", "\n6. Defender: its opportunity cost",
        "\n7. Defender (year t ends at age 5 + t): after-tax cost of each year kept past its end\n",
        "\n8. Defender: if sold at the end of the year",
        "\n9. EUAC and marginal cost by more years kept: defender",
        "\n10. EUAC and marginal cost by years kept: challenger",
        "\n11. Challenger: after-tax cost of each year kept past its end\n",
        "\n12. Challenger: if sold at the end of the year", "\n13. Replacement timing",
        "\n14. Verdict\n", "\n15. What is at stake"}) {
    const std::size_t found = text.find(heading, at);
    EXPECT_NE(found, std::string::npos) << heading << "\n" << text;
    if (found != std::string::npos) at = found;
  }
  EXPECT_NE(text.find("money                    nominal"), std::string::npos);
  EXPECT_NE(text.find("linear: cost of age-year k = a + g (k - 1), a = 1,000.00, g = 400.00"),
            std::string::npos);
  EXPECT_NE(squeezed(text).find(e.review.finding.reason), std::string::npos);
  EXPECT_EQ(text.substr(text.size() - formats::kCaution.size() - 1),
            std::string(formats::kCaution) + "\n");
}

// SPEC 11 "Per class" in section 3: the band recomputed from the rebuilt challenger and found
// equal to the stored one (the fixture's, by the rule on the case analysis), the stored
// percentiles, and the sentence that sums them up.
TEST(ExplainText, ClassSectionShowsTheBandAndThePercentiles) {
  const Explanation e = reproduced_explanation(5);
  const std::string text = explanation_to_text(e);
  const results::ClassRow& c = e.stored_class;
  ASSERT_TRUE(c.esl_band_low && c.esl_band_high && c.esl_p10 && c.esl_p90);
  const Years esl = *e.stored.class_esl_years;
  const std::string band = life_span_words(c.esl_band_low, c.esl_band_high);
  const std::string spread = fmt::format("{} to {} years", esl - 1, esl + 1);
  for (const std::string& expected :
       {std::string("economic life band 2.00%"),
        "near-best lives " + band +
            ": the lives whose after-tax EUAC is within esl_band 2.00% of the least; "
            "recomputed here from the challenger's EUAC curve (section 10), as the run stored it",
        "bootstrap spread " + spread +
            ": 10th to 90th percentile of the after-tax economic life over 200 refits",
        fmt::format(" in short (as stored): economic life {} years; lives within 2.00% of the "
                    "least EUAC: {}; bootstrap 10th-90th percentile: {} (200 refits of the cost "
                    "curve on resampled assets) ",
                    esl, band, spread)}) {
    EXPECT_NE(squeezed(text).find(expected), std::string::npos) << expected << "\n" << text;
  }
}

TEST(ExplainText, ARunWithoutTheClassLifeFiguresSaysSo) {
  PumpFixture f(5);
  f.stored_class.esl_band_low = f.stored_class.esl_band_high = std::nullopt;
  f.stored_class.esl_p10 = f.stored_class.esl_p90 = std::nullopt;
  f.stored.reason =
      explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt).review.finding.reason;
  const Explanation e = explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt);
  EXPECT_TRUE(e.reproduced());  // nothing stored, nothing to compare
  const std::string text = explanation_to_text(e);
  EXPECT_NE(squeezed(text).find("of the least; recomputed here from the challenger's EUAC curve "
                                "(section 10); not stored by this run"),
            std::string::npos);
  EXPECT_NE(text.find("bootstrap spread           not stored by this run"), std::string::npos);
}

TEST(ExplainText, AStoredBandTheRebuildDoesNotReproduceFailsTheCheck) {
  PumpFixture f(5);
  f.stored.reason =
      explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt).review.finding.reason;
  const Years high = *f.stored_class.esl_band_high;
  f.stored_class.esl_band_high = high + 1;
  const Explanation e = explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt);
  EXPECT_EQ(e.differences, (std::vector<std::string>{fmt::format(
                               "esl_band_high: stored {}, recomputed {}", high + 1, high)}));
  EXPECT_NE(explanation_to_text(e).find(fmt::format(
                "; the run stored {}", life_span_words(f.stored_class.esl_band_low, high + 1))),
            std::string::npos);
}

// A run stored before the reasons wrote money as the tables do ("3721.95", not "3,721.95")
// gave the same reason: it still reproduces; another word in it does not.
TEST(ExplainText, AReasonStoredWithoutThousandsSeparatorsIsTheSame) {
  PumpFixture f(5);
  const std::string reason =
      explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt).review.finding.reason;
  ASSERT_NE(reason.find("3,"), std::string::npos) << reason;  // a figure of thousands
  f.stored.reason = reason;
  for (std::size_t at; (at = f.stored.reason.find("3,")) != std::string::npos;) {
    f.stored.reason.erase(at + 1, 1);
  }
  EXPECT_TRUE(explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt).reproduced());
  f.stored.reason[0] = 'X';
  EXPECT_FALSE(explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt).reproduced());
}

TEST(ExplainText, SaysLoudlyWhenAFigureIsNotReproduced) {
  PumpFixture f(5);
  const std::string text =
      explanation_to_text(explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt));
  EXPECT_NE(text.find("CHECK FAILED: stored figures differ from the recomputation:\n  reason: "),
            std::string::npos);
}

TEST(ExplainJson, HoldsTheTablesAndParses) {
  const Explanation e = reproduced_explanation(5);
  const nlohmann::json doc = nlohmann::json::parse(explanation_to_json(e).dump());
  EXPECT_EQ(doc.at("asset_id"), "PF-TEST");
  EXPECT_EQ(doc.at("check").at("reproduced"), true);
  EXPECT_EQ(doc.at("caution"), formats::kCaution);
  EXPECT_EQ(doc.at("rates").at("money"), "nominal");
  EXPECT_EQ(doc.at("class").at("cost_curve").at("a"), 1000.0);
  // SPEC 11's class figures as stored, and the band recomputed.
  const nlohmann::json& c = doc.at("class");
  EXPECT_EQ(c.at("esl_band_low"), *e.stored_class.esl_band_low);
  EXPECT_EQ(c.at("esl_band_high"), *e.stored_class.esl_band_high);
  EXPECT_EQ(c.at("esl_p10"), *e.stored_class.esl_p10);
  EXPECT_EQ(c.at("esl_p90"), *e.stored_class.esl_p90);
  EXPECT_EQ(c.at("esl_band"), 0.02);
  EXPECT_EQ(c.at("bootstrap_refits"), 200);
  EXPECT_EQ(c.at("esl_band_recomputed").at("low"), *e.stored_class.esl_band_low);
  EXPECT_EQ(c.at("esl_band_recomputed").at("high"), *e.stored_class.esl_band_high);
  EXPECT_EQ(doc.at("rates").at("esl_band"), 0.02);
  const int weighed = testing::kMaxLife - 5;
  const nlohmann::json& flows = doc.at("defender").at("cash_flows");
  ASSERT_EQ(flows.size(), static_cast<std::size_t>(weighed));
  const double i = doc.at("rates").at("basis_rate").get<double>();
  EXPECT_DOUBLE_EQ(i, 0.10 * (1 - 0.25));  // after-tax MARR default (SPEC 4)
  for (std::size_t n = 0; n < flows.size(); ++n) {
    const double flow = flows[n].at("after_tax_cash_flow").get<double>();
    // Closed form: a year-end flow discounted n + 1 years.
    EXPECT_NEAR(flows[n].at("present_worth").get<double>(), flow / std::pow(1 + i, n + 1),
                1e-9 * std::abs(flow));
    EXPECT_TRUE(flows[n].at("if_sold").contains("disposal_tax"));
  }
  EXPECT_EQ(doc.at("defender").at("after_tax").at("curve").size(), static_cast<std::size_t>(weighed));
  EXPECT_EQ(doc.at("challenger").at("before_tax").at("curve").size(), 12u);
  EXPECT_EQ(doc.at("timing").at("rows").size(), static_cast<std::size_t>(weighed + 1));
  EXPECT_EQ(doc.at("verdict").at("defender_euac"), *e.stored.defender_euac);
  EXPECT_EQ(doc.at("verdict").at("verdict"), review::to_string(e.stored.verdict));
}

TEST(ExplainJson, EquivalentCaseAnalysesToTheSameFigures) {
  for (const auto& [age, tax] : {std::pair{9, 0.0}, {9, 0.25}, {2, 0.25}, {5, 0.25}, {11, 0.0}}) {
    SCOPED_TRACE(age);
    const Explanation e = reproduced_explanation(age, tax);
    const nlohmann::json doc = explanation_to_json(e);
    const replacement::Case input = formats::read_case(doc.at("equivalent_case").dump());
    const nlohmann::json as_case =
        formats::case_result_to_json(input, replacement::analyse(input));
    // The shape `tenure case` prints (SPEC 5), figure for figure.
    for (const char* basis : {"before_tax", "after_tax"}) {
      if (!as_case.at("defender").contains(basis)) continue;
      const nlohmann::json& ours = doc.at("defender").at(basis);
      const nlohmann::json& theirs = as_case.at("defender").at(basis);
      EXPECT_EQ(ours.at("euac"), theirs.at("euac")) << basis;
      EXPECT_EQ(ours.at("best_years"), theirs.at("best_years")) << basis;
      EXPECT_EQ(ours.at("marginal_costs"), theirs.at("marginal_costs")) << basis;
    }
    EXPECT_EQ(doc.at("verdict").at("replace_after_years"),
              as_case.at("decision").at("replace_after_years"));
    EXPECT_EQ(doc.at("verdict").at("challenger_euac"), as_case.at("decision").at("challenger_euac"));
    // One vocabulary: `tenure case` of the equivalent case gives explain's verdict, reason and
    // what is at stake.
    EXPECT_EQ(doc.at("verdict").at("verdict"), as_case.at("decision").at("verdict"));
    EXPECT_EQ(doc.at("verdict").at("reason"), as_case.at("decision").at("reason"));
    for (const char* figure : {"delay_cost", "early_cost", "repair_limit", "break_even_price",
                               "break_even_cost_factor", "close_call"}) {
      EXPECT_EQ(doc.at("verdict").at("at_stake").at(figure), as_case.at("decision").at(figure))
          << figure;
    }
  }
}

}  // namespace
}  // namespace tenure::explain
