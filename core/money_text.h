// How every money amount a person reads is written, in tables and in sentences alike: two
// decimals with thousands separators.
//
//   money(12345.678);  // "12,345.68"
//   money(-0.001);     // "0.00" (rounds to zero: no minus sign)
#pragma once

#include <string>

#include "core/types.h"

namespace tenure {

// Two decimals with thousands separators; half a cent rounds away from zero.
std::string money(Money amount);

}  // namespace tenure
