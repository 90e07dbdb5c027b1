// Case files with several challengers (SPEC 14): each refusal names its JSON path and rule
// exactly; the output lists every challenger's economic life and least EUAC and names the chosen
// one; one challenger given in either form gives the same figures; improving technology adds
// C*_k by year. The series are invented.
#include <gtest/gtest.h>

#include <functional>

#include "core/errors.h"
#include "formats/case_json.h"

namespace tenure::formats {
namespace {

using nlohmann::json;

json van(const char* name, double first_cost) {
  return {{"name", name},
          {"first_cost", first_cost},
          {"operating_costs", {100, 150, 260}},
          {"market_values", {800, 600, 450}},
          {"depreciation", {{"method", "straight_line"}, {"life_years", 3}, {"salvage", 0}}}};
}

json several_case() {
  json c = json::parse(R"({
    "marr": 0.10, "income_tax_rate": 0.25,
    "defender": {"first_cost": 900, "age_years": 3, "market_value_now": 300,
                 "operating_costs": [200, 260], "market_values": [250, 200],
                 "depreciation": {"method": "macrs", "recovery_years": 3}},
    "study_period_years": 2})");
  c["challengers"] = {van("diesel", 1000), van("electric", 1100)};
  return c;
}

std::string read_error(const json& document) {
  try {
    read_case(document.dump());
  } catch (const InputError& error) {
    return error.what();
  }
  return "no error";
}

struct BadCase {
  const char* what;
  std::function<void(json&)> change;
  std::string expected;
};

TEST(CaseChallengers, EveryRefusalNamesItsPathAndRule) {
  const std::vector<BadCase> cases = {
      {"empty list", [](json& c) { c["challengers"] = json::array(); },
       "$.challengers: must list at least one challenger"},
      {"not a list", [](json& c) { c["challengers"] = 3; },
       "$.challengers: expected an array of objects"},
      {"duplicate names", [](json& c) { c["challengers"][1]["name"] = "diesel"; },
       "$.challengers[1].name: duplicate challenger name 'diesel'"},
      {"empty name", [](json& c) { c["challengers"][0]["name"] = ""; },
       "$.challengers[0].name: must not be empty"},
      {"missing name", [](json& c) { c["challengers"][0].erase("name"); },
       "$.challengers[0].name: required string is missing"},
      {"cost factor zero", [](json& c) { c["challengers"][1]["cost_factor"] = 0; },
       "$.challengers[1].cost_factor: must be > 0"},
      {"cost factor negative", [](json& c) { c["challengers"][0]["cost_factor"] = -0.5; },
       "$.challengers[0].cost_factor: must be > 0"},
      {"improvement negative", [](json& c) { c["improvement"] = -0.01; },
       "$.improvement: must be in [0, 1)"},
      {"improvement one", [](json& c) { c["improvement"] = 1; },
       "$.improvement: must be in [0, 1)"},
      {"both forms", [](json& c) { c["challenger"] = van("x", 1); },
       "$.challengers: give either challenger or challengers, not both"},
      {"unknown key", [](json& c) { c["challengers"][0]["age_years"] = 0; },
       "$.challengers[0].age_years: unknown key (expected one of name, first_cost, cost_factor, "
       "operating_costs, market_values, depreciation)"},
      {"bad first cost", [](json& c) { c["challengers"][1]["first_cost"] = 0; },
       "$.challengers[1].first_cost: must be > 0"},
  };
  for (const BadCase& bad : cases) {
    json document = several_case();
    bad.change(document);
    EXPECT_EQ(read_error(document), bad.expected) << bad.what;
  }
}

TEST(CaseChallengers, OutputListsEachAndNamesTheChosen) {
  json document = several_case();
  // "electric" costs 10% more to buy and runs at half the cost: cheaper on both bases.
  document["challengers"][1]["cost_factor"] = 0.5;
  const replacement::Case input = read_case(document.dump());
  ASSERT_EQ(input.challengers.size(), 2u);
  EXPECT_EQ(input.challengers[1].asset.operating_costs, (std::vector<Money>{50, 75, 130}));
  const json out = case_result_to_json(input, replacement::analyse(input));
  ASSERT_EQ(out["challengers"].size(), 2u);
  EXPECT_EQ(out["chosen_challenger"], "electric");
  EXPECT_EQ(out["challengers"][0]["name"], "diesel");
  EXPECT_FALSE(out["challengers"][0]["chosen"].get<bool>());
  EXPECT_TRUE(out["challengers"][1]["chosen"].get<bool>());
  for (const char* basis : {"before_tax", "after_tax"}) {
    const double diesel = out["challengers"][0][basis]["euac"];
    const double electric = out["challengers"][1][basis]["euac"];
    EXPECT_LT(electric, diesel) << basis;
    // The chosen one's full analysis is the output's "challenger".
    EXPECT_EQ(out["challengers"][1][basis]["euac"], out["challenger"][basis]["euac"]);
    EXPECT_EQ(out["challengers"][1][basis]["esl_years"], out["challenger"][basis]["esl_years"]);
  }
  EXPECT_EQ(out["decision"]["challenger_euac"], out["challenger"]["after_tax"]["euac"]);
  EXPECT_FALSE(out.contains("improvement"));
  EXPECT_FALSE(out["decision"].contains("challenger_by_year"));
}

TEST(CaseChallengers, OneChallengerInEitherFormGivesTheSameDocument) {
  json listed = several_case();
  listed["challengers"].erase(1);
  json single = listed;
  json challenger = single["challengers"][0];
  challenger.erase("name");
  single.erase("challengers");
  single["challenger"] = challenger;
  const replacement::Case a = read_case(single.dump());
  const replacement::Case b = read_case(listed.dump());
  json out_a = case_result_to_json(a, replacement::analyse(a));
  json out_b = case_result_to_json(b, replacement::analyse(b));
  EXPECT_EQ(out_b["chosen_challenger"], "diesel");
  out_b.erase("challengers");
  out_b.erase("chosen_challenger");
  EXPECT_EQ(out_a, out_b);
}

TEST(CaseChallengers, ImprovementZeroGivesTodaysDocument) {
  json with_zero = several_case();
  with_zero["improvement"] = 0;
  const replacement::Case a = read_case(with_zero.dump());
  const replacement::Case b = read_case(several_case().dump());
  EXPECT_EQ(case_result_to_json(a, replacement::analyse(a)),
            case_result_to_json(b, replacement::analyse(b)));
}

TEST(CaseChallengers, ImprovementListsTheLeastEuacByYear) {
  json document = several_case();
  document["improvement"] = 0.05;
  const replacement::Case input = read_case(document.dump());
  const json out = case_result_to_json(input, replacement::analyse(input));
  EXPECT_EQ(out["improvement"], 0.05);
  const json& by_year = out["decision"]["challenger_by_year"];
  ASSERT_EQ(by_year.size(), 3u);  // k = 0..2, the defender's two years
  const double today = by_year[0]["least_euac"];
  EXPECT_EQ(today, out["decision"]["challenger_euac"]);
  // Every amount 5% less a year, so C*_k = 0.95^k C*_0 (replacement/challengers.h rule (2)).
  EXPECT_NEAR(by_year[2]["least_euac"].get<double>(), 0.95 * 0.95 * today, 1e-9 * today);
  EXPECT_EQ(by_year[2]["years_from_now"], 2);
  // review/at_stake.h rule (2): no break-evens under improvement; the timing's stakes stand.
  const replacement::CaseResult result = replacement::analyse(input);
  const review::CaseVerdict verdict = review::case_verdict(input, result);
  EXPECT_FALSE(verdict.at_stake.break_even_price.has_value());
  EXPECT_FALSE(verdict.at_stake.break_even_cost_factor.has_value());
  EXPECT_FALSE(verdict.at_stake.close_call);
  EXPECT_TRUE(verdict.at_stake.improving);
  const auto& pw = result.decision->timing.present_worth;
  EXPECT_EQ(verdict.at_stake.early_cost,
            pw[0] - pw[static_cast<std::size_t>(result.decision->timing.keep_years)]);
  // Without improvement the same case has both break-evens.
  document.erase("improvement");
  const replacement::Case plain = read_case(document.dump());
  const review::CaseVerdict plain_verdict =
      review::case_verdict(plain, replacement::analyse(plain));
  EXPECT_TRUE(plain_verdict.at_stake.break_even_price.has_value());
  EXPECT_TRUE(plain_verdict.at_stake.break_even_cost_factor.has_value());
}

}  // namespace
}  // namespace tenure::formats
