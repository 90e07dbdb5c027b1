// Typed errors of the engine. The engine throws them; the CLI and the extension turn them into
// messages and exit codes (InputError -> exit 2, anything else -> exit 1).
//
//   throw InputError("$.challenger.operating_costs[2]", "must be a finite number >= 0");
//   // what(): "$.challenger.operating_costs[2]: must be a finite number >= 0"
#pragma once

#include <stdexcept>
#include <string>

namespace tenure {

// Bad input: a field, row or argument that breaks a rule. `where` names it (a JSON path such as
// "$.defender.age_years", a row reference such as "cost_event rowid 42", or an argument name).
class InputError : public std::runtime_error {
 public:
  InputError(std::string where, std::string rule)
      : std::runtime_error(where.empty() ? rule : where + ": " + rule),
        where_(std::move(where)),
        rule_(std::move(rule)) {}
  const std::string& where() const noexcept { return where_; }
  const std::string& rule() const noexcept { return rule_; }

 private:
  std::string where_;
  std::string rule_;
};

// A failure that is not the input's fault (a database that cannot be written, say).
class RuntimeFailure : public std::runtime_error {
 public:
  using std::runtime_error::runtime_error;
};

}  // namespace tenure
