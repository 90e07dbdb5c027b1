// Policy files that must be refused (SPEC 4): unknown keys at every level, wrong types, missing
// fields, rates out of range, and `sources` that are not plain SQL identifiers, each an
// InputError naming the JSON path and the rule. Then the case-file refusals that
// case_json_test.cpp does not already cover.
#include <gtest/gtest.h>

#include <functional>
#include <string>
#include <vector>

#include "core/errors.h"
#include "formats/case_json.h"
#include "formats/policy_json.h"

namespace tenure::formats {
namespace {

using nlohmann::json;

// An invented policy with every optional key given.
json base_policy() {
  return json::parse(R"({
    "marr": 0.10, "income_tax_rate": 0.25, "after_tax_marr": 0.075,
    "capital_gains_tax_rate": 0.2, "cost_escalation": 0.03, "review_margin": 0.05,
    "detail": "due",
    "sources": {"assets": "asset", "costs": "cost_event", "valuations": "asset_valuation"},
    "classes": {"van-delivery": {
      "challenger_first_cost": 52000, "max_life_years": 15,
      "depreciation": {"method": "macrs", "recovery_years": 5},
      "market_value": {"annual_decline": 0.18}, "cost_model": "auto"}}})");
}

// "<where>|<rule>" of the InputError read_policy throws on `text`, or "no error".
std::string policy_error(const std::string& text) {
  try {
    read_policy(text);
  } catch (const InputError& error) {
    return error.where() + "|" + error.rule();
  }
  return "no error";
}

struct BadPolicy {
  const char* what;
  std::function<void(json&)> change;
  std::string expected;  // "<where>|<rule>"
};

const std::string kTopKeys =
    "unknown key (expected one of marr, income_tax_rate, after_tax_marr, "
    "capital_gains_tax_rate, cost_escalation, lead_time_years, review_margin, esl_band, "
    "sources, classes, detail)";
const std::string kClassKeys =
    "unknown key (expected one of challenger_first_cost, challengers, improvement, "
    "max_life_years, depreciation, market_value, cost_model)";
const std::string kSourceRule =
    "must be a plain SQL identifier (letters, digits and _, not starting with a digit); map "
    "other names with a CREATE VIEW";

json& van(json& p) { return p["classes"]["van-delivery"]; }

TEST(PolicyRefusals, BaseIsValid) { EXPECT_EQ(policy_error(base_policy().dump()), "no error"); }

// The edges of esl_band's range that are allowed, and its default of SPEC 11 (0.02).
TEST(PolicyRefusals, EslBandDefaultAndAllowedEdges) {
  EXPECT_EQ(read_policy(base_policy().dump()).esl_band, 0.02);
  for (const double band : {0.0, 0.5, 0.999}) {
    json policy = base_policy();
    policy["esl_band"] = band;
    EXPECT_EQ(read_policy(policy.dump()).esl_band, band);
  }
}

TEST(PolicyRefusals, UnknownKeysAtEachLevel) {
  const std::vector<BadPolicy> cases = {
      {"top level", [](json& p) { p["mar"] = 0.1; }, "$.mar|" + kTopKeys},
      {"top level, spec's name in other case", [](json& p) { p["MARR"] = 0.1; }, "$.MARR|" + kTopKeys},
      {"sources", [](json& p) { p["sources"]["cost"] = "x"; },
       "$.sources.cost|unknown key (expected one of assets, costs, valuations)"},
      {"class", [](json& p) { van(p)["max_life"] = 15; }, "$.classes.van-delivery.max_life|" + kClassKeys},
      {"depreciation", [](json& p) { van(p)["depreciation"]["life_years"] = 5; },
       "$.classes.van-delivery.depreciation.life_years|unknown key (expected one of method, "
       "recovery_years, convention, quarter, section_179, bonus)"},
      {"market value", [](json& p) { van(p)["market_value"]["decline"] = 0.1; },
       "$.classes.van-delivery.market_value.decline|unknown key (expected one of annual_decline)"},
  };
  for (const BadPolicy& bad : cases) {
    json policy = base_policy();
    bad.change(policy);
    EXPECT_EQ(policy_error(policy.dump()), bad.expected) << bad.what;
  }
}

TEST(PolicyRefusals, WrongTypes) {
  const std::vector<BadPolicy> cases = {
      {"marr as text", [](json& p) { p["marr"] = "0.10"; }, "$.marr|expected a number"},
      {"tax rate null", [](json& p) { p["income_tax_rate"] = nullptr; },
       "$.income_tax_rate|expected a number"},
      {"escalation as array", [](json& p) { p["cost_escalation"] = {0.03}; },
       "$.cost_escalation|expected a number"},
      {"margin as boolean", [](json& p) { p["review_margin"] = true; },
       "$.review_margin|expected a number"},
      {"esl band as text", [](json& p) { p["esl_band"] = "2%"; }, "$.esl_band|expected a number"},
      {"detail as number", [](json& p) { p["detail"] = 1; }, "$.detail|expected a string"},
      {"sources as text", [](json& p) { p["sources"] = "asset"; }, "$.sources|expected an object"},
      {"source as number", [](json& p) { p["sources"]["costs"] = 7; },
       "$.sources.costs|expected a string"},
      {"source as array", [](json& p) { p["sources"]["assets"] = {"asset"}; },
       "$.sources.assets|expected a string"},
      {"classes as array", [](json& p) { p["classes"] = json::array(); },
       "$.classes|expected an object"},
      {"class as number", [](json& p) { p["classes"]["van-delivery"] = 3; },
       "$.classes.van-delivery|expected an object"},
      {"first cost as text", [](json& p) { van(p)["challenger_first_cost"] = "52000"; },
       "$.classes.van-delivery.challenger_first_cost|expected a number"},
      {"first cost of 1e308", [](json& p) { van(p)["challenger_first_cost"] = 1e308; },
       "$.classes.van-delivery.challenger_first_cost|must be at most 1e15 in magnitude (no "
       "equipment costs more)"},
      {"max life 7.5", [](json& p) { van(p)["max_life_years"] = 7.5; },
       "$.classes.van-delivery.max_life_years|must be a whole number, not 7.5"},
      {"depreciation as text", [](json& p) { van(p)["depreciation"] = "macrs"; },
       "$.classes.van-delivery.depreciation|expected an object"},
      {"market value as number", [](json& p) { van(p)["market_value"] = 0.18; },
       "$.classes.van-delivery.market_value|expected an object"},
      {"cost model as number", [](json& p) { van(p)["cost_model"] = 1; },
       "$.classes.van-delivery.cost_model|expected a string"},
      {"the whole policy an array", [](json& p) { p = json::array({1}); }, "$|expected an object"},
  };
  for (const BadPolicy& bad : cases) {
    json policy = base_policy();
    bad.change(policy);
    EXPECT_EQ(policy_error(policy.dump()), bad.expected) << bad.what;
  }
}

TEST(PolicyRefusals, MissingFieldsAndEmptyClasses) {
  const std::vector<BadPolicy> cases = {
      {"no marr", [](json& p) { p.erase("marr"); }, "$.marr|required number is missing"},
      {"no tax rate", [](json& p) { p.erase("income_tax_rate"); },
       "$.income_tax_rate|required number is missing"},
      {"no classes", [](json& p) { p.erase("classes"); }, "$.classes|required object is missing"},
      {"no class", [](json& p) { p["classes"] = json::object(); },
       "$.classes|must name at least one asset class"},
      {"empty class name", [](json& p) { p["classes"][""] = van(p); },
       "$.classes|an asset class name must not be empty"},
      {"no challenger cost", [](json& p) { van(p).erase("challenger_first_cost"); },
       "$.classes.van-delivery.challenger_first_cost|required number is missing"},
      {"no max life", [](json& p) { van(p).erase("max_life_years"); },
       "$.classes.van-delivery.max_life_years|required whole number is missing"},
      {"no depreciation", [](json& p) { van(p).erase("depreciation"); },
       "$.classes.van-delivery.depreciation|required object is missing"},
      {"no market value", [](json& p) { van(p).erase("market_value"); },
       "$.classes.van-delivery.market_value|required object is missing"},
      {"no annual decline", [](json& p) { van(p)["market_value"] = json::object(); },
       "$.classes.van-delivery.market_value.annual_decline|required number is missing"},
  };
  for (const BadPolicy& bad : cases) {
    json policy = base_policy();
    bad.change(policy);
    EXPECT_EQ(policy_error(policy.dump()), bad.expected) << bad.what;
  }
}

TEST(PolicyRefusals, RatesAndAmountsOutOfRange) {
  const std::vector<BadPolicy> cases = {
      {"marr 0", [](json& p) { p["marr"] = 0; }, "$.marr|must be > 0"},
      {"marr negative", [](json& p) { p["marr"] = -0.05; }, "$.marr|must be > 0"},
      {"tax rate 1", [](json& p) { p["income_tax_rate"] = 1; }, "$.income_tax_rate|must be in [0, 0.99]"},
      {"tax rate negative", [](json& p) { p["income_tax_rate"] = -0.01; },
       "$.income_tax_rate|must be in [0, 0.99]"},
      {"marr above 100%", [](json& p) { p["marr"] = 1.01; }, "$.marr|must be <= 1 (100% a year)"},
      {"after-tax marr 0", [](json& p) { p["after_tax_marr"] = 0; }, "$.after_tax_marr|must be > 0"},
      {"after-tax marr 4e66", [](json& p) { p["after_tax_marr"] = 4e66; },
       "$.after_tax_marr|must be <= 1 (100% a year)"},
      {"gains rate 1.5", [](json& p) { p["capital_gains_tax_rate"] = 1.5; },
       "$.capital_gains_tax_rate|must be in [0, 0.99]"},
      {"escalation 1", [](json& p) { p["cost_escalation"] = 1; }, "$.cost_escalation|must be in (-1, 1)"},
      {"escalation -1", [](json& p) { p["cost_escalation"] = -1; }, "$.cost_escalation|must be in (-1, 1)"},
      {"margin 1", [](json& p) { p["review_margin"] = 1; }, "$.review_margin|must be in [0, 1)"},
      {"margin negative", [](json& p) { p["review_margin"] = -0.01; }, "$.review_margin|must be in [0, 1)"},
      {"esl band 1", [](json& p) { p["esl_band"] = 1; }, "$.esl_band|must be in [0, 1)"},
      {"esl band negative", [](json& p) { p["esl_band"] = -0.02; }, "$.esl_band|must be in [0, 1)"},
      {"decline 1", [](json& p) { van(p)["market_value"]["annual_decline"] = 1; },
       "$.classes.van-delivery.market_value.annual_decline|must be in [0, 1)"},
      {"decline negative", [](json& p) { van(p)["market_value"]["annual_decline"] = -0.1; },
       "$.classes.van-delivery.market_value.annual_decline|must be in [0, 1)"},
      {"challenger cost 0", [](json& p) { van(p)["challenger_first_cost"] = 0; },
       "$.classes.van-delivery.challenger_first_cost|must be > 0"},
      {"max life 0", [](json& p) { van(p)["max_life_years"] = 0; },
       "$.classes.van-delivery.max_life_years|must be >= 1"},
      {"max life 101", [](json& p) { van(p)["max_life_years"] = 101; },
       "$.classes.van-delivery.max_life_years|must be <= 100"},
      {"recovery 4", [](json& p) { van(p)["depreciation"]["recovery_years"] = 4; },
       "$.classes.van-delivery.depreciation.recovery_years|must be one of 3, 5, 7, 10, 15, 20"},
      {"unknown cost model", [](json& p) { van(p)["cost_model"] = "cubic"; },
       "$.classes.van-delivery.cost_model|unknown cost model 'cubic' (expected one of linear, "
       "geometric, auto)"},
      {"unknown detail", [](json& p) { p["detail"] = "some"; },
       "$.detail|unknown detail 'some' (expected one of none, due, all)"},
  };
  for (const BadPolicy& bad : cases) {
    json policy = base_policy();
    bad.change(policy);
    EXPECT_EQ(policy_error(policy.dump()), bad.expected) << bad.what;
  }
}

TEST(PolicyRefusals, NonFiniteNumbersInTheText) {
  std::string text = base_policy().dump();
  text.replace(text.find("52000"), 5, "1e999");
  EXPECT_EQ(policy_error(text), "$.classes.van-delivery.challenger_first_cost|must be a finite "
                                "number (this one overflows a double)");
  EXPECT_EQ(policy_error(R"({"marr": NaN})").substr(0, 2), "$|");
}

// Only [A-Za-z_][A-Za-z0-9_]* of at most 128 characters may name a relation: nothing a policy
// says can change the SQL tenure runs.
TEST(PolicyRefusals, SourcesThatAreNotPlainIdentifiers) {
  const std::vector<std::string> names = {
      "asset; DROP TABLE x", "a.b", "\"q\"", "", std::string(200, 'a'), std::string(129, 'b'),
      "1asset", "asset ", " asset", "ässet", "asset--", "as'set", "[asset]", "`asset`",
      std::string("asset\0x", 7), "main.asset"};
  for (const char* key : {"assets", "costs", "valuations"}) {
    for (const std::string& name : names) {
      json policy = base_policy();
      policy["sources"][key] = name;
      EXPECT_EQ(policy_error(policy.dump()), std::string("$.sources.") + key + "|" + kSourceRule)
          << key << " = " << name;
    }
  }
  // The longest and the plainest names that are allowed.
  json policy = base_policy();
  policy["sources"]["assets"] = std::string(128, 'a');
  policy["sources"]["costs"] = "_";
  policy["sources"]["valuations"] = "v_2";
  EXPECT_EQ(policy_error(policy.dump()), "no error");
}

TEST(PolicyRefusals, TextLevelErrors) {
  EXPECT_EQ(policy_error("{\"marr\": 0.1, \"marr\": 0.2}"), "$.marr|duplicate key");
  EXPECT_EQ(policy_error("").substr(0, 2), "$|");
  EXPECT_EQ(policy_error("{\"marr\": 0.1 /* unterminated").substr(0, 2), "$|");
  // A byte-order mark that some editors write is skipped, not an error.
  EXPECT_EQ(policy_error("\xEF\xBB\xBF" + base_policy().dump()), "no error");
  EXPECT_EQ(policy_error("\xEF\xBB\xBF{}"), "$.marr|required number is missing");
}

// Case files: what case_json_test.cpp leaves out.
std::string case_error(const std::string& text) {
  try {
    read_case(text);
  } catch (const InputError& error) {
    return error.where() + "|" + error.rule();
  }
  return "no error";
}

json base_case() {
  return json::parse(R"({
    "marr": 0.10, "income_tax_rate": 0.25,
    "challenger": {"first_cost": 1000, "operating_costs": [100, 150], "market_values": [800, 600],
                   "depreciation": {"method": "declining_balance", "life_years": 2, "rate": 2.0,
                                    "salvage": 0, "switch_to_straight_line": true}}})");
}

TEST(CaseRefusals, WhatTheCaseTestsLeaveOut) {
  const std::vector<BadPolicy> cases = {
      {"cost model is a policy key", [](json& c) { c["cost_model"] = "auto"; },
       "$.cost_model|unknown key (expected one of marr, income_tax_rate, after_tax_marr, "
       "capital_gains_tax_rate, lead_time_years, review_margin, challenger, challengers, "
       "improvement, defender, study_period_years)"},
      {"sources are a policy key", [](json& c) { c["sources"] = json::object(); },
       "$.sources|unknown key (expected one of marr, income_tax_rate, after_tax_marr, "
       "capital_gains_tax_rate, lead_time_years, review_margin, challenger, challengers, "
       "improvement, defender, study_period_years)"},
      {"switch as text", [](json& c) { c["challenger"]["depreciation"]["switch_to_straight_line"] = "yes"; },
       "$.challenger.depreciation.switch_to_straight_line|expected true or false"},
      {"method as number", [](json& c) { c["challenger"]["depreciation"]["method"] = 1; },
       "$.challenger.depreciation.method|expected a string"},
      {"1001 years of costs",
       [](json& c) {
         c["challenger"]["operating_costs"] = std::vector<double>(1001, 1.0);
         c["challenger"]["market_values"] = std::vector<double>(1001, 1.0);
       },
       "$.challenger.operating_costs|must have at most 1000 values"},
      {"study period 1001", [](json& c) { c["study_period_years"] = 1001; },
       "$.study_period_years|must be <= 1000"},
  };
  for (const BadPolicy& bad : cases) {
    json document = base_case();
    bad.change(document);
    EXPECT_EQ(case_error(document.dump()), bad.expected) << bad.what;
  }
}

// A MARR of 4.4e66 (found by fuzz/case_fuzzer) overflowed (1+i)^n and gave NaN marginal costs.
TEST(CaseRefusals, MarrAboveOneHundredPercent) {
  json document = base_case();
  document["marr"] = 4.444444444444445e+66;
  EXPECT_EQ(case_error(document.dump()), "$.marr|must be <= 1 (100% a year)");
  document["marr"] = 1.0;
  EXPECT_EQ(case_error(document.dump()), "no error");
}

// Huge but finite money in a case is analysed without an infinity or NaN in the result, or
// refused with a path.
TEST(CaseRefusals, HugeFiniteMoneyGivesFiniteResultsOrAnError) {
  json document = base_case();
  document["challenger"]["first_cost"] = 1e300;
  document["challenger"]["operating_costs"] = {1e300, 1e300};
  document["challenger"]["market_values"] = {1e300, 1e300};
  try {
    const replacement::Case c = read_case(document.dump());
    const json out = case_result_to_json(c, replacement::analyse(c));
    const std::string text = out.dump();
    EXPECT_EQ(text.find("null"), std::string::npos) << text;  // nlohmann writes NaN/inf as null
  } catch (const InputError& error) {
    EXPECT_FALSE(error.where().empty()) << error.what();
  }
}

}  // namespace
}  // namespace tenure::formats
