// The nightly review's policy file (SPEC 4), read strictly: unknown keys are errors, and every
// error names its JSON path and the rule ("$.classes.van-delivery.max_life_years: ...").
//
//   review::Policy p = read_policy(R"({"marr": 0.08, "income_tax_rate": 0.25,
//     "classes": {"van-delivery": {"challenger_first_cost": 52000, "max_life_years": 15,
//       "depreciation": {"method": "macrs", "recovery_years": 5},
//       "market_value": {"annual_decline": 0.18}, "cost_model": "auto"}}})");
//
// Keys beyond SPEC 4 (ours): "detail": "none" | "due" | "all" (default "none"), which assets keep
// their year-by-year tables (EUAC curves, cash flows) in the results; explain recomputes any.
#pragma once

#include <string_view>

#include "review/policy.h"

namespace tenure::formats {

review::Policy read_policy(std::string_view json_text);

}  // namespace tenure::formats
