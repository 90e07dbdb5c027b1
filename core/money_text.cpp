// Money amounts as text (see money_text.h).
#include "core/money_text.h"

#include <cmath>

#include <fmt/format.h>

namespace tenure {

std::string money(Money amount) {
  if (!std::isfinite(amount)) return fmt::format("{}", amount);
  // Half a cent rounds away from zero, as people round money (printf would round to even).
  const std::string digits = fmt::format("{:.2f}", std::round(std::abs(amount) * 100) / 100);
  // Rounds to zero: print no minus sign.
  std::string out = amount < 0 && digits != "0.00" ? "-" : "";
  const std::size_t whole = digits.size() - 3;  // digits before ".dd"
  for (std::size_t i = 0; i < whole; ++i) {
    if (i > 0 && (whole - i) % 3 == 0) out += ',';
    out += digits[i];
  }
  return out + digits.substr(whole);
}

}  // namespace tenure
