// SQL arguments to a depreciation schedule (see depreciation_arguments.h). The arguments become
// formats/ flat parameters of the same names, so the rules are those of `tenure schedule`; only
// the words of a refusal are SQL's.
#include "plugin/depreciation_arguments.h"

#include <optional>
#include <string>

#include <fmt/format.h>

namespace tenure::plugin {
namespace {

std::optional<bool> optional_flag(const Arguments& args, std::string_view name) {
  const std::optional<double> value = args.optional_number(name);
  if (!value) return std::nullopt;
  if (*value != 0 && *value != 1) throw InputError(std::string(name), "must be 0 or 1");
  return *value == 1;
}

// SQL's words for an argument that does not fit the method: one the method takes is refused as
// any required number is; one it does not use must be NULL or left out (a salvage may be 0).
formats::MisfitRefusals sql_refusals(const Arguments& args) {
  return {[&args](std::string_view parameter, std::string_view) {
            return args.number_not_given(parameter);
          },
          [](std::string_view parameter, std::string_view method,
             const std::vector<std::string_view>&) {
            if (parameter == "salvage") {
              return InputError("salvage", fmt::format("must be 0 or NULL for method {}", method));
            }
            return InputError(std::string(parameter),
                              fmt::format("is not used by method {}", method));
          }};
}

}  // namespace

formats::FlatSchedule schedule_from(const Arguments& args) {
  formats::FlatDepreciation flat{
      .method = args.text("method"),
      .basis = args.optional_number("basis"),
      .salvage = args.optional_number("salvage"),
      .life = args.optional_number("life"),
      .rate = args.optional_number("rate"),
      .switch_to_straight_line = optional_flag(args, "switch_to_straight_line")};
  if (args.signature().position("dispose_in_year")) {
    flat.disposal_year = args.optional_number("dispose_in_year");
  }
  if (args.signature().position("section_179")) {
    flat.section_179 = args.optional_number("section_179");
    flat.bonus = args.optional_number("bonus");
    flat.convention = args.optional_text("convention");
    flat.quarter = args.optional_number("quarter");
  }
  try {
    return formats::flat_schedule(flat, sql_refusals(args));
  } catch (const InputError& error) {
    // An unknown method is a rule about the call as a whole, as tenure_factor's unknown kind.
    if (error.where() == "method") throw InputError("", error.rule());
    throw;
  }
}

}  // namespace tenure::plugin
