// Argument checks shared by the engine. Each throws InputError naming `where` and the rule.
//
//   require_finite(x, "$.marr");              // rejects NaN and infinities
//   require_rate(i, "i");                     // finite and > -1
//   require_scenario_name(name, "--scenario"); // 1 to 64 of [A-Za-z0-9._-]
#pragma once

#include <string_view>

#include "core/types.h"

namespace tenure {

void require_finite(double value, std::string_view where);
void require_non_negative(double value, std::string_view where);
void require_positive(double value, std::string_view where);

// The largest amount of money tenure accepts, in magnitude: no equipment costs more, and sums,
// restatements and EUACs of amounts near the double's limit (1e308) would overflow to infinity.
inline constexpr double kMaxAmount = 1e15;
// An amount of money: finite and at most kMaxAmount in magnitude.
void require_amount(double value, std::string_view where);
// An interest rate: finite and greater than -1 (so 1 + i > 0).
void require_rate(Rate value, std::string_view where);
// The largest tax rate tenure weighs: above it, after-tax amounts are under 1% of the
// before-tax ones and their reasons would read "0.00 against 0.00".
inline constexpr Rate kMaxTaxRate = 0.99;
// A tax rate: 0 <= t <= kMaxTaxRate.
void require_tax_rate(Rate value, std::string_view where);

// A plain SQL identifier: [A-Za-z_][A-Za-z0-9_]*, at most 128 characters. Policy sources must be
// one, so that nothing a policy says can change the SQL tenure runs.
bool is_plain_identifier(std::string_view name);

// A what-if run's name (tenure_run.scenario): 1 to 64 characters, each an ASCII letter, a digit,
// '-', '_' or '.', so that it reads plainly in a summary, a file name or a WHERE clause. Throws
// InputError(where, rule) with the rule it broke: empty, too long, or which character is not one.
void require_scenario_name(std::string_view name, std::string_view where);

}  // namespace tenure
