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
//
// And writes the JSON every command prints, in one place, without float noise:
//
//   json_output({{"after_tax_marr", 0.07 * (1 - 0.25)}});
//   // "{\n  \"after_tax_marr\": 0.0525\n}" (not 0.052500000000000005)
#pragma once

#include <cstddef>
#include <initializer_list>
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

// How far from a short decimal a number may be and still be float noise: 8 units in the last
// place, about 2e-15 of it (1605.5999999999985, a book value, is 7 away from 1605.6).
inline constexpr int kNoiseUlps = 8;

// `value` rounded to 12 significant digits when that moves it by at most kNoiseUlps units in the
// last place: float noise, as 0.07 x 0.75 = 0.052500000000000005 is 0.0525. Any other value is
// kept as it is, to the last bit.
double without_float_noise(double value);

// The JSON text of every command and SQL function: `document` indented by `indent` spaces (-1:
// on one line), each floating-point number without_float_noise except in the members named in
// `exact` (explain's equivalent case, whose figures must give `tenure case` explain's own to the
// last bit); text that is not UTF-8 (an asset id, say) is written with U+FFFD rather than
// refused.
std::string json_output(const nlohmann::json& document, int indent = 2,
                        std::initializer_list<std::string_view> exact = {});

}  // namespace tenure::formats
