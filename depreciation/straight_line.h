// Straight-line depreciation: the same deduction, (basis - salvage) / L, in each of years 1..L.
//
//   StraightLine sl(StraightLineSpec{5, 1000});
//   sl.deductions(11000);   // {2000, 2000, 2000, 2000, 2000}
#pragma once

#include "depreciation/method.h"

namespace tenure::depreciation {

class StraightLine : public Method {
 public:
  // Throws InputError("life_years", ...) for a life below 1 year and InputError("salvage", ...)
  // for a salvage that is negative or not finite.
  explicit StraightLine(StraightLineSpec spec);

  std::string_view name() const override { return "straight_line"; }
  // Throws InputError("salvage", "must not exceed the basis") when salvage > basis.
  std::vector<Money> deductions(Money basis) const override;
  Money salvage() const override { return spec_.salvage; }
  std::shared_ptr<const Method> scaled(double factor) const override {
    return std::make_shared<StraightLine>(StraightLineSpec{spec_.life_years, spec_.salvage * factor});
  }

 private:
  StraightLineSpec spec_;
};

}  // namespace tenure::depreciation
