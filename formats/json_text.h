// Parses the JSON text of a case or policy file strictly enough that typos cannot pass: `//` and
// `/* */` comments are allowed (SPEC 4), a key given twice in one object is an error, and so is
// a number too large for a double. Every error is an InputError naming a JSON path.
//
//   nlohmann::json doc = parse_json_text("{\"marr\": 0.10 // ten percent\n}");
//   parse_json_text("{\"marr\": 0.1, \"marr\": 0.2}");
//   // throws InputError("$.marr", "duplicate key")
//   parse_json_text("{\"marr\": }");
//   // throws InputError("$", "invalid JSON at line 1, column 10: syntax error ...")
//   parse_json_text(text_of_78_megabytes);
//   // throws InputError("$", "is 78000057 bytes; a case or policy file may be at most ...")
#pragma once

#include <cstddef>
#include <string>
#include <string_view>

#include <nlohmann/json.hpp>

namespace tenure::formats {

// The largest case or policy text read: 16 MiB, about 90,000 asset classes of the usual size,
// far beyond any fleet; a larger text is refused before it is parsed.
inline constexpr std::size_t kMaxJsonTextBytes = std::size_t{16} << 20;

// The refusal of a text of `bytes` bytes, above kMaxJsonTextBytes.
std::string too_large_rule(std::size_t bytes);

nlohmann::json parse_json_text(std::string_view text);

}  // namespace tenure::formats
