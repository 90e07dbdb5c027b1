// `tenure explain --db PATH ASSET [--run N] [--format text|json]`: one asset's whole computation
// from a stored run (SPEC 8), as tables a person can audit or as JSON. The figures are recomputed
// from the run's stored inputs with the review's own code; when a stored figure is not
// reproduced exactly the explanation is still printed, and the command fails (exit 1) naming it.
#include <memory>
#include <optional>
#include <string>

#include <fmt/format.h>

#include "cli/commands.h"
#include "core/errors.h"
#include "db/run_reader.h"
#include "explain/explain_json.h"
#include "explain/explain_text.h"
#include "formats/policy_json.h"

namespace tenure::cli {
namespace {

struct ExplainOptions {
  std::string db;
  std::string asset;
  std::optional<std::int64_t> run;
  std::string format = "text";
};

explain::Explanation read_explanation(const ExplainOptions& o) {
  db::Connection db = db::Connection::open_existing(o.db, "--db");
  db::Transaction snapshot(db, db::Transaction::Kind::deferred);
  explain::StoredRun run = db::read_run(db, o.run);
  auto asset = db::read_asset_result(db, run.run_id, o.asset);
  if (!asset) {
    throw InputError("ASSET", fmt::format("no asset '{}' in run {}", o.asset, run.run_id));
  }
  auto stored_class = db::read_class_result(db, run.run_id, asset->asset_class);
  if (!stored_class) {
    throw RuntimeFailure(fmt::format("run {} has no row for class '{}'", run.run_id,
                                     asset->asset_class));
  }
  // Only the sources are needed here; explain_asset reads the whole policy again.
  const review::Sources sources = formats::read_policy(run.policy_json).sources;
  auto input = db::read_input_asset(db, sources, o.asset);
  snapshot.commit();
  return explain::explain_asset(std::move(run), std::move(*stored_class), std::move(*asset),
                                std::move(input));
}

void run_explain(const ExplainOptions& o, const Console& console) {
  const explain::Explanation e = read_explanation(o);
  if (o.format == "json") {
    console.out << explain::explanation_to_json(e).dump(2) << '\n';
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
  command->add_option("--db", o->db, "the maintenance database (SQLite file)")->required();
  command->add_option("ASSET", o->asset, "the asset_id to explain")->required();
  command->add_option("--run", o->run, "the run to read; default: the latest successful run")
      ->type_name("N");
  command->add_option("--format", o->format, "text (the default) or json")
      ->type_name("FORMAT")
      ->check(CLI::IsMember({"text", "json"}));
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
      "  tenure explain --db fleet.db PU-0042\n"
      "  tenure explain --db fleet.db PU-0042 --run 3 --format json");
  command->callback([o, console] { run_explain(*o, console); });
}

}  // namespace tenure::cli
