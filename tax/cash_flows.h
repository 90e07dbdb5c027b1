// The year-by-year after-tax cash flows of owning an asset (SPEC 6): operating costs are
// deductible, depreciation shields income, a negative taxable income is a saving in the same
// year (the firm has other income), and all flows are at year end. Signs: flows are what the
// owner receives, so costs are negative; the table reports operating_cost as a positive cost.
//
//   YearFlow f = operating_year(1, 4000, schedule, 1, rates);
//   // taxable_income = -(4000 + deduction), income_tax = t * taxable_income,
//   // after_tax_cash_flow = -4000 - income_tax
#pragma once

#include "core/types.h"
#include "depreciation/schedule.h"
#include "tax/disposal.h"
#include "tax/rates.h"

namespace tenure::tax {

struct YearFlow {
  Years year;                 // year of keeping, 1-based
  Money operating_cost;       // positive: a cost
  Money depreciation;         // deduction taken this year
  Money book_value;           // at the end of the year
  Money taxable_income;       // -(operating_cost + depreciation)
  Money income_tax;           // income_tax_rate * taxable_income (negative is a saving)
  Money after_tax_cash_flow;  // -operating_cost - income_tax
};

// One year of keeping: `year` counts years of keeping, `schedule_year` the asset's own tax year
// (they differ for a defender already `a` years old). The deduction is the full year's, or the
// disposal-year deduction when the asset is sold at the end of this year.
enum class YearEnd { kept, sold };
YearFlow operating_year(Years year, Money operating_cost, const depreciation::Schedule& schedule,
                        Years schedule_year, const Rates& rates, YearEnd end = YearEnd::kept);

struct SaleFlow {
  Money market_value;
  Money depreciation_in_year;  // the disposal-year deduction of the last year kept
  Money book_value;            // book value at the sale
  Money gain;                  // market_value - book_value
  Money tax;                   // tax on the sale (negative is a saving)
  Money net_proceeds;          // market_value - tax
};

// Selling at the end of schedule year `schedule_year` for `market_value`, after that year's
// disposal-year deduction. The tax is tax_on_disposal (tax/disposal.h), or for a pool
// (schedule.pool_rate()) the pool's sale rule, tax_on_pool_sale (tax/pool_disposal.h).
SaleFlow sale_at(Money market_value, const depreciation::Schedule& schedule, Years schedule_year,
                 const Rates& rates);

// Selling now, `age` completed years into the schedule (a defender's opportunity cost, SPEC 6):
// the book value is the basis less the full deductions of years 1..age, no deduction is taken
// in the sale, and the tax follows the same rule as sale_at. A new unit (age 0) sold at its
// cost bears no tax.
SaleFlow sale_now(Money market_value, const depreciation::Schedule& schedule, Years age,
                  const Rates& rates);

}  // namespace tenure::tax
