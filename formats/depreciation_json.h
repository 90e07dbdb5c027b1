// The depreciation object of a case or policy file (SPEC 5, 13), read into a depreciation::Spec
// and written back. Every field a method lists is required, but a pool's first_year_allowance
// (absent: none), a US method's section_179 and bonus (absent: nothing expensed) and macrs's
// convention (absent: half_year, as before SPEC 13) and quarter (mid_quarter only).
//
//   {"method": "straight_line", "life_years": 5, "salvage": 0}
//   {"method": "declining_balance", "life_years": 5, "rate": 2.0, "salvage": 0,
//    "switch_to_straight_line": true}
//   {"method": "sum_of_years_digits", "life_years": 5, "salvage": 0}
//   {"method": "macrs", "recovery_years": 5}
//   {"method": "macrs", "recovery_years": 7, "convention": "mid_quarter", "quarter": 4,
//    "section_179": 20000, "bonus": 0.4}
//   {"method": "macrs_ads", "recovery_years": 9}
//   {"method": "none"}
//   {"method": "pool", "rate": 0.30, "half_year_rule": true}        // CCA class 10 (Canada)
//   {"method": "pool", "rate": 0.18, "half_year_rule": false, "first_year_allowance": 0.40}
//
//   Spec spec = read_depreciation(challenger.object("depreciation"));
//   // "$.challenger.depreciation.method: unknown method 'foo' (expected one of ...)"
#pragma once

#include <memory>
#include <string>
#include <string_view>
#include <vector>

#include <nlohmann/json.hpp>

#include "core/types.h"
#include "depreciation/method.h"
#include "formats/json_path.h"

namespace tenure::formats {

// One accepted form of the depreciation object: the method's name and its fields (all
// required but the optional ones named at the top of this file).
struct DepreciationForm {
  std::string_view method;
  std::vector<std::string_view> fields;
  depreciation::Spec (*read)(const JsonObject& object);
};

// Every method a depreciation object may name, in the order they are listed to users.
const std::vector<DepreciationForm>& depreciation_forms();

// The form of `method`, or null when there is none.
const DepreciationForm* find_depreciation_form(std::string_view method);

// The names of depreciation_forms() in their order, for messages and help texts:
// "straight_line, declining_balance, sum_of_years_digits, macrs, macrs_ads, none, pool".
std::string depreciation_method_names();

// Reads a depreciation object. Checks types, unknown and missing fields, and whole years; the
// ranges of the values are the method's to check (see make_checked_method).
depreciation::Spec read_depreciation(const JsonObject& object);

// Builds the method and applies it once to `basis`, so that a parameter the method rejects (a
// recovery period of 4, a salvage above the basis) is reported under `path` now, not later.
std::shared_ptr<const depreciation::Method> make_checked_method(const depreciation::Spec& spec,
                                                                Money basis,
                                                                const std::string& path);

// The depreciation object that read_depreciation would read back into `spec`.
nlohmann::json depreciation_to_json(const depreciation::Spec& spec);

}  // namespace tenure::formats
