// Declining-balance depreciation (see declining_balance.h).
#include "depreciation/declining_balance.h"

#include <algorithm>

#include "core/checks.h"
#include "depreciation/book_checks.h"

namespace tenure::depreciation {

DecliningBalance::DecliningBalance(DecliningBalanceSpec spec) : spec_(spec) {
  require_life_years(spec_.life_years);
  require_positive(spec_.rate, "rate");
  require_salvage(spec_.salvage);
}

std::vector<Money> DecliningBalance::deductions(Money basis) const {
  require_salvage_within_basis(spec_.salvage, basis);
  const Years life = spec_.life_years;
  const double yearly_rate = spec_.rate / life;
  std::vector<Money> result;
  result.reserve(static_cast<std::size_t>(life));
  Money book_value = basis;
  for (Years k = 1; k <= life; ++k) {
    const Money above_salvage = book_value - spec_.salvage;
    Money deduction = yearly_rate * book_value;
    if (spec_.switch_to_straight_line) {
      deduction = std::max(deduction, above_salvage / (life - k + 1));
    }
    // Never below salvage, and never negative once salvage is reached.
    deduction = std::clamp(deduction, 0.0, std::max(above_salvage, 0.0));
    result.push_back(deduction);
    book_value -= deduction;
  }
  return result;
}

}  // namespace tenure::depreciation
