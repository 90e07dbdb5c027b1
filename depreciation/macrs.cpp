// MACRS GDS half-year table, computed (see macrs.h). The arithmetic is in whole units of the
// table's last printed decimal, with exact integer rounding: in floating point, cells that sit on
// a half unit (15-year year 4 is 7.695%, year 5 is 6.925%) would round the wrong way.
#include "depreciation/macrs.h"

#include <algorithm>
#include <cstdint>

#include "core/errors.h"

namespace tenure::depreciation {
namespace {

using Units = std::int64_t;

struct TableLayout {
  Units whole;         // 100% in the table's printed units
  double per_percent;  // units in 1%
  Units rate_num;      // declining-balance multiple, as a fraction: 2/1 or 3/2
  Units rate_den;
};

TableLayout layout_for(Years recovery_years) {
  switch (recovery_years) {
    case 3: case 5: case 7: case 10: return {10000, 100.0, 2, 1};
    case 15: return {10000, 100.0, 3, 2};
    case 20: return {100000, 1000.0, 3, 2};
    default: throw InputError("recovery_years", "must be one of 3, 5, 7, 10, 15, 20");
  }
}

// num / den rounded half up, for num >= 0 and den > 0.
Units round_half_up(Units num, Units den) { return (2 * num + den) / (2 * den); }

// Rule (2): eighths of a year depreciated in year 1: 4 (half-year), 9 - 2q (mid-quarter).
Units first_year_eighths(std::optional<int> quarter) {
  if (!quarter) return 4;
  if (*quarter < 1 || *quarter > 4) throw InputError("quarter", "must be 1, 2, 3 or 4");
  return 9 - 2 * *quarter;
}

}  // namespace

std::vector<double> macrs_percentages(Years recovery_years, std::optional<int> quarter) {
  const TableLayout table = layout_for(recovery_years);
  const Units first = first_year_eighths(quarter);
  const Units r = recovery_years;
  std::vector<double> result;
  result.reserve(static_cast<std::size_t>(r + 1));
  Units remaining = table.whole;
  auto take = [&](Units units) {
    result.push_back(static_cast<double>(units) / table.per_percent);
    remaining -= units;
  };
  // Rule (2): `first` eighths of a year of the declining-balance rate in year 1.
  take(round_half_up(remaining * table.rate_num * first, 8 * table.rate_den * r));
  for (Units k = 2; k <= r; ++k) {
    const Units declining = round_half_up(remaining * table.rate_num, table.rate_den * r);
    // Straight line over the remaining life, R years less the first year's part and k - 2
    // whole years, kept in eighths (R - k + 1.5 years under the half-year convention).
    const Units straight = round_half_up(8 * remaining, 8 * (r - k + 2) - first);
    // Rounding is monotone, so rounding each and taking the larger is rounding the larger.
    take(std::max(declining, straight));
  }
  take(remaining);
  return result;
}

namespace {

std::optional<int> checked_quarter(const MacrsSpec& spec) {
  if (spec.convention == MacrsConvention::half_year) {
    if (spec.quarter) throw InputError("quarter", "applies only to the mid_quarter convention");
    return std::nullopt;
  }
  if (!spec.quarter) throw InputError("quarter", "is required with the mid_quarter convention");
  return spec.quarter;
}

}  // namespace

Macrs::Macrs(MacrsSpec spec)
    : recovery_years_(spec.recovery_years),
      quarter_(checked_quarter(spec)),
      percentages_(macrs_percentages(spec.recovery_years, quarter_)) {}

std::vector<Money> Macrs::deductions(Money basis) const {
  std::vector<Money> result;
  result.reserve(percentages_.size());
  for (double percentage : percentages_) result.push_back(basis * percentage / 100.0);
  return result;
}

double Macrs::disposal_year_fraction(Years year) const {
  if (year >= recovery_years_ + 1) return 1.0;
  return quarter_ ? (*quarter_ - 0.5) / 4.0 : 0.5;
}

}  // namespace tenure::depreciation
