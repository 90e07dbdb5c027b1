// `tenure case FILE`: one replacement analysis from a case file (SPEC 5), as JSON or tables.
#include <memory>
#include <string>

#include "app/case_run.h"
#include "cli/commands.h"
#include "cli/input_file.h"
#include "formats/json_text.h"

namespace tenure::cli {
namespace {

struct CaseOptions {
  std::string file;
  std::string format = "text";
};

void run_case(const CaseOptions& options, const Console& console) {
  const std::string text = read_input_file(options.file, console.in);
  if (options.format == "text") {
    console.out << app::case_result_tables(text);
  } else {
    console.out << formats::json_output(app::case_result_json(text)) << '\n';
  }
}

}  // namespace

void add_case_command(CLI::App& app, const Console& console) {
  auto options = std::make_shared<CaseOptions>();
  CLI::App* command = app.add_subcommand(
      "case", "Analyse one replacement case file: economic life, keep or replace, and when");
  command->add_option("FILE", options->file, "the case file (JSON); '-' reads standard input")
      ->required();
  add_format_option(*command, options->format, {"text", "json"},
                    "tables for people (the default) or the whole result as JSON");
  command->footer(
      "The case file (JSON; // and /* */ comments allowed) gives marr and income_tax_rate,\n"
      "optionally after_tax_marr and capital_gains_tax_rate, a challenger (first_cost,\n"
      "operating_costs, market_values, depreciation), optionally a defender (the same plus\n"
      "age_years and market_value_now) and optionally study_period_years. Instead of one\n"
      "challenger, challengers lists several, each with a name and an optional cost_factor on\n"
      "its operating_costs; improvement (in [0, 1)) makes a challenger bought k years later\n"
      "(1 - improvement)^k times as dear. The result gives each challenger's economic service\n"
      "life before and after tax and names the one weighed, the defender's best remaining\n"
      "life and marginal costs, when to replace, and the study period's options.\n"
      "Errors name the JSON path and the rule, e.g. '$.challenger.first_cost: must be > 0'.\n"
      "\n"
      "Examples:\n"
      "  tenure case fixtures/cases/delivery_van.json\n"
      "  tenure case fixtures/cases/delivery_van_choices.json\n"
      "  tenure case - --format json < my_case.json > result.json");
  command->callback([options, console] { run_case(*options, console); });
}

}  // namespace tenure::cli
