// One asset's analysis as JSON: the shape `tenure case` writes (SPEC 5), and the audit figures
// `tenure explain` adds (present worths per cash flow, PW of cost and the rate per curve).
#include "formats/analysis_json.h"

#include <gtest/gtest.h>

#include "one_year_case.h"

namespace tenure::formats {
namespace {

using nlohmann::json;

constexpr double kTol = 1e-9;  // hand values of a few hundred; only rounding noise

TEST(AnalysisJson, AssetAsTheCaseWritesIt) {
  const json out = asset_analysis_to_json(testing::one_year_case().defender.value(), "best_years");
  // Before tax: 200 x 1.1 + 150 - 100 = 270; after tax: 275 x 1.075 + 112.50 - 200 = 208.125.
  const json& before = out.at("before_tax");
  EXPECT_EQ(before.at("best_years"), 1);
  EXPECT_NEAR(before.at("euac").get<double>(), 270, kTol);
  EXPECT_EQ(before.at("curve").size(), 1u);
  EXPECT_EQ(before.at("curve")[0].at("years"), 1);
  EXPECT_FALSE(before.contains("rate"));
  EXPECT_FALSE(before.at("curve")[0].contains("pw_cost"));
  EXPECT_NEAR(out.at("after_tax").at("euac").get<double>(), 208.125, kTol);
  const json& year = out.at("cash_flows").at(0);
  EXPECT_NEAR(year.at("after_tax_cash_flow").get<double>(), -112.5, kTol);  // -150 x 0.75
  EXPECT_FALSE(year.contains("present_worth"));
  // Sold for 100 against a book value of 500: the loss of 400 saves 100, so it nets 200.
  EXPECT_NEAR(year.at("if_sold").at("disposal_tax").get<double>(), -100, kTol);
  EXPECT_NEAR(year.at("if_sold").at("net_proceeds").get<double>(), 200, kTol);
}

TEST(AnalysisJson, AuditFiguresAddPresentWorths) {
  const json out = asset_analysis_to_json(testing::one_year_case().defender.value(), "best_years",
                                          {.present_worth_rate = 0.075, .pw_cost = true});
  const json& after = out.at("after_tax");
  EXPECT_DOUBLE_EQ(after.at("rate").get<double>(), 0.075);
  // PW of keeping one year after tax: 208.125 / 1.075 (closed form).
  EXPECT_NEAR(after.at("curve")[0].at("pw_cost").get<double>(), 208.125 / 1.075, kTol);
  EXPECT_DOUBLE_EQ(out.at("before_tax").at("rate").get<double>(), 0.10);
  EXPECT_NEAR(out.at("cash_flows")[0].at("present_worth").get<double>(), -112.5 / 1.075, kTol);
}

TEST(AnalysisJson, OpportunityCost) {
  // Sold now for 200 against a book value of 500: a loss of 300 saves 75, 275 after tax.
  const json out = opportunity_cost_to_json(testing::one_year_case().defender->table.start);
  EXPECT_EQ(out, json::parse(R"({"market_value_now": 200, "book_value_now": 500,
                                 "tax_on_sale_now": -75, "after_tax": 275})"));
}

}  // namespace
}  // namespace tenure::formats
