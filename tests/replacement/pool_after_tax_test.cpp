// After-tax keeping costs of assets in a pool (SPEC 13) against the closed forms assembled by
// hand. The present worth of the capital cost allowance tax shield of an addition C sold for S
// at year n, C d t / (d + k) x (1 + 0.5 k) / (1 + k) - S d t / (d + k) x (1 + k)^-n, is the one
// stated by https://www.krishnan.ca/calculators/cca/tax-shield; for an asset already in the
// pool with balance UCC it is UCC d t / (d + k) (formula (b) of
// https://www.scribd.com/doc/228819053/Tax-Shield-Pv-for-Amortizable-Assets). (A/P) is the
// textbook capital recovery factor k (1 + k)^n / ((1 + k)^n - 1). The units are invented.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <memory>
#include <optional>
#include <vector>

#include "replacement/break_even.h"
#include "replacement/case_analysis.h"
#include "replacement/keeping_costs.h"
#include "replacement/life_curve.h"

namespace tenure::replacement {
namespace {

constexpr double kRelative = 1e-9;
constexpr double kRate = 0.30;  // a 30% class under the half-year rule (Canada's class 10)
constexpr double kTax = 0.265;
constexpr double kAfterTaxMarr = 0.07;

std::shared_ptr<const depreciation::Method> class_10() {
  return depreciation::make_method(depreciation::PoolSpec{kRate, true, std::nullopt});
}

double capital_recovery(double k, Years n) {
  return k * std::pow(1 + k, n) / (std::pow(1 + k, n) - 1);
}

// After-tax present worth of operating costs c_1..c_n: (1 - t) sum c_j (1 + k)^-j.
double after_tax_costs(const std::vector<Money>& costs, Years n) {
  double pw = 0;
  for (Years j = 1; j <= n; ++j) {
    pw += (1 - kTax) * costs[static_cast<std::size_t>(j - 1)] * std::pow(1 + kAfterTaxMarr, -j);
  }
  return pw;
}

TEST(PoolAfterTax, ChallengerEuacIsTheClosedFormByHand) {
  const Money c = 90000;
  const std::vector<Money> costs = {5000,  6200,  7600,  9200,  11000, 13000,
                                    15200, 17600, 20200, 23000, 26000, 29200};
  const std::vector<Money> values = {70000, 56000, 45000, 36500, 29500, 24000,
                                     19500, 16000, 13000, 10500, 8500,  7000};
  const Ownership truck{c, 0, c, costs, values, class_10()};
  const auto rates = tax::Rates::make(0.10, kTax, kAfterTaxMarr);
  const KeepingCosts keeping = after_tax_keeping_costs(truck, rates);
  const double d = kRate, t = kTax, k = kAfterTaxMarr;
  std::vector<Money> by_hand;
  for (Years n = 1; n <= 12; ++n) {
    // PWcost(n) = C - PV(shield) - S_n (1 + k)^-n + after-tax costs.
    const Money s = values[static_cast<std::size_t>(n - 1)];
    const double v = std::pow(1 + k, -n);
    const double shield = c * d * t / (d + k) * (1 + 0.5 * k) / (1 + k) - s * d * t / (d + k) * v;
    const double pw = c - shield - s * v + after_tax_costs(costs, n);
    EXPECT_NEAR(keeping.pw_cost(n), pw, kRelative * pw) << n;
    by_hand.push_back(pw * capital_recovery(k, n));
    EXPECT_NEAR(keeping.euac(n), by_hand.back(), kRelative * by_hand.back()) << n;
  }
  // The economic life is the least of the EUACs by hand (all distinct here).
  const LifeCurve curve = life_curve(keeping);
  const auto least = std::min_element(by_hand.begin(), by_hand.end());
  EXPECT_EQ(curve.best_years, static_cast<Years>(least - by_hand.begin()) + 1);
  EXPECT_NEAR(curve.best_euac, *least, kRelative * *least);
}

TEST(PoolAfterTax, DefenderInThePoolWeighsOnlyItsProceeds) {
  // A unit 6 years into the pool, worth S0 now. Selling now gives up S0 and keeps the shield of
  // (UCC_6 - S0); keeping j years keeps the shield of UCC_6 less that of S_j at year j. So
  //   PWcost(j) = S0 - (UCC_6 - S0) d t / (d + k) + after-tax costs - S_j v^j
  //             - [UCC_6 d t / (d + k) - S_j d t / (d + k) v^j]
  //           = (1 - d t / (d + k)) (S0 - S_j v^j) + after-tax costs:
  // the balance cancels, as it must when the pool goes on either way.
  const std::vector<Money> costs = {14000, 16500, 19500, 23000};
  const std::vector<Money> values = {15000, 11500, 9000, 7000};
  const Money s0 = 19000;
  const Ownership old_truck{70000, 6, s0, costs, values, class_10()};
  const auto rates = tax::Rates::make(0.10, kTax, kAfterTaxMarr);
  const KeepingCosts keeping = after_tax_keeping_costs(old_truck, rates);
  const double d = kRate, t = kTax, k = kAfterTaxMarr;
  const double kept_share = 1 - d * t / (d + k);
  EXPECT_EQ(keeping.pw_cost(0), 0);
  for (Years j = 1; j <= 4; ++j) {
    const double v = std::pow(1 + k, -j);
    const Money s = values[static_cast<std::size_t>(j - 1)];
    const double pw = kept_share * (s0 - s * v) + after_tax_costs(costs, j);
    EXPECT_NEAR(keeping.pw_cost(j), pw, kRelative * pw) << j;
  }
  // Selling now is the pool's rule at the balance after 6 years, 0.85 x 0.7^5 of 70,000.
  const AfterTaxTable table = after_tax_table(old_truck, rates);
  const double ucc = 70000 * 0.85 * std::pow(0.7, 5);
  EXPECT_NEAR(table.start.book_value, ucc, 1e-9);
  EXPECT_NEAR(table.start.tax, -t * d * (ucc - s0) / (k + d), 1e-9);
}

TEST(PoolAfterTax, PriceLinesStayExact) {
  // The break-even price (break_even.h) takes each EUAC as affine in the price P, with market
  // values the same fractions of P. The pool's sale rule is linear in P (min(S, C) with S and C
  // both proportional to P), so the lines made at one price give the EUACs at others.
  const auto truck = [](Money price) {
    const double s = price / 90000;
    return Ownership{price,
                     0,
                     price,
                     {5000, 6200, 7600, 9200, 11000},
                     {70000 * s, 56000 * s, 45000 * s, 36500 * s, 29500 * s},
                     class_10()};
  };
  const auto rates = tax::Rates::make(0.10, kTax, kAfterTaxMarr);
  const Ownership c = truck(90000);
  const auto lines = price_lines(c, analyse_asset(c, rates), rates, Basis::after_tax);
  for (Money price : {1000.0, 45000.0, 250000.0}) {
    const auto euac = analyse_asset(truck(price), rates).on(Basis::after_tax).curve.euac;
    ASSERT_EQ(euac.size(), lines.size());
    for (std::size_t n = 0; n < euac.size(); ++n) {
      EXPECT_NEAR(lines[n].slope * price + lines[n].intercept, euac[n], kRelative * euac[n]);
    }
  }
}

}  // namespace
}  // namespace tenure::replacement
