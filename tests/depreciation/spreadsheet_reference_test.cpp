// The book depreciation methods against an independent library of spreadsheet functions,
// @formulajs/formulajs (pinned in tests/reference/package.json), run for real under Node.js by
// tests/reference/spreadsheet_values.js on a grid of invented assets:
//   SLN(cost, salvage, life)              = StraightLineSpec{life, salvage}, every year
//   SYD(cost, salvage, life, per)         = SumOfYearsDigitsSpec{life, salvage}, year per
//   DDB(cost, salvage, life, per, factor) = DecliningBalanceSpec{life, factor, salvage, no switch}
//   DB(cost, salvage, life, per, 12)      = DecliningBalanceSpec{life, rounded rate * life, 0,
//                                           no switch}: see DbIsFixedRateDecliningBalance
// Tolerance: 1e-9 relative (kReferenceRelative), plus 1e-9 absolute for deductions that are
// zero on both sides. Skipped without node or the installed library (`npm ci --prefix
// tests/reference`), failed instead when CI is set.
//
// VDB is not compared: formulajs's VDB is known to be wrong. Declining balance with the switch
// to straight line is checked against Microsoft's documented VDB examples in
// vdb_examples_test.cpp.
#include <gtest/gtest.h>

#include <cmath>
#include <string>
#include <vector>

#include "depreciation/declining_balance.h"
#include "depreciation/straight_line.h"
#include "depreciation/sum_of_years_digits.h"
#include "tests/reference/spreadsheet_values.h"

namespace tenure::depreciation {
namespace {

using tenure::testing::reference_tolerance;

class SpreadsheetDepreciation : public tenure::testing::SpreadsheetReference {
 protected:
  const nlohmann::json& assets() {
    const nlohmann::json& rows = values().at("depreciation");
    EXPECT_FALSE(rows.empty());
    return rows;
  }
};

struct Asset {
  Money cost;
  Money salvage;
  Years life;
};

Asset asset_of(const nlohmann::json& row) {
  return {row.at("cost").get<double>(), row.at("salvage").get<double>(),
          row.at("life").get<Years>()};
}

std::string describe(const Asset& a) {
  return "cost=" + std::to_string(a.cost) + " salvage=" + std::to_string(a.salvage) +
         " life=" + std::to_string(a.life);
}

// Every year of `ours` against the reference's list of per-period values.
void expect_same_years(const std::vector<Money>& ours, const nlohmann::json& reference) {
  ASSERT_EQ(ours.size(), reference.size());
  for (std::size_t k = 0; k < ours.size(); ++k) {
    const double expected = reference[k].get<double>();
    EXPECT_NEAR(ours[k], expected, reference_tolerance(expected)) << "year " << k + 1;
  }
}

TEST_F(SpreadsheetDepreciation, SlnIsStraightLine) {
  for (const nlohmann::json& row : assets()) {
    const Asset a = asset_of(row);
    SCOPED_TRACE(describe(a));
    const double sln = row.at("sln").get<double>();
    const auto ours = StraightLine(StraightLineSpec{a.life, a.salvage}).deductions(a.cost);
    expect_same_years(ours, nlohmann::json(std::vector<double>(ours.size(), sln)));
  }
}

TEST_F(SpreadsheetDepreciation, SydIsSumOfYearsDigits) {
  for (const nlohmann::json& row : assets()) {
    const Asset a = asset_of(row);
    SCOPED_TRACE(describe(a));
    expect_same_years(SumOfYearsDigits(SumOfYearsDigitsSpec{a.life, a.salvage}).deductions(a.cost),
                      row.at("syd"));
  }
}

TEST_F(SpreadsheetDepreciation, DdbIsDecliningBalanceWithoutSwitch) {
  for (const nlohmann::json& row : assets()) {
    const Asset a = asset_of(row);
    for (const auto& [factor, key] : {std::pair{2.0, "ddb_2"}, std::pair{1.5, "ddb_1_5"}}) {
      SCOPED_TRACE(describe(a) + " factor=" + std::to_string(factor));
      const DecliningBalance method(DecliningBalanceSpec{a.life, factor, a.salvage, false});
      expect_same_years(method.deductions(a.cost), row.at(key));
    }
  }
}

// DB is fixed-declining balance: year k deducts d * BV(k-1), with the rate
// d = 1 - (salvage / cost)^(1 / life) rounded to three decimals (with a first year of 12 months)
// and no floor at salvage: the rounding can take the book value a little below salvage. Ours,
// with the multiple R = d * life, deducts (R / life) * BV(k-1) = d * BV(k-1), the same arithmetic;
// its floor is the spec's salvage, here 0, which a book value (1 - d)^k * cost never reaches for
// d < 1 (and reaches exactly in year 1 for d = 1), so the floor never changes a deduction.
TEST_F(SpreadsheetDepreciation, DbIsFixedRateDecliningBalance) {
  for (const nlohmann::json& row : assets()) {
    const Asset a = asset_of(row);
    SCOPED_TRACE(describe(a));
    const double exact_rate = 1 - std::pow(a.salvage / a.cost, 1.0 / a.life);
    const double rounded_rate = std::round(exact_rate * 1000) / 1000;
    ASSERT_GT(rounded_rate, 0) << "the grid must not hold a DB rate that rounds to 0";
    const DecliningBalance method(DecliningBalanceSpec{a.life, rounded_rate * a.life, 0, false});
    expect_same_years(method.deductions(a.cost), row.at("db"));
  }
}

}  // namespace
}  // namespace tenure::depreciation
