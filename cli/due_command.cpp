// `tenure due --db PATH [--newly] [--class C] [--format text|csv|json] [--run N]`: the morning
// list of a stored run without SQL: its assets whose verdict is review or replace, the most
// urgent first, with what is at stake for each and its reason (app/due_list.h reads it,
// formats/due_list_output.h writes it).
#include <cstdint>
#include <memory>
#include <optional>
#include <string>

#include <nlohmann/json.hpp>

#include "app/due_list.h"
#include "cli/commands.h"
#include "formats/due_list_output.h"
#include "formats/json_text.h"

namespace tenure::cli {
namespace {

struct DueOptions {
  std::string db;
  bool newly = false;
  std::optional<std::string> asset_class;
  std::string format = "text";
  std::optional<std::int64_t> run;
};

void run_due(const DueOptions& o, const Console& console) {
  db::Connection db = db::Connection::open_existing(o.db, "--db");
  const formats::DueList list =
      app::read_due_list(db, o.run, {.newly = o.newly, .asset_class = o.asset_class});
  if (o.format == "csv") {
    console.out << formats::due_list_csv(list);
  } else if (o.format == "json") {
    console.out << formats::json_output(formats::due_list_json(list)) << '\n';
  } else {
    console.out << formats::due_list_table(list);
  }
}

}  // namespace

void add_due_command(CLI::App& app, const Console& console) {
  auto o = std::make_shared<DueOptions>();
  CLI::App* command = app.add_subcommand(
      "due", "The due list of a stored run: the assets to review or replace, most urgent first");
  add_db_option(*command, o->db, "the maintenance database (SQLite file)");
  command->add_flag("--newly", o->newly, "only the assets that were not due in the run before");
  command->add_option("--class", o->asset_class, "only the assets of this class")
      ->type_name("CLASS");
  add_format_option(*command, o->format, {"text", "csv", "json"},
                    "a table for people (the default), CSV for a spreadsheet, or JSON");
  command->add_option("--run", o->run, "the run to read; default: the latest successful run")
      ->type_name("N");
  command->footer(
      "Lists the run's assets whose verdict is review or replace, as the view tenure_due does,\n"
      "ordered by the largest delay cost (what replacing a year after the best time costs; none\n"
      "last), then replace before review, then asset_id. Columns: asset_id, asset_class,\n"
      "verdict, age_years, replace_after_years, delay_cost, early_cost, repair_limit,\n"
      "break_even_price, close_call, newly_due (not due in the run before, as the view\n"
      "tenure_newly_due) and reason; money is present worth at the run's as-of date on its\n"
      "basis. The table ends with the caution; csv (RFC 4180, CRLF line ends, numbers in full\n"
      "precision, an empty field for none) and json (null for none) are for tools.\n"
      "Exit codes: 0 done (also when nothing is due), 1 the database cannot be read, 2 bad\n"
      "arguments, no such run or a class the run does not have.\n"
      "\n"
      "Examples, on the demo fleet (tenure demo --db demo.db, then\n"
      "tenure review --db demo.db --as-of 2026-11-30):\n"
      "  tenure due --db demo.db\n"
      "  tenure due --db demo.db --newly --class van-service\n"
      "  tenure due --db demo.db --class pump-centrifugal --format csv > pumps-due.csv\n"
      "  tenure due --db demo.db --run 1 --format json\n"
      "  tenure explain --db demo.db VAN-00087      # the computation behind one row");
  command->callback([o, console] { run_due(*o, console); });
}

}  // namespace tenure::cli
