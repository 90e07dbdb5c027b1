// CLI11's parse errors said again in tenure's words (see usage_errors.h). Each rewording matches
// the text CLI11 2.1 (Debian 12's libcli11-dev) builds in CLI/Error.hpp; tests/cli/
// usage_errors_test.cpp pins every one, so a CLI11 that words them differently fails there.
#include "cli/usage_errors.h"

#include <algorithm>
#include <charconv>
#include <regex>
#include <sstream>

#include <fmt/format.h>

namespace tenure::cli {
namespace {

std::string lower_first(std::string text) {
  if (!text.empty() && text[0] >= 'A' && text[0] <= 'Z') text[0] = static_cast<char>(text[0] + 32);
  return text;
}

// The names a user can type for `command`'s options: "--basis", "-h".
std::vector<std::string> option_names(const CLI::App& command) {
  std::vector<std::string> names;
  for (const CLI::Option* option : command.get_options()) {
    for (const std::string& name : option->get_lnames()) names.push_back("--" + name);
    for (const std::string& name : option->get_snames()) names.push_back("-" + name);
  }
  return names;
}

std::string did_you_mean(std::string_view typed, const std::vector<std::string>& names) {
  const std::optional<std::string> near = nearest_name(typed, names);
  return near ? fmt::format(" (did you mean {}?)", *near) : "";
}

// "must be a number, not 'x'", or "must be a whole number" when the value is a number.
std::string number_rule(const std::string& value) {
  double number = 0;
  const auto [end, failure] = std::from_chars(value.data(), value.data() + value.size(), number);
  const bool is_number = failure == std::errc() && end == value.data() + value.size();
  return fmt::format("must be a {}number, not '{}'", is_number ? "whole " : "", value);
}

// An argument CLI11 did not expect: an option the command does not have, or a stray word.
InputError unexpected(const std::string& argument, const CLI::App& command) {
  if (!argument.starts_with('-')) {
    return InputError("", fmt::format("unexpected argument '{}'", argument));
  }
  const std::string option = argument.substr(0, argument.find('='));
  return InputError(option, "unknown option" + did_you_mean(option, option_names(command)));
}

// CLI11's IsMember words, "xml not in {table,json}", as a choice.
std::string choice_rule(const std::string& message) {
  static const std::regex kNotIn(R"(^(.*) not in \{(.*)\}$)");
  std::smatch match;
  if (!std::regex_match(message, match, kNotIn)) return lower_first(message);
  std::string choices = match[2];
  std::string listed;
  for (std::size_t at = 0; at <= choices.size();) {
    const std::size_t comma = std::min(choices.find(',', at), choices.size());
    listed += (listed.empty() ? "" : ", ") + choices.substr(at, comma - at);
    at = comma + 1;
  }
  return fmt::format("must be one of {}, not '{}'", listed, match[1].str());
}

}  // namespace

std::vector<std::string> command_names(const CLI::App& app) {
  std::vector<std::string> names;
  for (const CLI::App* command : app.get_subcommands({})) names.push_back(command->get_name());
  return names;
}

std::optional<std::string> nearest_name(std::string_view typed,
                                        const std::vector<std::string>& names) {
  // Levenshtein distance, one row at a time.
  auto distance = [&](std::string_view name) {
    std::vector<std::size_t> row(name.size() + 1);
    for (std::size_t j = 0; j < row.size(); ++j) row[j] = j;
    for (std::size_t i = 1; i <= typed.size(); ++i) {
      std::size_t diagonal = row[0];
      row[0] = i;
      for (std::size_t j = 1; j <= name.size(); ++j) {
        const std::size_t above = row[j];
        row[j] = std::min({row[j] + 1, row[j - 1] + 1,
                           diagonal + (typed[i - 1] == name[j - 1] ? 0 : 1)});
        diagonal = above;
      }
    }
    return row.back();
  };
  const std::size_t allowed = typed.size() / 3;  // none for "-q": every short option is near
  std::optional<std::string> best;
  std::size_t best_distance = allowed + 1;
  for (const std::string& name : names) {
    const std::size_t d = distance(name);
    if (d < best_distance) {
      best = name;
      best_distance = d;
    }
  }
  return best;
}

InputError unknown_command(std::string_view word, const CLI::App& app) {
  const std::vector<std::string> names = command_names(app);
  const std::optional<std::string> near = nearest_name(word, names);
  return InputError("", near ? fmt::format("unknown command '{}' (did you mean '{}'?)", word, *near)
                             : fmt::format("unknown command '{}' (the commands are {})", word,
                                           fmt::join(names, ", ")));
}

InputError usage_error(const CLI::ParseError& error, const CLI::App& command) {
  const std::string text = error.what();
  std::smatch m;
  auto matches = [&](const char* pattern) { return std::regex_match(text, m, std::regex(pattern)); };
  if (dynamic_cast<const CLI::ExtrasError*>(&error) != nullptr &&
      matches(R"(^The following arguments? (?:was|were) not expected: (.*)$)")) {
    // The first option among them ("--bassis 3" lists both), else the first word.
    std::vector<std::string> words;
    std::istringstream listed(m[1].str());
    for (std::string word; listed >> word;) words.push_back(word);
    const auto option = std::find_if(words.begin(), words.end(),
                                     [](const std::string& w) { return w.starts_with('-'); });
    return unexpected(option != words.end() ? *option : words.front(), command);
  }
  if (dynamic_cast<const CLI::ConversionError*>(&error) != nullptr) {
    if (matches(R"(^Could not convert: (\S+) = (.*)$)")) return InputError(m[1], number_rule(m[2]));
    if (matches(R"(^(\S+): too many inputs for a flag$)")) {
      return InputError(m[1], "is a flag and takes no value");
    }
  }
  if (dynamic_cast<const CLI::RequiredError*>(&error) != nullptr) {
    if (text == "A subcommand is required") {
      return InputError("", fmt::format("a command is required: one of {}",
                                        fmt::join(command_names(command), ", ")));
    }
    if (matches(R"(^(\S+) is required$)")) return InputError(m[1], "is required");
  }
  if (dynamic_cast<const CLI::ArgumentMismatch*>(&error) != nullptr &&
      matches(R"(^(\S+): \d+ required (\S+) missing$)")) {
    return InputError(m[1], fmt::format("needs a value ({})", m[2].str()));
  }
  if (dynamic_cast<const CLI::ValidationError*>(&error) != nullptr &&
      matches(R"(^(\S+): (.*)$)")) {
    return InputError(m[1], choice_rule(m[2]));
  }
  if (dynamic_cast<const CLI::ExcludesError*>(&error) != nullptr &&
      matches(R"(^(\S+) excludes (\S+)$)")) {
    return InputError(m[1], fmt::format("cannot be given with {}", m[2].str()));
  }
  if (dynamic_cast<const CLI::RequiresError*>(&error) != nullptr &&
      matches(R"(^(\S+) requires (\S+)$)")) {
    return InputError(m[1], fmt::format("needs {} as well", m[2].str()));
  }
  return InputError("", lower_first(text));
}

}  // namespace tenure::cli
