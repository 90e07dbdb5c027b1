// MACRS ADS, straight line with the half-year convention (see macrs_ads.h).
#include "depreciation/macrs_ads.h"

#include "core/errors.h"

namespace tenure::depreciation {

MacrsAds::MacrsAds(MacrsAdsSpec spec) : recovery_years_(spec.recovery_years) {
  if (recovery_years_ < 1) {
    throw InputError("recovery_years", "must be a whole number of years >= 1");
  }
}

std::vector<Money> MacrsAds::deductions(Money basis) const {
  const Money full_year = basis / recovery_years_;
  std::vector<Money> result(static_cast<std::size_t>(recovery_years_ + 1), full_year);
  result.front() = full_year / 2;
  result.back() = full_year / 2;
  return result;
}

double MacrsAds::disposal_year_fraction(Years year) const {
  return year < recovery_years_ + 1 ? 0.5 : 1.0;
}

}  // namespace tenure::depreciation
