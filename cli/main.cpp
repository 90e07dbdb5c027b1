// The `tenure` executable: builds the command line app and runs it (see commands.h for the
// commands and exit_codes.h for exit codes and error messages).
#include <iostream>

#include "cli/commands.h"
#include "cli/exit_codes.h"

int main(int argc, char** argv) {
  CLI::App app;
  const tenure::cli::Console console{std::cin, std::cout, std::cerr};
  try {
    tenure::cli::add_commands(app, console);
  } catch (...) {
    std::cerr << "tenure: " << tenure::message_of(std::current_exception()) << '\n';
    return static_cast<int>(tenure::exit_code_of(std::current_exception()));
  }
  return tenure::cli::run_command_line(app, argc, argv, std::cout, std::cerr);
}
