// The typed errors of core/errors.h: InputError keeps `where` and `rule` and formats what() as
// "<where>: <rule>" (the rule alone when `where` is empty); RuntimeFailure is a different type,
// so callers can map the two to different exit codes (DEVELOPERS.md: 2 and 1).
#include "core/errors.h"

#include <gtest/gtest.h>

#include <stdexcept>
#include <string>
#include <type_traits>
#include <vector>

namespace tenure {
namespace {

struct Row {
  const char* comment;
  std::string where;
  std::string rule;
  std::string what;  // by hand, from the format in errors.h
};

TEST(InputError, FormatsWhereAndRule) {
  const std::vector<Row> rows = {
      {"a JSON path", "$.defender.age_years", "must be >= 0", "$.defender.age_years: must be >= 0"},
      {"a path with an index (the example in errors.h)", "$.challenger.operating_costs[2]",
       "must be a finite number >= 0",
       "$.challenger.operating_costs[2]: must be a finite number >= 0"},
      {"a row reference", "row 17 (asset_id 'PU-0017')", "first cost must be > 0",
       "row 17 (asset_id 'PU-0017'): first cost must be > 0"},
      {"an option", "--life", "must be a whole number", "--life: must be a whole number"},
      {"empty where: the rule alone, no separator", "", "must be in [0, 1)", "must be in [0, 1)"},
      {"a where that itself holds ': ' is not split", "a: b", "c", "a: b: c"},
      {"an empty rule keeps the separator", "$.marr", "", "$.marr: "},
  };
  for (const Row& row : rows) {
    SCOPED_TRACE(row.comment);
    const InputError error(row.where, row.rule);
    EXPECT_EQ(error.where(), row.where);
    EXPECT_EQ(error.rule(), row.rule);
    EXPECT_EQ(std::string(error.what()), row.what);
  }
}

TEST(InputError, IsCaughtAsRuntimeErrorButNotAsRuntimeFailure) {
  static_assert(std::is_base_of_v<std::runtime_error, InputError>);
  static_assert(std::is_base_of_v<std::runtime_error, RuntimeFailure>);
  static_assert(!std::is_base_of_v<RuntimeFailure, InputError>);
  static_assert(!std::is_base_of_v<InputError, RuntimeFailure>);
  bool caught_as_failure = false;
  try {
    try {
      throw InputError("$.marr", "must be > 0");
    } catch (const RuntimeFailure&) {
      caught_as_failure = true;
    }
  } catch (const std::runtime_error& error) {
    EXPECT_EQ(std::string(error.what()), "$.marr: must be > 0");
  }
  EXPECT_FALSE(caught_as_failure);
}

TEST(InputError, CopiesKeepWhereAndRule) {
  const InputError original("$.classes.van.max_life_years", "must be >= 1");
  const InputError copy = original;
  EXPECT_EQ(copy.where(), "$.classes.van.max_life_years");
  EXPECT_EQ(copy.rule(), "must be >= 1");
  EXPECT_EQ(std::string(copy.what()), "$.classes.van.max_life_years: must be >= 1");
}

TEST(RuntimeFailure, WhatIsTheMessageAsGiven) {
  const RuntimeFailure failure("cannot store the results: disk I/O error");
  EXPECT_EQ(std::string(failure.what()), "cannot store the results: disk I/O error");
}

}  // namespace
}  // namespace tenure
