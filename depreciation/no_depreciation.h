// No depreciation ("method": "none"): nothing is deducted and the book value stays at the basis.
//
//   NoDepreciation none;
//   none.deductions(5000);   // {}
#pragma once

#include "depreciation/method.h"

namespace tenure::depreciation {

class NoDepreciation : public Method {
 public:
  std::string_view name() const override { return "none"; }
  // Always empty: no year has a deduction.
  std::vector<Money> deductions(Money basis) const override;
  std::shared_ptr<const Method> scaled(double) const override {
    return std::make_shared<NoDepreciation>();
  }
};

}  // namespace tenure::depreciation
