// The mapping of errors to exit codes and messages (see exit_codes.h).
#include "cli/exit_codes.h"

#include <cctype>
#include <cerrno>
#include <cstring>
#include <exception>
#include <optional>
#include <string>

#include "cli/usage_errors.h"

namespace tenure::cli {
namespace {

int code(ExitCode exit_code) { return static_cast<int>(exit_code); }

// The command chosen on the command line, down to the last subcommand ("policy set"); the app
// itself when none was.
const CLI::App& chosen_command(const CLI::App& app) {
  const CLI::App* command = &app;
  while (!command->get_subcommands().empty()) command = command->get_subcommands().front();
  return *command;
}

// "tenure policy set" when that command was chosen, else "tenure".
std::string command_name(const CLI::App& app) {
  std::string name = "tenure";
  for (const CLI::App* command = &app; !command->get_subcommands().empty();) {
    command = command->get_subcommands().front();
    name += " " + command->get_name();
  }
  return name;
}

// A usage error found before parsing, and the command it is about ("tenure policy").
struct EarlyUsageError {
  std::string command;
  InputError error;
};

// A word that reads as an option, "--name", "--name=value" or "-x" (not a value like "-5").
bool looks_like_option(const std::string& word) {
  return word.starts_with("--") ||
         (word.size() >= 2 && word[0] == '-' && std::isalpha(static_cast<unsigned char>(word[1])));
}

// Before CLI11 parses: a word where a command belongs must name one, and every option must be
// one of its command's. CLI11 would say "A subcommand is required" for the first, and report
// an unknown option only after a missing required one.
std::optional<EarlyUsageError> check_commands(const CLI::App& app, int argc,
                                              const char* const* argv) {
  const CLI::App* level = &app;
  std::string name = "tenure";
  for (int i = 1; i < argc; ++i) {
    const std::string word = argv[i];
    if (word == "--") break;
    const bool command_expected = !level->get_subcommands({}).empty();
    if (looks_like_option(word)) {
      if (level->get_option_no_throw(word.substr(0, word.find('='))) == nullptr) {
        return EarlyUsageError{name, usage_error(CLI::ExtrasError({word}), *level)};
      }
      if (command_expected) break;  // --help or --version before any command
    } else if (command_expected) {
      const std::vector<const CLI::App*> named =
          level->get_subcommands([&](const CLI::App* c) { return c->check_name(word); });
      if (named.empty()) return EarlyUsageError{name, unknown_command(word, *level)};
      level = named.front();
      name += " " + word;
    }
  }
  return std::nullopt;
}

int usage_failure(const std::string& command, const InputError& error, std::ostream& err) {
  err << command << ": " << message_of(std::make_exception_ptr(error)) << " (see '" << command
      << " --help')\n";
  return code(error.exit_code());
}

// What a command printed is only written when the stream is flushed: a full disk or a closed pipe
// shows here, not while the command ran. errno is the first failed write's (set to 0 before).
void flush_output(std::ostream& out) {
  out.flush();
  if (!out) {
    throw RuntimeFailure("cannot write the output: " +
                         std::string(errno != 0 ? std::strerror(errno) : "write error"));
  }
}

}  // namespace

int run_command_line(CLI::App& app, int argc, const char* const* argv, std::ostream& out,
                     std::ostream& err) {
  errno = 0;
  try {
    if (const std::optional<EarlyUsageError> early = check_commands(app, argc, argv)) {
      return usage_failure(early->command, early->error, err);
    }
    try {
      app.parse(argc, argv);
    } catch (const CLI::ParseError& error) {
      // --help and --version arrive as "errors" whose exit code is success.
      if (error.get_exit_code() != static_cast<int>(CLI::ExitCodes::Success)) throw;
      app.exit(error, out, err);
    }
    flush_output(out);
    return code(ExitCode::ok);
  } catch (const CLI::ParseError& error) {
    // A usage error is bad input, said in the house style.
    return usage_failure(command_name(app), usage_error(error, chosen_command(app)), err);
  } catch (...) {
    const std::exception_ptr error = std::current_exception();
    err << command_name(app) << ": " << message_of(error) << '\n';
    return code(exit_code_of(error));
  }
}

}  // namespace tenure::cli
