// A depreciation schedule written for `tenure schedule`: as JSON and as a table. With a disposal
// year Y the rows stop at Y and row Y takes the disposal-year deduction (SPEC 6: half a year for
// MACRS before its last table year, a full year for book methods).
//
//   auto method = make_method(MacrsSpec{5});
//   Schedule s(*method, 10000);
//   schedule_to_json(MacrsSpec{5}, s, 3);
//   // {"method": "macrs", "recovery_years": 5, "basis": 10000, "disposal_year": 3,
//   //  "rows": [{"year": 1, "depreciation": 2000, "book_value": 8000}, ...,
//   //           {"year": 3, "depreciation": 960, "book_value": 3840}]}
#pragma once

#include <optional>
#include <string>

#include <nlohmann/json.hpp>

#include "core/types.h"
#include "depreciation/method.h"
#include "depreciation/schedule.h"

namespace tenure::formats {

// `spec` is what `schedule` was built from; `disposal_year`, when given, is >= 1.
nlohmann::json schedule_to_json(const depreciation::Spec& spec,
                                const depreciation::Schedule& schedule,
                                std::optional<Years> disposal_year = std::nullopt);

// The same as a table, with the method's parameters above it and the caution of SPEC 10 below.
std::string schedule_to_table(const depreciation::Spec& spec,
                              const depreciation::Schedule& schedule,
                              std::optional<Years> disposal_year = std::nullopt);

}  // namespace tenure::formats
