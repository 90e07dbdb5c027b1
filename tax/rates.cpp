// Rates with their defaults and checks (see rates.h).
#include "tax/rates.h"

#include <fmt/format.h>

#include "core/checks.h"
#include "core/errors.h"

namespace tenure::tax {
namespace {

// A MARR is positive and at most 100% a year. Beyond that no multi-year comparison means much,
// and with series of up to 1000 years (formats/json_path.h kMaxYears) (1+i)^n would overflow a
// double (2^1000 is about 1e301), turning EUACs and marginal costs into NaN.
constexpr Rate kMaxMarr = 1.0;
// The smallest: the challenger repeated forever is worth C*/i now, so at i -> 0 the timing's
// present worths grow without bound and differences between them vanish under the 1e-9 tie rule
// (a MARR of 1e-8 gave wrong verdicts, 5e-324 none at all).
constexpr Rate kMinMarr = 0.0001;

void require_marr(Rate rate, const char* where) {
  require_positive(rate, where);
  if (rate < kMinMarr) throw InputError(where, "must be >= 0.0001 (0.01% a year)");
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
  } else if (rates.after_tax_marr < kMinMarr && income_tax_rate > 0) {
    throw InputError("$.after_tax_marr",
                     fmt::format("its default, marr x (1 - income_tax_rate) = {:g}, is below "
                                 "0.0001 (0.01% a year); give after_tax_marr",
                                 rates.after_tax_marr));
  }
  if (capital_gains_tax_rate) {
    require_tax_rate(*capital_gains_tax_rate, "$.capital_gains_tax_rate");
    rates.capital_gains_tax_rate = *capital_gains_tax_rate;
  }
  return rates;
}

}  // namespace tenure::tax
