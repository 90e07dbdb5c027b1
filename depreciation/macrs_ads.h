// MACRS Alternative Depreciation System ("method": "macrs_ads", SPEC 13): straight line over the
// ADS recovery period of L years with the half-year convention, so the deductions run over
// L + 1 years, half a year in the first and in the last (the shape of IRS Publication 946
// Table A-8).
//
//   MacrsAds ads(MacrsAdsSpec{5});
//   ads.deductions(10000);           // {1000, 2000, 2000, 2000, 2000, 1000}
//   ads.disposal_year_fraction(3);   // 0.5: sold in year 3, half of year 3's deduction
//
// Rules:
//   (1) Year 1 and year L + 1 deduct basis / (2 L), years 2..L deduct basis / L.
//   (2) The deductions are exact fractions of the basis, not the printed table's percentages
//       rounded to 0.01%: they differ from Table A-8 by at most half a unit of its last decimal.
//   (3) The year of disposal takes half of its deduction, when it falls before year L + 1.
//   (4) L is a whole number of years; ADS periods with a half year (9.5, 12.5) are not taken.
#pragma once

#include "depreciation/method.h"

namespace tenure::depreciation {

class MacrsAds : public Method {
 public:
  // Throws InputError("recovery_years", "must be a whole number of years >= 1").
  explicit MacrsAds(MacrsAdsSpec spec);

  std::string_view name() const override { return "macrs_ads"; }
  // Rule (1).
  std::vector<Money> deductions(Money basis) const override;
  // Rule (3): 0.5 before year L + 1, 1.0 from year L + 1 on.
  double disposal_year_fraction(Years year) const override;
  // ADS holds no amount: the same method.
  std::shared_ptr<const Method> scaled(double) const override {
    return std::make_shared<MacrsAds>(*this);
  }

 private:
  Years recovery_years_;
};

}  // namespace tenure::depreciation
