// The several challengers of a case (SPEC 14) as JSON and as a text table: each one's economic
// life and least EUAC before and after tax, which one the decision weighs, and with improving
// technology the least EUAC C*_k and economic life of the chosen one bought k years from now.
//
//   challengers_to_json(input.challengers, result);
//   // [{"name": "diesel", "chosen": false, "before_tax": {"esl_years": 6, "euac": 17421.3},
//   //   "after_tax": {...}}, ...]
//   challenger_by_year_to_json(*result.decision);
//   // [{"years_from_now": 0, "least_euac": 14210.5, "esl_years": 6}, ...]
#pragma once

#include <nlohmann/json.hpp>
#include <span>
#include <string>

#include "replacement/case_analysis.h"

namespace tenure::formats {

// `result` is the analysis of a case whose several challengers are `challengers`.
nlohmann::json challengers_to_json(std::span<const replacement::NamedChallenger> challengers,
                                   const replacement::CaseResult& result);
std::string challengers_table(std::span<const replacement::NamedChallenger> challengers,
                              const replacement::CaseResult& result);

// Present when the decision weighed improving challengers (its C*_k are not empty).
nlohmann::json challenger_by_year_to_json(const replacement::Decision& decision);
std::string challenger_by_year_table(const replacement::Decision& decision);

}  // namespace tenure::formats
