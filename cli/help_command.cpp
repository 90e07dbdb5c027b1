// `tenure help [COMMAND...]`: the help of the app or of a command, as `--help` prints it, for
// users who type the word ("tenure help review" is "tenure review --help").
#include <memory>
#include <string>
#include <vector>

#include "cli/commands.h"
#include "cli/usage_errors.h"

namespace tenure::cli {

void add_help_command(CLI::App& app, const Console& console) {
  auto words = std::make_shared<std::vector<std::string>>();
  CLI::App* command = app.add_subcommand("help", "Print the help of tenure or of a command");
  command->add_option("COMMAND", *words, "a command, e.g. review, or policy set");
  command->callback([&app, words, console] {
    const CLI::App* target = &app;
    std::string name = app.get_name();  // "tenure policy set": the usage line's whole command
    for (const std::string& word : *words) {
      const std::vector<const CLI::App*> named =
          target->get_subcommands([&](const CLI::App* c) { return c->check_name(word); });
      if (named.empty()) throw unknown_command(word, *target);
      target = named.front();
      name += " " + target->get_name();
    }
    // Not target->help(): on the app it would print the help of the chosen command, this one.
    console.out << target->get_formatter()->make_help(target, name, CLI::AppFormatMode::Normal);
  });
}

}  // namespace tenure::cli
