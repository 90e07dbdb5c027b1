// The US fields of the depreciation object (SPEC 13) in case and policy files: section_179 and
// bonus on macrs and macrs_ads, macrs's convention and quarter, macrs_ads itself; written back
// as read, and every refusal at its exact JSON path: a bonus above 1 or below 0, a 179 amount
// below 0 or above the basis, a quarter of 5 or missing under mid_quarter or given under
// half_year, an unknown convention, and the US fields on a method that is not US. Invented
// files.
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

using depreciation::MacrsAdsSpec;
using depreciation::MacrsConvention;
using depreciation::MacrsSpec;
using nlohmann::json;

const json kMidQuarterWithAllowances = {{"method", "macrs"},           {"recovery_years", 7},
                                        {"convention", "mid_quarter"}, {"quarter", 4},
                                        {"section_179", 200},          {"bonus", 0.4}};
const json kAds = {{"method", "macrs_ads"}, {"recovery_years", 9}, {"bonus", 1.0}};
const json kPlainMacrs = {{"method", "macrs"}, {"recovery_years", 5}};

depreciation::Spec read(const json& object) {
  return read_depreciation(JsonObject(object, "$.challenger.depreciation"));
}

TEST(UsDepreciationJson, ReadsTheFields) {
  const auto macrs = std::get<MacrsSpec>(read(kMidQuarterWithAllowances));
  EXPECT_EQ(macrs.recovery_years, 7);
  EXPECT_EQ(macrs.convention, MacrsConvention::mid_quarter);
  EXPECT_EQ(macrs.quarter, 4);
  EXPECT_EQ(macrs.allowances.section_179, 200);
  EXPECT_EQ(macrs.allowances.bonus, 0.4);
  const auto plain = std::get<MacrsSpec>(read(kPlainMacrs));
  EXPECT_EQ(plain.convention, MacrsConvention::half_year);  // absent: half_year, as before
  EXPECT_FALSE(plain.allowances.any());
  const auto ads = std::get<MacrsAdsSpec>(read(kAds));
  EXPECT_EQ(ads.recovery_years, 9);
  EXPECT_EQ(ads.allowances.bonus, 1.0);
  EXPECT_EQ(ads.allowances.section_179, std::nullopt);
}

TEST(UsDepreciationJson, WritesWhatItReads) {
  for (const json& object : {kMidQuarterWithAllowances, kAds, kPlainMacrs}) {
    EXPECT_EQ(depreciation_to_json(read(object)), object);
  }
  json half_year = kPlainMacrs;
  half_year["convention"] = "half_year";  // the default, written back without it
  EXPECT_EQ(depreciation_to_json(read(half_year)), kPlainMacrs);
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

struct BadObject {
  const char* what;
  json object;        // the whole depreciation object
  std::string field;  // the path's last key
  std::string rule;
};

// The challenger's first cost in both files below is 1000: a 179 amount above it is refused.
const std::vector<BadObject>& bad_objects() {
  static const std::vector<BadObject> cases = {
      {"bonus above 1",
       {{"method", "macrs"}, {"recovery_years", 5}, {"bonus", 1.2}},
       "bonus",
       "must be between 0 and 1"},
      {"bonus below 0",
       {{"method", "macrs_ads"}, {"recovery_years", 5}, {"bonus", -0.5}},
       "bonus",
       "must be between 0 and 1"},
      {"negative 179",
       {{"method", "macrs"}, {"recovery_years", 5}, {"section_179", -1}},
       "section_179",
       "must be >= 0"},
      {"179 above the basis",
       {{"method", "macrs"}, {"recovery_years", 5}, {"section_179", 1000.5}},
       "section_179",
       "must not exceed the basis"},
      {"quarter of 5",
       {{"method", "macrs"}, {"recovery_years", 5}, {"convention", "mid_quarter"}, {"quarter", 5}},
       "quarter",
       "must be <= 4"},
      {"quarter of 0",
       {{"method", "macrs"}, {"recovery_years", 5}, {"convention", "mid_quarter"}, {"quarter", 0}},
       "quarter",
       "must be >= 1"},
      {"mid_quarter without a quarter",
       {{"method", "macrs"}, {"recovery_years", 5}, {"convention", "mid_quarter"}},
       "quarter",
       "is required with the mid_quarter convention"},
      {"a quarter under half_year",
       {{"method", "macrs"}, {"recovery_years", 5}, {"quarter", 2}},
       "quarter",
       "applies only to the mid_quarter convention"},
      {"unknown convention",
       {{"method", "macrs"}, {"recovery_years", 5}, {"convention", "mid_month"}},
       "convention",
       "unknown convention 'mid_month' (expected half_year or mid_quarter)"},
      {"179 on straight line",
       {{"method", "straight_line"}, {"life_years", 5}, {"salvage", 0}, {"section_179", 100}},
       "section_179",
       "applies only to the US methods macrs and macrs_ads, not straight_line"},
      {"bonus on a pool",
       {{"method", "pool"}, {"rate", 0.3}, {"half_year_rule", true}, {"bonus", 0.5}},
       "bonus",
       "applies only to the US methods macrs and macrs_ads, not pool"},
      {"a convention on ADS",
       {{"method", "macrs_ads"}, {"recovery_years", 5}, {"convention", "mid_quarter"}},
       "convention",
       "applies only to the macrs method, not macrs_ads"},
      {"ADS period 0",
       {{"method", "macrs_ads"}, {"recovery_years", 0}},
       "recovery_years",
       "must be >= 1"},
  };
  return cases;
}

TEST(UsDepreciationJson, CaseFileRefusalsNameTheirPath) {
  const json base = json::parse(R"({
    "marr": 0.10, "income_tax_rate": 0.21,
    "challenger": {"first_cost": 1000, "operating_costs": [100, 150], "market_values": [800, 600],
                   "depreciation": {"method": "none"}},
    "defender": {"first_cost": 1000, "age_years": 3, "market_value_now": 300,
                 "operating_costs": [200, 260], "market_values": [250, 200],
                 "depreciation": {"method": "none"}}})");
  for (const char* role : {"challenger", "defender"}) {
    for (const json& good_object : {kMidQuarterWithAllowances, kAds}) {
      json good = base;
      good[role]["depreciation"] = good_object;
      EXPECT_EQ(error_of([&] { read_case(good.dump()); }), "no error") << role;
    }
    for (const BadObject& bad : bad_objects()) {
      json document = base;
      document[role]["depreciation"] = bad.object;
      EXPECT_EQ(error_of([&] { read_case(document.dump()); }),
                "$." + std::string(role) + ".depreciation." + bad.field + "|" + bad.rule)
          << role << ": " << bad.what;
    }
  }
}

TEST(UsDepreciationJson, PolicyRefusalsNameTheirPath) {
  const json base = json::parse(R"({
    "marr": 0.10, "income_tax_rate": 0.21,
    "classes": {"pump-station": {"challenger_first_cost": 1000, "max_life_years": 15,
                                 "depreciation": {"method": "none"},
                                 "market_value": {"annual_decline": 0.18}}}})");
  for (const json& good_object : {kMidQuarterWithAllowances, kAds}) {
    json good = base;
    good["classes"]["pump-station"]["depreciation"] = good_object;
    EXPECT_EQ(error_of([&] { read_policy(good.dump()); }), "no error");
  }
  for (const BadObject& bad : bad_objects()) {
    json document = base;
    document["classes"]["pump-station"]["depreciation"] = bad.object;
    EXPECT_EQ(error_of([&] { read_policy(document.dump()); }),
              "$.classes.pump-station.depreciation." + bad.field + "|" + bad.rule)
        << bad.what;
  }
}

}  // namespace
}  // namespace tenure::formats
