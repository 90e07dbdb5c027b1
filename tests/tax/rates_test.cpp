// The rates of tax/rates.h: the defaults (after-tax MARR = marr (1 - t), capital gains taxed at
// the income rate, SPEC 4), given values kept as given, and each refused rate named by its JSON
// path ("$.marr", ...).
#include "tax/rates.h"

#include <gtest/gtest.h>

#include <cmath>
#include <limits>
#include <optional>
#include <string>
#include <vector>

#include "core/errors.h"

namespace tenure::tax {
namespace {

struct DefaultRow {
  const char* comment;
  Rate marr;
  Rate income_tax_rate;
  Rate after_tax_marr;  // by hand: marr (1 - t)
  bool after_tax;       // SPEC 4: t = 0 means before-tax only
};

TEST(Rates, DefaultsFollowFromMarrAndTaxRate) {
  const std::vector<DefaultRow> rows = {
      {"SPEC 4's example: 0.10 (1 - 0.25) = 0.075", 0.10, 0.25, 0.075, true},
      {"0.12 (1 - 0.40) = 0.072", 0.12, 0.40, 0.072, true},
      {"no tax: the after-tax MARR is the MARR, 0.08 (1 - 0) = 0.08", 0.08, 0.0, 0.08, false},
      {"a MARR of 100% a year, the largest allowed: 1 (1 - 0.5) = 0.5", 1.0, 0.5, 0.5, true},
  };
  for (const DefaultRow& row : rows) {
    SCOPED_TRACE(row.comment);
    const Rates rates = Rates::make(row.marr, row.income_tax_rate);
    EXPECT_EQ(rates.marr, row.marr);
    EXPECT_EQ(rates.income_tax_rate, row.income_tax_rate);
    EXPECT_DOUBLE_EQ(rates.after_tax_marr, row.after_tax_marr);
    EXPECT_EQ(rates.capital_gains_tax_rate, row.income_tax_rate);  // SPEC 4 default
    EXPECT_EQ(rates.after_tax(), row.after_tax);
  }
}

TEST(Rates, GivenRatesOverrideTheDefaults) {
  const Rates rates = Rates::make(0.10, 0.25, 0.07, 0.15);
  EXPECT_EQ(rates.after_tax_marr, 0.07);
  EXPECT_EQ(rates.capital_gains_tax_rate, 0.15);
}

TEST(Rates, AGivenZeroCapitalGainsRateIsNotTheDefault) {
  // An optional holding 0 is a given rate of 0, not "absent": gains above basis go untaxed.
  const Rates rates = Rates::make(0.10, 0.25, std::nullopt, 0.0);
  EXPECT_EQ(rates.capital_gains_tax_rate, 0.0);
  EXPECT_DOUBLE_EQ(rates.after_tax_marr, 0.075);  // still the default, by hand 0.10 x 0.75
}

TEST(Rates, AfterTaxMarrMayBeGivenWithoutTax) {
  const Rates rates = Rates::make(0.10, 0.0, 0.06);
  EXPECT_EQ(rates.after_tax_marr, 0.06);
  EXPECT_FALSE(rates.after_tax());
}

struct RefusedRow {
  const char* comment;
  Rate marr;
  Rate income_tax_rate;
  std::optional<Rate> after_tax_marr;
  std::optional<Rate> capital_gains_tax_rate;
  const char* where;  // the JSON path the error must name (rates.h)
};

TEST(Rates, RefusedRatesNameTheirJsonPath) {
  const double nan = std::numeric_limits<double>::quiet_NaN();
  const double inf = std::numeric_limits<double>::infinity();
  const double above_one = std::nextafter(1.0, 2.0);
  const std::vector<RefusedRow> rows = {
      {"marr 0: must be > 0", 0.0, 0.25, {}, {}, "$.marr"},
      {"marr 1e-8: below 0.0001, C*/i swamps the tie rule", 1e-8, 0.25, {}, {}, "$.marr"},
      {"the smallest subnormal marr", 5e-324, 0.25, {}, {}, "$.marr"},
      {"default after-tax marr 0.0002 x (1 - 0.6) below 0.0001", 0.0002, 0.6, {}, {},
       "$.after_tax_marr"},
      {"tax rate 0.9999999999: above 0.99", 0.10, 0.9999999999, {}, {}, "$.income_tax_rate"},
      {"a negative marr", -0.05, 0.25, {}, {}, "$.marr"},
      {"marr just above 100% a year", above_one, 0.25, {}, {}, "$.marr"},
      {"marr NaN", nan, 0.25, {}, {}, "$.marr"},
      {"marr infinite", inf, 0.25, {}, {}, "$.marr"},
      {"tax rate 1: must be <= 0.99", 0.10, 1.0, {}, {}, "$.income_tax_rate"},
      {"a negative tax rate", 0.10, -0.01, {}, {}, "$.income_tax_rate"},
      {"tax rate NaN", 0.10, nan, {}, {}, "$.income_tax_rate"},
      {"after-tax marr 0", 0.10, 0.25, 0.0, {}, "$.after_tax_marr"},
      {"after-tax marr above 100%", 0.10, 0.25, above_one, {}, "$.after_tax_marr"},
      {"after-tax marr NaN", 0.10, 0.25, nan, {}, "$.after_tax_marr"},
      {"capital gains rate 1", 0.10, 0.25, {}, 1.0, "$.capital_gains_tax_rate"},
      {"a negative capital gains rate", 0.10, 0.25, {}, -0.1, "$.capital_gains_tax_rate"},
      {"capital gains rate infinite", 0.10, 0.25, {}, inf, "$.capital_gains_tax_rate"},
      {"both marr and tax rate bad: marr is named first", 0.0, 1.0, {}, {}, "$.marr"},
  };
  for (const RefusedRow& row : rows) {
    SCOPED_TRACE(row.comment);
    try {
      Rates::make(row.marr, row.income_tax_rate, row.after_tax_marr, row.capital_gains_tax_rate);
      ADD_FAILURE() << "accepted";
    } catch (const InputError& error) {
      EXPECT_EQ(error.where(), row.where);
      EXPECT_FALSE(error.rule().empty());
    }
  }
}

TEST(Rates, BoundariesThatAreAccepted) {
  // marr exactly 1 (100% a year) or 0.0001, tax rates of 0.99, are inside their ranges (rates.h).
  EXPECT_NO_THROW(Rates::make(1.0, 0.0));
  EXPECT_NO_THROW(Rates::make(0.10, 0.99));
  EXPECT_NO_THROW(Rates::make(0.10, 0.25, 1.0, 0.99));
  EXPECT_NO_THROW(Rates::make(0.0001, 0.0));
  EXPECT_NO_THROW(Rates::make(0.10, 0.99, 0.0001));
}

}  // namespace
}  // namespace tenure::tax
