// Straight-line depreciation (see straight_line.h).
#include "depreciation/straight_line.h"

#include "depreciation/book_checks.h"

namespace tenure::depreciation {

StraightLine::StraightLine(StraightLineSpec spec) : spec_(spec) {
  require_life_years(spec_.life_years);
  require_salvage(spec_.salvage);
}

std::vector<Money> StraightLine::deductions(Money basis) const {
  require_salvage_within_basis(spec_.salvage, basis);
  const Money each = (basis - spec_.salvage) / spec_.life_years;
  return std::vector<Money>(static_cast<std::size_t>(spec_.life_years), each);
}

}  // namespace tenure::depreciation
