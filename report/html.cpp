// Escaping and number text for the page (see html.h).
#include "report/html.h"

#include <cmath>

#include <fmt/format.h>

namespace tenure::report {

std::string escape(std::string_view text) {
  std::string out;
  out.reserve(text.size());
  for (const char c : text) {
    switch (c) {
      case '&': out += "&amp;"; break;
      case '<': out += "&lt;"; break;
      case '>': out += "&gt;"; break;
      case '"': out += "&quot;"; break;
      case '\'': out += "&#39;"; break;
      default: out += c; break;
    }
  }
  return out;
}

std::string grouped(double value, int decimals) {
  if (!std::isfinite(value)) return fmt::format("{}", value);
  const std::string digits = fmt::format("{:.{}f}", std::abs(value), decimals);
  const std::size_t point = digits.find('.');
  const std::size_t whole = point == std::string::npos ? digits.size() : point;
  std::string out;
  for (std::size_t i = 0; i < whole; ++i) {
    if (i > 0 && (whole - i) % 3 == 0) out += ',';
    out += digits[i];
  }
  out += digits.substr(whole);
  // No minus sign on a value that rounds to zero.
  if (value < 0 && out.find_first_not_of("0.,") != std::string::npos) out = "-" + out;
  return out;
}

}  // namespace tenure::report
