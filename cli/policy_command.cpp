// `tenure policy`: check a policy file, store it in the database, show the stored one.
#include <memory>
#include <string>

#include <fmt/format.h>

#include "cli/commands.h"
#include "cli/input_file.h"
#include "core/errors.h"
#include "db/policy_store.h"
#include "formats/json_text.h"
#include "formats/policy_json.h"

namespace tenure::cli {
namespace {

struct PolicyOptions {
  std::string db;
  std::string file;
};

void check(const PolicyOptions& o, const Console& console) {
  const review::Policy policy = formats::read_policy(read_input_file(o.file, console.in));
  console.out << fmt::format("{}: a valid policy with {} asset class{}\n", o.file,
                             policy.classes.size(), policy.classes.size() == 1 ? "" : "es");
}

// Two policy texts with the same values: comments and layout aside.
bool same_values(const std::string& a, const std::string& b) {
  try {
    return formats::parse_json_text(a) == formats::parse_json_text(b);
  } catch (const InputError&) {
    return false;  // a stored text this version cannot read is not the same policy
  }
}

void set(const PolicyOptions& o, const Console& console) {
  const std::string text = read_input_file(o.file, console.in);
  formats::read_policy(text);  // refuse a bad policy before storing it
  db::Connection db = db::Connection::open_existing(o.db, "--db");
  const auto latest = db::latest_stored_policy(db);
  if (latest && same_values(latest->text, text)) {
    console.out << fmt::format(
        "policy {} in {} (stored {}) already has these values: nothing stored\n",
        latest->policy_id, o.db, latest->stored_at);
    return;
  }
  const auto id = db::store_policy(db, text);
  console.out << fmt::format("stored policy {} in {}\n", id, o.db);
}

// The text as stored, under a comment line (a policy file may have comments) naming it, so that
// the output is still a policy file.
void show(const PolicyOptions& o, const Console& console) {
  db::Connection db = db::Connection::open_existing(o.db, "--db");
  const auto latest = db::latest_stored_policy(db);
  if (!latest) throw InputError("--db", "no policy is stored in '" + o.db + "'");
  console.out << fmt::format("// policy {}, stored {}\n", latest->policy_id, latest->stored_at)
              << latest->text;
  if (latest->text.empty() || latest->text.back() != '\n') console.out << '\n';
}

}  // namespace

void add_policy_command(CLI::App& app, const Console& console) {
  CLI::App* command = app.add_subcommand(
      "policy", "Check a policy file, store it in the database, or show the stored one");
  command->require_subcommand(1);
  command->footer(
      "Examples:\n"
      "  tenure policy check policy.json\n"
      "  tenure policy set --db fleet.db policy.json\n"
      "  tenure policy show --db fleet.db");

  auto check_options = std::make_shared<PolicyOptions>();
  CLI::App* check_command =
      command->add_subcommand("check", "Check a policy file and say what is wrong");
  check_command
      ->add_option("FILE", check_options->file, "the policy file (JSON); '-' reads standard input")
      ->required();
  check_command->callback([check_options, console] { check(*check_options, console); });

  auto set_options = std::make_shared<PolicyOptions>();
  CLI::App* set_command = command->add_subcommand(
      "set",
      "Check a policy file and store it, unless the latest stored one has the same values; the "
      "nightly review uses the latest stored");
  add_db_option(*set_command, set_options->db, "the maintenance database (SQLite file)");
  set_command
      ->add_option("FILE", set_options->file, "the policy file (JSON); '-' reads standard input")
      ->required();
  set_command->callback([set_options, console] { set(*set_options, console); });

  auto show_options = std::make_shared<PolicyOptions>();
  CLI::App* show_command = command->add_subcommand(
      "show", "Print the latest stored policy, under a comment line with its id and date");
  add_db_option(*show_command, show_options->db, "the maintenance database (SQLite file)");
  show_command->callback([show_options, console] { show(*show_options, console); });
}

}  // namespace tenure::cli
