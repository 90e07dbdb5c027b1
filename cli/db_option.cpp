// The --db option every command that opens a database shares (see commands.h).
#include "cli/commands.h"

namespace tenure::cli {

CLI::Option* add_db_option(CLI::App& command, std::string& db, const std::string& description) {
  return command.add_option("--db", db, description + "; default: $TENURE_DB")
      ->type_name("PATH")
      ->envname("TENURE_DB")
      ->required();
}

}  // namespace tenure::cli
