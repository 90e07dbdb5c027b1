// The demo policy: marked invented, identical to its fixture file, shaped as SPEC 4 says, and in
// agreement with the invented classes the generator draws from.
#include "demo/demo_policy.h"

#include <gtest/gtest.h>

#include <fstream>
#include <nlohmann/json.hpp>
#include <set>
#include <sstream>
#include <string>

#include "demo/demo_classes.h"

namespace tenure::demo {
namespace {

nlohmann::json parsed() {
  return nlohmann::json::parse(demo_policy_json(), nullptr, true, /*ignore_comments=*/true);
}

std::set<std::string> keys(const nlohmann::json& object) {
  std::set<std::string> names;
  for (const auto& [key, value] : object.items()) names.insert(key);
  return names;
}

TEST(DemoPolicy, EqualsItsFixtureFile) {
  std::ifstream file(TENURE_SOURCE_DIR "/fixtures/policies/demo_policy.json", std::ios::binary);
  ASSERT_TRUE(file) << "fixtures/policies/demo_policy.json is missing";
  std::ostringstream text;
  text << file.rdbuf();
  EXPECT_EQ(text.str(), demo_policy_json());
}

TEST(DemoPolicy, FirstLineSaysItIsInvented) {
  const std::string_view text = demo_policy_json();
  const std::string_view first_line = text.substr(0, text.find('\n'));
  EXPECT_TRUE(first_line.starts_with("//"));
  EXPECT_NE(first_line.find("Invented"), std::string_view::npos);
}

TEST(DemoPolicy, HasTheKeysOfSpecFour) {
  const nlohmann::json policy = parsed();
  const std::set<std::string> top = {"marr",
                                     "income_tax_rate",
                                     "after_tax_marr",
                                     "capital_gains_tax_rate",
                                     "cost_escalation",
                                     "review_margin",
                                     "sources",
                                     "classes"};
  for (const std::string& key : keys(policy)) EXPECT_TRUE(top.count(key)) << key;
  EXPECT_EQ(keys(policy["sources"]), (std::set<std::string>{"assets", "costs", "valuations"}));
  EXPECT_EQ(policy["sources"]["assets"], "asset");
  EXPECT_EQ(policy["sources"]["costs"], "cost_event");
  EXPECT_EQ(policy["sources"]["valuations"], "asset_valuation");
  for (const auto& [name, c] : policy["classes"].items()) {
    EXPECT_EQ(keys(c), (std::set<std::string>{"challenger_first_cost", "max_life_years",
                                              "depreciation", "market_value", "cost_model"}))
        << name;
    EXPECT_EQ(keys(c["market_value"]), std::set<std::string>{"annual_decline"}) << name;
  }
}

TEST(DemoPolicy, AgreesWithTheInventedClasses) {
  const nlohmann::json policy = parsed();
  // Costs are restated at the demo world's own inflation, so marr is real (SPEC 6).
  EXPECT_DOUBLE_EQ(policy["cost_escalation"].get<double>(), kDemoInflation);
  std::set<std::string> names;
  for (const DemoClass& c : demo_classes()) {
    const std::string name(c.name);
    names.insert(name);
    ASSERT_TRUE(policy["classes"].contains(name)) << name;
    const auto& entry = policy["classes"][name];
    EXPECT_DOUBLE_EQ(entry["challenger_first_cost"].get<double>(), c.price) << name;
    EXPECT_DOUBLE_EQ(entry["market_value"]["annual_decline"].get<double>(), c.value_decline)
        << name;
  }
  EXPECT_EQ(keys(policy["classes"]), names);
  std::set<std::string> models;
  for (const auto& [name, c] : policy["classes"].items()) models.insert(c["cost_model"]);
  EXPECT_EQ(models, (std::set<std::string>{"auto", "linear", "geometric"}));
}

}  // namespace
}  // namespace tenure::demo
