// Parses the JSON text of a case or policy file strictly enough that typos cannot pass: `//` and
// `/* */` comments are allowed (SPEC 4), a key given twice in one object is an error, and so is
// a number too large for a double. Every error is an InputError naming a JSON path.
//
//   nlohmann::json doc = parse_json_text("{\"marr\": 0.10 // ten percent\n}");
//   parse_json_text("{\"marr\": 0.1, \"marr\": 0.2}");
//   // throws InputError("$.marr", "duplicate key")
//   parse_json_text("{\"marr\": }");
//   // throws InputError("$", "invalid JSON at line 1, column 10: syntax error ...")
#pragma once

#include <string_view>

#include <nlohmann/json.hpp>

namespace tenure::formats {

nlohmann::json parse_json_text(std::string_view text);

}  // namespace tenure::formats
