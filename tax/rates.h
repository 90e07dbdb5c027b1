// The rates an analysis runs at (SPEC 4 and 5), with their defaults and checks in one place.
//
//   auto r = tenure::tax::Rates::make(0.10, 0.25);   // after-tax MARR 0.075, gains taxed at 0.25
#pragma once

#include <optional>

#include "core/types.h"

namespace tenure::tax {

struct Rates {
  Rate marr;                    // before-tax MARR, 0.0001 <= marr <= 1
  Rate income_tax_rate;         // effective combined rate, 0 <= t <= 0.99
  Rate after_tax_marr;          // 0.0001 <= rate <= 1; default marr * (1 - t)
  Rate capital_gains_tax_rate;  // 0 <= rate <= 0.99; default income_tax_rate

  // Applies the defaults and checks every rate; errors name "$.marr" and so on.
  static Rates make(Rate marr, Rate income_tax_rate, std::optional<Rate> after_tax_marr = {},
                    std::optional<Rate> capital_gains_tax_rate = {});
  bool after_tax() const { return income_tax_rate > 0; }
};

}  // namespace tenure::tax
