// Typed errors of the engine, each carrying the exit code it means, and the one map from any
// caught exception to its exit code and message. The engine throws them; the CLI, the extension
// and the C ABI each catch everything in one place and ask exit_code_of and message_of.
//
//   throw InputError("$.challenger.operating_costs[2]", "must be a finite number >= 0");
//   // what(): "$.challenger.operating_costs[2]: must be a finite number >= 0"
//   catch (...) { return static_cast<int>(exit_code_of(std::current_exception())); }   // 2
#pragma once

#include <exception>
#include <stdexcept>
#include <string>

namespace tenure {

// Exit codes of the `tenure` command, and the return codes of the C ABI (plugin/tenure.h's
// TENURE_OK, TENURE_FAILURE and TENURE_BAD_INPUT, held equal to these by static_assert).
enum class ExitCode : int {
  ok = 0,
  failure = 1,    // not the input's fault: a database that cannot be read or written, a bug
  bad_input = 2,  // a bad field, row, argument or usage
};

// An error tenure raises on purpose; what() is one line naming where and the rule.
class Error : public std::runtime_error {
 public:
  using std::runtime_error::runtime_error;
  virtual ExitCode exit_code() const noexcept = 0;
};

// Bad input: a field, row or argument that breaks a rule. `where` names it (a JSON path such as
// "$.defender.age_years", a row reference such as "cost_event rowid 42", or an argument name).
class InputError : public Error {
 public:
  InputError(std::string where, std::string rule)
      : Error(where.empty() ? rule : where + ": " + rule),
        where_(std::move(where)),
        rule_(std::move(rule)) {}
  const std::string& where() const noexcept { return where_; }
  const std::string& rule() const noexcept { return rule_; }
  ExitCode exit_code() const noexcept override { return ExitCode::bad_input; }

 private:
  std::string where_;
  std::string rule_;
};

// A failure that is not the input's fault (a database that cannot be written, say).
class RuntimeFailure : public Error {
 public:
  using Error::Error;
  ExitCode exit_code() const noexcept override { return ExitCode::failure; }
};

// The exit code `error` means: a tenure::Error's own; failure for anything else.
ExitCode exit_code_of(const std::exception_ptr& error) noexcept;

// The one-line message of `error`: a tenure::Error's what(); "out of memory"; "internal error:
// <what()>" for any other exception, "internal error of an unknown kind" for a non-exception.
// Line breaks a library put in are made spaces. Throws std::bad_alloc only.
std::string message_of(const std::exception_ptr& error);

}  // namespace tenure
