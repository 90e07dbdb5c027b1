// Tax on a sale (tax/disposal.h, SPEC 6): the gain over book value is taxed as recapture at the
// income rate up to the first cost, any excess over the first cost at the capital-gains rate; a
// sale below book value is a loss that saves tax at the income rate. Every golden value is worked
// by hand in its row's comment; the figures of the fixtures are invented.
#include "tax/disposal.h"

#include <gtest/gtest.h>

#include <cmath>
#include <optional>
#include <vector>

namespace tenure::tax {
namespace {

struct Row {
  const char* comment;  // the sale and the tax worked by hand
  Money market_value;
  Money book_value;
  Money basis;
  Rate income_tax_rate;
  std::optional<Rate> capital_gains_tax_rate;  // none: the default, the income rate
  Money tax;                                   // by hand
};

const std::vector<Row>& rows() {
  static const std::vector<Row> table = {
      {"sale at 12,000 of an asset with book value 8,000 and first cost 20,000 at t = 0.25: "
       "gain 4,000 all recapture, tax 1,000 (by hand: 0.25 x 4,000)",
       12000, 8000, 20000, 0.25, std::nullopt, 1000},
      {"disposal.h's example: basis 10,000, book 4,000, sold for 12,000, t = 0.25, gains 0.15: "
       "recapture 6,000 and capital gain 2,000, tax 1,800 (by hand: 0.25 x 6,000 + 0.15 x 2,000)",
       12000, 4000, 10000, 0.25, 0.15, 1800},
      {"sale below book: 3,000 against book 5,000 at t = 0.25 is a loss of 2,000 that saves 500 "
       "(by hand: 0.25 x -2,000)",
       3000, 5000, 10000, 0.25, std::nullopt, -500},
      {"a loss is saved at the income rate, never the gains rate: 3,000 against 5,000, t = 0.30, "
       "gains 0.10: -600 (by hand: 0.30 x -2,000)",
       3000, 5000, 10000, 0.30, 0.10, -600},
      {"sale at book value: no gain, no tax (by hand: 0.25 x 0)", 5000, 5000, 10000, 0.25,
       std::nullopt, 0},
      {"sale at exactly the first cost: all recapture, 1,800 (by hand: 0.30 x (10,000 - 4,000)); "
       "the gains rate does not enter",
       10000, 4000, 10000, 0.30, 0.10, 1800},
      {"fully depreciated, sold for 2,500 at t = 0.40: 1,000 (by hand: 0.40 x 2,500)", 2500, 0,
       10000, 0.40, std::nullopt, 1000},
      {"fully depreciated, sold above first cost for 15,000 at t = 0.40 and gains 0.20: 5,000 "
       "(by hand: 0.40 x 10,000 + 0.20 x 5,000)",
       15000, 0, 10000, 0.40, 0.20, 5000},
      {"above first cost with the default gains rate: the whole gain at t, 2,750 (by hand: "
       "0.25 x (15,000 - 4,000))",
       15000, 4000, 10000, 0.25, std::nullopt, 2750},
      {"above first cost with gains untaxed: recapture only, 1,500 (by hand: 0.25 x 6,000)", 15000,
       4000, 10000, 0.25, 0.0, 1500},
      {"scrapped for nothing: the whole book value is a loss, -1,000 (by hand: 0.25 x -4,000)", 0,
       4000, 10000, 0.25, std::nullopt, -1000},
      {"a sale that costs money (removal above scrap): -500 against book 1,000 at t = 0.20 is a "
       "loss of 1,500, -300 (by hand: 0.20 x -1,500)",
       -500, 1000, 10000, 0.20, std::nullopt, -300},
      {"no tax at t = 0, whatever the gain (by hand: 0 x 8,000)", 12000, 4000, 10000, 0.0,
       std::nullopt, 0},
  };
  return table;
}

Rates rates_of(const Row& row) {
  return Rates::make(0.10, row.income_tax_rate, std::nullopt, row.capital_gains_tax_rate);
}

TEST(TaxOnDisposal, RecaptureCapitalGainAndLossByHand) {
  for (const Row& row : rows()) {
    SCOPED_TRACE(row.comment);
    const Sale sale{row.market_value, row.book_value, row.basis};
    EXPECT_NEAR(tax_on_disposal(sale, rates_of(row)), row.tax, 1e-9);
  }
}

TEST(TaxOnDisposal, ProceedsAreTheMarketValueLessTheTax) {
  // Identity of disposal.h: after_tax_proceeds = market_value - tax_on_disposal, so with the
  // rows' hand-worked taxes, e.g. 12,000 - 1,800 = 10,200 and 3,000 - (-500) = 3,500.
  for (const Row& row : rows()) {
    SCOPED_TRACE(row.comment);
    const Sale sale{row.market_value, row.book_value, row.basis};
    EXPECT_NEAR(after_tax_proceeds(sale, rates_of(row)), row.market_value - row.tax, 1e-9);
  }
}

TEST(TaxOnDisposal, WithEqualRatesTheTaxIsTheRateTimesTheGain) {
  // Identity: when the capital-gains rate equals the income rate, recapture and capital gain are
  // taxed alike, so the tax is t x (market value - book value) on either side of the first cost.
  const Rates rates = Rates::make(0.10, 0.35);
  for (Money market : {0.0, 1500.0, 4000.0, 9999.0, 10000.0, 10001.0, 25000.0}) {
    SCOPED_TRACE(market);
    EXPECT_NEAR(tax_on_disposal({market, 4000, 10000}, rates), 0.35 * (market - 4000), 1e-9);
  }
}

TEST(TaxOnDisposal, ContinuousAtBookValueAndAtFirstCost) {
  // Identity: the tax is a piecewise linear function of the sale price with no jump where the
  // pieces meet (at book value, at first cost); one cent either side moves it by one cent times
  // the rate of that side (by hand: 0.25 x 0.01 below first cost, 0.10 x 0.01 above it).
  const Rates rates = Rates::make(0.10, 0.25, std::nullopt, 0.10);
  const Money book = 4000;
  const Money basis = 10000;
  EXPECT_NEAR(tax_on_disposal({book - 0.01, book, basis}, rates), -0.0025, 1e-9);
  EXPECT_NEAR(tax_on_disposal({book + 0.01, book, basis}, rates), 0.0025, 1e-9);
  const Money at_basis = 0.25 * 6000;  // by hand: 1,500
  EXPECT_NEAR(tax_on_disposal({basis - 0.01, book, basis}, rates), at_basis - 0.0025, 1e-9);
  EXPECT_NEAR(tax_on_disposal({basis, book, basis}, rates), at_basis, 1e-9);
  EXPECT_NEAR(tax_on_disposal({basis + 0.01, book, basis}, rates), at_basis + 0.001, 1e-9);
}

}  // namespace
}  // namespace tenure::tax
