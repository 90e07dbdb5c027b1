// The pooled regime (see pool.h).
#include "depreciation/pool.h"

#include "core/errors.h"

namespace tenure::depreciation {
namespace {

constexpr double kListedShare = 0.01;  // rule (5): list years until the UCC is under 1% of C
constexpr Years kMaxListedYears = 100;

// d and f are fractions of a balance: 0 < x <= 1 (NaN fails too).
void require_fraction(double value, const char* where) {
  if (!(value > 0 && value <= 1)) throw InputError(where, "must be > 0 and <= 1");
}

}  // namespace

Pool::Pool(PoolSpec spec) : spec_(spec) {
  require_fraction(spec_.rate, "rate");
  if (spec_.first_year_allowance) {
    require_fraction(*spec_.first_year_allowance, "first_year_allowance");
    if (spec_.half_year_rule) {  // rule (4)
      throw InputError("half_year_rule",
                       "must be false with a first_year_allowance: the allowance is the year-1 "
                       "deduction and the rest is written down from year 2");
    }
  }
}

std::vector<Money> Pool::deductions(Money basis) const {
  // Worked as shares of the addition, so every basis lists the same years.
  const double d = spec_.rate;
  double first = spec_.half_year_rule ? d / 2 : d;                      // rule (1)
  if (spec_.first_year_allowance) first = *spec_.first_year_allowance;  // rule (2)
  std::vector<Money> result{first * basis};
  double share = 1 - first;  // of the addition still in the pool
  while (share >= kListedShare && static_cast<Years>(result.size()) < kMaxListedYears) {
    result.push_back(d * share * basis);  // rule (3)
    share -= d * share;
  }
  return result;
}

}  // namespace tenure::depreciation
