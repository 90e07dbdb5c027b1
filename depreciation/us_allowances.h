// US first-year expensing around a US method (SPEC 13): a decorator that takes the section 179
// amount and the special depreciation allowance ("bonus") in year 1 and leaves the rest of the
// basis to the method it wraps (macrs, macrs_ads), in IRS Publication 946's order.
//
//   auto macrs = make_method(MacrsSpec{5});
//   UsAllowancesFirst first(macrs, UsAllowances{2000.0, 0.5});
//   first.deductions(10000);   // {2000 + 4000 + 400, 640, 384, 230.4, 230.4, 115.2}
//
// Rules:
//   (1) Year 1 expenses the section 179 amount E (0 <= E <= basis).
//   (2) Then the special allowance b x (basis - E), 0 <= b <= 1.
//   (3) The wrapped method depreciates the rest, (1 - b) x (basis - E), from year 1 as usual.
//   (4) A sale takes E and the special allowance in full in year 1; the wrapped method's own
//       disposal-year rule applies to its part only. All of it is recaptured on the sale at the
//       income rate, as for any deduction (tax/disposal.h): the book value is what is left.
//   (5) scaled(f) scales E with the basis; b and the method's rates stay as they are.
//   Limits that depend on the buyer (the section 179 dollar limit and its phase-out, the
//   taxable-income limit, the year's bonus percentage) are the user's to apply: E and b are
//   taken as written.
#pragma once

#include <memory>

#include "depreciation/method.h"

namespace tenure::depreciation {

class UsAllowancesFirst : public Method {
 public:
  // Throws InputError("section_179", "must be >= 0") or InputError("bonus", "must be between 0
  // and 1"); the bound of E by the basis is checked in deductions().
  UsAllowancesFirst(std::shared_ptr<const Method> method, UsAllowances allowances);

  std::string_view name() const override { return method_->name(); }
  // Rules (1) to (3); throws InputError("section_179", "must not exceed the basis").
  std::vector<Money> deductions(Money basis) const override;
  double disposal_year_fraction(Years year) const override {
    return method_->disposal_year_fraction(year);
  }
  // Rule (4).
  std::vector<Money> deductions_if_sold(Money basis) const override;
  Money salvage() const override { return method_->salvage(); }
  // Rule (5).
  std::shared_ptr<const Method> scaled(double factor) const override;

 private:
  // Rules (1) and (2): the amount expensed in year 1 on `basis`.
  Money expensed(Money basis) const;

  std::shared_ptr<const Method> method_;
  Money section_179_;
  Rate bonus_;
};

}  // namespace tenure::depreciation
