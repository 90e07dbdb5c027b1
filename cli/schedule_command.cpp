// `tenure schedule`: one depreciation schedule from command-line parameters. They are read by
// formats/flat_depreciation.h, as the SQL functions' are, so the command accepts what a case file
// accepts; its errors name the options ("--life") that set the flat parameters ("life").
#include <map>
#include <memory>
#include <optional>
#include <string>
#include <vector>

#include <fmt/format.h>

#include "cli/commands.h"
#include "core/errors.h"
#include "formats/depreciation_json.h"
#include "formats/flat_depreciation.h"
#include "formats/json_text.h"
#include "formats/schedule_json.h"

namespace tenure::cli {
namespace {

// The option that sets each flat parameter.
const std::map<std::string, std::string, std::less<>> kOptionForParameter = {
    {"method", "--method"},
    {"basis", "--basis"},
    {"salvage", "--salvage"},
    {"life", "--life"},
    {"rate", "--rate"},
    {"switch_to_straight_line", "--switch/--no-switch"},
    {"disposal_year", "--dispose-in-year"},
};

std::string option_for(std::string_view parameter) {
  const auto found = kOptionForParameter.find(parameter);
  return found == kOptionForParameter.end() ? std::string(parameter) : found->second;
}

struct ScheduleOptions {
  std::string method;
  double basis = 0;
  double salvage = 0;
  double life = 0;
  double rate = 0;
  bool switch_to_straight_line = false;  // --switch
  bool no_switch = false;                // --no-switch; excludes --switch
  double dispose_in_year = 0;
  std::string format = "text";
  // Which of the optional parameters were given.
  CLI::Option* salvage_given = nullptr;
  CLI::Option* life_given = nullptr;
  CLI::Option* rate_given = nullptr;
  CLI::Option* switch_given = nullptr;
  CLI::Option* no_switch_given = nullptr;
  CLI::Option* dispose_given = nullptr;
};

template <class T>
std::optional<T> if_given(bool given, T value) {
  return given ? std::optional<T>(value) : std::nullopt;
}

formats::FlatDepreciation flat_parameters(const ScheduleOptions& o) {
  return {.method = o.method,
          .basis = o.basis,
          .salvage = if_given(o.salvage_given->count() > 0, o.salvage),
          .life = if_given(o.life_given->count() > 0, o.life),
          .rate = if_given(o.rate_given->count() > 0, o.rate),
          .switch_to_straight_line = if_given(
              o.switch_given->count() + o.no_switch_given->count() > 0, o.switch_to_straight_line),
          .disposal_year = if_given(o.dispose_given->count() > 0, o.dispose_in_year)};
}

// The command line's words for a parameter that does not fit the method: an option the method
// needs and one it does not use, with the options it takes.
const formats::MisfitRefusals kRefusals{
    [](std::string_view parameter, std::string_view method) {
      return InputError(std::string(parameter), fmt::format("required by method {}", method));
    },
    [](std::string_view parameter, std::string_view method,
       const std::vector<std::string_view>& taken) {
      std::vector<std::string> options;
      for (std::string_view name : taken) options.push_back(option_for(name));
      return InputError(std::string(parameter),
                        fmt::format("not used by method {} (it takes {})", method,
                                    options.empty() ? "no parameters"
                                                    : fmt::format("{}", fmt::join(options, ", "))));
    }};

void run_schedule(const ScheduleOptions& options, const Console& console) {
  try {
    const formats::FlatSchedule s = formats::flat_schedule(flat_parameters(options), kRefusals);
    if (options.format == "json") {
      console.out << formats::json_output(
          formats::schedule_to_json(s.spec, s.schedule, s.disposal_year)) << '\n';
    } else {
      console.out << formats::schedule_to_table(s.spec, s.schedule, s.disposal_year);
    }
  } catch (const InputError& error) {
    throw InputError(option_for(error.where()), error.rule());
  }
}

}  // namespace

void add_schedule_command(CLI::App& app, const Console& console) {
  auto o = std::make_shared<ScheduleOptions>();
  CLI::App* command = app.add_subcommand(
      "schedule", "Print a depreciation schedule: each year's deduction and book value");
  command->add_option("--method", o->method, "one of " + formats::depreciation_method_names())
      ->type_name("METHOD")
      ->required();
  command->add_option("--basis", o->basis, "depreciable basis (first cost), > 0")
      ->type_name("AMOUNT")
      ->required();
  o->salvage_given =
      command->add_option("--salvage", o->salvage, "salvage value, >= 0")->type_name("AMOUNT");
  o->life_given =
      command->add_option("--life", o->life, "life in whole years (macrs: recovery period)")
          ->type_name("YEARS");
  o->rate_given =
      command->add_option("--rate", o->rate, "multiple of the straight-line rate (2 = double)")
          ->type_name("MULTIPLE");
  o->switch_given = command->add_flag("--switch", o->switch_to_straight_line,
                                      "switch to straight line when it deducts more");
  o->no_switch_given =
      command->add_flag("--no-switch", o->no_switch, "never switch to straight line")
          ->excludes(o->switch_given);
  o->dispose_given =
      command->add_option("--dispose-in-year", o->dispose_in_year, "sold at the end of this year")
          ->type_name("YEAR");
  add_format_option(*command, o->format, {"text", "json"},
                    "a table for people (the default) or JSON");
  command->footer(
      "Each method needs exactly its own parameters; there are no silent defaults:\n"
      "  straight_line, sum_of_years_digits   --life, --salvage\n"
      "  declining_balance                    --life, --rate, --salvage, --switch or --no-switch\n"
      "  macrs                                --life (recovery period 3, 5, 7, 10, 15 or 20;\n"
      "                                       GDS, half-year convention)\n"
      "  none                                 nothing\n"
      "macrs and none recover the whole basis: they accept --salvage 0 and refuse others.\n"
      "With --dispose-in-year Y the rows stop at Y, and year Y takes the disposal-year\n"
      "deduction: half a year for macrs before its last table year, a full year otherwise.\n"
      "\n"
      "Examples:\n"
      "  tenure schedule --method macrs --life 5 --basis 52000\n"
      "  tenure schedule --method straight_line --life 5 --salvage 2000 --basis 12000\n"
      "  tenure schedule --method declining_balance --life 5 --rate 2 --salvage 0 --switch \\\n"
      "                  --basis 10000 --dispose-in-year 3 --format json");
  command->callback([o, console] { run_schedule(*o, console); });
}

}  // namespace tenure::cli
