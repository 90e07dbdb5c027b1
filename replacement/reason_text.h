// How the one-sentence reasons of decisions and verdicts write numbers, in one place, so a case
// and the nightly review say "12,535.62" and "3 years" alike, as the tables do.
//
//   money(12535.62);         // "12,535.62" (core/money_text.h, the tables' money format)
//   reason_years(1);         // "1 year"
#pragma once

#include <string>

#include <fmt/format.h>

#include "core/money_text.h"
#include "core/types.h"

namespace tenure::replacement {

inline std::string reason_years(Years n) { return fmt::format("{} year{}", n, n == 1 ? "" : "s"); }

}  // namespace tenure::replacement
