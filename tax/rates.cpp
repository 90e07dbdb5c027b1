// Rates with their defaults and checks (see rates.h).
#include "tax/rates.h"

#include "core/checks.h"

namespace tenure::tax {

Rates Rates::make(Rate marr, Rate income_tax_rate, std::optional<Rate> after_tax_marr,
                  std::optional<Rate> capital_gains_tax_rate) {
  require_positive(marr, "$.marr");
  require_tax_rate(income_tax_rate, "$.income_tax_rate");
  Rates rates{marr, income_tax_rate, marr * (1 - income_tax_rate), income_tax_rate};
  if (after_tax_marr) {
    require_positive(*after_tax_marr, "$.after_tax_marr");
    rates.after_tax_marr = *after_tax_marr;
  }
  if (capital_gains_tax_rate) {
    require_tax_rate(*capital_gains_tax_rate, "$.capital_gains_tax_rate");
    rates.capital_gains_tax_rate = *capital_gains_tax_rate;
  }
  return rates;
}

}  // namespace tenure::tax
