// The --format option every command that prints shares (see commands.h).
#include "cli/commands.h"

namespace tenure::cli {

CLI::Option* add_format_option(CLI::App& command, std::string& format,
                               const std::vector<std::string>& formats,
                               const std::string& description) {
  return command
      .add_option("--format", format, description)
      ->type_name("FORMAT")
      ->check(CLI::IsMember(formats));
}

}  // namespace tenure::cli
