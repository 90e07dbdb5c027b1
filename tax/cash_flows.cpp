// After-tax cash flows of one year of keeping and of a sale (see cash_flows.h).
#include "tax/cash_flows.h"

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

SaleFlow sale_at(Money market_value, const depreciation::Schedule& schedule, Years schedule_year,
                 const Rates& rates) {
  SaleFlow sale{};
  sale.market_value = market_value;
  sale.depreciation_in_year = schedule.deduction_if_sold(schedule_year);
  sale.book_value = schedule.book_value_if_sold(schedule_year);
  sale.gain = market_value - sale.book_value;
  sale.tax = tax_on_disposal({market_value, sale.book_value, schedule.basis()}, rates);
  sale.net_proceeds = market_value - sale.tax;
  return sale;
}

}  // namespace tenure::tax
