// `tenure schedule`: one depreciation schedule from command-line parameters. The parameters go
// through the case file's depreciation reader, so the command accepts exactly what a case file
// accepts, and its errors are renamed from fields ("life_years") to options ("--life").
#include <algorithm>
#include <map>
#include <memory>
#include <optional>
#include <string>
#include <vector>

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "cli/commands.h"
#include "core/errors.h"
#include "depreciation/schedule.h"
#include "formats/depreciation_json.h"
#include "formats/json_path.h"
#include "formats/schedule_json.h"

namespace tenure::cli {
namespace {

// The option that sets each field of a depreciation object.
const std::map<std::string, std::string, std::less<>> kOptionForField = {
    {"method", "--method"},       {"life_years", "--life"},
    {"recovery_years", "--life"}, {"rate", "--rate"},
    {"salvage", "--salvage"},     {"switch_to_straight_line", "--switch/--no-switch"},
    {"basis", "--basis"},         {"disposal_year", "--dispose-in-year"},
};

std::string option_for(std::string_view field) {
  const auto found = kOptionForField.find(field);
  return found == kOptionForField.end() ? std::string(field) : found->second;
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
  std::string format = "table";
  // Which of the optional parameters were given.
  CLI::Option* salvage_given = nullptr;
  CLI::Option* life_given = nullptr;
  CLI::Option* rate_given = nullptr;
  CLI::Option* switch_given = nullptr;
  CLI::Option* no_switch_given = nullptr;
  CLI::Option* dispose_given = nullptr;
};

// An option that sets a field of the depreciation object; --life sets life_years or, for
// macrs, recovery_years.
struct Parameter {
  std::string name;
  bool given;
  std::vector<std::string_view> fields;
  nlohmann::json value;
};

// The depreciation object the options describe. A field the method needs whose option was not
// given, and an option the method does not use, are errors naming the option.
nlohmann::json depreciation_object(const ScheduleOptions& o) {
  const formats::DepreciationForm* form = formats::find_depreciation_form(o.method);
  if (form == nullptr) {
    throw InputError("--method", fmt::format("unknown method '{}' (expected one of {})", o.method,
                                             formats::depreciation_method_names()));
  }
  const std::vector<Parameter> parameters = {
      {"--life", o.life_given->count() > 0, {"life_years", "recovery_years"}, o.life},
      {"--rate", o.rate_given->count() > 0, {"rate"}, o.rate},
      {"--salvage", o.salvage_given->count() > 0, {"salvage"}, o.salvage},
      {"--switch/--no-switch",
       o.switch_given->count() + o.no_switch_given->count() > 0,
       {"switch_to_straight_line"},
       o.switch_to_straight_line},
  };
  auto sets = [](const Parameter& parameter, std::string_view field) {
    return std::find(parameter.fields.begin(), parameter.fields.end(), field) !=
           parameter.fields.end();
  };
  nlohmann::json object = {{"method", o.method}};
  std::vector<std::string> taken;
  for (std::string_view field : form->fields) {
    for (const Parameter& parameter : parameters) {
      if (!sets(parameter, field)) continue;
      if (!parameter.given) {
        throw InputError(parameter.name, fmt::format("required by method {}", o.method));
      }
      object[std::string(field)] = parameter.value;
      taken.push_back(parameter.name);
    }
  }
  for (const Parameter& parameter : parameters) {
    if (parameter.given && std::find(taken.begin(), taken.end(), parameter.name) == taken.end()) {
      throw InputError(
          parameter.name,
          fmt::format("not used by method {} (it takes {})", o.method,
                      taken.empty() ? "no parameters" : fmt::format("{}", fmt::join(taken, ", "))));
    }
  }
  return object;
}

// An error about a field ("life_years" or "$.life_years") as one about its option.
InputError renamed(const InputError& error) {
  std::string_view where = error.where();
  if (where.starts_with("$.")) where.remove_prefix(2);
  return InputError(option_for(where), error.rule());
}

void run_schedule(const ScheduleOptions& options, const Console& console) {
  try {
    const nlohmann::json object = depreciation_object(options);
    const depreciation::Spec spec = formats::read_depreciation(formats::JsonObject(object, "$"));
    const auto method = depreciation::make_method(spec);
    const depreciation::Schedule schedule(*method, options.basis);
    std::optional<Years> disposal_year;
    if (options.dispose_given->count() > 0) {
      disposal_year = formats::whole_years(options.dispose_in_year, "disposal_year", 1);
    }
    if (options.format == "json") {
      console.out << formats::schedule_to_json(spec, schedule, disposal_year).dump(2) << '\n';
    } else {
      console.out << formats::schedule_to_table(spec, schedule, disposal_year);
    }
  } catch (const InputError& error) {
    throw renamed(error);
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
  command->add_option("--format", o->format, "table (the default) or json")
      ->type_name("FORMAT")
      ->check(CLI::IsMember({"table", "json"}));
  command->footer(
      "Each method needs exactly its own parameters; there are no silent defaults:\n"
      "  straight_line, sum_of_years_digits   --life, --salvage\n"
      "  declining_balance                    --life, --rate, --salvage, --switch or --no-switch\n"
      "  macrs                                --life (recovery period 3, 5, 7, 10, 15 or 20;\n"
      "                                       GDS, half-year convention)\n"
      "  none                                 nothing\n"
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
