// MACRS, General Depreciation System, with the half-year convention (IRS Publication 946,
// Table A-1) or the mid-quarter convention (Tables, quarter q = 1..4 placed in
// service): property of a 3, 5, 7, 10, 15 or 20-year recovery period R is depreciated over
// R + 1 table years at the table's percentages of the basis.
//
//   Macrs macrs(MacrsSpec{5});
//   macrs.deductions(10000);           // {2000, 3200, 1920, 1152, 1152, 576}
//   macrs.disposal_year_fraction(3);   // 0.5: sold in year 3, half of year 3's deduction
//   macrs_percentages(3);              // {33.33, 44.45, 14.81, 7.41}
//   macrs_percentages(5, 4);           // {5.00, 38.00, 22.80, 13.68, 10.94, 9.58} (Table A-5)
//   Macrs(MacrsSpec{5, MacrsConvention::mid_quarter, 4}).disposal_year_fraction(3);  // 0.875
//
// Rules (SPEC 6):
//   (1) 200% declining balance for 3, 5, 7 and 10-year property, 150% for 15 and 20-year,
//       switching to straight line over the remaining life when that is larger.
//   (2) Half a year in year 1 and half a year in year R + 1; under the mid-quarter convention
//       year 1 takes the rest of the year from the middle of quarter q, (4 - q + 0.5) / 4 of
//       a year (7/8, 5/8, 3/8, 1/8), and year R + 1 what is left of the recovery period.
//   (3) The table is computed, not typed in: each year's rate is rounded half up to the table's
//       printed unit (0.01% for 3..15-year, 0.001% for 20-year) and the rounded remainder is
//       carried forward; the last year takes what remains. This equals the printed table.
//   (4) The year of disposal takes half of its deduction, when it falls before year R + 1;
//       under the mid-quarter convention (q - 0.5) / 4 of it (SPEC 13: a sale at an
//       anniversary of the placing falls in quarter q, and its middle ends the year's use).
#pragma once

#include <optional>
#include <vector>

#include "depreciation/method.h"

namespace tenure::depreciation {

class Macrs : public Method {
 public:
  // Throws InputError("recovery_years", "must be one of 3, 5, 7, 10, 15, 20"), or naming
  // "quarter": missing or not 1..4 under mid_quarter, or given under half_year.
  explicit Macrs(MacrsSpec spec);

  std::string_view name() const override { return "macrs"; }
  // basis * percentage(k) / 100 for table years k = 1..R+1.
  std::vector<Money> deductions(Money basis) const override;
  // 0.5 (half-year) or (q - 0.5) / 4 (mid-quarter) before year R + 1 (rule 4), 1.0 from
  // year R + 1 on.
  double disposal_year_fraction(Years year) const override;
  // MACRS holds no amount: the same method.
  std::shared_ptr<const Method> scaled(double) const override {
    return std::make_shared<Macrs>(*this);
  }

 private:
  Years recovery_years_;
  std::optional<int> quarter_;  // set under the mid-quarter convention
  std::vector<double> percentages_;
};

// The table's percentages for years 1..R+1, e.g. 20.00, 32.00, ... for R = 5; they sum to 100.
// Without a quarter the half-year table, with quarter q (1..4) the mid-quarter table of
// that quarter (A-2 to A-5). Throws InputError("recovery_years", "must be one of 3, 5, 7, 10,
// 15, 20") or InputError("quarter", "must be 1, 2, 3 or 4").
std::vector<double> macrs_percentages(Years recovery_years,
                                      std::optional<int> quarter = std::nullopt);

}  // namespace tenure::depreciation
