// The subcommands of `tenure`, one file each (case_command.cpp, schedule_command.cpp, ...).
// Each add_*_command adds its subcommand, options and help to the app; its callback runs the
// command and reports bad input by throwing InputError (exit_codes.h maps it to exit code 2).
// A new command is one new file and one line in add_commands (app.cpp).
//
//   CLI::App app{"..."};
//   Console console{std::cin, std::cout, std::cerr};
//   add_commands(app, console);
#pragma once

#include <istream>
#include <ostream>
#include <string>
#include <vector>

#include <CLI/CLI.hpp>

namespace tenure::cli {

// Where commands read and write; main passes the process's standard streams. The streams must
// outlive the app.
struct Console {
  std::istream& in;
  std::ostream& out;
  std::ostream& err;
};

// --db PATH, required, or the TENURE_DB environment variable when it is not given; one
// spelling for every command that reads a database (not `demo`, which writes one).
CLI::Option* add_db_option(CLI::App& command, std::string& db, const std::string& description);

// --format FORMAT, one of `formats` ("text" for people, "json", ...), with the same words in
// every command; the help lists the choices.
CLI::Option* add_format_option(CLI::App& command, std::string& format,
                               const std::vector<std::string>& formats,
                               const std::string& description);

// The top-level app: description, --version, the footer, every command below.
void add_commands(CLI::App& app, const Console& console);

// tenure case FILE [--format json|table]
void add_case_command(CLI::App& app, const Console& console);
// tenure schedule --method M --basis B [--salvage S] [--life L] [--rate R] [--switch|--no-switch]
//                 [--dispose-in-year Y] [--format table|json]
void add_schedule_command(CLI::App& app, const Console& console);
// tenure demo --db PATH [--assets N] [--events M] [--seed S] [--as-of DATE] [--force]
//             [--no-bad-rows]
void add_demo_command(CLI::App& app, const Console& console);
// tenure review --db PATH [--policy FILE] [--as-of DATE] [--format table|json] [--quiet]
void add_review_command(CLI::App& app, const Console& console);
// tenure policy check FILE | set --db PATH FILE | show --db PATH
void add_policy_command(CLI::App& app, const Console& console);
// tenure explain --db PATH ASSET [--run N] [--format text|json]
void add_explain_command(CLI::App& app, const Console& console);
// tenure report --db PATH --out FILE.html [--run N]
void add_report_command(CLI::App& app, const Console& console);
// tenure due --db PATH [--newly] [--class C] [--format table|csv|json] [--run N]
void add_due_command(CLI::App& app, const Console& console);
// tenure help [COMMAND...]: the help of tenure or of a command
void add_help_command(CLI::App& app, const Console& console);
// tenure repair --db PATH ASSET --estimate R [--run N] [--format text|json]
void add_repair_command(CLI::App& app, const Console& console);

}  // namespace tenure::cli
