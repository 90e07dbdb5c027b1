// After-tax keeping costs on small invented cases worked by hand (closed form, SPEC 6 rules):
// operating costs deductible, depreciation shield, tax on the gain at sale, the MACRS
// disposal-year half deduction and the capital-gains split.
#include <gtest/gtest.h>

#include "replacement/keeping_costs.h"

namespace tenure::replacement {
namespace {

TEST(AfterTax, StraightLineTwoYearsByHand) {
  // Basis 10000, straight line 2 years, t = 40%, after-tax MARR 6%.
  // Year 1: D 5000, taxable -6000, tax -2400, ATCF -1000 + 2400 = 1400; sold for 6000 against
  //         book 5000: tax 400, net 5600. PW(1) = 10000 - 7000/1.06, EUAC(1) = 3600.
  // Year 2: D 5000, taxable -7000, tax -2800, ATCF 800; sold for 3000 against book 0: tax 1200,
  //         net 1800. PW(2) = 10000 - 1400/1.06 - 2600/1.06^2.
  const Ownership unit{10000, 0, 10000, {1000, 2000}, {6000, 3000},
                       depreciation::make_method(depreciation::StraightLineSpec{2, 0})};
  const auto rates = tax::Rates::make(0.10, 0.40, 0.06);
  const KeepingCosts costs = after_tax_keeping_costs(unit, rates);
  EXPECT_NEAR(costs.pw_cost(1), 10000 - 7000 / 1.06, 1e-9);
  EXPECT_NEAR(costs.euac(1), 3600.0, 1e-9);
  const double pw2 = 10000 - 1400 / 1.06 - 2600 / (1.06 * 1.06);
  EXPECT_NEAR(costs.pw_cost(2), pw2, 1e-9);
  EXPECT_NEAR(costs.euac(2), pw2 * 0.06 * 1.1236 / 0.1236, 1e-9);

  const AfterTaxTable table = after_tax_table(unit, rates);
  EXPECT_NEAR(table.years[0].kept.taxable_income, -6000, 1e-9);
  EXPECT_NEAR(table.years[0].kept.income_tax, -2400, 1e-9);
  EXPECT_NEAR(table.years[0].kept.after_tax_cash_flow, 1400, 1e-9);
  EXPECT_NEAR(table.years[1].sale.tax, 1200, 1e-9);
  EXPECT_NEAR(table.years[1].sale.net_proceeds, 1800, 1e-9);
}

TEST(AfterTax, MacrsDisposalYearTakesHalf) {
  // MACRS 3-year, year 1 rate 33.33% (IRS Publication 946 Table A-1). Sold at the end of
  // year 1 (before the last table year): half, 16.665% of 9000 = 1499.85, book 7500.15.
  const Ownership unit{9000, 0, 9000, {0, 0}, {7000, 5000},
                       depreciation::make_method(depreciation::MacrsSpec{3})};
  const auto rates = tax::Rates::make(0.10, 0.30);
  const AfterTaxTable table = after_tax_table(unit, rates);
  EXPECT_NEAR(table.years[0].sold.depreciation, 1499.85, 1e-9);
  EXPECT_NEAR(table.years[0].kept.depreciation, 2999.70, 1e-9);
  EXPECT_NEAR(table.years[0].sale.book_value, 7500.15, 1e-9);
  EXPECT_NEAR(table.years[0].sale.tax, 0.30 * (7000 - 7500.15), 1e-9);  // a loss saves tax
}

TEST(AfterTax, GainAboveBasisSplitsIntoRecaptureAndCapitalGain) {
  // Basis 10000, straight line 2 years; sold after 1 year for 12000 against book 5000:
  // recapture 5000 at 40% plus capital gain 2000 at 20% = 2400.
  const Ownership unit{10000, 0, 10000, {0}, {12000},
                       depreciation::make_method(depreciation::StraightLineSpec{2, 0})};
  const auto rates = tax::Rates::make(0.10, 0.40, std::nullopt, 0.20);
  EXPECT_NEAR(after_tax_table(unit, rates).years[0].sale.tax, 2400, 1e-9);
}

TEST(AfterTax, DefenderContinuesItsOwnSchedule) {
  // A defender 2 years old on straight line over 4 years (basis 8000): book now 4000; kept one
  // more year it deducts year 3's 2000, so its book at the sale is 2000.
  const Ownership unit{8000, 2, 5000, {700}, {3000},
                       depreciation::make_method(depreciation::StraightLineSpec{4, 0})};
  const auto rates = tax::Rates::make(0.10, 0.25);
  const AfterTaxTable table = after_tax_table(unit, rates);
  EXPECT_NEAR(table.start.book_value, 4000, 1e-9);
  EXPECT_NEAR(table.start.tax, 0.25 * 1000, 1e-9);
  EXPECT_NEAR(table.years[0].kept.depreciation, 2000, 1e-9);
  EXPECT_NEAR(table.years[0].sale.book_value, 2000, 1e-9);
}

}  // namespace
}  // namespace tenure::replacement
