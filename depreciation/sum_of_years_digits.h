// Sum-of-years'-digits depreciation: year k of L deducts (basis - salvage) * (L - k + 1) / S,
// where S = L(L+1)/2 is the sum of the digits 1..L, so the deductions fall by the same step.
//
//   SumOfYearsDigits syd(SumOfYearsDigitsSpec{4, 0});
//   syd.deductions(1000);   // {400, 300, 200, 100}
#pragma once

#include "depreciation/method.h"

namespace tenure::depreciation {

class SumOfYearsDigits : public Method {
 public:
  // Throws InputError("life_years", ...) for a life below 1 year and InputError("salvage", ...)
  // for a salvage that is negative or not finite.
  explicit SumOfYearsDigits(SumOfYearsDigitsSpec spec);

  std::string_view name() const override { return "sum_of_years_digits"; }
  // Throws InputError("salvage", "must not exceed the basis") when salvage > basis.
  std::vector<Money> deductions(Money basis) const override;
  Money salvage() const override { return spec_.salvage; }
  std::shared_ptr<const Method> scaled(double factor) const override {
    return std::make_shared<SumOfYearsDigits>(
        SumOfYearsDigitsSpec{spec_.life_years, spec_.salvage * factor});
  }

 private:
  SumOfYearsDigitsSpec spec_;
};

}  // namespace tenure::depreciation
