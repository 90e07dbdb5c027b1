// `tenure repair --db PATH ASSET --estimate R [--run N] [--format text|json]`: at the counter
// (SPEC 11), repair or replace one asset for a repair estimate paid now, from a stored run's
// inputs as `tenure explain` rebuilds them (app/repair_check.h): repair when R is within the
// asset's repair limit, with the years to keep it after repairing. An asset the run did not
// weigh gets a line saying why.
#include <memory>
#include <optional>
#include <string>

#include "app/repair_check.h"
#include "cli/commands.h"
#include "formats/json_text.h"
#include "formats/repair_output.h"

namespace tenure::cli {
namespace {

struct RepairOptions {
  std::string db;
  std::string asset;
  double estimate = 0;
  std::optional<std::int64_t> run;
  std::string format = "text";
};

void run_repair(const RepairOptions& o, const Console& console) {
  review::require_repair_estimate(o.estimate, "--estimate");  // named as the option, first
  db::Connection db = db::Connection::open_existing(o.db, "--db");
  const app::RepairCheck check = app::check_repair(db, o.asset, o.estimate, o.run);
  if (o.format == "json") {
    console.out << formats::json_output(formats::repair_check_to_json(check)) << '\n';
  } else {
    console.out << formats::repair_check_text(check);
  }
}

}  // namespace

void add_repair_command(CLI::App& app, const Console& console) {
  auto o = std::make_shared<RepairOptions>();
  CLI::App* command = app.add_subcommand(
      "repair", "Repair or replace one asset, for a repair estimate, from a stored run");
  add_db_option(*command, o->db, "the maintenance database (SQLite file)");
  command->add_option("ASSET", o->asset, "the asset_id to weigh the repair for")->required();
  command->add_option("--estimate", o->estimate, "the repair's cost, paid now (>= 0)")
      ->type_name("AMOUNT")
      ->required();
  command->add_option("--run", o->run, "the run to read; default: the latest successful run")
      ->type_name("N");
  add_format_option(*command, o->format, {"text", "json"},
                    "tables for people (the default) or JSON");
  command->footer(
      "Repair when the estimate is within the asset's repair limit: the largest one-time repair,\n"
      "paid now with the costs ahead unchanged, still worth making rather than replacing now\n"
      "(after tax the repair is expensed, deducted at the end of year 1). Prints the verdict\n"
      "(REPAIR or REPLACE), the limit, how long to keep the asset after repairing it (k*) and the\n"
      "reason; an asset the run did not weigh (retired, rejected, not yet in service, a class\n"
      "without a cost curve) gets a line saying which. The asset is rebuilt from the run's stored\n"
      "inputs with the review's own code, as 'tenure explain' does.\n"
      "Exit codes: 0 an answer, 1 the database cannot be read or a stored figure is not\n"
      "reproduced, 2 bad arguments or an asset not in the asset relation.\n"
      "\n"
      "Examples, on the invented demo fleet reviewed as of 2026-11-30\n"
      "(tenure demo --db demo.db && tenure review --db demo.db --as-of 2026-11-30):\n"
      "  tenure repair --db demo.db FLT-00137 --estimate 2500      # REPAIR: within its limit\n"
      "  tenure repair --db demo.db FLT-00137 --estimate 5000 --format json\n"
      "  tenure repair --db demo.db FLT-00049 --estimate 800       # REPLACE: due now anyway\n"
      "  tenure repair --db demo.db VAN-00080 --estimate 300       # retired: nothing to repair\n"
      "  tenure repair --db demo.db PMP-00060 --estimate 1200 --run 1");
  command->callback([o, console] { run_repair(*o, console); });
}

}  // namespace tenure::cli
