// The pool's depreciation object (SPEC 13) in case and policy files: its form, written back as
// read, and every refusal at its exact JSON path: a rate of 0 or above 1, a first-year allowance
// of 0, below 0 or above 1, a missing rate or half_year_rule, and the half-year rule together
// with a first-year allowance (depreciation/pool.h, rule 4). Invented files.
#include <gtest/gtest.h>

#include <functional>
#include <string>
#include <vector>

#include "core/errors.h"
#include "formats/case_json.h"
#include "formats/depreciation_json.h"
#include "formats/policy_json.h"

namespace tenure::formats {
namespace {

using depreciation::PoolSpec;
using nlohmann::json;

const json kClass10 = {{"method", "pool"}, {"rate", 0.30}, {"half_year_rule", true}};
const json kUkMainPool = {
    {"method", "pool"}, {"rate", 0.18}, {"half_year_rule", false}, {"first_year_allowance", 0.4}};

depreciation::Spec read(const json& object) {
  return read_depreciation(JsonObject(object, "$.challenger.depreciation"));
}

TEST(PoolDepreciationJson, ReadsTheFormWithAndWithoutAnAllowance) {
  const auto cca = std::get<PoolSpec>(read(kClass10));
  EXPECT_EQ(cca.rate, 0.30);
  EXPECT_TRUE(cca.half_year_rule);
  EXPECT_EQ(cca.first_year_allowance, std::nullopt);  // absent: none
  const auto uk = std::get<PoolSpec>(read(kUkMainPool));
  EXPECT_EQ(uk.rate, 0.18);
  EXPECT_FALSE(uk.half_year_rule);
  EXPECT_EQ(uk.first_year_allowance, 0.4);
  EXPECT_EQ(find_depreciation_form("pool")->fields,
            (std::vector<std::string_view>{"rate", "half_year_rule", "first_year_allowance"}));
}

TEST(PoolDepreciationJson, WritesWhatItReads) {
  for (const json& object : {kClass10, kUkMainPool}) {
    EXPECT_EQ(depreciation_to_json(read(object)), object);
  }
}

// "<where>|<rule>" of the InputError `action` throws, or "no error".
std::string error_of(const std::function<void()>& action) {
  try {
    action();
  } catch (const InputError& error) {
    return error.where() + "|" + error.rule();
  }
  return "no error";
}

struct BadPool {
  const char* what;
  std::function<void(json&)> change;  // on kClass10
  std::string field;                  // the path's last key
  std::string rule;
};

const std::string kFraction = "must be > 0 and <= 1";

const std::vector<BadPool>& bad_pools() {
  static const std::vector<BadPool> cases = {
      {"rate 0", [](json& o) { o["rate"] = 0; }, "rate", kFraction},
      {"rate above 1", [](json& o) { o["rate"] = 1.2; }, "rate", kFraction},
      {"negative rate", [](json& o) { o["rate"] = -0.3; }, "rate", kFraction},
      {"no rate", [](json& o) { o.erase("rate"); }, "rate", "required number is missing"},
      {"rate as text", [](json& o) { o["rate"] = "30%"; }, "rate", "expected a number"},
      {"no half-year rule", [](json& o) { o.erase("half_year_rule"); }, "half_year_rule",
       "required true or false is missing"},
      {"half-year rule as 1", [](json& o) { o["half_year_rule"] = 1; }, "half_year_rule",
       "expected true or false"},
      {"negative allowance",
       [](json& o) {
         o["half_year_rule"] = false;
         o["first_year_allowance"] = -0.1;
       },
       "first_year_allowance", kFraction},
      {"allowance above 1",
       [](json& o) {
         o["half_year_rule"] = false;
         o["first_year_allowance"] = 1.5;
       },
       "first_year_allowance", kFraction},
      {"allowance 0 (leave it out for none)",
       [](json& o) {
         o["half_year_rule"] = false;
         o["first_year_allowance"] = 0;
       },
       "first_year_allowance", kFraction},
      {"half-year rule with an allowance", [](json& o) { o["first_year_allowance"] = 0.45; },
       "half_year_rule",
       "must be false with a first_year_allowance: the allowance is the year-1 deduction and the "
       "rest is written down from year 2"},
      {"a book method's field", [](json& o) { o["salvage"] = 0; }, "salvage",
       "unknown key (expected one of method, rate, half_year_rule, first_year_allowance)"},
  };
  return cases;
}

TEST(PoolDepreciationJson, CaseFileRefusalsNameTheirPath) {
  const json base = json::parse(R"({
    "marr": 0.10, "income_tax_rate": 0.265,
    "challenger": {"first_cost": 1000, "operating_costs": [100, 150], "market_values": [800, 600],
                   "depreciation": {"method": "none"}},
    "defender": {"first_cost": 900, "age_years": 3, "market_value_now": 300,
                 "operating_costs": [200, 260], "market_values": [250, 200],
                 "depreciation": {"method": "none"}}})");
  for (const char* role : {"challenger", "defender"}) {
    json good = base;
    good[role]["depreciation"] = kClass10;
    EXPECT_EQ(error_of([&] { read_case(good.dump()); }), "no error") << role;
    for (const BadPool& bad : bad_pools()) {
      json document = good;
      bad.change(document[role]["depreciation"]);
      EXPECT_EQ(error_of([&] { read_case(document.dump()); }),
                "$." + std::string(role) + ".depreciation." + bad.field + "|" + bad.rule)
          << role << ": " << bad.what;
    }
  }
}

TEST(PoolDepreciationJson, PolicyRefusalsNameTheirPath) {
  json good = json::parse(R"({
    "marr": 0.10, "income_tax_rate": 0.265,
    "classes": {"truck-haul": {"challenger_first_cost": 90000, "max_life_years": 15,
                               "depreciation": {"method": "none"},
                               "market_value": {"annual_decline": 0.18}}}})");
  json& class_depreciation = good["classes"]["truck-haul"]["depreciation"];
  class_depreciation = kUkMainPool;
  EXPECT_EQ(error_of([&] { read_policy(good.dump()); }), "no error");
  for (const BadPool& bad : bad_pools()) {
    json document = good;
    json& object = document["classes"]["truck-haul"]["depreciation"];
    object = kClass10;
    bad.change(object);
    EXPECT_EQ(error_of([&] { read_policy(document.dump()); }),
              "$.classes.truck-haul.depreciation." + bad.field + "|" + bad.rule)
        << bad.what;
  }
}

}  // namespace
}  // namespace tenure::formats
