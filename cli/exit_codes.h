// Exit codes of `tenure` (tenure::ExitCode, core/errors.h), and the one place in the command
// line that turns errors into them and into messages:
//
//   0  ok            the command did its job; also --help and --version
//   1  failure       something went wrong that is not the input's fault: a RuntimeFailure (a
//                    database that cannot be written, say) or any unexpected exception
//   2  bad input     a usage error (unknown option, missing argument: CLI11's parse errors) or
//                    an InputError (a case file that is missing or unreadable, a bad field, an
//                    out-of-range argument)
//
// Errors are one line on stderr, "tenure <command>: <where>: <rule>", for example
//   tenure case: $.challenger.first_cost: must be > 0
// Standard output is flushed before the exit code is chosen: output that cannot be written (a
// full disk, `> /dev/full`) is a failure, exit 1, "tenure case: cannot write the output: ...".
// No exception leaves run_command_line.
//
//   int main(int argc, char** argv) { ...; return run_command_line(app, argc, argv, out, err); }
#pragma once

#include <ostream>

#include <CLI/CLI.hpp>

#include "core/errors.h"

namespace tenure::cli {

// Parses the arguments, which runs the chosen command's callback, and returns the exit code.
// Help and version text go to `out`, error messages to `err`.
int run_command_line(CLI::App& app, int argc, const char* const* argv, std::ostream& out,
                     std::ostream& err);

}  // namespace tenure::cli
