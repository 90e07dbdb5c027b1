// The one verdict rule (review/verdict_rule.h, SPEC 6 "Nightly verdict"): which test decides,
// with each test's figures, for the nightly review and for a case file, and the reasons' wording.
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

struct NightlyRow {
  const char* what;
  Years k_star;
  Money d, c;
  Years esl, age;
  double margin;
  Verdict verdict;
  VerdictTest decided_by;
};

class NightlyVerdict : public ::testing::TestWithParam<NightlyRow> {};

TEST_P(NightlyVerdict, FollowsTheRuleInOrder) {
  const NightlyRow& row = GetParam();
  SCOPED_TRACE(row.what);
  const VerdictFinding f =
      nightly_verdict(figures(row.k_star, row.d, row.c, row.esl), row.age, row.margin);
  EXPECT_EQ(f.verdict, row.verdict);
  EXPECT_EQ(f.decided_by, row.decided_by);
  EXPECT_EQ(f.due(), row.verdict != Verdict::keep);
  // Every test's figures are there, whichever decided.
  ASSERT_TRUE(f.figures);
  ASSERT_TRUE(f.age);
  EXPECT_EQ(*f.age, row.age);
  EXPECT_EQ(f.past_economic_life, row.age >= row.esl);
  EXPECT_DOUBLE_EQ(f.gap, std::abs(row.d - row.c));
  EXPECT_DOUBLE_EQ(f.allowed, row.margin * row.c);
  EXPECT_EQ(f.close_to_challenger, std::abs(row.d - row.c) <= row.margin * row.c);
}

INSTANTIATE_TEST_SUITE_P(
    Rows, NightlyVerdict,
    ::testing::Values(
        // (1) k* = 0 decides before the others, even for a young unit close to the challenger.
        NightlyRow{"k* = 0", 0, 5000, 4000, 8, 2, 0.05, Verdict::replace, VerdictTest::replace_now},
        NightlyRow{"k* = 0, close and young", 0, 4010, 4000, 8, 1, 0.05, Verdict::replace,
                   VerdictTest::replace_now},
        // (2) at or past the economic life: age 8 against 8 holds (>=), 9 against 8 too.
        NightlyRow{"age = ESL", 2, 3000, 4000, 8, 8, 0.05, Verdict::review,
                   VerdictTest::past_economic_life},
        NightlyRow{"age > ESL", 1, 3000, 4000, 8, 9, 0.05, Verdict::review,
                   VerdictTest::past_economic_life},
        // (3) |D - C| <= margin x C: |3800 - 4000| = 200 = 0.05 x 4000 holds at the boundary.
        NightlyRow{"gap = margin x C", 5, 3800, 4000, 8, 3, 0.05, Verdict::review,
                   VerdictTest::close_to_challenger},
        NightlyRow{"gap < margin x C", 5, 3900, 4000, 8, 3, 0.05, Verdict::review,
                   VerdictTest::close_to_challenger},
        // (4) 3700 is 300 from 4000, more than 200: keep.
        NightlyRow{"gap > margin x C", 5, 3700, 4000, 8, 3, 0.05, Verdict::keep,
                   VerdictTest::none_held},
        NightlyRow{"margin 0, D = C", 5, 4000, 4000, 8, 3, 0.0, Verdict::review,
                   VerdictTest::close_to_challenger},
        NightlyRow{"margin 0, D < C", 5, 3999, 4000, 8, 3, 0.0, Verdict::keep,
                   VerdictTest::none_held}));

TEST(CaseVerdict, WeighsKStarAlone) {
  // Rule (1), else (4): a case's defender is never "review", whatever its figures.
  EXPECT_EQ(case_verdict(figures(0, 5000, 4000, 8)).verdict, Verdict::replace);
  EXPECT_EQ(case_verdict(figures(0, 5000, 4000, 8)).decided_by, VerdictTest::replace_now);
  const VerdictFinding kept = case_verdict(figures(2, 3990, 4000, 1));
  EXPECT_EQ(kept.verdict, Verdict::keep);
  EXPECT_EQ(kept.decided_by, VerdictTest::none_held);
  EXPECT_FALSE(kept.age);
  EXPECT_FALSE(kept.review_margin);
}

TEST(CannotWeigh, IsUnderReviewSayingWhy) {
  const VerdictFinding f = cannot_weigh("no complete year of cost history for class 'x'");
  EXPECT_EQ(f.verdict, Verdict::review);
  EXPECT_EQ(f.decided_by, VerdictTest::cannot_weigh);
  EXPECT_FALSE(f.figures);
  EXPECT_EQ(f.reason,
            "Review: no complete year of cost history for class 'x'; tenure cannot weigh this "
            "asset until the class has a complete year of costs.");
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
// sentence is written out by hand from its row's figures.
TEST(Reasons, SayTheDecidingTestWithTheNumbers) {
  EXPECT_EQ(nightly_verdict(figures(0, 5000, 4000, 8), 2, 0.05).reason,
            "Replace: keeping it any longer costs more than a new unit; its least after-tax EUAC "
            "is 5000.00 against the challenger's 4000.00 and next year's marginal cost is 900.00.");
  EXPECT_EQ(nightly_verdict(figures(1, 3000, 4000, 8), 9, 0.05).reason,
            "Review: at 9 years it is at or past the class's economic life of 8 years; replacing "
            "after 1 year more is cheapest (after-tax EUAC 3000.00 against the challenger's "
            "4000.00).");
  EXPECT_EQ(nightly_verdict(figures(5, 3900, 4000, 8), 3, 0.05).reason,
            "Review: its least after-tax EUAC of 3900.00 is within 5% of the challenger's 4000.00; "
            "replacing after 5 years more is cheapest.");
  EXPECT_EQ(nightly_verdict(figures(5, 3700, 4000, 8), 1, 0.05).reason,
            "Keep: at 1 year it is short of the class's economic life of 8 years; its least "
            "after-tax EUAC is 3700.00 against the challenger's 4000.00, and replacing after 5 "
            "years more is cheapest.");
  EXPECT_EQ(case_verdict(figures(0, 5000, 4000, 8)).reason,
            "Replace now: on an after-tax basis the defender's least EUAC is 5000.00 (keeping 3 "
            "years) against the challenger's 4000.00 (economic life 8 years), and no period of "
            "keeping it costs less than replacing it at once.");
  // k* at the last year weighed (10) says so.
  EXPECT_EQ(case_verdict(figures(10, 3000, 4000, 8)).reason,
            "Keep the defender 10 years more (the end of the years given for it) and then replace "
            "it: on an after-tax basis its least EUAC is 3000.00 (keeping 3 years) against the "
            "challenger's 4000.00 (economic life 8 years).");
}

TEST(VerdictWords, AreTheStoredOnes) {
  EXPECT_STREQ(to_string(Verdict::keep), "keep");
  EXPECT_STREQ(to_string(Verdict::review), "review");
  EXPECT_STREQ(to_string(Verdict::replace), "replace");
}

}  // namespace
}  // namespace tenure::review
