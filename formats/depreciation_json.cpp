// Depreciation objects of case and policy files (see depreciation_json.h). Adding a method is one
// line in kForms and one overload in SpecWriter.
#include "formats/depreciation_json.h"

#include <fmt/format.h>

#include "core/errors.h"
#include "depreciation/schedule.h"

namespace tenure::formats {
namespace {

using namespace tenure::depreciation;

Years life(const JsonObject& o) { return o.whole_number("life_years", 1); }

const std::vector<DepreciationForm> kForms = {
    {"straight_line",
     {"life_years", "salvage"},
     [](const JsonObject& o) -> Spec {
       return StraightLineSpec{life(o), o.number("salvage")};
     }},
    {"declining_balance",
     {"life_years", "rate", "salvage", "switch_to_straight_line"},
     [](const JsonObject& o) -> Spec {
       return DecliningBalanceSpec{life(o), o.number("rate"), o.number("salvage"),
                                   o.boolean("switch_to_straight_line")};
     }},
    {"sum_of_years_digits",
     {"life_years", "salvage"},
     [](const JsonObject& o) -> Spec {
       return SumOfYearsDigitsSpec{life(o), o.number("salvage")};
     }},
    {"macrs",
     {"recovery_years"},
     [](const JsonObject& o) -> Spec { return MacrsSpec{o.whole_number("recovery_years", 1)}; }},
    {"none", {}, [](const JsonObject&) -> Spec { return NoDepreciationSpec{}; }},
    {"pool",
     {"rate", "half_year_rule", "first_year_allowance"},
     [](const JsonObject& o) -> Spec {
       return PoolSpec{o.number("rate"), o.boolean("half_year_rule"),
                       o.optional_number("first_year_allowance")};
     }},
};

struct SpecWriter {
  nlohmann::json operator()(const StraightLineSpec& s) const {
    return {{"method", "straight_line"}, {"life_years", s.life_years}, {"salvage", s.salvage}};
  }
  nlohmann::json operator()(const DecliningBalanceSpec& s) const {
    return {{"method", "declining_balance"},
            {"life_years", s.life_years},
            {"rate", s.rate},
            {"salvage", s.salvage},
            {"switch_to_straight_line", s.switch_to_straight_line}};
  }
  nlohmann::json operator()(const SumOfYearsDigitsSpec& s) const {
    return {
        {"method", "sum_of_years_digits"}, {"life_years", s.life_years}, {"salvage", s.salvage}};
  }
  nlohmann::json operator()(const MacrsSpec& s) const {
    return {{"method", "macrs"}, {"recovery_years", s.recovery_years}};
  }
  nlohmann::json operator()(const NoDepreciationSpec&) const { return {{"method", "none"}}; }
  nlohmann::json operator()(const PoolSpec& s) const {
    nlohmann::json out = {
        {"method", "pool"}, {"rate", s.rate}, {"half_year_rule", s.half_year_rule}};
    if (s.first_year_allowance) out["first_year_allowance"] = *s.first_year_allowance;
    return out;
  }
};

}  // namespace

const std::vector<DepreciationForm>& depreciation_forms() { return kForms; }

const DepreciationForm* find_depreciation_form(std::string_view method) {
  for (const DepreciationForm& form : kForms) {
    if (form.method == method) return &form;
  }
  return nullptr;
}

std::string depreciation_method_names() {
  std::vector<std::string_view> names;
  for (const DepreciationForm& form : kForms) names.push_back(form.method);
  return fmt::format("{}", fmt::join(names, ", "));
}

Spec read_depreciation(const JsonObject& object) {
  const std::string method = object.string("method");
  const DepreciationForm* form = find_depreciation_form(method);
  if (form == nullptr) {
    throw InputError(object.path_of("method"),
                     fmt::format("unknown method '{}' (expected one of {})", method,
                                 depreciation_method_names()));
  }
  std::vector<std::string_view> keys{"method"};
  keys.insert(keys.end(), form->fields.begin(), form->fields.end());
  object.allow_only(keys);
  return form->read(object);
}

std::shared_ptr<const Method> make_checked_method(const Spec& spec, Money basis,
                                                  const std::string& path) {
  try {
    std::shared_ptr<const Method> method = make_method(spec);
    const Schedule trial(*method, basis);
    return method;
  } catch (const InputError& error) {
    throw under_path(error, path);
  }
}

nlohmann::json depreciation_to_json(const Spec& spec) { return std::visit(SpecWriter{}, spec); }

}  // namespace tenure::formats
