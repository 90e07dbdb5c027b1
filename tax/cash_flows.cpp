// After-tax cash flows of one year of keeping and of a sale (see cash_flows.h).
#include "tax/cash_flows.h"

#include <optional>

#include "tax/pool_disposal.h"

namespace tenure::tax {

YearFlow operating_year(Years year, Money operating_cost, const depreciation::Schedule& schedule,
                        Years schedule_year, const Rates& rates, YearEnd end) {
  const bool sold = end == YearEnd::sold;
  YearFlow flow{};
  flow.year = year;
  flow.operating_cost = operating_cost;
  flow.depreciation =
      sold ? schedule.deduction_if_sold(schedule_year) : schedule.deduction(schedule_year);
  flow.book_value =
      sold ? schedule.book_value_if_sold(schedule_year) : schedule.book_value(schedule_year);
  flow.taxable_income = -(operating_cost + flow.depreciation);
  flow.income_tax = rates.income_tax_rate * flow.taxable_income;
  flow.after_tax_cash_flow = -operating_cost - flow.income_tax;
  return flow;
}

namespace {

// A sale at `book_value` with the deduction `in_year` taken in its year, taxed by the schedule's
// regime: the pool's sale rule for a pool, else recapture, capital gain or loss.
SaleFlow sale_of(Money market_value, const depreciation::Schedule& schedule, Money in_year,
                 Money book_value, const Rates& rates) {
  SaleFlow sale{};
  sale.market_value = market_value;
  sale.depreciation_in_year = in_year;
  sale.book_value = book_value;
  sale.gain = market_value - book_value;
  if (const std::optional<Rate> d = schedule.pool_rate()) {
    sale.tax = tax_on_pool_sale({market_value, book_value, schedule.basis(), *d}, rates);
  } else {
    sale.tax = tax_on_disposal({market_value, book_value, schedule.basis()}, rates);
  }
  sale.net_proceeds = market_value - sale.tax;
  return sale;
}

}  // namespace

SaleFlow sale_at(Money market_value, const depreciation::Schedule& schedule, Years schedule_year,
                 const Rates& rates) {
  return sale_of(market_value, schedule, schedule.deduction_if_sold(schedule_year),
                 schedule.book_value_if_sold(schedule_year), rates);
}

SaleFlow sale_now(Money market_value, const depreciation::Schedule& schedule, Years age,
                  const Rates& rates) {
  return sale_of(market_value, schedule, 0, schedule.book_value(age), rates);
}

}  // namespace tenure::tax
