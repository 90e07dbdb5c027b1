// How the one-sentence reasons of decisions and verdicts write numbers, in one place, so a case
// and the nightly review say "12535.62" and "3 years" alike.
//
//   reason_money(12535.62);  // "12535.62"
//   reason_years(1);         // "1 year"
#pragma once

#include <string>

#include <fmt/format.h>

#include "core/types.h"

namespace tenure::replacement {

inline std::string reason_money(Money amount) { return fmt::format("{:.2f}", amount); }
inline std::string reason_years(Years n) { return fmt::format("{} year{}", n, n == 1 ? "" : "s"); }

}  // namespace tenure::replacement
