// The command line's usage errors in the house style, "<where>: <rule>", instead of the argument
// parser's own English. CLI11 says what went wrong in its exception's text; usage_error reads
// that text and says it again in tenure's words, naming the option:
//
//   tenure schedule --basis 52,000      --basis: must be a number, not '52,000'
//   tenure schedule -q                  -q: unknown option
//   tenure schedule --bassis 5          --bassis: unknown option (did you mean --basis?)
//   tenure schedule                     --method: is required
//   tenure schedule --basis             --basis: needs a value (AMOUNT)
//   tenure schedule --format xml        --format: must be one of table, json, not 'xml'
//   tenure schedule --switch --no-switch  --switch: cannot be given with --no-switch
//   tenure revew                        unknown command 'revew' (did you mean 'review'?)
//   tenure                              a command is required: one of case, schedule, ...
//
// A text it does not know is kept, with its first letter in lower case.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include <CLI/CLI.hpp>

#include "core/errors.h"

namespace tenure::cli {

// `error`, raised while parsing the options of `command` (the subcommand the words are about),
// as an InputError naming the option.
InputError usage_error(const CLI::ParseError& error, const CLI::App& command);

// A word that is not a command of `app`: "unknown command 'revew' (did you mean 'review'?)".
InputError unknown_command(std::string_view word, const CLI::App& app);

// The names of `app`'s subcommands, in the order they were added.
std::vector<std::string> command_names(const CLI::App& app);

// The one of `names` nearest to `typed` when it is near enough to be a slip of the keyboard
// (an edit distance of at most a third of its length: none for a name of 2 letters); nullopt
// otherwise.
std::optional<std::string> nearest_name(std::string_view typed,
                                        const std::vector<std::string>& names);

}  // namespace tenure::cli
