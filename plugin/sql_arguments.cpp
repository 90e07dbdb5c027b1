// Arguments by name and errors as SQL results (see sql_arguments.h).
#include "plugin/sql_arguments.h"

#include <fmt/format.h>

namespace tenure::plugin {

std::optional<std::size_t> Signature::position(std::string_view name) const {
  for (const auto& [alias, argument] : aliases) {
    if (alias == name) return position(argument);
  }
  for (std::size_t k = 0; k < arguments.size(); ++k) {
    if (arguments[k] == name) return k;
  }
  return std::nullopt;
}

std::string Signature::message(const InputError& error) const {
  std::string_view where = error.where();
  if (where.empty()) return fmt::format("{}: {}", function, error.rule());
  // The case-file reader names fields as JSON paths ("$.life_years").
  if (where.starts_with("$.") && position(where.substr(2))) where.remove_prefix(2);
  if (const auto k = position(where)) {
    return fmt::format("{}: {} argument ({}) {}", function, ordinal(*k + 1), arguments[*k],
                       error.rule());
  }
  return fmt::format("{}: {}: {}", function, where, error.rule());
}

std::string ordinal(std::size_t position) {
  const std::size_t tens = position % 100, units = position % 10;
  const char* suffix = "th";
  if (tens < 11 || tens > 13) {
    if (units == 1) suffix = "st";
    if (units == 2) suffix = "nd";
    if (units == 3) suffix = "rd";
  }
  return fmt::format("{}{}", position, suffix);
}

Arguments::Arguments(const Signature& signature, int argc, sqlite3_value** argv)
    : signature_(signature), values_(argv, argv + argc) {
  values_.resize(signature.arguments.size(), nullptr);
}

Arguments::Arguments(const Signature& signature)
    : signature_(signature), values_(signature.arguments.size(), nullptr) {}

void Arguments::set(std::size_t position, sqlite3_value* value) { values_.at(position) = value; }

sqlite3_value* Arguments::value(std::string_view name) const {
  // Names come from the function's own code, never from SQL: an unknown one is a bug here.
  const auto k = signature_.position(name);
  if (!k) throw std::logic_error(fmt::format("no argument named {}", name));
  return values_[*k];
}

sqlite3_value* Arguments::present(std::string_view name) const {
  sqlite3_value* v = value(name);
  if (v == nullptr) throw InputError(std::string(name), "is missing");
  return v;
}

bool Arguments::given(std::string_view name) const {
  sqlite3_value* v = value(name);
  return v != nullptr && sqlite3_value_type(v) != SQLITE_NULL;
}

double Arguments::number(std::string_view name) const {
  sqlite3_value* v = present(name);
  const int type = sqlite3_value_numeric_type(v);
  if (type != SQLITE_INTEGER && type != SQLITE_FLOAT) {
    throw InputError(std::string(name), "must be a number");
  }
  return sqlite3_value_double(v);
}

std::optional<double> Arguments::optional_number(std::string_view name) const {
  if (!given(name)) return std::nullopt;
  return number(name);
}

InputError Arguments::number_not_given(std::string_view name) const {
  return InputError(std::string(name), value(name) == nullptr ? "is missing" : "must be a number");
}

std::string Arguments::text(std::string_view name) const {
  sqlite3_value* v = present(name);
  const int type = sqlite3_value_type(v);
  if (type != SQLITE_TEXT && type != SQLITE_BLOB) {
    throw InputError(std::string(name), "must be text");
  }
  const auto* p = reinterpret_cast<const char*>(sqlite3_value_text(v));
  if (p == nullptr) throw std::bad_alloc();
  return std::string(p, static_cast<std::size_t>(sqlite3_value_bytes(v)));
}

std::optional<std::string> Arguments::optional_text(std::string_view name) const {
  if (!given(name)) return std::nullopt;
  return text(name);
}

std::string describe(const Signature& signature, const std::exception_ptr& error) {
  try {
    std::rethrow_exception(error);
  } catch (const InputError& input) {
    return signature.message(input);
  } catch (const std::bad_alloc&) {
    throw;
  } catch (...) {
    return fmt::format("{}: {}", signature.function, message_of(error));
  }
}

void report_error(sqlite3_context* context, const Signature& signature,
                  const std::exception_ptr& error) noexcept {
  try {
    const std::string message = describe(signature, error);
    sqlite3_result_error(context, message.c_str(), static_cast<int>(message.size()));
  } catch (...) {
    sqlite3_result_error_nomem(context);
  }
}

}  // namespace tenure::plugin
