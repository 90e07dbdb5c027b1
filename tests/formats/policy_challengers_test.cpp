// A policy class's several challengers and improvement (SPEC 14): what read_policy keeps of the
// list form, its defaults, and every refusal with its JSON path and exact rule. The policy and
// its challengers are invented.
#include <gtest/gtest.h>

#include <functional>
#include <nlohmann/json.hpp>
#include <string>
#include <variant>
#include <vector>

#include "core/errors.h"
#include "formats/policy_json.h"

namespace tenure::formats {
namespace {

using nlohmann::json;

// An invented van class with a diesel and an electric van; the electric one has its own
// depreciation and value decline, the diesel one the class's.
json several_policy() {
  return json::parse(R"({
    "marr": 0.10, "income_tax_rate": 0.25,
    "classes": {"van-delivery": {
      "challengers": [
        {"name": "diesel", "first_cost": 52000},
        {"name": "electric", "first_cost": 61000, "cost_factor": 0.7,
         "depreciation": {"method": "straight_line", "life_years": 8, "salvage": 0},
         "market_value": {"annual_decline": 0.22}}],
      "improvement": 0.02, "max_life_years": 15,
      "depreciation": {"method": "macrs", "recovery_years": 5},
      "market_value": {"annual_decline": 0.18}}}})");
}

json& van(json& p) { return p["classes"]["van-delivery"]; }

std::string policy_error(const json& policy) {
  try {
    read_policy(policy.dump());
  } catch (const InputError& error) {
    return error.where() + "|" + error.rule();
  }
  return "no error";
}

TEST(PolicyChallengers, ListFormKeepsEachChallengerAndItsDefaults) {
  const review::Policy policy = read_policy(several_policy().dump());
  const review::ClassPolicy& vans = policy.classes.at("van-delivery");
  ASSERT_EQ(vans.challengers.size(), 2u);
  EXPECT_EQ(vans.challengers[0].name, "diesel");
  EXPECT_EQ(vans.challengers[0].first_cost, 52000);
  EXPECT_EQ(vans.challengers[0].cost_factor, 1);  // SPEC 14 default
  EXPECT_FALSE(vans.challengers[0].depreciation);
  EXPECT_FALSE(vans.challengers[0].annual_decline);
  EXPECT_EQ(vans.challengers[1].cost_factor, 0.7);
  ASSERT_TRUE(vans.challengers[1].depreciation);
  EXPECT_TRUE(
      std::holds_alternative<depreciation::StraightLineSpec>(*vans.challengers[1].depreciation));
  EXPECT_EQ(vans.challengers[1].annual_decline, 0.22);
  EXPECT_EQ(vans.challenger_first_cost, 52000);  // the first listed
  EXPECT_EQ(vans.improvement, 0.02);
}

TEST(PolicyChallengers, OneChallengerFormHasNoListAndNoImprovement) {
  json policy = several_policy();
  van(policy).erase("challengers");
  van(policy).erase("improvement");
  van(policy)["challenger_first_cost"] = 52000;
  const review::ClassPolicy vans = read_policy(policy.dump()).classes.at("van-delivery");
  EXPECT_TRUE(vans.challengers.empty());
  EXPECT_EQ(vans.improvement, 0);  // SPEC 14 default
}

TEST(PolicyChallengers, Refusals) {
  struct Bad {
    const char* what;
    std::function<void(json&)> change;
    std::string expected;
  };
  const std::string at = "$.classes.van-delivery";
  const std::vector<Bad> cases = {
      {"both forms", [](json& p) { van(p)["challenger_first_cost"] = 52000; },
       at + ".challengers|give either challenger_first_cost or challengers, not both"},
      {"empty list", [](json& p) { van(p)["challengers"] = json::array(); },
       at + ".challengers|must list at least one challenger"},
      {"duplicate names", [](json& p) { van(p)["challengers"][1]["name"] = "diesel"; },
       at + ".challengers[1].name|duplicate challenger name 'diesel'"},
      {"empty name", [](json& p) { van(p)["challengers"][0]["name"] = ""; },
       at + ".challengers[0].name|must not be empty"},
      {"cost factor 0", [](json& p) { van(p)["challengers"][1]["cost_factor"] = 0; },
       at + ".challengers[1].cost_factor|must be > 0"},
      {"cost factor below 0", [](json& p) { van(p)["challengers"][0]["cost_factor"] = -0.5; },
       at + ".challengers[0].cost_factor|must be > 0"},
      {"improvement 1", [](json& p) { van(p)["improvement"] = 1; },
       at + ".improvement|must be in [0, 1)"},
      {"improvement below 0", [](json& p) { van(p)["improvement"] = -0.01; },
       at + ".improvement|must be in [0, 1)"},
      {"first cost 0", [](json& p) { van(p)["challengers"][0]["first_cost"] = 0; },
       at + ".challengers[0].first_cost|must be > 0"},
      {"no name", [](json& p) { van(p)["challengers"][0].erase("name"); },
       at + ".challengers[0].name|required string is missing"},
      {"unknown key", [](json& p) { van(p)["challengers"][0]["price"] = 1; },
       at + ".challengers[0].price|unknown key (expected one of name, first_cost, cost_factor, "
            "depreciation, market_value)"},
      {"own decline 1",
       [](json& p) { van(p)["challengers"][1]["market_value"]["annual_decline"] = 1; },
       at + ".challengers[1].market_value.annual_decline|must be in [0, 1)"},
      {"list of numbers", [](json& p) { van(p)["challengers"] = json::array({52000}); },
       at + ".challengers[0]|expected an object"},
  };
  for (const Bad& bad : cases) {
    json policy = several_policy();
    bad.change(policy);
    EXPECT_EQ(policy_error(policy), bad.expected) << bad.what;
  }
}

}  // namespace
}  // namespace tenure::formats
