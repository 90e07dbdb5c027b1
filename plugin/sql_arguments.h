// The adapter between SQL values and the engine, shared by every tenure_* SQL function: reading
// arguments by name, and the one wrapper that turns any C++ exception into an SQL error, so that
// no exception ever crosses into SQLite.
//
// Error messages are short, lower case, and name the function, the argument and the rule:
//   tenure_factor: 3rd argument (n) must be >= 0
//   tenure_factor: 2nd argument (i) must be a number
//   tenure_depreciation: 2nd argument (basis) is missing
//   tenure_case: $.challenger.first_cost: must be > 0        (a JSON path inside an argument)
//   tenure_factor: unknown kind 'X/Y' (expected one of ...)  (a rule about the call as a whole)
// The engine throws InputError(where, rule) with `where` a field name ("n", "life_years", or
// "$.life_years"); Signature::message places it at the SQL argument of that name or alias.
//
//   const Signature kFactor{"tenure_factor", {"kind", "i", "n"}};
//   void factor_function(sqlite3_context* ctx, int argc, sqlite3_value** argv) {
//     guarded(ctx, kFactor, [&] {
//       const Arguments args(kFactor, argc, argv);
//       sqlite3_result_double(ctx, compute(args.text("kind"), args.number("i"), ...));
//     });
//   }
#pragma once

#include <sqlite3.h>

#include <exception>
#include <optional>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

#include "core/errors.h"

namespace tenure::plugin {

// A function's SQL name and its arguments' names in order, with aliases for engine field names
// ({"life_years", "life"}: an engine error about life_years is about the argument life).
struct Signature {
  std::string_view function;
  std::vector<std::string_view> arguments;
  std::vector<std::pair<std::string_view, std::string_view>> aliases = {};

  // 0-based position of the argument `name` (or of the argument it is an alias of), if any.
  std::optional<std::size_t> position(std::string_view name) const;
  // "<function>: <ordinal> argument (<name>) <rule>" when error.where() names an argument,
  // "<function>: <rule>" when it is empty, "<function>: <where>: <rule>" otherwise.
  std::string message(const InputError& error) const;
};

// "1st", "2nd", "3rd", "4th", ... for a 1-based position.
std::string ordinal(std::size_t position);

// A function's arguments by name. An argument is absent when the call did not pass it (a
// table-valued function's hidden column without a constraint); NULL counts as given, and the
// getters of a required value reject it. Every getter throws InputError(name, rule).
class Arguments {
 public:
  // The arguments of a scalar call: argv[k] is the argument signature.arguments[k].
  Arguments(const Signature& signature, int argc, sqlite3_value** argv);
  // None passed yet; set() passes them one by one (a table-valued function's xFilter).
  explicit Arguments(const Signature& signature);
  void set(std::size_t position, sqlite3_value* value);

  const Signature& signature() const { return signature_; }
  // Passed and not NULL.
  bool given(std::string_view name) const;

  // A number (an integer, a real, or text that SQLite reads as a number): "must be a number"
  // when NULL or other text, "is missing" when absent.
  double number(std::string_view name) const;
  // The same, or nullopt when absent or NULL.
  std::optional<double> optional_number(std::string_view name) const;
  // The error number(name) throws for an argument that was not given: "is missing" when it was
  // left out, "must be a number" when NULL.
  InputError number_not_given(std::string_view name) const;
  // Text, or a BLOB taken as UTF-8 text (the sqlite3 shell's readfile() returns one): "must be
  // text" when NULL or a number, "is missing" when absent.
  std::string text(std::string_view name) const;
  // The same, or nullopt when absent or NULL.
  std::optional<std::string> optional_text(std::string_view name) const;

 private:
  sqlite3_value* value(std::string_view name) const;
  sqlite3_value* present(std::string_view name) const;  // throws "is missing" when absent

  const Signature& signature_;
  std::vector<sqlite3_value*> values_;  // nullptr: absent
};

// The error message for the exception `error`: InputError through signature.message, anything
// else as "<function>: " and its message_of (core/errors.h). Throws std::bad_alloc only.
std::string describe(const Signature& signature, const std::exception_ptr& error);

// Sets the exception `error` as the call's error: its message (describe), or SQLITE_NOMEM for
// std::bad_alloc. Never throws.
void report_error(sqlite3_context* context, const Signature& signature,
                  const std::exception_ptr& error) noexcept;

// Runs `body`, which sets the call's result; any exception it throws becomes the call's error.
template <class Body>
void guarded(sqlite3_context* context, const Signature& signature, Body&& body) noexcept {
  try {
    body();
  } catch (...) {
    report_error(context, signature, std::current_exception());
  }
}

}  // namespace tenure::plugin
