// `tenure report --db PATH --out FILE.html [--run N]`: one self-contained static HTML page about
// a stored run (SPEC 8): the fleet by verdict, per class its EUAC curves and ages against its
// economic life, the due list with reasons and a marginal-cost chart per due asset.
#include <memory>
#include <optional>
#include <string>

#include <fmt/format.h>

#include "app/report_run.h"
#include "cli/commands.h"
#include "cli/output_file.h"
#include "core/errors.h"
#include "formats/text_table.h"
#include "report/report_page.h"

namespace tenure::cli {
namespace {

struct ReportOptions {
  std::string db;
  std::string out;
  std::optional<std::int64_t> run;
};

void run_report(const ReportOptions& o, const Console& console) {
  db::Connection db = db::Connection::open_existing(o.db, "--db");
  const report::ReportData data = app::read_report_data(db, o.run);
  const std::string html = report::render_report(data);
  if (o.out == "-") {  // the page alone on standard output
    console.out << html;
    return;
  }
  write_whole_file(o.out, html, "--out");
  std::size_t due = 0;
  for (const results::AssetRow& a : data.assets) due += a.due() ? 1 : 0;
  formats::TextTable t({"", ""}, 2);
  t.add_row({"run", fmt::format("{} as of {}", data.run.run_id, data.run.as_of)});
  t.add_row({"assets", std::to_string(data.assets.size())});
  t.add_row({"classes", std::to_string(data.classes.size())});
  t.add_row({"due", std::to_string(due)});
  t.add_row({"page", fmt::format("{} ({} KiB)", o.out, (html.size() + 1023) / 1024)});
  console.out << "tenure report: written\n" << t.render();
}

}  // namespace

void add_report_command(CLI::App& app, const Console& console) {
  auto o = std::make_shared<ReportOptions>();
  CLI::App* command = app.add_subcommand(
      "report", "A static HTML page with charts of a stored run, for people who sign off a plan");
  add_db_option(*command, o->db, "the maintenance database (SQLite file)");
  command
      ->add_option("--out", o->out, "the HTML file to write; - writes the page to standard output")
      ->type_name("FILE")
      ->required();
  command->add_option("--run", o->run, "the run to report; default: the latest baseline run")
      ->type_name("N");
  command->footer(
      "One self-contained file: inline styles and SVG charts, no script, nothing fetched from\n"
      "the network, and a print layout. It shows the fleet by verdict, per class the EUAC of a\n"
      "new unit before and after tax against years kept with the economic life marked and the\n"
      "ages of the units in service against it, the due list with reasons, each due asset's\n"
      "marginal cost of keeping against the new unit's least EUAC, and the rejected input rows.\n"
      "--out - writes the page alone to standard output. Anything at the path that is not a\n"
      "regular file (a device, a directory, a symbolic link) is refused, never replaced.\n"
      "Exit codes: 0 written, 1 the database cannot be read or the file cannot be written (a\n"
      "full disk), 2 bad arguments, no such run, or an output path that cannot be used.\n"
      "\n"
      "Examples:\n"
      "  tenure report --db fleet.db --out review.html\n"
      "  tenure report --db fleet.db --out run3.html --run 3");
  command->callback([o, console] { run_report(*o, console); });
}

}  // namespace tenure::cli
