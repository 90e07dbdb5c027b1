// The pool's sale rule (tax/pool_disposal.h) and its use by sale_at and sale_now: the year-by-
// year tax shields of a pool schedule plus the sale's tax equal the published closed form of the
// present worth of the capital cost allowance tax shield,
//   PV = C d t / (d + k) x (1 + 0.5 k) / (1 + k) - S d t / (d + k) x (1 + k)^-n,
// as stated (with a worked example, below) by https://www.krishnan.ca/calculators/cca/tax-shield
// and in the Canadian corporate-finance texts (Brealey-Myers-Marcus, Ross-Westerfield-Jaffe
// Canadian editions, from memory). The variants without the half-year rule and with a
// first-year allowance are derived beside their tests; the tail of an asset not newly acquired,
// UCC d t / (d + k), is formula (b) of https://www.scribd.com/doc/228819053/
// Tax-Shield-Pv-for-Amortizable-Assets. Amounts are invented.
#include "tax/pool_disposal.h"

#include <gtest/gtest.h>

#include <cmath>
#include <optional>

#include "depreciation/pool.h"
#include "depreciation/schedule.h"
#include "tax/cash_flows.h"

namespace tenure::tax {
namespace {

using depreciation::Pool;
using depreciation::PoolSpec;
using depreciation::Schedule;

constexpr double kRelative = 1e-9;

// The tax shields of keeping a pool asset n years and selling it at the end of year n for S,
// year by year from the engine: sum of t D_j (1 + k)^-j, less the sale's tax (1 + k)^-n.
double shields_and_sale(const Schedule& s, Years n, Money sale_price, const Rates& rates) {
  const double k = rates.after_tax_marr;
  double pv = 0;
  for (Years j = 1; j <= n; ++j) {
    const YearEnd end = j == n ? YearEnd::sold : YearEnd::kept;
    const YearFlow year = operating_year(j, 0, s, j, rates, end);
    pv -= year.income_tax * std::pow(1 + k, -j);  // the shield: minus the (negative) tax
  }
  return pv - sale_at(sale_price, s, n, rates).tax * std::pow(1 + k, -n);
}

// The closed form's salvage term, S d t / (d + k) (1 + k)^-n.
double lost_by_salvage(Money s, Rate d, Rate t, Rate k, Years n) {
  return s * d * t / (d + k) * std::pow(1 + k, -n);
}

void expect_relative(double actual, double expected, const char* what) {
  EXPECT_NEAR(actual, expected, kRelative * std::abs(expected)) << what;
}

TEST(PoolSale, HalfYearRuleMatchesThePublishedClosedForm) {
  // Over 40 years, so most of the years lie past the schedule's listed ones.
  const Money c = 250000;
  for (Rate d : {0.06, 0.18, 0.20, 0.30, 0.50}) {
    for (Rate k : {0.03, 0.075, 0.12}) {
      for (Money s : {0.0, 20000.0, 110000.0}) {
        for (Years n : {1, 5, 40}) {
          const Rate t = 0.265;
          const Rates rates = Rates::make(0.2, t, k);
          const Schedule schedule(Pool(PoolSpec{d, true, std::nullopt}), c);
          const double closed =
              c * d * t / (d + k) * (1 + 0.5 * k) / (1 + k) - lost_by_salvage(s, d, t, k, n);
          SCOPED_TRACE(::testing::Message()
                       << "d k S n: " << d << " " << k << " " << s << " " << n);
          expect_relative(shields_and_sale(schedule, n, s, rates), closed, "half-year rule");
        }
      }
    }
  }
}

TEST(PoolSale, PublishedWorkedExamples) {
  // krishnan.ca's example: C 500,000, d 20%, T 35%, k 12%, salvage 100,000 at n = 5:
  // 91,103.16 (printed to the cent).
  const Schedule example(Pool(PoolSpec{0.20, true, std::nullopt}), 500000);
  EXPECT_NEAR(shields_and_sale(example, 5, 100000, Rates::make(0.2, 0.35, 0.12)), 91103.16, 0.005);
  // A worked answer using the same formula (https://www.scribd.com/document/549789318/
  // First-question): C 560,000, d 30%, T 38%, k 12%, salvage 30,000 at n = 4: 138,682.21.
  const Schedule answer(Pool(PoolSpec{0.30, true, std::nullopt}), 560000);
  EXPECT_NEAR(shields_and_sale(answer, 4, 30000, Rates::make(0.2, 0.38, 0.12)), 138682.21, 0.005);
}

TEST(PoolSale, WithoutTheHalfYearRule) {
  // Derived: year j deducts d (1 - d)^(j-1) C, so the whole shield is
  // t d C sum (1 - d)^(j-1) (1 + k)^-j = t d C / (1 + k) / (1 - (1 - d) / (1 + k)),
  // which is C d t / (d + k); the salvage term is the same as with the rule.
  const Money c = 80000;
  for (Rate d : {0.06, 0.18, 0.45}) {
    for (Rate k : {0.04, 0.10}) {
      const Rate t = 0.19;
      const Rates rates = Rates::make(0.2, t, k);
      const Schedule schedule(Pool(PoolSpec{d, false, std::nullopt}), c);
      for (Years n : {1, 7, 40}) {
        const double closed = c * d * t / (d + k) - lost_by_salvage(9000, d, t, k, n);
        expect_relative(shields_and_sale(schedule, n, 9000, rates), closed, "no half-year rule");
      }
    }
  }
}

TEST(PoolSale, WithAFirstYearAllowance) {
  // Derived: year 1 deducts f C (shield t f C / (1 + k)); the rest (1 - f) C is a pool from
  // year 2, worth (1 - f) C d t / (d + k) at year 1 by the case above, so
  // PV = t f C / (1 + k) + t (1 - f) C d / (d + k) / (1 + k), less the same salvage term.
  const Money c = 80000;
  for (Rate f : {0.40, 0.45, 1.0}) {
    for (Rate d : {0.06, 0.18, 0.30}) {
      const Rate t = 0.25, k = 0.075;
      const Rates rates = Rates::make(0.1, t, k);
      const Schedule schedule(Pool(PoolSpec{d, false, f}), c);
      for (Years n : {1, 6, 40}) {
        const double closed = t * f * c / (1 + k) + t * (1 - f) * c * d / (d + k) / (1 + k) -
                              lost_by_salvage(5000, d, t, k, n);
        expect_relative(shields_and_sale(schedule, n, 5000, rates), closed, "allowance");
      }
    }
  }
}

TEST(PoolSale, HeaderExampleAndTheCapitalGain) {
  const Rates rates = Rates::make(0.10, 0.25, 0.075, 0.15);
  // pool_disposal.h example: -0.25 x 0.30 x (5950 - 2000) / 0.375 = -790.
  EXPECT_NEAR(tax_on_pool_sale({2000, 5950, 10000, 0.30}, rates), -790, 1e-9);
  // Proceeds above the balance: the pool loses write-downs, 0.25 x 0.30 x 1050 / 0.375 = +210.
  EXPECT_NEAR(tax_on_pool_sale({7000, 5950, 10000, 0.30}, rates), 210, 1e-9);
  // Above the capital cost C only C comes off the pool; the 2,000 over C is a capital gain at
  // 15%: -0.25 x 0.30 x (5950 - 10000) / 0.375 + 0.15 x 2000 = 810 + 300 = 1110.
  EXPECT_NEAR(tax_on_pool_sale({12000, 5950, 10000, 0.30}, rates), 1110, 1e-9);
  // Without income tax only the capital gain is taxed.
  EXPECT_NEAR(tax_on_pool_sale({12000, 5950, 10000, 0.30}, Rates::make(0.1, 0, 0.1, 0.15)), 300,
              1e-9);
}

TEST(PoolSale, SaleAtAndSaleNowApplyThePoolsRule) {
  const Rates rates = Rates::make(0.10, 0.25, 0.075);
  const Schedule s(Pool(PoolSpec{0.30, true, std::nullopt}), 10000);
  // Selling at the end of year 2: the year's full deduction 2,550, balance 5,950 (pool.h).
  const SaleFlow at = sale_at(2000, s, 2, rates);
  EXPECT_NEAR(at.depreciation_in_year, 2550, 1e-9);
  EXPECT_NEAR(at.book_value, 5950, 1e-9);
  EXPECT_NEAR(at.tax, -790, 1e-9);
  EXPECT_NEAR(at.net_proceeds, 2790, 1e-9);
  // A defender two years old sold now: the same balance, no deduction in the sale.
  const SaleFlow now = sale_now(2000, s, 2, rates);
  EXPECT_EQ(now.depreciation_in_year, 0);
  EXPECT_NEAR(now.book_value, 5950, 1e-9);
  EXPECT_NEAR(now.tax, -790, 1e-9);
  // A new unit sold at its cost: the whole addition comes off again, no tax.
  EXPECT_NEAR(sale_now(10000, s, 0, rates).tax, 0, 1e-9);
  // Far past the listed years the sale's balance is the tail's: 0.85 x 0.7^59 of 10,000.
  const double balance = 10000 * 0.85 * std::pow(0.7, 59);
  EXPECT_NEAR(sale_at(0, s, 60, rates).tax, -0.25 * 0.30 * balance / 0.375, 1e-12);
}

}  // namespace
}  // namespace tenure::tax
