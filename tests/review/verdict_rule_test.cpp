// The one verdict rule (review/verdict_rule.h, SPEC 6 "Nightly verdict", revised): which test
// decides, with each test's figures, and the reasons' and headline's wording.
// The figures are invented round numbers; each row's expected verdict follows from the rule's
// numbered clauses by hand.
#include "review/verdict_rule.h"

#include <gtest/gtest.h>

#include <string>
#include <vector>

#include "review/verdict_reasons.h"

namespace tenure::review {
namespace {

using replacement::Basis;

// D and C on the after-tax basis, k* and the class's economic life; the rest fixed.
VerdictFigures figures(Years k_star, Money d, Money c, Years esl) {
  return {Basis::after_tax, k_star, 10, d, 3, c, esl, 900};
}

struct Row {
  const char* what;
  Years k_star;
  Years esl, age, lead_time;
  Verdict verdict;
  VerdictTest decided_by;
};

class Weigh : public ::testing::TestWithParam<Row> {};

TEST_P(Weigh, FollowsTheRuleInOrder) {
  const Row& row = GetParam();
  SCOPED_TRACE(row.what);
  const VerdictFinding f = weigh(figures(row.k_star, 3000, 4000, row.esl), row.age, row.lead_time);
  EXPECT_EQ(f.verdict, row.verdict);
  EXPECT_EQ(f.decided_by, row.decided_by);
  EXPECT_EQ(f.due(), row.verdict != Verdict::keep);
  // Every test's figures are there, whichever decided.
  ASSERT_TRUE(f.figures);
  EXPECT_EQ(f.age, row.age);
  EXPECT_EQ(f.past_economic_life, row.age >= row.esl);
  EXPECT_EQ(f.lead_time_years, row.lead_time);
  EXPECT_EQ(f.within_lead_time, row.k_star <= row.lead_time);
}

INSTANTIATE_TEST_SUITE_P(
    Rows, Weigh,
    ::testing::Values(
        // (1) k* = 0 decides before the others, even for a young unit.
        Row{"k* = 0, old", 0, 8, 9, 1, Verdict::replace, VerdictTest::replace_now},
        Row{"k* = 0, young", 0, 8, 1, 1, Verdict::replace, VerdictTest::replace_now},
        // (2) at or past the economic life: age 8 against 8 holds (>=), 9 against 8 too.
        Row{"age = ESL", 5, 8, 8, 1, Verdict::review, VerdictTest::past_economic_life},
        Row{"age > ESL, k* within the lead time", 1, 8, 9, 1, Verdict::review,
            VerdictTest::past_economic_life},
        // (3) k* <= lead time: 1 against 1 holds; 2 against 2; lead time 0 never holds for k* >= 1.
        Row{"k* = lead time 1", 1, 8, 3, 1, Verdict::review, VerdictTest::within_lead_time},
        Row{"k* = lead time 2", 2, 8, 3, 2, Verdict::review, VerdictTest::within_lead_time},
        Row{"lead time 0", 1, 8, 3, 0, Verdict::keep, VerdictTest::none_held},
        // (4) young, replacement beyond the lead time: keep (a new unit is never due).
        Row{"k* = 2 > lead time 1", 2, 8, 3, 1, Verdict::keep, VerdictTest::none_held},
        Row{"brand new", 22, 22, 0, 1, Verdict::keep, VerdictTest::none_held}));

TEST(CannotWeigh, IsUnderReviewSayingWhy) {
  const VerdictFinding f = cannot_weigh(
      "no complete year of cost history for class 'x', so its costs cannot be estimated until it "
      "has one");
  EXPECT_EQ(f.verdict, Verdict::review);
  EXPECT_EQ(f.decided_by, VerdictTest::cannot_weigh);
  EXPECT_FALSE(f.figures);
  EXPECT_EQ(f.reason,
            "Review: no complete year of cost history for class 'x', so its costs cannot be "
            "estimated until it has one; tenure cannot weigh this asset until then.");
}

TEST(FiguresOf, TakesTheDecisionsFiguresOnItsBasis) {
  replacement::Decision d{};
  d.basis = Basis::before_tax;
  d.timing = {{10, 9, 11}, 1};
  d.challenger_euac = 4000;
  d.challenger_esl = 7;
  d.defender_euac = 3500;
  d.defender_best_years = 2;
  const VerdictFigures f = figures_of(d, 1234.5, 2);
  EXPECT_EQ(f.basis, Basis::before_tax);
  EXPECT_EQ(f.keep_years, 1);
  EXPECT_EQ(f.last_year_weighed, 2);
  EXPECT_EQ(f.defender_euac, 3500);
  EXPECT_EQ(f.defender_best_years, 2);
  EXPECT_EQ(f.challenger_euac, 4000);
  EXPECT_EQ(f.challenger_esl, 7);
  EXPECT_EQ(f.marginal_cost_next_year, 1234.5);
}

// The reasons are the product's words (SPEC 6: one sentence with the numbers); each expected
// sentence is written out by hand from its row's figures, money with thousands separators as
// the tables print it (issue 16: "9,560.65", not "9560.65").
TEST(Reasons, SayTheDecidingTestWithTheNumbers) {
  EXPECT_EQ(weigh(figures(0, 5000, 4000, 8), 2, 1).reason,
            "Replace: keeping it any longer costs more than a new unit; its least after-tax EUAC "
            "is 5,000.00 against the challenger's 4,000.00, and next year's marginal cost is "
            "900.00.");
  EXPECT_EQ(weigh(figures(1, 3000, 4000, 8), 9, 1).reason,
            "Review: at 9 years it is at or past a new unit's economic life of 8 years; "
            "replacing after 1 year more is cheapest (after-tax EUAC 3,000.00 against the "
            "challenger's 4,000.00).");
  EXPECT_EQ(weigh(figures(2, 3900, 4000, 8), 3, 2).reason,
            "Review: replacing after 2 years more is cheapest, within the lead time of 2 years, "
            "so the replacement is to be budgeted or ordered now (after-tax EUAC 3,900.00 against "
            "the challenger's 4,000.00).");
  EXPECT_EQ(weigh(figures(5, 3700, 4000, 8), 1, 1).reason,
            "Keep: at 1 year it is short of a new unit's economic life of 8 years, and replacing "
            "after 5 years more is cheapest (after-tax EUAC 3,700.00 against the challenger's "
            "4,000.00).");
  // k* at the last year weighed (10) says so.
  EXPECT_EQ(weigh(figures(10, 3000, 4000, 12), 2, 1).reason,
            "Keep: at 2 years it is short of a new unit's economic life of 12 years, and "
            "replacing after 10 years more (the last year weighed) is cheapest (after-tax EUAC "
            "3,000.00 against the challenger's 4,000.00).");
}

TEST(Headline, SaysTheVerdictAndWhen) {
  EXPECT_EQ(verdict_headline(weigh(figures(0, 5000, 4000, 8), 2, 1)), "REPLACE now");
  EXPECT_EQ(verdict_headline(weigh(figures(1, 3000, 4000, 8), 9, 1)),
            "REVIEW (cheapest: replace after 1 year more)");
  EXPECT_EQ(verdict_headline(weigh(figures(5, 3700, 4000, 8), 1, 1)),
            "KEEP (cheapest: replace after 5 years more)");
  EXPECT_EQ(verdict_headline(cannot_weigh("x")), "REVIEW");
}

TEST(VerdictWords, AreTheStoredOnes) {
  EXPECT_STREQ(to_string(Verdict::keep), "keep");
  EXPECT_STREQ(to_string(Verdict::review), "review");
  EXPECT_STREQ(to_string(Verdict::replace), "replace");
}

}  // namespace
}  // namespace tenure::review
