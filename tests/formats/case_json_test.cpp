// Case files: every class of bad input names its JSON path and rule exactly; a good file reads
// into the Case it describes; the result JSON has the keys of SPEC 5 and the brief, and numbers
// that match a hand computation.
#include <gtest/gtest.h>

#include <functional>
#include <set>

#include "core/errors.h"
#include "formats/case_json.h"

namespace tenure::formats {
namespace {

using nlohmann::json;

json base_case() {
  return json::parse(R"({
    "marr": 0.10, "income_tax_rate": 0.25,
    "challenger": {"first_cost": 1000, "operating_costs": [100, 150], "market_values": [800, 600],
                   "depreciation": {"method": "straight_line", "life_years": 2, "salvage": 0}},
    "defender": {"first_cost": 900, "age_years": 3, "market_value_now": 300,
                 "operating_costs": [200, 260], "market_values": [250, 200],
                 "depreciation": {"method": "macrs", "recovery_years": 3}},
    "study_period_years": 2})");
}

// The error read_case throws on `text`, as "<where>|<rule>".
std::string read_error(const std::string& text) {
  try {
    read_case(text);
  } catch (const InputError& error) {
    return error.where() + "|" + error.rule();
  }
  return "no error";
}

struct BadCase {
  const char* what;
  std::function<void(json&)> change;
  std::string expected;  // "<where>|<rule>"
};

TEST(ReadCase, EveryBadInputNamesItsPathAndRule) {
  const std::vector<BadCase> cases = {
      // Unknown keys at each level.
      {"top-level typo", [](json& c) { c["mar"] = 0.1; },
       "$.mar|unknown key (expected one of marr, income_tax_rate, after_tax_marr, "
       "capital_gains_tax_rate, lead_time_years, review_margin, challenger, challengers, "
       "improvement, defender, study_period_years)"},
      {"challenger typo", [](json& c) { c["challenger"]["foo"] = 1; },
       "$.challenger.foo|unknown key (expected one of first_cost, operating_costs, "
       "market_values, depreciation)"},
      {"defender typo", [](json& c) { c["defender"]["age"] = 3; },
       "$.defender.age|unknown key (expected one of first_cost, age_years, market_value_now, "
       "operating_costs, market_values, depreciation)"},
      {"challenger age is not a challenger key", [](json& c) { c["challenger"]["age_years"] = 0; },
       "$.challenger.age_years|unknown key (expected one of first_cost, operating_costs, "
       "market_values, depreciation)"},
      {"depreciation typo", [](json& c) { c["defender"]["depreciation"]["life_years"] = 3; },
       "$.defender.depreciation.life_years|unknown key (expected one of method, "
       "recovery_years, convention, quarter, section_179, bonus)"},
      // Wrong types.
      {"marr as text", [](json& c) { c["marr"] = "0.1"; }, "$.marr|expected a number"},
      {"challenger as array", [](json& c) { c["challenger"] = json::array(); },
       "$.challenger|expected an object"},
      {"defender null", [](json& c) { c["defender"] = nullptr; }, "$.defender|expected an object"},
      {"costs as number", [](json& c) { c["challenger"]["operating_costs"] = 5; },
       "$.challenger.operating_costs|expected an array of numbers"},
      {"cost element as text", [](json& c) { c["challenger"]["operating_costs"][1] = "x"; },
       "$.challenger.operating_costs[1]|expected a number"},
      {"age as boolean", [](json& c) { c["defender"]["age_years"] = true; },
       "$.defender.age_years|expected a whole number"},
      {"study period as text", [](json& c) { c["study_period_years"] = "3"; },
       "$.study_period_years|expected a whole number"},
      // Amounts beyond 1e15 (core/checks.h kMaxAmount): found by the case fuzzer, a market
      // value of 1e308 made a tax on the sale overflow and a present worth infinite.
      {"market value of 1e308", [](json& c) { c["challenger"]["market_values"][1] = 1e308; },
       "$.challenger.market_values[1]|must be at most 1e15 in magnitude (no equipment costs "
       "more)"},
      {"operating cost above 1e15", [](json& c) { c["defender"]["operating_costs"][0] = 2e15; },
       "$.defender.operating_costs[0]|must be at most 1e15 in magnitude (no equipment costs "
       "more)"},
      {"first cost above 1e15", [](json& c) { c["challenger"]["first_cost"] = 1.5e15; },
       "$.challenger.first_cost|must be at most 1e15 in magnitude (no equipment costs more)"},
      {"market value now above 1e15", [](json& c) { c["defender"]["market_value_now"] = 1e16; },
       "$.defender.market_value_now|must be at most 1e15 in magnitude (no equipment costs "
       "more)"},
      // Missing required fields.
      {"no marr", [](json& c) { c.erase("marr"); }, "$.marr|required number is missing"},
      {"no income tax rate", [](json& c) { c.erase("income_tax_rate"); },
       "$.income_tax_rate|required number is missing"},
      {"no challenger", [](json& c) { c.erase("challenger"); },
       "$.challenger|required object is missing"},
      {"no first cost", [](json& c) { c["challenger"].erase("first_cost"); },
       "$.challenger.first_cost|required number is missing"},
      {"no market values", [](json& c) { c["challenger"].erase("market_values"); },
       "$.challenger.market_values|required array of numbers is missing"},
      {"no depreciation", [](json& c) { c["defender"].erase("depreciation"); },
       "$.defender.depreciation|required object is missing"},
      {"no age", [](json& c) { c["defender"].erase("age_years"); },
       "$.defender.age_years|required whole number is missing"},
      {"no market value now", [](json& c) { c["defender"].erase("market_value_now"); },
       "$.defender.market_value_now|required number is missing"},
      {"no method", [](json& c) { c["challenger"]["depreciation"].erase("method"); },
       "$.challenger.depreciation.method|required string is missing"},
      // Ranges.
      {"tax rate 1.0", [](json& c) { c["income_tax_rate"] = 1.0; },
       "$.income_tax_rate|must be in [0, 0.99]"},
      {"tax rate -0.1", [](json& c) { c["income_tax_rate"] = -0.1; },
       "$.income_tax_rate|must be in [0, 0.99]"},
      {"marr 0", [](json& c) { c["marr"] = 0; }, "$.marr|must be > 0"},
      {"after-tax marr negative", [](json& c) { c["after_tax_marr"] = -0.01; },
       "$.after_tax_marr|must be > 0"},
      {"capital gains 1.5", [](json& c) { c["capital_gains_tax_rate"] = 1.5; },
       "$.capital_gains_tax_rate|must be in [0, 0.99]"},
      {"first cost 0", [](json& c) { c["challenger"]["first_cost"] = 0; },
       "$.challenger.first_cost|must be > 0"},
      {"negative cost", [](json& c) { c["challenger"]["operating_costs"][1] = -5; },
       "$.challenger.operating_costs[1]|must be >= 0"},
      {"negative market value", [](json& c) { c["defender"]["market_values"][0] = -1; },
       "$.defender.market_values[0]|must be >= 0"},
      {"negative value now", [](json& c) { c["defender"]["market_value_now"] = -1; },
       "$.defender.market_value_now|must be >= 0"},
      {"empty costs", [](json& c) { c["challenger"]["operating_costs"] = json::array(); },
       "$.challenger.operating_costs|must not be empty"},
      {"lists of different lengths",
       [](json& c) {
         c["challenger"]["market_values"] = {800, 600, 500};
       },
       "$.challenger.market_values|has 3 values but operating_costs has 2; give one market "
       "value for the end of each year"},
      {"negative life", [](json& c) { c["challenger"]["depreciation"]["life_years"] = -2; },
       "$.challenger.depreciation.life_years|must be >= 1"},
      {"life 5.5", [](json& c) { c["challenger"]["depreciation"]["life_years"] = 5.5; },
       "$.challenger.depreciation.life_years|must be a whole number, not 5.5"},
      {"age 2.5", [](json& c) { c["defender"]["age_years"] = 2.5; },
       "$.defender.age_years|must be a whole number, not 2.5"},
      {"negative age", [](json& c) { c["defender"]["age_years"] = -1; },
       "$.defender.age_years|must be >= 0"},
      {"study period 0", [](json& c) { c["study_period_years"] = 0; },
       "$.study_period_years|must be >= 1"},
      {"unknown method", [](json& c) { c["challenger"]["depreciation"]["method"] = "double"; },
       "$.challenger.depreciation.method|unknown method 'double' (expected one of "
       "straight_line, declining_balance, sum_of_years_digits, macrs, macrs_ads, none, pool)"},
      {"recovery period 4", [](json& c) { c["defender"]["depreciation"]["recovery_years"] = 4; },
       "$.defender.depreciation.recovery_years|must be one of 3, 5, 7, 10, 15, 20"},
      {"salvage above first cost",
       [](json& c) { c["challenger"]["depreciation"]["salvage"] = 1500; },
       "$.challenger.depreciation.salvage|must not exceed the basis"},
  };
  for (const BadCase& bad : cases) {
    json document = base_case();
    bad.change(document);
    EXPECT_EQ(read_error(document.dump()), bad.expected) << bad.what;
  }
}

TEST(ReadCase, TextLevelErrors) {
  EXPECT_EQ(read_error("[1, 2]"), "$|expected an object");
  const std::string malformed = read_error("{\"marr\": 0.1,\n  \"income_tax_rate\": }");
  EXPECT_EQ(malformed.rfind("$|invalid JSON at line 2, column 22: ", 0), 0u) << malformed;
  // 1e999 overflows a double: the non-finite number is named where it stands.
  std::string overflow = base_case().dump();
  overflow.replace(overflow.find("1000"), 4, "1e999");
  EXPECT_EQ(read_error(overflow),
            "$.challenger.first_cost|must be a finite number (this one overflows a double)");
  EXPECT_EQ(read_error("{\"marr\": 0.1, \"income_tax_rate\": 0, \"marr\": 0.2}"),
            "$.marr|duplicate key");
}

TEST(ReadCase, ReadsAGoodCaseWithCommentsAndDefaults) {
  const replacement::Case c = read_case("// a comment\n" + base_case().dump());
  EXPECT_EQ(c.rates.marr, 0.10);
  EXPECT_EQ(c.rates.income_tax_rate, 0.25);
  EXPECT_DOUBLE_EQ(c.rates.after_tax_marr, 0.075);  // SPEC 4 default: marr * (1 - t)
  EXPECT_EQ(c.rates.capital_gains_tax_rate, 0.25);  // SPEC 4 default: the income rate
  EXPECT_EQ(c.challenger.first_cost, 1000);
  EXPECT_EQ(c.challenger.age_years, 0);
  EXPECT_EQ(c.challenger.value_now, 1000);  // a challenger's value now is its first cost
  EXPECT_EQ(c.challenger.operating_costs, (std::vector<double>{100, 150}));
  EXPECT_EQ(c.challenger.market_values, (std::vector<double>{800, 600}));
  EXPECT_EQ(c.challenger.depreciation->name(), "straight_line");
  ASSERT_TRUE(c.defender.has_value());
  EXPECT_EQ(c.defender->first_cost, 900);
  EXPECT_EQ(c.defender->age_years, 3);
  EXPECT_EQ(c.defender->value_now, 300);
  EXPECT_EQ(c.defender->depreciation->name(), "macrs");
  EXPECT_EQ(c.study_period_years, 2);
}

TEST(ReadCase, OptionalPartsMayBeLeftOut) {
  json document = base_case();
  document.erase("defender");
  document.erase("study_period_years");
  document["after_tax_marr"] = 0.07;
  document["capital_gains_tax_rate"] = 0.15;
  const replacement::Case c = read_case(document.dump());
  EXPECT_FALSE(c.defender.has_value());
  EXPECT_FALSE(c.study_period_years.has_value());
  EXPECT_EQ(c.rates.after_tax_marr, 0.07);
  EXPECT_EQ(c.rates.capital_gains_tax_rate, 0.15);
}

std::set<std::string> keys_of(const json& object) {
  std::set<std::string> keys;
  for (const auto& item : object.items()) keys.insert(item.key());
  return keys;
}

using Keys = std::set<std::string>;

json analysed(const json& document) {
  const replacement::Case c = read_case(document.dump());
  return case_result_to_json(c, replacement::analyse(c));
}

TEST(CaseResultJson, HasTheListedKeys) {
  const json out = analysed(base_case());
  EXPECT_EQ(keys_of(out),
            (Keys{"basis", "rates", "challenger", "defender", "decision", "study_period"}));
  EXPECT_EQ(out["basis"], "after_tax");
  EXPECT_EQ(keys_of(out["rates"]),
            (Keys{"marr", "income_tax_rate", "after_tax_marr", "capital_gains_tax_rate"}));
  EXPECT_EQ(keys_of(out["challenger"]), (Keys{"before_tax", "after_tax", "cash_flows"}));
  EXPECT_EQ(keys_of(out["challenger"]["before_tax"]),
            (Keys{"esl_years", "euac", "curve", "marginal_costs"}));
  EXPECT_EQ(keys_of(out["challenger"]["after_tax"]),
            (Keys{"esl_years", "euac", "curve", "marginal_costs"}));
  EXPECT_EQ(keys_of(out["challenger"]["before_tax"]["curve"][0]), (Keys{"years", "euac"}));
  EXPECT_EQ(out["challenger"]["before_tax"]["curve"].size(), 2u);
  EXPECT_TRUE(out["challenger"]["before_tax"]["marginal_costs"][0].is_number());
  const json& row = out["challenger"]["cash_flows"][0];
  EXPECT_EQ(keys_of(row), (Keys{"year", "operating_cost", "depreciation", "book_value",
                                "taxable_income", "income_tax", "after_tax_cash_flow", "if_sold"}));
  EXPECT_EQ(keys_of(row["if_sold"]), (Keys{"market_value", "depreciation", "book_value", "gain",
                                           "disposal_tax", "net_proceeds", "after_tax_cash_flow"}));
  EXPECT_EQ(keys_of(out["defender"]),
            (Keys{"before_tax", "after_tax", "opportunity_cost", "cash_flows"}));
  EXPECT_EQ(keys_of(out["defender"]["before_tax"]),
            (Keys{"best_years", "euac", "curve", "marginal_costs"}));
  EXPECT_EQ(keys_of(out["defender"]["opportunity_cost"]),
            (Keys{"market_value_now", "book_value_now", "tax_on_sale_now", "after_tax"}));
  EXPECT_EQ(keys_of(out["decision"]),
            (Keys{"basis", "verdict", "replace_after_years", "reason", "challenger_euac",
                  "challenger_esl_years", "defender_euac", "defender_best_years", "timing",
                  "delay_cost", "early_cost", "repair_limit", "break_even_price",
                  "break_even_cost_factor", "close_call"}));
  EXPECT_EQ(keys_of(out["decision"]["timing"][0]), (Keys{"keep_years", "present_worth_cost"}));
  EXPECT_EQ(out["decision"]["timing"].size(), 3u);  // keep 0, 1 or 2 years
  EXPECT_EQ(keys_of(out["study_period"]),
            (Keys{"years", "basis", "options", "best_defender_years"}));
  EXPECT_EQ(keys_of(out["study_period"]["options"][0]),
            (Keys{"defender_years", "present_worth_cost"}));
}

TEST(CaseResultJson, BeforeTaxOnlyWithoutDefenderOrStudyPeriod) {
  json document = base_case();
  document["income_tax_rate"] = 0;
  document.erase("defender");
  document.erase("study_period_years");
  const json out = analysed(document);
  EXPECT_EQ(keys_of(out), (Keys{"basis", "rates", "challenger"}));
  EXPECT_EQ(out["basis"], "before_tax");
  EXPECT_EQ(keys_of(out["challenger"]), (Keys{"before_tax", "cash_flows"}));
}

// One year each, so every number can be checked by hand (closed form).
TEST(CaseResultJson, NumbersMatchAHandComputation) {
  const json out = analysed(json::parse(R"({
    "marr": 0.10, "income_tax_rate": 0.25,
    "challenger": {"first_cost": 1000, "operating_costs": [100], "market_values": [800],
                   "depreciation": {"method": "straight_line", "life_years": 1, "salvage": 0}},
    "defender": {"first_cost": 500, "age_years": 1, "market_value_now": 200,
                 "operating_costs": [150], "market_values": [100],
                 "depreciation": {"method": "none"}}})"));
  constexpr double kTol = 1e-9;
  EXPECT_EQ(out["rates"]["after_tax_marr"].get<double>(), 0.1 * 0.75);
  // Challenger before tax: 1000 * 1.1 + 100 - 800 = 400.
  EXPECT_NEAR(out["challenger"]["before_tax"]["euac"].get<double>(), 400, kTol);
  EXPECT_EQ(out["challenger"]["before_tax"]["esl_years"], 1);
  EXPECT_NEAR(out["challenger"]["before_tax"]["marginal_costs"][0].get<double>(), 400, kTol);
  // After tax: deduction 1000, taxable income -1100, tax -275, ATCF 175; sale 800 against
  // book 0, tax 200, net 600; EUAC at 7.5% = 1000 * 1.075 - 175 - 600 = 300.
  const json& year = out["challenger"]["cash_flows"][0];
  EXPECT_NEAR(year["depreciation"].get<double>(), 1000, kTol);
  EXPECT_NEAR(year["taxable_income"].get<double>(), -1100, kTol);
  EXPECT_NEAR(year["income_tax"].get<double>(), -275, kTol);
  EXPECT_NEAR(year["after_tax_cash_flow"].get<double>(), 175, kTol);
  EXPECT_NEAR(year["if_sold"]["gain"].get<double>(), 800, kTol);
  EXPECT_NEAR(year["if_sold"]["disposal_tax"].get<double>(), 200, kTol);
  EXPECT_NEAR(year["if_sold"]["net_proceeds"].get<double>(), 600, kTol);
  EXPECT_NEAR(out["challenger"]["after_tax"]["euac"].get<double>(), 300, kTol);
  // Defender, no depreciation: book value now 500, a sale now at 200 is a loss of 300 that saves
  // 75, so keeping gives up 275. Year 1: ATCF -150 + 37.5 = -112.5; sale at 100, loss 400 saves
  // 100, net 200. EUAC = 275 * 1.075 + 112.5 - 200 = 208.125. Before tax: 200 * 1.1 + 150 - 100.
  const json& opportunity = out["defender"]["opportunity_cost"];
  EXPECT_NEAR(opportunity["book_value_now"].get<double>(), 500, kTol);
  EXPECT_NEAR(opportunity["tax_on_sale_now"].get<double>(), -75, kTol);
  EXPECT_NEAR(opportunity["after_tax"].get<double>(), 275, kTol);
  EXPECT_NEAR(out["defender"]["before_tax"]["euac"].get<double>(), 270, kTol);
  EXPECT_NEAR(out["defender"]["after_tax"]["euac"].get<double>(), 208.125, kTol);
  // Timing at 7.5% with the challenger's 300 forever: keep 0 -> 300 / 0.075 = 4000;
  // keep 1 -> (208.125 + 4000) / 1.075 = 3914.53..., so keep one year.
  const json& decision = out["decision"];
  EXPECT_EQ(decision["basis"], "after_tax");
  // k* = 1 is within the default lead time of 1 year: review (SPEC 6, revised).
  EXPECT_EQ(decision["verdict"], "review");
  EXPECT_EQ(decision["replace_after_years"], 1);
  EXPECT_NEAR(decision["timing"][0]["present_worth_cost"].get<double>(), 4000, 1e-6);
  EXPECT_NEAR(decision["timing"][1]["present_worth_cost"].get<double>(), 4208.125 / 1.075, 1e-6);
  EXPECT_NEAR(decision["challenger_euac"].get<double>(), 300, kTol);
  EXPECT_NEAR(decision["defender_euac"].get<double>(), 208.125, kTol);
  EXPECT_FALSE(decision["reason"].get<std::string>().empty());
  // At stake (SPEC 11), by hand. k* = 1 is the last year given: no cost of waiting. Replacing
  // now costs T(0) - T(1) = 4000 - 4208.125 / 1.075; the repair limit is that over
  // 1 - 0.25 / 1.075. The challenger's EUAC against its price P: 1.075 P + 0.75 x 100 - 0.25 P
  // (its deduction) - 0.6 P (its sale, net of tax) = 0.225 P + 75, equal to D* = 208.125 at
  // P = 133.125 / 0.225. The defender's against a factor f on its costs: 275 x 1.075 + 112.5 f
  // - 200 = 95.625 + 112.5 f, equal to C* = 300 at f = 204.375 / 112.5. The break-even price is
  // 41% below the price: no close call.
  const double early = 4000 - 4208.125 / 1.075;
  EXPECT_TRUE(decision["delay_cost"].is_null());
  EXPECT_NEAR(decision["early_cost"].get<double>(), early, 1e-9);
  EXPECT_NEAR(decision["repair_limit"].get<double>(), early / (1 - 0.25 / 1.075), 1e-9);
  EXPECT_NEAR(decision["break_even_price"].get<double>(), 133.125 / 0.225, 1e-9);
  EXPECT_NEAR(decision["break_even_cost_factor"].get<double>(), 204.375 / 112.5, 1e-12);
  EXPECT_EQ(decision["close_call"], false);
}

TEST(CaseResultJson, KeepsFullPrecision) {
  json document = base_case();
  document["marr"] = 0.1234567890123;
  const json out = analysed(document);
  EXPECT_EQ(out["rates"]["marr"].get<double>(), 0.1234567890123);
  const json reparsed = json::parse(out.dump());
  EXPECT_EQ(reparsed["challenger"]["after_tax"]["euac"].get<double>(),
            out["challenger"]["after_tax"]["euac"].get<double>());
}

}  // namespace
}  // namespace tenure::formats
