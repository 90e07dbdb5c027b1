// The manual page (tenure.1) and the bash completion script of `tenure`, made from the command
// line itself (the CLI11 app of add_commands), so that they list exactly the commands, options
// and choices the program has. The build writes both with tenure_reference_pages
// (reference_pages_main.cpp) and `cmake --install` installs them.
//
//   CLI::App app;
//   add_commands(app, console);
//   std::string page = man_page(app);          // troff: man -l tenure.1
//   std::string script = bash_completion(app);  // source it, then: tenure rev<TAB> -> review
#pragma once

#include <string>

#include <CLI/CLI.hpp>

namespace tenure::cli {

// The manual page, in the man(7) macros: name, synopsis, each command with its options and
// footer, exit status, environment, files and the caution of SPEC 10.
std::string man_page(CLI::App& app);

// A bash script defining the completion of `tenure`: the commands (and policy's), each
// command's options, the choices of an option that has them (--format), and file names for an
// option or argument that names a file (--db PATH, --policy FILE, --out FILE, FILE).
std::string bash_completion(CLI::App& app);

}  // namespace tenure::cli
