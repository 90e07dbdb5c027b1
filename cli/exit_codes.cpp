// The mapping of errors to exit codes and messages (see exit_codes.h).
#include "cli/exit_codes.h"

#include <cerrno>
#include <cstring>
#include <exception>
#include <string>

namespace tenure::cli {
namespace {

// "tenure case" when a command was chosen, else "tenure".
std::string command_name(const CLI::App& app) {
  std::string name = "tenure";
  for (const CLI::App* command : app.get_subcommands()) name += " " + command->get_name();
  return name;
}

int code(ExitCode exit_code) { return static_cast<int>(exit_code); }


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
    // A usage error (CLI11's words) is bad input.
    const InputError usage("", error.what());
    const std::string name = command_name(app);
    err << name << ": " << message_of(std::make_exception_ptr(usage)) << " (see '" << name
        << " --help')\n";
    return code(usage.exit_code());
  } catch (...) {
    const std::exception_ptr error = std::current_exception();
    err << command_name(app) << ": " << message_of(error) << '\n';
    return code(exit_code_of(error));
  }
}

}  // namespace tenure::cli
