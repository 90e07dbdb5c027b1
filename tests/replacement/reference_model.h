// A deliberately plain second implementation of SPEC section 6 for the tests: it writes out the
// whole cash-flow vector of each option year by year and discounts it, with none of the engine's
// running sums, so the two can be compared on random cases.
#pragma once

#include <cmath>
#include <vector>

#include "depreciation/schedule.h"
#include "replacement/ownership.h"
#include "tax/rates.h"

namespace tenure::reference {

// Net present value of flows[0..] (flows[t] at the end of year t) at rate i.
inline double npv(double i, const std::vector<double>& flows) {
  double sum = 0;
  for (std::size_t t = 0; t < flows.size(); ++t) sum += flows[t] / std::pow(1 + i, double(t));
  return sum;
}

inline double capital_recovery(double i, int n) {
  return i * std::pow(1 + i, n) / (std::pow(1 + i, n) - 1);
}

inline double disposal_tax(double mv, double book, double basis, const tax::Rates& r) {
  if (mv > basis) return r.income_tax_rate * (basis - book) + r.capital_gains_tax_rate * (mv - basis);
  return r.income_tax_rate * (mv - book);
}

// Cash flows (receipts positive) of owning `a` for exactly n more years, sold at the end.
inline std::vector<double> owner_flows(const replacement::Ownership& a, int n, bool after_tax,
                                       const tax::Rates& r) {
  const depreciation::Schedule s(*a.depreciation, a.first_cost);
  std::vector<double> flows(std::size_t(n) + 1, 0.0);
  const double t = after_tax ? r.income_tax_rate : 0.0;
  // Time 0: the money tied up (purchase, or the after-tax sale given up).
  double book_now = a.first_cost;
  for (int y = 1; y <= a.age_years; ++y) book_now -= s.deduction(y);
  flows[0] = -(a.value_now - (after_tax ? disposal_tax(a.value_now, book_now, a.first_cost, r) : 0));
  double book = book_now;
  for (int k = 1; k <= n; ++k) {
    const int year = a.age_years + k;
    double dep = s.deduction(year);
    if (k == n) dep *= a.depreciation->disposal_year_fraction(year);
    book -= dep;
    const double cost = a.operating_costs[std::size_t(k - 1)];
    flows[std::size_t(k)] = -cost + t * (cost + dep);
  }
  const double mv = a.market_values[std::size_t(n - 1)];
  flows[std::size_t(n)] += mv - (after_tax ? disposal_tax(mv, book, a.first_cost, r) : 0);
  return flows;
}

inline double pw_cost(const replacement::Ownership& a, int n, bool after_tax, const tax::Rates& r) {
  if (n == 0) return 0;
  const double i = after_tax ? r.after_tax_marr : r.marr;
  return -npv(i, owner_flows(a, n, after_tax, r));
}

inline double euac(const replacement::Ownership& a, int n, bool after_tax, const tax::Rates& r) {
  const double i = after_tax ? r.after_tax_marr : r.marr;
  return pw_cost(a, n, after_tax, r) * capital_recovery(i, n);
}

}  // namespace tenure::reference
