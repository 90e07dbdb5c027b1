// `tenure demo`: builds the demo database of "Larkmoor Water", an invented water utility: its
// fleet as the three host relations (asset, cost_event, asset_valuation), with a handful of bad
// rows on purpose, and its policy stored, ready for `tenure review`.
//
//   tenure demo --db demo.db
//   tenure demo --db big.db --assets 100000 --events 10000000 --seed 7
#include <fmt/format.h>

#include <chrono>
#include <cmath>
#include <map>
#include <memory>
#include <optional>
#include <string>

#include "cli/commands.h"
#include "core/errors.h"
#include "db/demo_writer.h"

namespace tenure::cli {
namespace {

struct DemoCommandOptions {
  std::string db;
  demo::Options generator;
  std::optional<std::string> as_of;  // given, even empty, or not
  bool force = false;
  bool no_bad_rows = false;
  CLI::Option* events_given = nullptr;
};

// The generator's option names as the command's.
const std::map<std::string, std::string, std::less<>> kOptionForField = {
    {"assets", "--assets"}, {"events", "--events"}, {"as_of", "--as-of"}};

std::string bad_rows_in(const demo::Summary& summary, std::string_view relation) {
  std::size_t count = 0;
  for (const demo::BadRow& bad : summary.bad_rows) count += bad.relation == relation ? 1 : 0;
  if (count == 0) return "";
  return fmt::format(" (of which {} bad on purpose)", count);
}

// Runs `step`; an option the generator rejects is named as the command's option.
template <class Step>
auto named_as_options(Step&& step) {
  try {
    return step();
  } catch (const InputError& error) {
    const auto option = kOptionForField.find(error.where());
    if (option == kOptionForField.end()) throw;
    throw InputError(option->second, error.rule());
  }
}

db::DemoWrite write(db::Connection& db, const DemoCommandOptions& o) {
  return named_as_options([&] {
    return db::write_demo_fleet(
        db, o.generator,
        o.force ? db::ExistingDemoTables::replace : db::ExistingDemoTables::refuse);
  });
}

void run_demo(DemoCommandOptions o, const Console& console) {
  if (o.as_of) {  // given, even empty
    const auto as_of = parse_iso_date(*o.as_of);
    if (!as_of) throw InputError("--as-of", "'" + *o.as_of + "' is not a valid date (YYYY-MM-DD)");
    o.generator.as_of = *as_of;
  }
  if (o.events_given->count() == 0) {
    // Keep the default demo's density of events per asset.
    o.generator.events = static_cast<std::size_t>(std::llround(
        static_cast<double>(o.generator.assets) * demo::kDefaultEvents / demo::kDefaultAssets));
  }
  o.generator.bad_rows = !o.no_bad_rows;
  named_as_options([&] { demo::check_options(o.generator); });  // before a file is made

  const auto started = std::chrono::steady_clock::now();
  db::Connection db = db::Connection::open(o.db, true);
  const db::DemoWrite written = write(db, o);
  const std::chrono::duration<double> took = std::chrono::steady_clock::now() - started;

  const demo::Summary& s = written.summary;
  const std::string as_of = o.generator.as_of.to_iso();
  console.out << fmt::format(
      "Demo fleet of Larkmoor Water (an invented water utility; all data invented) written to {}\n"
      "  assets       {:>10}{}\n"
      "  cost events  {:>10}{}\n"
      "  valuations   {:>10}{}\n"
      "  bad rows     {:>10}{}\n"
      "  policy       stored as policy_id {}; as of {}, seed {}, built in {:.1f} s\n"
      "Next: tenure review --db {} --as-of {}\n",
      o.db, s.assets, bad_rows_in(s, "asset"), s.events, bad_rows_in(s, "cost_event"), s.valuations,
      bad_rows_in(s, "asset_valuation"), s.bad_rows.size(),
      s.bad_rows.empty() ? "" : " injected on purpose; the review lists each in tenure_rejected",
      written.policy_id, as_of, o.generator.seed, took.count(), o.db, as_of);
}

}  // namespace

void add_demo_command(CLI::App& app, const Console& console) {
  auto o = std::make_shared<DemoCommandOptions>();
  CLI::App* command = app.add_subcommand(
      "demo", "Build a demo database: the invented fleet of Larkmoor Water, with its policy");
  // Never $TENURE_DB: a demo --force there would replace the real database.
  command->add_option("--db", o->db, "database file to write (created when missing)")
      ->type_name("PATH")
      ->required();
  command
      ->add_option("--assets", o->generator.assets,
                   fmt::format("number of assets (default {})", demo::kDefaultAssets))
      ->type_name("N");
  o->events_given =
      command
          ->add_option("--events", o->generator.events,
                       fmt::format("target number of cost events (default {} per {} assets)",
                                   demo::kDefaultEvents, demo::kDefaultAssets))
          ->type_name("M");
  command->add_option("--seed", o->generator.seed, "random seed; the same seed, the same fleet")
      ->type_name("S");
  command
      ->add_option(
          "--as-of", o->as_of,
          fmt::format("the fleet's as-of date (default {})", demo::default_as_of().to_iso()))
      ->type_name("DATE");
  command->add_flag("--force", o->force,
                    "replace existing asset, cost_event and asset_valuation tables (earlier "
                    "tenure_ results stay; remove the file for a fresh start)");
  command->add_flag("--no-bad-rows", o->no_bad_rows,
                    "leave out the handful of bad rows injected on purpose");
  command->footer(
      "All names, prices and costs are invented. Events are stored in the order a live system\n"
      "appends them, with an index on cost_event(asset_id, occurred_on).\n"
      "\n"
      "Examples:\n"
      "  tenure demo --db demo.db\n"
      "  tenure demo --db big.db --assets 100000 --events 10000000");
  command->callback([o, console] { run_demo(*o, console); });
}

}  // namespace tenure::cli
