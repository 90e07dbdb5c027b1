// After-tax cash flows of one year and of a sale (tax/cash_flows.h, SPEC 6): operating costs are
// deductible, depreciation shields income, a negative taxable income is a saving the same year,
// the disposal-year rule applies to the year of a sale. Golden values are worked by hand beside
// each row from the deductions of the method (straight line by its formula, MACRS from IRS
// Publication 946 Table A-1, 5-year: 20.00, 32.00, 19.20, 11.52, 11.52, 5.76 %, from memory).
// Two textbook identities are checked on every row: ATCF = -(1 - t) x cost + t x depreciation,
// and at t = 0 the after-tax flows are the before-tax ones. Assets and amounts are invented.
#include "tax/cash_flows.h"

#include <gtest/gtest.h>

#include <memory>
#include <optional>
#include <vector>

#include "depreciation/method.h"
#include "depreciation/schedule.h"

namespace tenure::tax {
namespace {

using depreciation::make_method;
using depreciation::Schedule;
using depreciation::Spec;

constexpr double kTol = 1e-9;

Schedule schedule_of(const Spec& spec, Money basis) { return Schedule(*make_method(spec), basis); }

const Spec kStraightLine5 = depreciation::StraightLineSpec{5, 0};
const Spec kMacrs5 = depreciation::MacrsSpec{5};
const Spec kSumOfYears5 = depreciation::SumOfYearsDigitsSpec{5, 0};
const Spec kNone = depreciation::NoDepreciationSpec{};

struct YearRow {
  const char* comment;  // the year worked by hand
  Spec method;
  Money basis;
  Years schedule_year;
  YearEnd end;
  Money operating_cost;
  Rate t;
  // By hand:
  Money depreciation;
  Money book_value;
  Money after_tax_cash_flow;
};

const std::vector<YearRow>& year_rows() {
  static const std::vector<YearRow> rows = {
      {"straight line 10,000 over 5 years, year 1 kept, cost 4,000, t = 0.25: D 2,000, book "
       "8,000, taxable -6,000, tax -1,500, ATCF -4,000 + 1,500 = -2,500",
       kStraightLine5, 10000, 1, YearEnd::kept, 4000, 0.25, 2000, 8000, -2500},
      {"MACRS 5 on 10,000, year 2 kept, cost 3,000, t = 0.40: D 3,200 (32%), book 4,800, "
       "taxable -6,200, tax -2,480, ATCF -3,000 + 2,480 = -520",
       kMacrs5, 10000, 2, YearEnd::kept, 3000, 0.40, 3200, 4800, -520},
      {"a defender 2 years old in its first year kept is in schedule year 3: MACRS 5 on 10,000, "
       "D 1,920 (19.20%), book 2,880, cost 5,000, t = 0.25: tax -1,730, ATCF -3,270",
       kMacrs5, 10000, 3, YearEnd::kept, 5000, 0.25, 1920, 2880, -3270},
      {"sum-of-years'-digits 15,000 over 5 years, year 1: D 5/15 x 15,000 = 5,000, book 10,000, "
       "cost 2,000, t = 0.20: taxable -7,000, tax -1,400, ATCF -600",
       kSumOfYears5, 15000, 1, YearEnd::kept, 2000, 0.20, 5000, 10000, -600},
      {"past the schedule: straight line 5 years, year 7: D 0, book 0, cost 4,000, t = 0.25: "
       "ATCF -3,000",
       kStraightLine5, 10000, 7, YearEnd::kept, 4000, 0.25, 0, 0, -3000},
      {"no depreciation: D 0, book stays 10,000, cost 1,000, t = 0.30: ATCF -700", kNone, 10000, 1,
       YearEnd::kept, 1000, 0.30, 0, 10000, -700},
      {"no operating cost: the shield alone, straight line year 2, t = 0.25: ATCF 0.25 x 2,000 "
       "= +500",
       kStraightLine5, 10000, 2, YearEnd::kept, 0, 0.25, 2000, 6000, 500},
      {"sold at the end of MACRS 5 year 3 (before the last table year): half of 1,920 = 960, "
       "book 4,800 - 960 = 3,840; cost 5,000, t = 0.25: taxable -5,960, tax -1,490, ATCF -3,510",
       kMacrs5, 10000, 3, YearEnd::sold, 5000, 0.25, 960, 3840, -3510},
      {"sold at the end of MACRS 5 year 6, its last table year: the full 576 (5.76%), book 0; "
       "cost 2,000, t = 0.25: ATCF -1,500 + 144 = -1,356",
       kMacrs5, 10000, 6, YearEnd::sold, 2000, 0.25, 576, 0, -1356},
      {"sold at the end of straight-line year 3: book methods take the full year, D 2,000, book "
       "4,000; cost 4,000, t = 0.25: ATCF -2,500",
       kStraightLine5, 10000, 3, YearEnd::sold, 4000, 0.25, 2000, 4000, -2500},
  };
  return rows;
}

TEST(OperatingYear, FlowsOfAYearByHand) {
  for (const YearRow& row : year_rows()) {
    SCOPED_TRACE(row.comment);
    const Schedule schedule = schedule_of(row.method, row.basis);
    const Rates rates = Rates::make(0.10, row.t);
    const YearFlow flow =
        operating_year(1, row.operating_cost, schedule, row.schedule_year, rates, row.end);
    EXPECT_EQ(flow.year, 1);  // years of keeping, not the schedule's year
    EXPECT_EQ(flow.operating_cost, row.operating_cost);
    EXPECT_NEAR(flow.depreciation, row.depreciation, kTol);
    EXPECT_NEAR(flow.book_value, row.book_value, kTol);
    // Definitions of cash_flows.h, with the hand-worked deduction.
    EXPECT_NEAR(flow.taxable_income, -(row.operating_cost + row.depreciation), kTol);
    EXPECT_NEAR(flow.income_tax, row.t * -(row.operating_cost + row.depreciation), kTol);
    EXPECT_NEAR(flow.after_tax_cash_flow, row.after_tax_cash_flow, kTol);
  }
}

TEST(OperatingYear, AtcfIsMinusOneMinusTTimesCostPlusTTimesDepreciation) {
  // Textbook identity for a year kept: ATCF = -(1 - t) c + t D, on each row's hand-worked D, at
  // several tax rates.
  for (const YearRow& row : year_rows()) {
    if (row.end != YearEnd::kept) continue;
    for (Rate t : {0.0, 0.21, 0.25, 0.40, 0.65}) {
      SCOPED_TRACE(::testing::Message() << row.comment << " at t = " << t);
      const Schedule schedule = schedule_of(row.method, row.basis);
      const YearFlow flow = operating_year(1, row.operating_cost, schedule, row.schedule_year,
                                           Rates::make(0.10, t), YearEnd::kept);
      EXPECT_NEAR(flow.after_tax_cash_flow, -(1 - t) * row.operating_cost + t * row.depreciation,
                  kTol);
    }
  }
}

TEST(OperatingYear, WithoutTaxTheFlowIsTheBeforeTaxCost) {
  // Identity: at t = 0 the after-tax flow of every year is -operating cost, the before-tax flow,
  // whatever the depreciation; no tax is due or saved.
  const Rates no_tax = Rates::make(0.10, 0.0);
  for (const YearRow& row : year_rows()) {
    SCOPED_TRACE(row.comment);
    const Schedule schedule = schedule_of(row.method, row.basis);
    const YearFlow flow =
        operating_year(1, row.operating_cost, schedule, row.schedule_year, no_tax, row.end);
    EXPECT_EQ(flow.income_tax, 0);
    EXPECT_EQ(flow.after_tax_cash_flow, -row.operating_cost);
  }
}

TEST(OperatingYear, YearIsCarriedAsGiven) {
  const Schedule schedule = schedule_of(kStraightLine5, 10000);
  const YearFlow flow = operating_year(4, 100, schedule, 2, Rates::make(0.10, 0.25));
  EXPECT_EQ(flow.year, 4);
  EXPECT_NEAR(flow.depreciation, 2000, kTol);  // by hand: schedule year 2 of 10,000 / 5
}

struct SaleRow {
  const char* comment;  // the sale worked by hand
  Spec method;
  Money basis;
  Years schedule_year;
  Money market_value;
  Rate t;
  std::optional<Rate> capital_gains;
  // By hand:
  Money depreciation_in_year;
  Money book_value;
  Money tax;
};

const std::vector<SaleRow>& sale_rows() {
  static const std::vector<SaleRow> rows = {
      {"straight line 10,000 over 5 years sold after year 3 for 6,000, t = 0.25: book 4,000, "
       "gain 2,000 all recapture, tax 500, net 5,500",
       kStraightLine5, 10000, 3, 6000, 0.25, std::nullopt, 2000, 4000, 500},
      {"MACRS 5 on 10,000 sold after year 3 for 5,000, t = 0.25: half-year 960, book 3,840, "
       "gain 1,160, tax 290, net 4,710",
       kMacrs5, 10000, 3, 5000, 0.25, std::nullopt, 960, 3840, 290},
      {"straight line sold after year 5 for 12,000 (above first cost), t = 0.25, gains 0.15: "
       "book 0, recapture 10,000 and gain 2,000, tax 2,500 + 300 = 2,800, net 9,200",
       kStraightLine5, 10000, 5, 12000, 0.25, 0.15, 2000, 0, 2800},
      {"straight line sold after year 2 for 4,000, t = 0.40: book 6,000, a loss of 2,000 saves "
       "800, net 4,800",
       kStraightLine5, 10000, 2, 4000, 0.40, std::nullopt, 2000, 6000, -800},
      {"sold now (schedule year 0) at first cost, as a challenger's start: book 10,000, no gain, "
       "no tax, net 10,000",
       kMacrs5, 10000, 0, 10000, 0.25, std::nullopt, 0, 10000, 0},
      {"MACRS 5 sold after year 1 for 8,500, t = 0.30: half of 2,000 = 1,000, book 9,000, loss "
       "500 saves 150, net 8,650",
       kMacrs5, 10000, 1, 8500, 0.30, std::nullopt, 1000, 9000, -150},
  };
  return rows;
}

TEST(SaleAt, TaxOnASaleByHand) {
  for (const SaleRow& row : sale_rows()) {
    SCOPED_TRACE(row.comment);
    const Schedule schedule = schedule_of(row.method, row.basis);
    const Rates rates = Rates::make(0.10, row.t, std::nullopt, row.capital_gains);
    const SaleFlow sale = sale_at(row.market_value, schedule, row.schedule_year, rates);
    EXPECT_EQ(sale.market_value, row.market_value);
    EXPECT_NEAR(sale.depreciation_in_year, row.depreciation_in_year, kTol);
    EXPECT_NEAR(sale.book_value, row.book_value, kTol);
    EXPECT_NEAR(sale.gain, row.market_value - row.book_value, kTol);
    EXPECT_NEAR(sale.tax, row.tax, kTol);
    EXPECT_NEAR(sale.net_proceeds, row.market_value - row.tax, kTol);
  }
}

TEST(SaleAt, AgreesWithTheYearSoldAndWithTaxOnDisposal) {
  // The sale's book value and deduction are those of the same year ended by a sale, and its tax
  // is tax_on_disposal of (market value, that book value, the basis).
  for (const SaleRow& row : sale_rows()) {
    if (row.schedule_year < 1) continue;
    SCOPED_TRACE(row.comment);
    const Schedule schedule = schedule_of(row.method, row.basis);
    const Rates rates = Rates::make(0.10, row.t, std::nullopt, row.capital_gains);
    const SaleFlow sale = sale_at(row.market_value, schedule, row.schedule_year, rates);
    const YearFlow last = operating_year(1, 0, schedule, row.schedule_year, rates, YearEnd::sold);
    EXPECT_EQ(sale.book_value, last.book_value);
    EXPECT_EQ(sale.depreciation_in_year, last.depreciation);
    EXPECT_EQ(sale.tax, tax_on_disposal({row.market_value, sale.book_value, row.basis}, rates));
  }
}

TEST(SaleAt, WithoutTaxTheSaleBringsItsMarketValue) {
  // Identity: at t = 0 (and gains untaxed) the after-tax sale is the before-tax one.
  const Rates no_tax = Rates::make(0.10, 0.0);
  for (const SaleRow& row : sale_rows()) {
    SCOPED_TRACE(row.comment);
    const Schedule schedule = schedule_of(row.method, row.basis);
    const SaleFlow sale = sale_at(row.market_value, schedule, row.schedule_year, no_tax);
    EXPECT_EQ(sale.tax, 0);
    EXPECT_EQ(sale.net_proceeds, row.market_value);
  }
}

}  // namespace
}  // namespace tenure::tax
