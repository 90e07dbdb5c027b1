// Parameter checks shared by the book methods (straight line, declining balance, sum of years'
// digits), so each rule and its message are written once.
//
//   require_life_years(spec.life_years);          // InputError("life_years", ...) if < 1
//   require_salvage_within_basis(salvage, basis);  // InputError("salvage", ...) if salvage > basis
#pragma once

#include "core/checks.h"
#include "core/errors.h"
#include "core/types.h"

namespace tenure::depreciation {

// A book life is a whole number of years, at least one.
inline void require_life_years(Years life_years) {
  if (life_years < 1) throw InputError("life_years", "must be a whole number of years >= 1");
}

// Salvage is a finite amount >= 0.
inline void require_salvage(Money salvage) { require_non_negative(salvage, "salvage"); }

// A salvage above the basis would make the deductions negative.
inline void require_salvage_within_basis(Money salvage, Money basis) {
  if (salvage > basis) throw InputError("salvage", "must not exceed the basis");
}

}  // namespace tenure::depreciation
