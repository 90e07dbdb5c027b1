// Argument checks shared by the engine (see checks.h).
#include "core/checks.h"

#include <cmath>
#include <string>

#include "core/errors.h"

namespace tenure {

void require_finite(double value, std::string_view where) {
  if (!std::isfinite(value)) throw InputError(std::string(where), "must be a finite number");
}

void require_non_negative(double value, std::string_view where) {
  require_finite(value, where);
  if (value < 0) throw InputError(std::string(where), "must be >= 0");
}

void require_positive(double value, std::string_view where) {
  require_finite(value, where);
  if (value <= 0) throw InputError(std::string(where), "must be > 0");
}

void require_amount(double value, std::string_view where) {
  require_finite(value, where);
  if (std::abs(value) > kMaxAmount) {
    throw InputError(std::string(where), "must be at most 1e15 in magnitude (no equipment costs more)");
  }
}

void require_rate(Rate value, std::string_view where) {
  require_finite(value, where);
  if (value <= -1) throw InputError(std::string(where), "must be a rate greater than -1");
}

void require_tax_rate(Rate value, std::string_view where) {
  require_finite(value, where);
  if (value < 0 || value > kMaxTaxRate) {
    throw InputError(std::string(where), "must be in [0, 0.99]");  // kMaxTaxRate
  }
}

bool is_plain_identifier(std::string_view name) {
  if (name.empty() || name.size() > 128) return false;
  const auto letter = [](char c) {
    return (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z') || c == '_';
  };
  if (!letter(name[0])) return false;
  for (char c : name) {
    if (!letter(c) && !(c >= '0' && c <= '9')) return false;
  }
  return true;
}

void require_scenario_name(std::string_view name, std::string_view where) {
  if (name.empty()) {
    throw InputError(std::string(where),
                     "must not be empty (a name of letters, digits, '-', '_' and '.')");
  }
  if (name.size() > 64) {
    const std::string size = std::to_string(name.size());
    throw InputError(std::string(where), "must be at most 64 characters (it has " + size + ")");
  }
  for (std::size_t i = 0; i < name.size(); ++i) {
    const char c = name[i];
    const bool allowed = (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z') ||
                         (c >= '0' && c <= '9') || c == '-' || c == '_' || c == '.';
    if (!allowed) {
      const std::string rule = "may hold only letters, digits, '-', '_' and '.' (character " +
                               std::to_string(i + 1) + " is not one)";
      throw InputError(std::string(where), rule);
    }
  }
}

}  // namespace tenure
