// The argument checks of core/checks.h: which values each check accepts and refuses, at its
// boundaries, and that a refusal is an InputError naming `where` and the range it broke.
// Every expectation follows from the rule written beside the check in core/checks.h.
#include "core/checks.h"

#include <gtest/gtest.h>

#include <cmath>
#include <limits>
#include <string>
#include <string_view>
#include <vector>

#include "core/errors.h"

namespace tenure {
namespace {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
constexpr double kInf = std::numeric_limits<double>::infinity();
constexpr double kTiny = std::numeric_limits<double>::denorm_min();
constexpr double kMax = std::numeric_limits<double>::max();

using Check = void (*)(double, std::string_view);

struct Row {
  const char* comment;  // what the row shows
  Check check;
  double value;
  // Empty: the value is accepted. Otherwise it is refused with a rule containing this text.
  std::string refused_with;
};

// The words each rule must contain: the range it states (checks.h).
const std::string kFinite = "finite";
const std::string kNonNegative = ">= 0";
const std::string kPositive = "> 0";
const std::string kAmount = "1e15";
const std::string kRate = "greater than -1";
const std::string kTaxRate = "[0, 0.99]";

std::string describe(const Row& row) {
  return std::string(row.comment) + " (value " + std::to_string(row.value) + ")";
}

void run_rows(const std::vector<Row>& rows) {
  for (const Row& row : rows) {
    SCOPED_TRACE(describe(row));
    if (row.refused_with.empty()) {
      EXPECT_NO_THROW(row.check(row.value, "$.x"));
      continue;
    }
    try {
      row.check(row.value, "$.x");
      ADD_FAILURE() << "accepted a value it should refuse";
    } catch (const InputError& error) {
      EXPECT_EQ(error.where(), "$.x");
      EXPECT_NE(error.rule().find(row.refused_with), std::string::npos) << error.rule();
    }
  }
}

TEST(RequireFinite, AcceptsEveryFiniteDoubleAndRefusesNaNAndInfinities) {
  run_rows({
      {"zero", require_finite, 0.0, ""},
      {"negative zero", require_finite, -0.0, ""},
      {"the largest double", require_finite, kMax, ""},
      {"the most negative double", require_finite, -kMax, ""},
      {"the smallest subnormal", require_finite, kTiny, ""},
      {"quiet NaN", require_finite, kNaN, kFinite},
      {"negative NaN", require_finite, -kNaN, kFinite},
      {"plus infinity", require_finite, kInf, kFinite},
      {"minus infinity", require_finite, -kInf, kFinite},
  });
}

TEST(RequireNonNegative, ZeroIsTheBoundary) {
  run_rows({
      {"zero is allowed (>= 0)", require_non_negative, 0.0, ""},
      {"negative zero compares equal to zero", require_non_negative, -0.0, ""},
      {"the smallest subnormal above zero", require_non_negative, kTiny, ""},
      {"a large amount", require_non_negative, 1e300, ""},
      {"the smallest subnormal below zero", require_non_negative, -kTiny, kNonNegative},
      {"minus one", require_non_negative, -1.0, kNonNegative},
      {"NaN is refused as not finite first", require_non_negative, kNaN, kFinite},
      {"plus infinity is not finite, though not negative", require_non_negative, kInf, kFinite},
      {"minus infinity", require_non_negative, -kInf, kFinite},
  });
}

TEST(RequirePositive, ZeroIsRefused) {
  run_rows({
      {"the smallest subnormal above zero", require_positive, kTiny, ""},
      {"one", require_positive, 1.0, ""},
      {"zero (> 0 is strict)", require_positive, 0.0, kPositive},
      {"negative zero", require_positive, -0.0, kPositive},
      {"minus one", require_positive, -1.0, kPositive},
      {"NaN", require_positive, kNaN, kFinite},
      {"plus infinity", require_positive, kInf, kFinite},
  });
}

TEST(RequireAmount, AtMostOneE15InMagnitude) {
  // 1e15 < 2^53, so it is a double exactly; the next doubles out are 1e15 +- 0.125.
  const double above = std::nextafter(kMaxAmount, kInf);
  const double below = std::nextafter(-kMaxAmount, -kInf);
  ASSERT_EQ(kMaxAmount, 1e15);     // the documented limit: at most 1e15 in magnitude
  ASSERT_EQ(above, 1e15 + 0.125);  // by hand: spacing of doubles in [2^49, 2^50) is 2^-3
  run_rows({
      {"zero", require_amount, 0.0, ""},
      {"a negative amount (a credit) is an amount", require_amount, -412.5, ""},
      {"exactly 1e15 is accepted", require_amount, 1e15, ""},
      {"exactly -1e15 is accepted", require_amount, -1e15, ""},
      {"the next double above 1e15 is refused", require_amount, above, kAmount},
      {"the next double below -1e15 is refused", require_amount, below, kAmount},
      {"1e308, near the double's limit", require_amount, 1e308, kAmount},
      {"NaN", require_amount, kNaN, kFinite},
      {"plus infinity", require_amount, kInf, kFinite},
      {"minus infinity", require_amount, -kInf, kFinite},
  });
}

TEST(RequireRate, GreaterThanMinusOne) {
  run_rows({
      {"zero", require_rate, 0.0, ""},
      {"ten percent", require_rate, 0.10, ""},
      {"a negative rate above -1 (deflation)", require_rate, -0.5, ""},
      {"the next double above -1", require_rate, std::nextafter(-1.0, 0.0), ""},
      {"a rate above 100% is still a rate", require_rate, 5.0, ""},
      {"-1 makes 1 + i zero", require_rate, -1.0, kRate},
      {"-2", require_rate, -2.0, kRate},
      {"NaN", require_rate, kNaN, kFinite},
      {"plus infinity", require_rate, kInf, kFinite},
      {"minus infinity", require_rate, -kInf, kFinite},
  });
}

TEST(RequireTaxRate, ZeroToNinetyNinePercent) {
  run_rows({
      {"zero: before-tax only", require_tax_rate, 0.0, ""},
      {"negative zero compares equal to zero", require_tax_rate, -0.0, ""},
      {"a quarter", require_tax_rate, 0.25, ""},
      {"0.99, the largest (kMaxTaxRate)", require_tax_rate, 0.99, ""},
      {"the next double above 0.99", require_tax_rate, std::nextafter(0.99, 1.0), kTaxRate},
      {"0.9999999999: after-tax amounts would be too small to weigh", require_tax_rate,
       0.9999999999, kTaxRate},
      {"the next double below one", require_tax_rate, std::nextafter(1.0, 0.0), kTaxRate},
      {"one: nothing would be left after tax", require_tax_rate, 1.0, kTaxRate},
      {"above one", require_tax_rate, 1.5, kTaxRate},
      {"the smallest subnormal below zero", require_tax_rate, -kTiny, kTaxRate},
      {"minus one", require_tax_rate, -1.0, kTaxRate},
      {"NaN", require_tax_rate, kNaN, kFinite},
      {"plus infinity", require_tax_rate, kInf, kFinite},
  });
}

TEST(Checks, EmptyWhereGivesTheBareRule) {
  // errors.h: with no `where`, what() is the rule alone, without a ": " prefix.
  try {
    require_finite(kNaN, "");
    FAIL() << "NaN accepted";
  } catch (const InputError& error) {
    EXPECT_EQ(error.where(), "");
    EXPECT_EQ(std::string(error.what()), error.rule());
    EXPECT_NE(error.rule().find(kFinite), std::string::npos);
  }
}

TEST(Checks, WhereIsCopiedAsGiven) {
  // A row reference and a JSON path with an index, as DEVELOPERS.md describes `where`.
  for (const char* where : {"$.challenger.operating_costs[2]", "row 17 (asset_id 'PU-0017')"}) {
    try {
      require_positive(-3, where);
      FAIL() << "-3 accepted";
    } catch (const InputError& error) {
      EXPECT_EQ(error.where(), where);
      EXPECT_EQ(std::string(error.what()), std::string(where) + ": " + error.rule());
    }
  }
}

struct IdentifierRow {
  const char* comment;
  std::string name;
  bool plain;
};

TEST(IsPlainIdentifier, LettersDigitsUnderscoresUpTo128) {
  const std::vector<IdentifierRow> rows = {
      {"the default asset relation", "asset", true},
      {"a leading underscore", "_staging", true},
      {"upper case and digits after the first", "Cost_Event2", true},
      {"a single letter", "a", true},
      {"a single underscore", "_", true},
      {"128 characters, the limit", std::string(128, 'v'), true},
      {"129 characters, one too many", std::string(129, 'v'), false},
      {"empty", "", false},
      {"a leading digit", "1asset", false},
      {"a hyphen", "asset-view", false},
      {"a space", "asset view", false},
      {"a schema-qualified name", "main.asset", false},
      {"a quoted name", "\"asset\"", false},
      {"a statement separator", "asset;DROP TABLE asset", false},
      {"a comment opener", "asset--", false},
      {"a non-ASCII letter (UTF-8 e acute)", "caf\xc3\xa9", false},
      {"an embedded NUL", std::string("ass\0et", 6), false},
      {"a trailing newline", "asset\n", false},
  };
  for (const IdentifierRow& row : rows) {
    EXPECT_EQ(is_plain_identifier(row.name), row.plain) << row.comment;
  }
}

// Empty: accepted. Otherwise the rule it is refused with, exactly (core/checks.h states it).
struct ScenarioRow {
  const char* comment;
  std::string name;
  std::string refused_with;
};

TEST(RequireScenarioName, OneToSixtyFourLettersDigitsHyphensUnderscoresDots) {
  const std::string kOnly = "may hold only letters, digits, '-', '_' and '.' (character ";
  const std::vector<ScenarioRow> rows = {
      {"one letter", "a", ""},
      {"every kind of character", "Q4.budget_2027-high", ""},
      {"digits only", "2027", ""},
      {"dots only", "..", ""},
      {"64 characters, the limit", std::string(64, 'z'), ""},
      {"65 characters, one too many", std::string(65, 'z'),
       "must be at most 64 characters (it has 65)"},
      {"empty", "", "must not be empty (a name of letters, digits, '-', '_' and '.')"},
      {"a space, the 5th character", "next year", kOnly + "5 is not one)"},
      {"a slash first", "/tmp", kOnly + "1 is not one)"},
      {"a quote", "x'y", kOnly + "2 is not one)"},
      {"a non-ASCII letter (UTF-8 e acute), its first byte the 4th", "caf\xc3\xa9",
       kOnly + "4 is not one)"},
      {"an embedded NUL", std::string("a\0b", 3), kOnly + "2 is not one)"},
      {"a trailing newline", "plan\n", kOnly + "5 is not one)"},
  };
  for (const ScenarioRow& row : rows) {
    SCOPED_TRACE(row.comment);
    if (row.refused_with.empty()) {
      EXPECT_NO_THROW(require_scenario_name(row.name, "--scenario"));
      continue;
    }
    try {
      require_scenario_name(row.name, "--scenario");
      ADD_FAILURE() << "accepted a name it should refuse";
    } catch (const InputError& error) {
      EXPECT_EQ(error.where(), "--scenario");
      EXPECT_EQ(error.rule(), row.refused_with);
    }
  }
}

}  // namespace
}  // namespace tenure
