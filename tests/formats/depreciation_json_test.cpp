// The depreciation object of case files: each method's form, every field required, unknown
// fields and methods rejected, and the method's own range errors placed under the object's path.
#include <gtest/gtest.h>

#include "core/errors.h"
#include "formats/depreciation_json.h"

namespace tenure::formats {
namespace {

using depreciation::Spec;
using nlohmann::json;

const std::string kPath = "$.challenger.depreciation";

Spec read(const json& value) { return read_depreciation(JsonObject(value, kPath)); }

// The error reading `value` throws, as "<where>|<rule>" for one-line comparisons.
std::string read_error(const json& value) {
  try {
    read(value);
  } catch (const InputError& error) {
    return error.where() + "|" + error.rule();
  }
  return "no error";
}

TEST(DepreciationJson, ReadsEachMethodsForm) {
  const auto sl = std::get<depreciation::StraightLineSpec>(
      read({{"method", "straight_line"}, {"life_years", 5}, {"salvage", 1000}}));
  EXPECT_EQ(sl.life_years, 5);
  EXPECT_EQ(sl.salvage, 1000);
  const auto db =
      std::get<depreciation::DecliningBalanceSpec>(read({{"method", "declining_balance"},
                                                         {"life_years", 8},
                                                         {"rate", 1.5},
                                                         {"salvage", 0},
                                                         {"switch_to_straight_line", false}}));
  EXPECT_EQ(db.life_years, 8);
  EXPECT_EQ(db.rate, 1.5);
  EXPECT_FALSE(db.switch_to_straight_line);
  const auto syd = std::get<depreciation::SumOfYearsDigitsSpec>(
      read({{"method", "sum_of_years_digits"}, {"life_years", 4.0}, {"salvage", 0}}));
  EXPECT_EQ(syd.life_years, 4);  // 4.0 is a whole number
  EXPECT_EQ(std::get<depreciation::MacrsSpec>(read({{"method", "macrs"}, {"recovery_years", 7}}))
                .recovery_years,
            7);
  EXPECT_TRUE(std::holds_alternative<depreciation::NoDepreciationSpec>(read({{"method", "none"}})));
}

TEST(DepreciationJson, EveryFieldIsRequired) {
  EXPECT_EQ(read_error({{"life_years", 5}, {"salvage", 0}}),
            kPath + ".method|required string is missing");
  EXPECT_EQ(read_error({{"method", "straight_line"}, {"life_years", 5}}),
            kPath + ".salvage|required number is missing");
  EXPECT_EQ(
      read_error(
          {{"method", "declining_balance"}, {"life_years", 5}, {"rate", 2.0}, {"salvage", 0}}),
      kPath + ".switch_to_straight_line|required true or false is missing");
  EXPECT_EQ(read_error({{"method", "macrs"}}),
            kPath + ".recovery_years|required whole number is missing");
}

TEST(DepreciationJson, RejectsUnknownFieldsAndMethods) {
  EXPECT_EQ(read_error({{"method", "macrs"}, {"recovery_years", 5}, {"salvage", 0}}),
            kPath + ".salvage|unknown key (expected one of method, recovery_years, convention, "
                    "quarter, section_179, bonus)");
  EXPECT_EQ(read_error({{"method", "none"}, {"life_years", 5}}),
            kPath + ".life_years|unknown key (expected one of method)");
  EXPECT_EQ(read_error({{"method", "foo"}}),
            kPath +
                ".method|unknown method 'foo' (expected one of straight_line, "
                "declining_balance, sum_of_years_digits, macrs, macrs_ads, none, pool)");
  EXPECT_EQ(read_error({{"method", 5}}), kPath + ".method|expected a string");
  EXPECT_EQ(read_error(json::array()), kPath + "|expected an object");
}

TEST(DepreciationJson, YearsMustBeWholeAndInRange) {
  EXPECT_EQ(read_error({{"method", "straight_line"}, {"life_years", 5.5}, {"salvage", 0}}),
            kPath + ".life_years|must be a whole number, not 5.5");
  EXPECT_EQ(read_error({{"method", "straight_line"}, {"life_years", -3}, {"salvage", 0}}),
            kPath + ".life_years|must be >= 1");
  EXPECT_EQ(read_error({{"method", "straight_line"}, {"life_years", 1e9}, {"salvage", 0}}),
            kPath + ".life_years|must be <= 1000");
  EXPECT_EQ(read_error({{"method", "straight_line"}, {"life_years", "5"}, {"salvage", 0}}),
            kPath + ".life_years|expected a whole number");
  EXPECT_EQ(read_error({{"method", "declining_balance"},
                        {"life_years", 5},
                        {"rate", 2},
                        {"salvage", 0},
                        {"switch_to_straight_line", 1}}),
            kPath + ".switch_to_straight_line|expected true or false");
}

// The method's own checks raise bare field names; they come out under the object's path.
std::string method_error(const Spec& spec, Money basis) {
  try {
    make_checked_method(spec, basis, kPath);
  } catch (const InputError& error) {
    return error.where() + "|" + error.rule();
  }
  return "no error";
}

TEST(DepreciationJson, MethodErrorsArePlacedUnderThePath) {
  EXPECT_EQ(method_error(depreciation::MacrsSpec{4}, 1000),
            kPath + ".recovery_years|must be one of 3, 5, 7, 10, 15, 20");
  EXPECT_EQ(method_error(depreciation::StraightLineSpec{5, 2000}, 1000),
            kPath + ".salvage|must not exceed the basis");
  EXPECT_EQ(method_error(depreciation::StraightLineSpec{5, -1}, 1000),
            kPath + ".salvage|must be >= 0");
  EXPECT_EQ(method_error(depreciation::StraightLineSpec{5, 0}, 1000), "no error");
}

TEST(DepreciationJson, WritesWhatItReads) {
  const std::vector<json> objects = {
      {{"method", "straight_line"}, {"life_years", 5}, {"salvage", 250.5}},
      {{"method", "declining_balance"},
       {"life_years", 6},
       {"rate", 1.5},
       {"salvage", 10.0},
       {"switch_to_straight_line", true}},
      {{"method", "sum_of_years_digits"}, {"life_years", 3}, {"salvage", 0.0}},
      {{"method", "macrs"}, {"recovery_years", 20}},
      {{"method", "none"}},
  };
  for (const json& object : objects) EXPECT_EQ(depreciation_to_json(read(object)), object);
}

TEST(DepreciationJson, FormsListEveryMethodOnce) {
  std::vector<std::string_view> names;
  for (const DepreciationForm& form : depreciation_forms()) names.push_back(form.method);
  EXPECT_EQ(names,
            (std::vector<std::string_view>{"straight_line", "declining_balance",
                                           "sum_of_years_digits", "macrs", "macrs_ads", "none",
                                           "pool"}));
  EXPECT_EQ(find_depreciation_form("macrs")->fields,
            (std::vector<std::string_view>{"recovery_years", "convention", "quarter", "section_179",
                                          "bonus"}));
  EXPECT_EQ(find_depreciation_form("nope"), nullptr);
}

TEST(DepreciationJson, MethodNamesFollowTheForms) {
  EXPECT_EQ(depreciation_method_names(),
            "straight_line, declining_balance, sum_of_years_digits, macrs, macrs_ads, none, pool");
}

}  // namespace
}  // namespace tenure::formats
