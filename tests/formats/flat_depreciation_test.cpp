// Flat depreciation parameters into a schedule: each rule of flat_depreciation.h, every error at
// the flat parameter's name, and the refusals of rules (2) and (3) in the caller's words.
#include "formats/flat_depreciation.h"

#include <gtest/gtest.h>

#include <fmt/format.h>

namespace tenure::formats {
namespace {

using namespace tenure::depreciation;

constexpr double kTol = 1e-9;

// Refusals that say which rule refused which parameter, and what the method takes.
const MisfitRefusals kRefusals{
    [](std::string_view parameter, std::string_view method) {
      return InputError(std::string(parameter), fmt::format("missing for {}", method));
    },
    [](std::string_view parameter, std::string_view method,
       const std::vector<std::string_view>& taken) {
      return InputError(std::string(parameter),
                        fmt::format("unused by {} (takes {})", method, fmt::join(taken, " ")));
    }};

// The error flat_schedule throws, as "<where>|<rule>".
std::string error_of(const FlatDepreciation& flat) {
  try {
    flat_schedule(flat, kRefusals);
  } catch (const InputError& error) {
    return error.where() + "|" + error.rule();
  }
  return "no error";
}

TEST(FlatDepreciation, MacrsLifeIsTheRecoveryPeriod) {
  const FlatSchedule s = flat_schedule({.method = "macrs", .basis = 10000, .life = 5}, kRefusals);
  ASSERT_TRUE(std::holds_alternative<MacrsSpec>(s.spec));
  EXPECT_EQ(std::get<MacrsSpec>(s.spec).recovery_years, 5);
  // IRS Publication 946, Table A-1, 5-year property, year 1: 20.00%.
  EXPECT_NEAR(s.schedule.deduction(1), 2000, kTol);
  EXPECT_FALSE(s.disposal_year);
}

TEST(FlatDepreciation, BookMethodsTakeTheirParameters) {
  const FlatSchedule db = flat_schedule({.method = "declining_balance",
                                         .basis = 10000,
                                         .salvage = 0,
                                         .life = 5,
                                         .rate = 2,
                                         .switch_to_straight_line = true,
                                         .disposal_year = 3},
                                        kRefusals);
  const auto& spec = std::get<DecliningBalanceSpec>(db.spec);
  EXPECT_EQ(spec.life_years, 5);
  EXPECT_EQ(spec.rate, 2);
  EXPECT_TRUE(spec.switch_to_straight_line);
  EXPECT_EQ(db.disposal_year, 3);
  // Double declining balance, 40% a year on 10000 (closed form): 4000 in year 1.
  EXPECT_NEAR(db.schedule.deduction(1), 4000, kTol);
  const FlatSchedule sl = flat_schedule(
      {.method = "straight_line", .basis = 12000, .salvage = 2000, .life = 5}, kRefusals);
  EXPECT_NEAR(sl.schedule.deduction(1), 2000, kTol);  // (12000 - 2000) / 5
}

TEST(FlatDepreciation, AZeroSalvageIsNotGivenToMethodsWithoutOne) {
  // Rule (3): macrs and none recover the whole basis, so a salvage of 0 says nothing.
  EXPECT_EQ(error_of({.method = "macrs", .basis = 10000, .salvage = 0, .life = 5}), "no error");
  EXPECT_EQ(error_of({.method = "none", .basis = 10000, .salvage = 0}), "no error");
  EXPECT_EQ(error_of({.method = "macrs", .basis = 10000, .salvage = 500, .life = 5}),
            "salvage|unused by macrs (takes life convention quarter section_179 bonus)");
}

TEST(FlatDepreciation, EveryRuleNamesTheFlatParameter) {
  const std::vector<std::pair<FlatDepreciation, std::string>> cases = {
      // (1) the method.
      {{.method = "linear", .basis = 1},
       "method|unknown method 'linear' (expected one of straight_line, declining_balance, "
       "sum_of_years_digits, macrs, macrs_ads, none, pool)"},
      // (2) in the order of FlatDepreciation: basis, salvage, life, rate, switch.
      {{.method = "none"}, "basis|missing for none"},
      {{.method = "straight_line", .basis = 1000}, "salvage|missing for straight_line"},
      {{.method = "straight_line", .basis = 1000, .salvage = 0}, "life|missing for straight_line"},
      {{.method = "declining_balance", .basis = 1000, .salvage = 0, .life = 5, .rate = 2},
       "switch_to_straight_line|missing for declining_balance"},
      // (3) with what the method takes, in its order.
      {{.method = "straight_line", .basis = 1000, .salvage = 0, .life = 5, .rate = 2},
       "rate|unused by straight_line (takes life salvage)"},
      {{.method = "none", .basis = 1000, .switch_to_straight_line = false},
       "switch_to_straight_line|unused by none (takes )"},
      // (4) the values, as a case file's.
      {{.method = "straight_line", .basis = 1000, .salvage = 0, .life = 5.5},
       "life|must be a whole number, not 5.5"},
      {{.method = "macrs", .basis = 1000, .life = 4}, "life|must be one of 3, 5, 7, 10, 15, 20"},
      {{.method = "declining_balance",
        .basis = 1000,
        .salvage = 0,
        .life = 5,
        .rate = 0,
        .switch_to_straight_line = true},
       "rate|must be > 0"},
      {{.method = "straight_line", .basis = 1000, .salvage = 5000, .life = 5},
       "salvage|must not exceed the basis"},
      {{.method = "none", .basis = 0}, "basis|must be > 0"},
      // (5) the disposal year.
      {{.method = "none", .basis = 100, .disposal_year = 0}, "disposal_year|must be >= 1"},
      {{.method = "none", .basis = 100, .disposal_year = 2.5},
       "disposal_year|must be a whole number, not 2.5"},
  };
  for (const auto& [flat, expected] : cases) EXPECT_EQ(error_of(flat), expected);
}

TEST(FlatDepreciation, AMethodMayBeAWholeDepreciationObject) {
  // Rule (6): the object a case file writes, read as a case file's.
  const FlatSchedule s = flat_schedule(
      {.method = R"( {"method": "macrs", "recovery_years": 5})", .basis = 10000, .disposal_year = 3},
      kRefusals);
  EXPECT_EQ(std::get<MacrsSpec>(s.spec).recovery_years, 5);
  EXPECT_EQ(s.disposal_year, 3);
  // IRS Publication 946, Table A-1, 5-year property, year 2: 32.00%.
  EXPECT_NEAR(s.schedule.deduction(2), 3200, kTol);
}

TEST(FlatDepreciation, AnObjectsErrorsAreAtItsJsonPaths) {
  const std::vector<std::pair<FlatDepreciation, std::string>> cases = {
      {{.method = R"({"method": "macrs", "recovery_years": 4})", .basis = 1000},
       "$.recovery_years|must be one of 3, 5, 7, 10, 15, 20"},
      {{.method = R"({"method": "straight_line", "life_years": 5})", .basis = 1000},
       "$.salvage|required number is missing"},
      {{.method = R"({"method": "straight_line", "life_years": 5, "salvage": 2000})",
        .basis = 1000},
       "$.salvage|must not exceed the basis"},
      {{.method = R"({"method": "none", "life_years": 5})", .basis = 1000},
       "$.life_years|unknown key (expected one of method)"},
      {{.method = "[1]", .basis = 1000},
       "method|unknown method '[1]' (expected one of straight_line, declining_balance, "
       "sum_of_years_digits, macrs, macrs_ads, none, pool)"},
      {{.method = "{", .basis = 1000},
       "$|invalid JSON at line 1, column 2: syntax error while parsing object key - unexpected "
       "end of input; expected string literal"},
      // Only basis and disposal_year stand beside an object; basis keeps its name.
      {{.method = R"({"method": "none"})", .basis = 1000, .life = 5},
       "life|must not be given when the method is a depreciation object (put it in the "
       "object)"},
      {{.method = R"({"method": "none"})", .basis = -1}, "basis|must be > 0"},
      {{.method = R"({"method": "none"})", .basis = 10, .disposal_year = 0},
       "disposal_year|must be >= 1"},
  };
  for (const auto& [flat, expected] : cases) EXPECT_EQ(error_of(flat), expected);
}

}  // namespace
}  // namespace tenure::formats
