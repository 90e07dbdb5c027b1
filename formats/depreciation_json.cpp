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

// The US first-year fields (SPEC 13), on macrs and macrs_ads only.
constexpr std::string_view kUsOnlyFields[] = {"section_179", "bonus"};
// The MACRS convention fields, on macrs only.
constexpr std::string_view kMacrsOnlyFields[] = {"convention", "quarter"};

UsAllowances allowances(const JsonObject& o) {
  return UsAllowances{o.optional_number("section_179"), o.optional_number("bonus")};
}

MacrsConvention convention(const JsonObject& o) {
  if (!o.has("convention")) return MacrsConvention::half_year;
  const std::string name = o.string("convention");
  if (name == "half_year") return MacrsConvention::half_year;
  if (name == "mid_quarter") return MacrsConvention::mid_quarter;
  throw InputError(o.path_of("convention"),
                   fmt::format("unknown convention '{}' (expected half_year or mid_quarter)",
                               name));
}

const char* convention_name(MacrsConvention convention) {
  return convention == MacrsConvention::mid_quarter ? "mid_quarter" : "half_year";
}

void write_allowances(const UsAllowances& a, nlohmann::json& out) {
  if (a.section_179) out["section_179"] = *a.section_179;
  if (a.bonus) out["bonus"] = *a.bonus;
}

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
     {"recovery_years", "convention", "quarter", "section_179", "bonus"},
     [](const JsonObject& o) -> Spec {
       return MacrsSpec{o.whole_number("recovery_years", 1), convention(o),
                        o.optional_whole_number("quarter", 1, 4), allowances(o)};
     }},
    {"macrs_ads",
     {"recovery_years", "section_179", "bonus"},
     [](const JsonObject& o) -> Spec {
       return MacrsAdsSpec{o.whole_number("recovery_years", 1), allowances(o)};
     }},
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
    nlohmann::json out = {{"method", "macrs"}, {"recovery_years", s.recovery_years}};
    if (s.convention != MacrsConvention::half_year) {
      out["convention"] = convention_name(s.convention);
    }
    if (s.quarter) out["quarter"] = *s.quarter;
    write_allowances(s.allowances, out);
    return out;
  }
  nlohmann::json operator()(const MacrsAdsSpec& s) const {
    nlohmann::json out = {{"method", "macrs_ads"}, {"recovery_years", s.recovery_years}};
    write_allowances(s.allowances, out);
    return out;
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
  // A US field on another method is refused by name, before the list of the method's keys.
  for (std::string_view field : kUsOnlyFields) {
    if (object.has(field) && method != "macrs" && method != "macrs_ads") {
      throw InputError(object.path_of(field),
                       fmt::format("applies only to the US methods macrs and macrs_ads, not {}",
                                   method));
    }
  }
  for (std::string_view field : kMacrsOnlyFields) {
    if (object.has(field) && method != "macrs") {
      throw InputError(object.path_of(field),
                       fmt::format("applies only to the macrs method, not {}", method));
    }
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
