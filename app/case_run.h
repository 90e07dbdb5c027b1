// `tenure case` as a use case: one case file's text analysed and its result written, as the CLI,
// tenure_case() and tenure_case_json() all give it (formats/case_json.h and case_table.h render).
//
//   nlohmann::json result = case_result_json(text);   // result["decision"]["verdict"]
//   std::string tables = case_result_tables(text);
#pragma once

#include <nlohmann/json.hpp>
#include <string>
#include <string_view>

namespace tenure::app {

// Both throw InputError naming the JSON path of a bad field.
nlohmann::json case_result_json(std::string_view case_json);
std::string case_result_tables(std::string_view case_json);

}  // namespace tenure::app
