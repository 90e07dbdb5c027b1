// Flat depreciation parameters into a checked schedule (see flat_depreciation.h).
#include "formats/flat_depreciation.h"

#include <algorithm>

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "core/checks.h"
#include "formats/depreciation_json.h"
#include "formats/json_path.h"
#include "formats/json_text.h"

namespace tenure::formats {
namespace {

// A flat parameter that sets fields of a depreciation object, and its value as JSON when given.
struct MethodParameter {
  std::string_view name;
  std::vector<std::string_view> fields;  // life sets life_years or, for macrs, recovery_years
  std::optional<nlohmann::json> (*value)(const FlatDepreciation& flat);
  bool optional = false;  // rule (2a): may be left out for the methods that take it
};

template <class T>
std::optional<nlohmann::json> as_json(const std::optional<T>& value) {
  if (!value) return std::nullopt;
  return nlohmann::json(*value);
}

// In the order of FlatDepreciation, the order rules (2) and (3) are checked in.
const std::vector<MethodParameter> kMethodParameters = {
    {"salvage", {"salvage"}, [](const FlatDepreciation& f) { return as_json(f.salvage); }},
    {"life",
     {"life_years", "recovery_years"},
     [](const FlatDepreciation& f) { return as_json(f.life); }},
    {"rate", {"rate"}, [](const FlatDepreciation& f) { return as_json(f.rate); }},
    {"switch_to_straight_line",
     {"switch_to_straight_line"},
     [](const FlatDepreciation& f) { return as_json(f.switch_to_straight_line); }},
    {"section_179",
     {"section_179"},
     [](const FlatDepreciation& f) { return as_json(f.section_179); },
     true},
    {"bonus", {"bonus"}, [](const FlatDepreciation& f) { return as_json(f.bonus); }, true},
    {"convention",
     {"convention"},
     [](const FlatDepreciation& f) { return as_json(f.convention); },
     true},
    {"quarter", {"quarter"}, [](const FlatDepreciation& f) { return as_json(f.quarter); }, true},
};

bool sets(const MethodParameter& parameter, std::string_view field) {
  return std::find(parameter.fields.begin(), parameter.fields.end(), field) !=
         parameter.fields.end();
}

// The flat parameter that sets `field` of a depreciation object.
std::string_view parameter_of(std::string_view field) {
  for (const MethodParameter& parameter : kMethodParameters) {
    if (sets(parameter, field)) return parameter.name;
  }
  return field;
}

// An error of the depreciation reader or the method ("$.life_years", "recovery_years") at the
// flat parameter it is about ("life").
InputError at_parameter(const InputError& error) {
  std::string_view where = error.where();
  if (where.starts_with("$.")) where.remove_prefix(2);
  return InputError(std::string(parameter_of(where)), error.rule());
}

// Rules (2) and (3): the depreciation object of the parameters the method takes.
nlohmann::json depreciation_object(const FlatDepreciation& flat, const DepreciationForm& form,
                                   const MisfitRefusals& refusals) {
  std::vector<std::string_view> taken;
  for (std::string_view field : form.fields) taken.push_back(parameter_of(field));
  if (!flat.basis) throw refusals.missing("basis", flat.method);
  nlohmann::json object = {{"method", flat.method}};
  for (const MethodParameter& parameter : kMethodParameters) {
    const std::optional<nlohmann::json> value = parameter.value(flat);
    const auto field = std::find_if(form.fields.begin(), form.fields.end(),
                                    [&](std::string_view f) { return sets(parameter, f); });
    if (field != form.fields.end()) {
      if (!value && parameter.optional) continue;  // rule (2a)
      if (!value) throw refusals.missing(parameter.name, flat.method);
      object[std::string(*field)] = *value;
    } else if (value && !(parameter.name == "salvage" && flat.salvage == 0.0)) {  // rule (3)
      throw refusals.unused(parameter.name, flat.method, taken);
    }
  }
  return object;
}

bool is_object_text(std::string_view method) {
  const std::size_t first = method.find_first_not_of(" \t\r\n");
  return first != std::string_view::npos && method[first] == '{';
}

// Rule (6): the method is a depreciation object, and only basis and disposal_year stand beside
// it. The object's errors keep their JSON paths ("$.bonus").
nlohmann::json given_object(const FlatDepreciation& flat, const MisfitRefusals& refusals) {
  for (const MethodParameter& parameter : kMethodParameters) {
    if (parameter.value(flat)) {
      throw InputError(std::string(parameter.name),
                       "must not be given when the method is a depreciation object (put it in "
                       "the object)");
    }
  }
  nlohmann::json object = parse_json_text(flat.method);
  if (!object.is_object()) throw InputError("$", "must be a JSON object");
  if (!flat.basis) throw refusals.missing("basis", "given as an object");
  return object;
}

}  // namespace

FlatSchedule flat_schedule(const FlatDepreciation& flat, const MisfitRefusals& refusals) {
  const bool as_object = is_object_text(flat.method);
  const DepreciationForm* form = find_depreciation_form(flat.method);
  if (form == nullptr && !as_object) {  // rule (1)
    throw InputError("method", fmt::format("unknown method '{}' (expected one of {})", flat.method,
                                           depreciation_method_names()));
  }
  const nlohmann::json object =
      as_object ? given_object(flat, refusals) : depreciation_object(flat, *form, refusals);
  try {
    const depreciation::Spec spec = read_depreciation(JsonObject(object, "$"));  // rule (4)
    // The bound of every amount tenure reads (core/checks.h): 1e308 would print infinities.
    require_amount(*flat.basis, "basis");
    if (flat.salvage) require_amount(*flat.salvage, "salvage");
    depreciation::Schedule schedule(*depreciation::make_method(spec), *flat.basis);
    std::optional<Years> disposal_year;  // rule (5)
    if (flat.disposal_year) disposal_year = whole_years(*flat.disposal_year, "disposal_year", 1);
    return {spec, std::move(schedule), disposal_year};
  } catch (const InputError& error) {
    // The flat parameters beside an object keep their names; the object's errors are at its
    // JSON paths, the method's own ("recovery_years") under "$".
    const bool flat_beside = error.where() == "basis" || error.where() == "disposal_year";
    throw as_object && !flat_beside ? under_path(error, "$") : at_parameter(error);
  }
}

}  // namespace tenure::formats
