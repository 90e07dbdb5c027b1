// Test helper: checks that an action throws tenure::InputError with exactly the given where()
// and rule(), reporting the failure at the caller's line.
//
//   EXPECT_TRUE(throws_input_error([] { StraightLine(StraightLineSpec{0, 0}); },
//                                  "life_years", "must be a whole number of years >= 1"));
#pragma once

#include <gtest/gtest.h>

#include <string>

#include "core/errors.h"

namespace tenure::depreciation::testing {

template <typename Action>
::testing::AssertionResult throws_input_error(Action&& action, const std::string& where,
                                              const std::string& rule) {
  try {
    action();
  } catch (const InputError& error) {
    if (error.where() == where && error.rule() == rule) return ::testing::AssertionSuccess();
    return ::testing::AssertionFailure() << "threw InputError(\"" << error.where() << "\", \""
                                         << error.rule() << "\")";
  }
  return ::testing::AssertionFailure() << "did not throw InputError";
}

}  // namespace tenure::depreciation::testing
