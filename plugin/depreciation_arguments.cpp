// SQL arguments to a depreciation schedule (see depreciation_arguments.h). The arguments are put
// into a case file's depreciation object and read by formats/, so the two cannot drift apart.
#include "plugin/depreciation_arguments.h"

#include <algorithm>
#include <string>

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "formats/depreciation_json.h"
#include "formats/json_path.h"

namespace tenure::plugin {
namespace {

bool uses(const formats::DepreciationForm& form, std::string_view field) {
  return std::find(form.fields.begin(), form.fields.end(), field) != form.fields.end();
}

void require_unused(const Arguments& args, std::string_view name, std::string_view method) {
  if (args.given(name)) {
    throw InputError(std::string(name), fmt::format("is not used by method {}", method));
  }
}

bool flag(const Arguments& args, std::string_view name) {
  const double value = args.number(name);
  if (value != 0 && value != 1) throw InputError(std::string(name), "must be 0 or 1");
  return value == 1;
}

}  // namespace

depreciation::Schedule schedule_from(const Arguments& args) {
  const std::string method = args.text("method");
  const formats::DepreciationForm* form = formats::find_depreciation_form(method);
  if (form == nullptr) {
    throw InputError("", fmt::format("unknown method '{}' (expected one of {})", method,
                                     formats::depreciation_method_names()));
  }
  const Money basis = args.number("basis");
  nlohmann::json object = {{"method", method}};

  if (uses(*form, "salvage")) {
    object["salvage"] = args.number("salvage");
  } else if (args.given("salvage") && args.number("salvage") != 0) {
    // MACRS recovers the whole basis; a salvage would be silently ignored, so refuse it.
    throw InputError("salvage", fmt::format("must be 0 or NULL for method {}", method));
  }
  if (uses(*form, "life_years")) {
    object["life_years"] = args.number("life");
  } else if (uses(*form, "recovery_years")) {
    object["recovery_years"] = args.number("life");
  } else {
    require_unused(args, "life", method);
  }
  if (uses(*form, "rate")) {
    object["rate"] = args.number("rate");
  } else {
    require_unused(args, "rate", method);
  }
  if (uses(*form, "switch_to_straight_line")) {
    object["switch_to_straight_line"] = flag(args, "switch_to_straight_line");
  } else {
    require_unused(args, "switch_to_straight_line", method);
  }

  const depreciation::Spec spec = formats::read_depreciation(formats::JsonObject(object, "$"));
  const auto made = depreciation::make_method(spec);
  return depreciation::Schedule(*made, basis);
}

}  // namespace tenure::plugin
