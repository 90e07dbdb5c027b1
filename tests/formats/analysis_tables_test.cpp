// The year-by-year tables of one asset as text: as `tenure case` prints them, and with each audit
// figure `tenure explain` adds (age at end, present worth, PW of cost, the gain on a sale now).
#include "formats/analysis_tables.h"

#include <gtest/gtest.h>

#include "one_year_case.h"

namespace tenure::formats {
namespace {

bool contains(const std::string& text, const std::string& part) {
  return text.find(part) != std::string::npos;
}

TEST(AnalysisTables, BasisWordsAndMarks) {
  EXPECT_EQ(basis_words(replacement::Basis::after_tax), "after-tax");
  EXPECT_EQ(basis_words(replacement::Basis::before_tax), "before-tax");
  EXPECT_EQ(marked(1234.5, true), "1,234.50 *");
  EXPECT_EQ(marked(1234.5, false), "1,234.50  ");
}

TEST(AnalysisTables, CashFlowsAsTheCasePrintsThem) {
  const std::string text =
      cash_flow_tables("Challenger", testing::one_year_case().challenger.table);
  // Year 1 by hand: taxable income -100 - 1000 depreciation = -1100, tax -275 (saved), so the
  // year's after-tax cost is 100 - 275 = -175, a net receipt; sold for 800 over a book value
  // of 0: tax 200, net 600. Money is positive for cost, as in every other table (issue 16).
  EXPECT_EQ(text,
            "Challenger: after-tax cost of each year kept past its end\n"
            "         operating                   book     taxable    income   after-tax\n"
            "  year        cost   depreciation   value      income       tax        cost\n"
            "     1      100.00       1,000.00    0.00   -1,100.00   -275.00     -175.00\n"
            "  after-tax cost = operating cost + income tax; money is positive for cost: a "
            "negative tax is saved\n"
            "\n"
            "Challenger: if sold at the end of the year (that year takes the disposal-year "
            "deduction)\n"
            "         market                   book            disposal        net   after-tax\n"
            "  year    value   depreciation   value     gain        tax   proceeds        cost\n"
            "     1   800.00       1,000.00    0.00   800.00     200.00     600.00     -175.00\n"
            "  net proceeds = market value - disposal tax, money received; after-tax cost as when "
            "kept\n");
}

TEST(AnalysisTables, CashFlowsWithAgeAndPresentWorth) {
  const std::string text = cash_flow_tables("7. Defender", testing::one_year_case().defender->table,
                                            {.age_at_start = 3, .present_worth_rate = 0.075});
  // Kept one more year the defender is 4; its cost 150 x (1 - 0.25) = 112.50 is worth
  // 112.50 / 1.075 = 104.65 now (closed form).
  EXPECT_TRUE(contains(text,
                       "         age at   operating                    book   taxable   income   "
                       "after-tax    PW at\n"
                       "  year      end        cost   depreciation    value    income      tax   "
                       "     cost    7.50%\n"
                       "     1        4      150.00           0.00   500.00   -150.00   -37.50   "
                       "   112.50   104.65\n"))
      << text;
  // The sale table has no audit columns.
  EXPECT_TRUE(contains(text,
                       "7. Defender: if sold at the end of the year (that year takes the "
                       "disposal-year deduction)\n         market"))
      << text;
}

TEST(AnalysisTables, LifeCurveAsTheCasePrintsIt) {
  const std::string text = life_curve_table(testing::one_year_case().defender.value());
  // Before tax at 10%: (200 x 1.1 + 150 - 100) = 270; after tax at 7.5%: the 275 given up by
  // keeping x 1.075 + 112.50 - the 200 a sale then brings after tax (a loss of 400 saves 100)
  // = 208.125, half a cent up.
  EXPECT_EQ(text,
            "  years         EUAC   marginal cost        EUAC   marginal cost\n"
            "   kept   before tax      before tax   after tax       after tax\n"
            "      1     270.00 *          270.00    208.13 *          208.13\n");
}

TEST(AnalysisTables, LifeCurveWithAgeAndPresentWorthOfCost) {
  const std::string text =
      life_curve_table(testing::one_year_case().defender.value(),
                       {.age_at_start = 3, .pw_cost_basis = replacement::Basis::after_tax});
  // The after-tax present worth of keeping one year: 208.125 / 1.075 = 193.60 (closed form).
  EXPECT_TRUE(contains(text, "  years   age at   PW of cost,         EUAC   marginal cost"))
      << text;
  EXPECT_TRUE(contains(text, "   kept      end     after-tax   before tax      before tax"))
      << text;
  EXPECT_TRUE(contains(text, "      1        4        193.60     270.00 *")) << text;
}

TEST(AnalysisTables, OpportunityCostWithAndWithoutTheGain) {
  const replacement::CaseResult result = testing::one_year_case();
  const tax::SaleFlow& now = result.defender->table.start;
  // Sold now for 200 against a book value of 500: a loss of 300 saves 75 of tax, so keeping
  // gives up 275 after tax.
  EXPECT_EQ(opportunity_cost_table(now),
            "  selling now instead of keeping    amount\n"
            "  market value now                  200.00\n"
            "  book value now                    500.00\n"
            "  tax on a sale now                 -75.00\n"
            "  given up by keeping (after tax)   275.00\n");
  EXPECT_EQ(opportunity_cost_table(now, {.gain_on_sale = true}),
            "  selling now instead of keeping     amount\n"
            "  market value now                   200.00\n"
            "  book value now                     500.00\n"
            "  gain on a sale now                -300.00\n"
            "  tax on a sale now                  -75.00\n"
            "  given up by keeping (after tax)    275.00\n");
}

}  // namespace
}  // namespace tenure::formats
