// Sum-of-years'-digits depreciation (see sum_of_years_digits.h).
#include "depreciation/sum_of_years_digits.h"

#include "depreciation/book_checks.h"

namespace tenure::depreciation {

SumOfYearsDigits::SumOfYearsDigits(SumOfYearsDigitsSpec spec) : spec_(spec) {
  require_life_years(spec_.life_years);
  require_salvage(spec_.salvage);
}

std::vector<Money> SumOfYearsDigits::deductions(Money basis) const {
  require_salvage_within_basis(spec_.salvage, basis);
  const Years life = spec_.life_years;
  // In double: L(L+1)/2 overflows an int for lives past 65535 years.
  const double digit_sum = 0.5 * life * (life + 1.0);
  std::vector<Money> result;
  result.reserve(static_cast<std::size_t>(life));
  for (Years k = 1; k <= life; ++k) {
    result.push_back((basis - spec_.salvage) * (life - k + 1) / digit_sum);
  }
  return result;
}

}  // namespace tenure::depreciation
