// `tenure review`: the nightly run on a maintenance database (SPEC 6 to 8). Reads the stored or
// given policy, reviews every asset, writes the results in one transaction, and ends with a
// summary: a table for people on a terminal (--format text), one line for a log when the output
// is not a terminal or with -q (--format line), or JSON (--format json). With --scenario NAME
// the run is a what-if run: stored under that name, left out of the nightly views
// (db/schema.h), its "newly due" compared with the latest baseline run.
//
//   $ tenure review --db fleet.db -q >> /var/log/tenure.log
//   2026-12-02T02:15:07+0100 tenure review: run 7 as of 2026-12-02, 313 assets reviewed (keep
//   250, review 40, replace 23), due 63, newly due 5, 12 of 40210 rows rejected, 3.21 s
#include <unistd.h>

#include <cstdio>
#include <ctime>
#include <memory>
#include <optional>
#include <string>

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "cli/commands.h"
#include "cli/input_file.h"
#include "core/checks.h"
#include "core/errors.h"
#include "app/review_run.h"
#include "formats/caution.h"
#include "formats/json_text.h"
#include "formats/text_table.h"

namespace tenure::cli {
namespace {

struct ReviewCommandOptions {
  std::string db;
  std::optional<std::string> policy_file;  // given, even empty, or not
  std::optional<std::string> as_of;
  std::optional<std::string> scenario;
  std::string format_given;  // empty: text on a terminal, else line
  bool quiet = false;                 // the line, and no progress display
};

Date parse_as_of(const std::string& text) {
  const auto date = parse_iso_date(text);
  if (!date) throw InputError("--as-of", "'" + text + "' is not a valid date (YYYY-MM-DD)");
  return *date;
}

std::string summary_table(const app::RunSummary& s) {
  formats::TextTable t({"", ""}, 2);
  t.add_row({"run", std::to_string(s.run_id)});
  if (s.scenario) {
    t.add_row({"scenario", *s.scenario + " (a what-if run: the nightly views ignore it)"});
  }
  t.add_row({"as of", s.as_of});
  t.add_row({"basis", s.basis == replacement::Basis::after_tax ? "after tax" : "before tax"});
  t.add_row({"money", s.money == results::MoneyTerms::real
                          ? "real (costs restated; marr is a real rate)"
                          : "nominal (costs as recorded)"});
  t.add_row({"rows read", std::to_string(s.rows_read)});
  t.add_row({"rows rejected", std::to_string(s.rows_rejected)});
  t.add_row({"rows dated after as-of", std::to_string(s.rows_after_as_of)});
  t.add_row({"assets reviewed", std::to_string(s.assets_reviewed)});
  t.add_row({"keep", std::to_string(s.keep)});
  t.add_row({"review", std::to_string(s.review)});
  t.add_row({"replace", std::to_string(s.replace)});
  t.add_row({"due (review + replace)", std::to_string(s.due)});
  t.add_row({"newly due", std::to_string(s.newly_due) +
                              (s.scenario ? " (not due in the latest baseline run)" : "")});
  t.add_row({"time", fmt::format("read {:.2f} s, analyse and write {:.2f} s, commit {:.2f} s",
                                 s.read_seconds, s.analyse_write_seconds, s.commit_seconds)});
  return t.render();
}

nlohmann::json summary_json(const app::RunSummary& s) {
  return {{"run_id", s.run_id},           {"as_of", s.as_of},
          {"scenario", s.scenario ? nlohmann::json(*s.scenario) : nlohmann::json(nullptr)},
          {"basis", replacement::to_string(s.basis)},
          {"money", results::to_string(s.money)},
          {"rows_read", s.rows_read},     {"rows_rejected", s.rows_rejected},
          {"rows_after_as_of", s.rows_after_as_of},
          {"assets_reviewed", s.assets_reviewed},
          {"keep", s.keep},               {"review", s.review},
          {"replace", s.replace},         {"due", s.due},
          {"newly_due", s.newly_due},
          {"seconds", {{"read", s.read_seconds},
                       {"analyse_and_write", s.analyse_write_seconds},
                       {"commit", s.commit_seconds}}}};
}

// Now, on the machine's clock and in its time zone: "2026-12-02T02:15:07+0100".
std::string local_timestamp() {
  const std::time_t now = std::time(nullptr);
  std::tm local{};
  ::localtime_r(&now, &local);
  char text[32];
  return std::string(text, std::strftime(text, sizeof text, "%Y-%m-%dT%H:%M:%S%z", &local));
}

std::string summary_line(const app::RunSummary& s) {
  const std::string run = s.scenario ? fmt::format("what-if run {} '{}'", s.run_id, *s.scenario)
                                     : fmt::format("run {}", s.run_id);
  return fmt::format(
      "{} tenure review: {} as of {}, {} assets reviewed (keep {}, review {}, replace {}), due {}, "
      "newly due {}, {} of {} rows rejected, {:.2f} s\n",
      local_timestamp(), run, s.as_of, s.assets_reviewed, s.keep, s.review, s.replace, s.due,
      s.newly_due, s.rows_rejected, s.rows_read,
      s.read_seconds + s.analyse_write_seconds + s.commit_seconds);
}

std::string nightly_note(const app::RunSummary& s) {
  return fmt::format(
      "See the views tenure_latest, tenure_due, tenure_newly_due and tenure_class_latest;\n"
      "rejected rows are in tenure_rejected (run_id {}).\n",
      s.run_id);
}

std::string what_if_note(const app::RunSummary& s) {
  return fmt::format(
      "This is a what-if run (scenario '{0}'): the nightly views tenure_latest, tenure_due,\n"
      "tenure_newly_due and tenure_class_latest ignore it and still show the latest baseline\n"
      "run. Compare it with that run in tenure_scenario_diff (WHERE scenario = '{0}'), or read\n"
      "it with 'tenure explain --run {1}' and 'tenure report --run {1}'; rejected rows are in\n"
      "tenure_rejected (run_id {1}).\n",
      *s.scenario, s.run_id);
}

void run(const ReviewCommandOptions& o, const Console& console) {
  app::ReviewOptions options;
  if (o.policy_file) {
    if (o.policy_file->empty()) {
      throw InputError("--policy", "must not be empty: give a policy file, - for standard input, "
                                   "or leave it out for the policy stored in the database");
    }
    options.policy_json = read_input_file(*o.policy_file, console.in);
  }
  if (o.as_of) options.as_of = parse_as_of(*o.as_of);  // '' is not a date either
  if (o.scenario) require_scenario_name(*o.scenario, "--scenario");
  options.scenario = o.scenario;
  const bool show_progress = !o.quiet && ::isatty(STDERR_FILENO);
  if (show_progress) {
    options.progress = [&console](std::size_t done, std::size_t total) {
      console.err << fmt::format("\rreviewing assets {:>9}/{}", done, total) << std::flush;
      if (done == total) console.err << '\n';
    };
  }
  db::Connection db = db::Connection::open_existing(o.db, "--db");
  const app::RunSummary summary = app::run_review(db, options);
  const std::string format =
      o.quiet                   ? "line"
      : !o.format_given.empty() ? o.format_given
      : ::isatty(STDOUT_FILENO) ? "text"
                                : "line";
  if (format == "json") {
    console.out << formats::json_output(summary_json(summary)) << '\n';
    return;
  }
  if (format == "line") {
    console.out << summary_line(summary);
    return;
  }
  console.out << "tenure review: done\n"
              << summary_table(summary) << '\n'
              << (summary.scenario ? what_if_note(summary) : nightly_note(summary)) << '\n'
              << formats::kCaution << '\n';
}

}  // namespace

void add_review_command(CLI::App& app, const Console& console) {
  auto o = std::make_shared<ReviewCommandOptions>();
  CLI::App* command = app.add_subcommand(
      "review", "The nightly review: every asset's economic life, verdict and reason, into SQL views");
  add_db_option(*command, o->db, "the maintenance database (SQLite file)");
  command
      ->add_option("--policy", o->policy_file,
                   "policy file (JSON); default: the latest policy stored in the database")
      ->type_name("FILE");
  command
      ->add_option("--as-of", o->as_of,
                   "review as of this date (YYYY-MM-DD); default: today (the local date)")
      ->type_name("DATE");
  command
      ->add_option("--scenario", o->scenario,
                   "store a what-if run under this name (1 to 64 letters, digits, '-', '_', "
                   "'.'); the nightly views ignore it")
      ->type_name("NAME");
  CLI::Option* format = add_format_option(
      *command, o->format_given, {"text", "line", "json"},
      "the summary as a table for people, one line for a log, or JSON; default: text on a "
      "terminal, else line");
  command->add_flag("-q,--quiet", o->quiet, "the one-line summary and no progress display")
      ->excludes(format);
  command->footer(
      "Reads the relations named by the policy's sources (default asset, cost_event,\n"
      "asset_valuation) without writing them, fits each class's cost and value curves, weighs\n"
      "every asset in service against its class's challenger, and writes one run into the\n"
      "tenure_* tables in one transaction. Bad rows are skipped into tenure_rejected.\n"
      "With --scenario NAME the run is a what-if run: stored, shown in tenure_scenario_diff\n"
      "against the latest baseline run, and ignored by tenure_latest, tenure_due,\n"
      "tenure_newly_due and tenure_class_latest; its newly due counts the assets due in it\n"
      "that are not due in the latest baseline run.\n"
      "Exit codes: 0 done, 1 the database could not be read or written, 2 bad policy or input.\n"
      "\n"
      "Examples:\n"
      "  tenure review --db fleet.db\n"
      "  tenure review --db fleet.db -q >> /var/log/tenure-review.log   # from cron\n"
      "  tenure review --db fleet.db --policy policy.json --as-of 2026-11-30 --format json\n"
      "  tenure review --db fleet.db --policy dearer-vans.json --scenario price-up");
  command->callback([o, console] { run(*o, console); });
}

}  // namespace tenure::cli
