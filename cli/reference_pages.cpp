// The manual page and the bash completion of `tenure`, read off its CLI11 app (see
// reference_pages.h).
#include "cli/reference_pages.h"

#include <fmt/format.h>

#include <sstream>
#include <vector>

#include "core/version.h"
#include "formats/caution.h"

namespace tenure::cli {
namespace {

// One option or argument as a page and a completion need it.
struct Entry {
  std::vector<std::string> names;  // "-q", "--quiet"; or the argument's name, "FILE"
  bool positional = false;
  bool takes_value = false;
  std::string type;                  // "PATH", "FORMAT", ...
  std::vector<std::string> choices;  // from an IsMember check: "text", "json"
  std::string description;
  bool required = false;
};

// One command: "review", "policy set"; the app itself has an empty path.
struct Command {
  std::string path;
  std::string description;
  std::string footer;
  std::vector<Entry> entries;
  std::vector<std::string> subcommands;
};

bool names_a_file(const Entry& e) { return e.type == "PATH" || e.type == "FILE"; }

Entry entry_of(CLI::Option& option) {
  Entry e;
  for (const std::string& s : option.get_snames()) e.names.push_back("-" + s);
  for (const std::string& l : option.get_lnames()) e.names.push_back("--" + l);
  e.positional = e.names.empty();
  if (e.positional) e.names.push_back(option.get_name(true));
  e.takes_value = option.get_items_expected_max() > 0;
  // get_type_name() is "FORMAT:{text,json}" when a check lists the choices.
  const std::string full = option.get_type_name();
  e.type = full.substr(0, full.find(':'));
  if (const std::size_t open = full.find(":{"); open != std::string::npos) {
    std::istringstream listed(full.substr(open + 2, full.find('}', open) - open - 2));
    for (std::string choice; std::getline(listed, choice, ',');) e.choices.push_back(choice);
  }
  e.description = option.get_description();
  e.required = option.get_required();
  return e;
}

void collect(CLI::App& app, const std::string& path, std::vector<Command>& out) {
  Command c{path, app.get_description(), app.get_footer(), {}, {}};
  for (CLI::Option* option : app.get_options({})) {
    if (option->get_lnames() == std::vector<std::string>{"help"}) continue;  // in every command
    c.entries.push_back(entry_of(*option));
  }
  std::vector<CLI::App*> subcommands = app.get_subcommands([](CLI::App*) { return true; });
  for (CLI::App* sub : subcommands) c.subcommands.push_back(sub->get_name());
  out.push_back(std::move(c));
  for (CLI::App* sub : subcommands) {
    collect(*sub, path.empty() ? sub->get_name() : path + " " + sub->get_name(), out);
  }
}

std::vector<Command> commands_of(CLI::App& app) {
  std::vector<Command> out;
  collect(app, "", out);
  return out;
}

// Backslashes and hyphens escaped for troff.
std::string escaped(const std::string& text) {
  std::string out;
  for (const char c : text) {
    if (c == '\\') {
      out += "\\e";
    } else if (c == '-') {
      out += "\\-";
    } else {
      out += c;
    }
  }
  return out;
}

// Text as troff lines: escaped, each line ended, a leading dot or quote guarded.
std::string roff(const std::string& text) {
  std::string guarded;
  std::istringstream lines(escaped(text));
  for (std::string line; std::getline(lines, line);) {
    if (!line.empty() && (line[0] == '.' || line[0] == '\'')) guarded += "\\&";
    guarded += line + "\n";
  }
  return guarded;
}

std::string option_heading(const Entry& e) {
  std::string heading;
  for (const std::string& name : e.names) {
    heading += fmt::format("{}\\fB{}\\fR", heading.empty() ? "" : ", ", escaped(name));
  }
  if (e.takes_value && !e.positional) heading += fmt::format(" \\fI{}\\fR", e.type);
  return heading;
}

std::string shell_words(const std::vector<std::string>& words) {
  return fmt::format("{}", fmt::join(words, " "));
}

}  // namespace

std::string man_page(CLI::App& app) {
  const std::vector<Command> commands = commands_of(app);
  std::string page = fmt::format(
      ".TH TENURE 1 \"\" \"tenure {}\" \"User Commands\"\n"
      ".SH NAME\ntenure \\- replacement analysis for equipment\n"
      ".SH SYNOPSIS\n.B tenure\n.I command\n[\\fIoptions\\fR]\n"
      ".SH DESCRIPTION\n{}",
      kVersion, roff(commands.front().description));
  page += ".SH COMMANDS\n";
  for (const Command& c : commands) {
    if (c.path.empty() || !c.subcommands.empty()) {
      if (!c.path.empty()) page += fmt::format(".SS \"tenure {}\"\n{}", c.path, roff(c.description));
      continue;
    }
    page += fmt::format(".SS \"tenure {}\"\n{}", c.path, roff(c.description));
    for (const Entry& e : c.entries) {
      const std::string choices =
          e.choices.empty() ? "" : fmt::format(" One of: {}.", fmt::join(e.choices, ", "));
      page += fmt::format(".TP\n{}\n{}", option_heading(e),
                          roff(e.description + (e.required ? " (required)" : "") + choices));
    }
    if (!c.footer.empty()) page += ".PP\n.nf\n" + roff(c.footer) + ".fi\n";
  }
  page +=
      ".SH EXIT STATUS\n"
      ".TP\n0\nthe command did its job; also \\fB\\-\\-help\\fR and \\fB\\-\\-version\\fR\n"
      ".TP\n1\na failure that is not the input's fault (a database that cannot be read or "
      "written)\n"
      ".TP\n2\nbad input or usage, with one line on standard error: "
      "\\fItenure command\\fR: \\fIwhere\\fR: \\fIrule\\fR\n"
      ".SH ENVIRONMENT\n"
      ".TP\nTENURE_DB\nthe database of \\fB\\-\\-db\\fR when it is not given (not for "
      "\\fBdemo\\fR)\n"
      ".TP\nTZ\nthe time zone of the local date a review defaults to, and of the time in its "
      "one-line log summary\n"
      ".TP\nNO_COLOR\ntenure prints no colour, with or without it\n"
      ".SH CAUTION\n";
  page += roff(std::string(formats::kCaution));
  return page;
}

std::string bash_completion(CLI::App& app) {
  const std::vector<Command> commands = commands_of(app);
  std::string commands_case;  // the words that lead from one command to the next
  std::string values_case;    // an option's value: its choices, or a file name
  std::string words_case;     // what may come next in a command
  for (const Command& c : commands) {
    for (const std::string& sub : c.subcommands) {
      const std::string next = c.path.empty() ? sub : c.path + " " + sub;
      commands_case += fmt::format("      \"{}|{}\") path=\"{}\" ;;\n", c.path, sub, next);
    }
    std::vector<std::string> words = c.subcommands;
    bool takes_file = false;
    for (const Entry& e : c.entries) {
      if (e.positional) {
        takes_file = takes_file || names_a_file(e) || e.names.front() == "FILE";
        continue;
      }
      words.insert(words.end(), e.names.begin(), e.names.end());
      if (!e.takes_value) continue;
      for (const std::string& name : e.names) {
        if (!e.choices.empty()) {
          values_case += fmt::format("    \"{}|{}\") COMPREPLY=($(compgen -W \"{}\" -- \"$cur\")); "
                                     "return ;;\n",
                                     c.path, name, shell_words(e.choices));
        } else if (names_a_file(e)) {
          values_case += fmt::format(
              "    \"{}|{}\") COMPREPLY=($(compgen -f -- \"$cur\")); return ;;\n", c.path, name);
        } else {  // a number, a date, a name: nothing to offer
          values_case += fmt::format("    \"{}|{}\") return ;;\n", c.path, name);
        }
      }
    }
    words.push_back("--help");
    words_case += fmt::format(
        "    \"{}\") COMPREPLY=($(compgen -W \"{}\" -- \"$cur\")){} ;;\n", c.path,
        shell_words(words),
        takes_file ? "\n      [[ $cur == -* ]] || COMPREPLY+=($(compgen -f -- \"$cur\"))" : "");
  }
  return fmt::format(
      "# bash completion for tenure {0}, made from its command line by tenure_reference_pages.\n"
      "# Installed in share/bash-completion/completions/tenure; or: source this file.\n"
      "_tenure() {{\n"
      "  local cur=${{COMP_WORDS[COMP_CWORD]}} prev=${{COMP_WORDS[COMP_CWORD-1]}}\n"
      "  local path=\"\" i\n"
      "  for ((i = 1; i < COMP_CWORD; i++)); do\n"
      "    case \"$path|${{COMP_WORDS[i]}}\" in\n"
      "{1}"
      "    esac\n"
      "  done\n"
      "  case \"$path|$prev\" in\n"
      "{2}"
      "  esac\n"
      "  case \"$path\" in\n"
      "{3}"
      "  esac\n"
      "}}\n"
      "complete -F _tenure tenure\n",
      kVersion, commands_case, values_case, words_case);
}

}  // namespace tenure::cli
