// The case result as text tables: every section is there, the best lives are marked, and the
// caution of SPEC 10 closes the output.
#include <gtest/gtest.h>

#include "formats/case_json.h"
#include "formats/case_table.h"
#include "formats/caution.h"

namespace tenure::formats {
namespace {

const char* kCase = R"({
  "marr": 0.10, "income_tax_rate": 0.25,
  "challenger": {"first_cost": 1000, "operating_costs": [100], "market_values": [800],
                 "depreciation": {"method": "straight_line", "life_years": 1, "salvage": 0}},
  "defender": {"first_cost": 500, "age_years": 1, "market_value_now": 200,
               "operating_costs": [150], "market_values": [100],
               "depreciation": {"method": "none"}},
  "study_period_years": 1})";

std::string table_of(const char* text) {
  const replacement::Case c = read_case(text);
  return case_result_to_table(c, replacement::analyse(c));
}

bool contains(const std::string& text, const std::string& part) {
  return text.find(part) != std::string::npos;
}

TEST(CaseTable, HasEverySection) {
  const std::string text = table_of(kCase);
  for (const char* heading :
       {"Rates used", "Decision basis: after-tax", "Challenger: EUAC and marginal cost",
        "Challenger: after-tax cost of each year kept",
        "Challenger: if sold at the end of the year",
        "Defender: its opportunity cost", "Defender: EUAC and marginal cost",
        "Defender: after-tax cost of each year kept", "Replacement timing",
        "Decision: REVIEW (cheapest: replace after 1 year more)", "What is at stake",
        "Study period of 1 year"}) {
    EXPECT_TRUE(contains(text, heading)) << heading << "\n" << text;
  }
}

TEST(CaseTable, ShowsTheNumbersWithTheBestMarked) {
  const std::string text = table_of(kCase);
  // Rates: 10%, and the after-tax MARR default 10% * (1 - 0.25) = 7.5%.
  EXPECT_TRUE(contains(text, "after-tax MARR              7.50%")) << text;
  // The one-year challenger: EUAC 400.00 before tax and 300.00 after (closed form, see
  // case_json_test), each the economic service life.
  EXPECT_TRUE(contains(text, "400.00 *")) << text;
  EXPECT_TRUE(contains(text, "300.00 *")) << text;
  // Opportunity cost after tax: 200 + 75 saved on the loss = 275.
  EXPECT_TRUE(contains(text, "given up by keeping (after tax)   275.00")) << text;
  // The defender's after-tax EUAC 208.125 (closed form, see case_json_test), half a cent up.
  EXPECT_TRUE(contains(text, "208.13 *")) << text;
}

TEST(CaseTable, EndsWithTheCaution) {
  const std::string text = table_of(kCase);
  const std::string ending = std::string(kCaution) + "\n";
  ASSERT_GE(text.size(), ending.size());
  EXPECT_EQ(text.substr(text.size() - ending.size()), ending);
}

TEST(CaseTable, BeforeTaxCaseHasNoAfterTaxColumns) {
  const std::string text = table_of(R"({
    "marr": 0.10, "income_tax_rate": 0,
    "challenger": {"first_cost": 1000, "operating_costs": [100, 200], "market_values": [800, 700],
                   "depreciation": {"method": "none"}}})");
  EXPECT_TRUE(contains(text, "Decision basis: before-tax"));
  EXPECT_FALSE(contains(text, "EUAC after tax"));
  EXPECT_FALSE(contains(text, "Defender"));
  EXPECT_FALSE(contains(text, "Decision:"));
}

}  // namespace
}  // namespace tenure::formats
