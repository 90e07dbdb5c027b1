// The top-level `tenure` app and its list of commands (see commands.h).
#include "cli/commands.h"

#include <string>

#include "core/version.h"

namespace tenure::cli {

void add_commands(CLI::App& app, const Console& console) {
  app.name("tenure");
  app.description(
      "tenure: replacement analysis for equipment. Economic service life, defender against\n"
      "challenger, after-tax cash flows with depreciation, and when to replace.");
  app.set_version_flag("-V,--version", std::string("tenure ") + kVersion);
  app.require_subcommand(1);
  app.footer(
      "Examples:\n"
      "  tenure case fixtures/cases/delivery_van.json\n"
      "  tenure schedule --method macrs --life 5 --basis 52000\n"
      "  tenure demo --db demo.db && tenure review --db demo.db\n"
      "Run 'tenure COMMAND --help' for a command's options.");
  add_case_command(app, console);
  add_schedule_command(app, console);
  add_demo_command(app, console);
  add_review_command(app, console);
  add_policy_command(app, console);
  add_explain_command(app, console);
  add_report_command(app, console);
  add_due_command(app, console);
  add_repair_command(app, console);
  add_help_command(app, console);
}

}  // namespace tenure::cli
