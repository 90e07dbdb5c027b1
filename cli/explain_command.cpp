// `tenure explain --db PATH ASSET [--run N] [--format text|json]`: one asset's whole computation
// from a stored run (SPEC 8), as tables a person can audit or as JSON. The figures are recomputed
// from the run's stored inputs with the review's own code; when a stored figure is not
// reproduced exactly the explanation is still printed, and the command fails (exit 1) naming it.
#include <memory>
#include <optional>
#include <string>

#include <fmt/format.h>

#include "app/explain_run.h"
#include "cli/commands.h"
#include "core/errors.h"
#include "explain/explain_json.h"
#include "explain/explain_text.h"
#include "formats/json_text.h"

namespace tenure::cli {
namespace {

struct ExplainOptions {
  std::string db;
  std::string asset;
  std::optional<std::int64_t> run;
  std::string format = "text";
};

void run_explain(const ExplainOptions& o, const Console& console) {
  db::Connection db = db::Connection::open_existing(o.db, "--db");
  const explain::Explanation e = app::explain_stored_asset(db, o.asset, o.run);
  if (o.format == "json") {
    console.out << formats::json_output(explain::explanation_to_json(e), 2, {"equivalent_case"})
                << '\n';
  } else {
    console.out << explain::explanation_to_text(e);
  }
  if (!e.reproduced()) {
    std::string what = "stored figures differ from the recomputation:";
    for (const std::string& d : e.differences) what += " " + d + ";";
    what.pop_back();
    throw RuntimeFailure(what);
  }
}

}  // namespace

void add_explain_command(CLI::App& app, const Console& console) {
  auto o = std::make_shared<ExplainOptions>();
  CLI::App* command = app.add_subcommand(
      "explain", "One asset's whole computation from a stored run, as tables a person can audit");
  add_db_option(*command, o->db, "the maintenance database (SQLite file)");
  command->add_option("ASSET", o->asset, "the asset_id to explain")->required();
  command->add_option("--run", o->run, "the run to read; default: the latest baseline run")
      ->type_name("N");
  add_format_option(*command, o->format, {"text", "json"},
                    "tables for people (the default) or JSON");
  command->footer(
      "Shows the inputs (age, first cost, book and market value now and where they came from),\n"
      "the policy rates and whether money is real or nominal, the class's fitted curves, the\n"
      "asset's own cost history against the curve and its credibility factor, the after-tax\n"
      "cash flows with present worth, EUAC and marginal cost by years kept for defender and\n"
      "challenger, the replacement timing with k*, and the verdict with its rule.\n"
      "Everything is recomputed from the run's stored inputs with the review's own code.\n"
      "Exit codes: 0 done, 1 a stored figure is not reproduced (named on stderr) or the database\n"
      "cannot be read, 2 bad arguments or an asset not in the run.\n"
      "\n"
      "Examples:\n"
      "  tenure explain --db demo.db FLT-00109\n"
      "  tenure explain --db demo.db FLT-00109 --run 1 --format json");
  command->callback([o, console] { run_explain(*o, console); });
}

}  // namespace tenure::cli
