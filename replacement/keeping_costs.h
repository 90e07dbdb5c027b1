// The present worth of keeping an asset exactly n more years, n = 0..N, on one basis (before or
// after tax): all its costs of those years, plus its value now (the purchase, or the sale given up),
// net of what selling it after n years brings. PWcost(0) = 0 for a defender: selling now costs
// nothing more. Everything in SPEC 6 (EUAC, marginal cost, timing, study period) reads from it.
//
//   KeepingCosts k = before_tax_keeping_costs(asset, 0.10);
//   k.euac(3);            // PWcost(3) * (A/P, 10%, 3)
//   k.marginal_cost(2);   // (PWcost(2) - PWcost(1)) * (F/P, 10%, 2)
#pragma once

#include <vector>

#include "core/types.h"
#include "replacement/ownership.h"
#include "tax/cash_flows.h"
#include "tax/rates.h"

namespace tenure::replacement {

enum class Basis { before_tax, after_tax };

class KeepingCosts {
 public:
  KeepingCosts(Rate rate, std::vector<Money> pw_cost);
  Rate rate() const { return rate_; }
  Years max_years() const { return static_cast<Years>(pw_cost_.size()) - 1; }
  Money pw_cost(Years n) const;        // n = 0..max_years()
  Money euac(Years n) const;           // pw_cost(n) * (A/P, i, n), n = 1..max_years()
  Money marginal_cost(Years k) const;  // (pw_cost(k) - pw_cost(k-1)) * (F/P, i, k), k >= 1

 private:
  Rate rate_;
  std::vector<Money> pw_cost_;
};

// Before tax at `marr`: value_now + sum c_k (P/F,k) - MV_n (P/F,n).
KeepingCosts before_tax_keeping_costs(const Ownership& asset, Rate marr);

// After tax at rates.after_tax_marr: the value now net of the tax a sale now would bear (zero for
// a new unit), the after-tax operating flows with the asset's own depreciation from year
// age+1 on, and the after-tax sale with the disposal-year rule in its last year.
KeepingCosts after_tax_keeping_costs(const Ownership& asset, const tax::Rates& rates);

// The audit table behind after_tax_keeping_costs: one row per year k = 1..N with the flows of a
// year kept (full deduction) and, beside it, what selling at the end of year k would mean.
struct AfterTaxYear {
  tax::YearFlow kept;       // the year's flows if the asset is kept past its end
  tax::YearFlow sold;       // the year's flows if it is sold at its end (disposal-year deduction)
  tax::SaleFlow sale;       // the sale at its end
};
struct AfterTaxTable {
  tax::SaleFlow start;      // selling now: for a defender, the opportunity cost; zero gain if new
  std::vector<AfterTaxYear> years;
};
AfterTaxTable after_tax_table(const Ownership& asset, const tax::Rates& rates);

// The same keeping costs from a table already built (saves building it twice).
KeepingCosts after_tax_keeping_costs(const AfterTaxTable& table, Rate after_tax_marr);

}  // namespace tenure::replacement
