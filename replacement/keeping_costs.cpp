// Present worth of keeping an asset n years, before and after tax (see keeping_costs.h).
#include "replacement/keeping_costs.h"

#include "core/errors.h"
#include "depreciation/schedule.h"
#include "interest/factors.h"

namespace tenure::replacement {

KeepingCosts::KeepingCosts(Rate rate, std::vector<Money> pw_cost)
    : rate_(rate), pw_cost_(std::move(pw_cost)) {
  if (pw_cost_.empty()) throw InputError("years", "a keeping-cost series needs year 0");
}

Money KeepingCosts::pw_cost(Years n) const {
  if (n < 0 || n > max_years()) throw InputError("years", "outside the cost series");
  return pw_cost_[static_cast<std::size_t>(n)];
}

Money KeepingCosts::euac(Years n) const {
  if (n < 1) throw InputError("years", "must be >= 1");
  return pw_cost(n) * interest::ap(rate_, n);
}

Money KeepingCosts::marginal_cost(Years k) const {
  if (k < 1) throw InputError("years", "must be >= 1");
  return (pw_cost(k) - pw_cost(k - 1)) * interest::fp(rate_, k);
}

KeepingCosts before_tax_keeping_costs(const Ownership& asset, Rate marr) {
  // PWcost(n) = value_now + sum_{k<=n} c_k (P/F,k) - MV_n (P/F,n); PWcost(0) = 0.
  std::vector<Money> pw{0.0};
  Money running = asset.value_now;
  for (Years n = 1; n <= asset.max_years(); ++n) {
    const double discount = interest::pf(marr, n);
    running += asset.operating_costs[static_cast<std::size_t>(n - 1)] * discount;
    pw.push_back(running - asset.market_values[static_cast<std::size_t>(n - 1)] * discount);
  }
  return KeepingCosts(marr, std::move(pw));
}

AfterTaxTable after_tax_table(const Ownership& asset, const tax::Rates& rates) {
  const depreciation::Schedule schedule(*asset.depreciation, asset.first_cost);
  const Years age = asset.age_years;
  AfterTaxTable table;
  // Selling now: the book value now is the basis less the full deductions of completed years
  // 1..age (SPEC 6, defender). For a new unit the sale is at cost, so no tax.
  table.start = tax::sale_now(asset.value_now, schedule, age, rates);
  for (Years k = 1; k <= asset.max_years(); ++k) {
    const auto index = static_cast<std::size_t>(k - 1);
    const Money cost = asset.operating_costs[index];
    AfterTaxYear year;
    year.kept = tax::operating_year(k, cost, schedule, age + k, rates, tax::YearEnd::kept);
    year.sold = tax::operating_year(k, cost, schedule, age + k, rates, tax::YearEnd::sold);
    year.sale = tax::sale_at(asset.market_values[index], schedule, age + k, rates);
    table.years.push_back(year);
  }
  return table;
}

KeepingCosts after_tax_keeping_costs(const Ownership& asset, const tax::Rates& rates) {
  return after_tax_keeping_costs(after_tax_table(asset, rates), rates.after_tax_marr);
}

KeepingCosts after_tax_keeping_costs(const AfterTaxTable& table, Rate after_tax_marr) {
  // PWcost(n) = start - sum_{k<n} ATCF_k (P/F,k) - (ATCF'_n + net sale_n) (P/F,n), where the
  // last year kept takes the disposal-year deduction (ATCF'_n) and is followed by the sale.
  const Rate i = after_tax_marr;
  std::vector<Money> pw{0.0};
  Money kept_so_far = table.start.net_proceeds;  // PW of costs of the years kept past their end
  for (Years n = 1; n <= static_cast<Years>(table.years.size()); ++n) {
    const AfterTaxYear& year = table.years[static_cast<std::size_t>(n - 1)];
    const double discount = interest::pf(i, n);
    pw.push_back(kept_so_far - (year.sold.after_tax_cash_flow + year.sale.net_proceeds) * discount);
    kept_so_far -= year.kept.after_tax_cash_flow * discount;
  }
  return KeepingCosts(i, std::move(pw));
}

}  // namespace tenure::replacement
