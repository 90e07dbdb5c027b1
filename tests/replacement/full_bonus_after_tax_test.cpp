// A 100% special depreciation allowance (bonus 1.0, SPEC 13): the after-tax challenger EUAC
// equals its closed form with the whole price deducted in year 1 and all of the sale proceeds
// recaptured at the income rate. Invented pump figures.
//
// Closed form. Price P, income rate t, after-tax MARR i, operating costs c_k, market value S_n
// at a sale at the end of year n, S_n <= P:
//   - year 1 deducts all of P (bonus x (P - 0), and MACRS has nothing left), saving t P at the
//     end of year 1 whether the unit is kept or sold then (us_allowances.h rule 4);
//   - each year's operating cost is deductible: (1 - t) c_k;
//   - at the sale the book value is 0, so the gain S_n is all recapture (S_n <= P), taxed at t:
//     the sale nets (1 - t) S_n (tax/disposal.h).
//   PW(n)   = P - t P / (1 + i) + sum_{k=1..n} (1 - t) c_k / (1 + i)^k - (1 - t) S_n / (1 + i)^n
//   EUAC(n) = PW(n) x i (1 + i)^n / ((1 + i)^n - 1)     (capital recovery factor)
#include <gtest/gtest.h>

#include <cmath>
#include <vector>

#include "replacement/keeping_costs.h"

namespace tenure::replacement {
namespace {

constexpr double kRelativeTolerance = 1e-12;  // sums of a few terms: rounding noise only

double closed_form_euac(double price, double t, double i, const std::vector<double>& costs,
                        const std::vector<double>& values, int n) {
  double pw = price - t * price / (1 + i);
  for (int k = 1; k <= n; ++k) pw += (1 - t) * costs[k - 1] / std::pow(1 + i, k);
  pw -= (1 - t) * values[n - 1] / std::pow(1 + i, n);
  const double growth = std::pow(1 + i, n);
  return pw * i * growth / (growth - 1);
}

TEST(FullBonusAfterTax, ChallengerEuacIsTheClosedForm) {
  const double price = 60000;
  const std::vector<double> costs = {5000, 6500, 8000, 9500, 11000};
  const std::vector<double> values = {42000, 33000, 26000, 20000, 15000};
  const double t = 0.25;
  const double i = 0.08;
  const auto rates = tax::Rates::make(0.11, t, i);
  const depreciation::Spec specs[] = {
      depreciation::MacrsSpec{
          7, depreciation::MacrsConvention::half_year, std::nullopt, {std::nullopt, 1.0}},
      depreciation::MacrsSpec{
          5, depreciation::MacrsConvention::mid_quarter, 4, {std::nullopt, 1.0}},
      depreciation::MacrsAdsSpec{10, {std::nullopt, 1.0}},
      // 179 on part, the allowance on all the rest: again the whole price in year 1.
      depreciation::MacrsSpec{
          7, depreciation::MacrsConvention::half_year, std::nullopt, {25000.0, 1.0}},
  };
  for (const depreciation::Spec& spec : specs) {
    const Ownership unit{price, 0, price, costs, values, depreciation::make_method(spec)};
    const KeepingCosts kept = after_tax_keeping_costs(unit, rates);
    for (int n = 1; n <= 5; ++n) {
      const double expected = closed_form_euac(price, t, i, costs, values, n);
      EXPECT_NEAR(kept.euac(n), expected, kRelativeTolerance * expected) << "n = " << n;
    }
  }
}

// Without the allowance the same unit costs more after tax kept 2 years or more (MACRS defers
// the deductions), so the closed form above is not met by chance. Sold after 1 year it costs the
// same: either way year 1 deducts P - S_1 in all (the allowance less the recapture, or MACRS's
// half year plus the loss on the sale below book value).
TEST(FullBonusAfterTax, PlainMacrsCostsMore) {
  const std::vector<double> costs = {5000, 6500, 8000};
  const std::vector<double> values = {42000, 33000, 26000};
  const auto rates = tax::Rates::make(0.11, 0.25, 0.08);
  const Ownership plain{60000, 0,      60000,
                        costs, values, depreciation::make_method(depreciation::MacrsSpec{7})};
  const KeepingCosts kept = after_tax_keeping_costs(plain, rates);
  const double one_year = closed_form_euac(60000, 0.25, 0.08, costs, values, 1);
  EXPECT_NEAR(kept.euac(1), one_year, kRelativeTolerance * one_year);
  for (int n = 2; n <= 3; ++n) {
    EXPECT_GT(kept.euac(n), closed_form_euac(60000, 0.25, 0.08, costs, values, n) + 1) << n;
  }
}

}  // namespace
}  // namespace tenure::replacement
