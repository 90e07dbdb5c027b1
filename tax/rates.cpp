// Rates with their defaults and checks (see rates.h).
#include "tax/rates.h"

#include "core/checks.h"
#include "core/errors.h"

namespace tenure::tax {
namespace {

// A MARR is positive and at most 100% a year. Beyond that no multi-year comparison means much,
// and with series of up to 1000 years (formats/json_path.h kMaxYears) (1+i)^n would overflow a
// double (2^1000 is about 1e301), turning EUACs and marginal costs into NaN.
constexpr Rate kMaxMarr = 1.0;

void require_marr(Rate rate, const char* where) {
  require_positive(rate, where);
  if (rate > kMaxMarr) throw InputError(where, "must be <= 1 (100% a year)");
}

}  // namespace

Rates Rates::make(Rate marr, Rate income_tax_rate, std::optional<Rate> after_tax_marr,
                  std::optional<Rate> capital_gains_tax_rate) {
  require_marr(marr, "$.marr");
  require_tax_rate(income_tax_rate, "$.income_tax_rate");
  Rates rates{marr, income_tax_rate, marr * (1 - income_tax_rate), income_tax_rate};
  if (after_tax_marr) {
    require_marr(*after_tax_marr, "$.after_tax_marr");
    rates.after_tax_marr = *after_tax_marr;
  }
  if (capital_gains_tax_rate) {
    require_tax_rate(*capital_gains_tax_rate, "$.capital_gains_tax_rate");
    rates.capital_gains_tax_rate = *capital_gains_tax_rate;
  }
  return rates;
}

}  // namespace tenure::tax
