// Declining-balance depreciation at any multiple R of the straight-line rate (R = 2 is double
// declining balance). Year k of L deducts d * BV(k-1) with d = R / L, never taking the book value
// below salvage. With switch_to_straight_line, a year deducts the larger of that and the straight
// line over the remaining life, (BV(k-1) - salvage) / (L - k + 1), again never below salvage.
// There are no deductions after year L; without the switch the book value at L may stay above
// salvage, as the method says.
//
//   DecliningBalance ddb(DecliningBalanceSpec{10, 2.0, 300, false});
//   ddb.deductions(2400);   // {480, 384, 307.2, ..., 22.12}: year 10 stops at salvage
#pragma once

#include "depreciation/method.h"

namespace tenure::depreciation {

class DecliningBalance : public Method {
 public:
  // Throws InputError naming "life_years" (below 1), "rate" (not finite or <= 0) or "salvage"
  // (negative or not finite).
  explicit DecliningBalance(DecliningBalanceSpec spec);

  std::string_view name() const override { return "declining_balance"; }
  // Throws InputError("salvage", "must not exceed the basis") when salvage > basis.
  std::vector<Money> deductions(Money basis) const override;
  Money salvage() const override { return spec_.salvage; }
  std::shared_ptr<const Method> scaled(double factor) const override {
    DecliningBalanceSpec spec = spec_;
    spec.salvage *= factor;
    return std::make_shared<DecliningBalance>(spec);
  }

 private:
  DecliningBalanceSpec spec_;
};

}  // namespace tenure::depreciation
