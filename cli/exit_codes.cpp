// The mapping of errors to exit codes and messages (see exit_codes.h).
#include "cli/exit_codes.h"

#include <algorithm>
#include <string>

#include "core/errors.h"

namespace tenure::cli {
namespace {

// "tenure case" when a command was chosen, else "tenure".
std::string command_name(const CLI::App& app) {
  std::string name = "tenure";
  for (const CLI::App* command : app.get_subcommands()) name += " " + command->get_name();
  return name;
}

// Messages must stay on one line, whatever the library that raised them put in.
std::string one_line(std::string text) {
  std::replace(text.begin(), text.end(), '\n', ' ');
  return text;
}

int code(ExitCode exit_code) { return static_cast<int>(exit_code); }

}  // namespace

int run_command_line(CLI::App& app, int argc, const char* const* argv, std::ostream& out,
                     std::ostream& err) {
  try {
    app.parse(argc, argv);
    return code(ExitCode::ok);
  } catch (const CLI::ParseError& error) {
    // --help and --version arrive as "errors" whose exit code is success.
    if (error.get_exit_code() == static_cast<int>(CLI::ExitCodes::Success)) {
      app.exit(error, out, err);
      return code(ExitCode::ok);
    }
    const std::string name = command_name(app);
    err << name << ": " << one_line(error.what()) << " (see '" << name << " --help')\n";
    return code(ExitCode::bad_input);
  } catch (const InputError& error) {
    err << command_name(app) << ": " << one_line(error.what()) << '\n';
    return code(ExitCode::bad_input);
  } catch (const RuntimeFailure& error) {
    err << command_name(app) << ": " << one_line(error.what()) << '\n';
    return code(ExitCode::failure);
  } catch (const std::exception& error) {
    err << command_name(app) << ": internal error: " << one_line(error.what()) << '\n';
    return code(ExitCode::failure);
  } catch (...) {
    err << command_name(app) << ": internal error of an unknown kind\n";
    return code(ExitCode::failure);
  }
}

}  // namespace tenure::cli
