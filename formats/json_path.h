// Reading a parsed JSON document strictly, with a JSON path in every error (SPEC 4 and 5):
// unknown keys, wrong types, missing required fields, non-finite numbers and years that are not
// whole all throw tenure::InputError(path, rule), whose message is "<path>: <rule>".
//
//   JsonObject root(document, "$");
//   root.allow_only({"marr", "challenger"});
//   // "$.foo: unknown key (expected one of marr, challenger)"
//   double marr = root.number("marr");             // "$.marr: expected a number"
//   JsonObject ch = root.object("challenger");     // "$.challenger: required object is missing"
//   std::vector<double> c = ch.numbers("operating_costs");
//   // "$.challenger.operating_costs[2]: expected a number"
#pragma once

#include <cstddef>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include <nlohmann/json.hpp>

#include "core/errors.h"
#include "core/types.h"

namespace tenure::formats {

// Year counts and year series in input files stop here, far beyond any equipment's life, so a
// typo cannot make the engine allocate or loop without bound.
inline constexpr Years kMaxYears = 1000;

// "$.challenger" + "first_cost" -> "$.challenger.first_cost". Control characters in the key are
// written \u0001 and so on, so a message never carries them to a terminal, and a key of more than
// 96 bytes is cut after its first 48: "$.kkk...kkk...(a key of 5000 bytes)".
std::string key_path(std::string_view parent, std::string_view key);
// "$.challenger.operating_costs" + 2 -> "$.challenger.operating_costs[2]".
std::string index_path(std::string_view parent, std::size_t index);

// `value` as a whole number of years in [min, max], else InputError(where, rule): "must be a
// whole number, not 5.5", "must be >= 1", "must be <= 1000", "must be a finite number".
Years whole_years(double value, const std::string& where, Years min, Years max = kMaxYears);

// An engine error whose `where` is a bare field name ("life_years"), placed under `path`
// ("$.challenger.depreciation.life_years"); errors that already carry a JSON path are kept.
InputError under_path(const InputError& error, std::string_view path);

// One JSON object and its path. Getters of required fields throw when the key is missing;
// optional_* return nullopt instead (a JSON null counts as given, and is a wrong type).
class JsonObject {
 public:
  // Throws "<path>: expected an object" unless `value` is one. `value` must outlive this.
  JsonObject(const nlohmann::json& value, std::string path);

  const std::string& path() const { return path_; }
  std::string path_of(std::string_view key) const { return key_path(path_, key); }
  bool has(std::string_view key) const;

  // Throws "<path>.<key>: unknown key (expected one of a, b, c)" for the first key not listed.
  void allow_only(const std::vector<std::string_view>& keys) const;

  // A finite number.
  double number(std::string_view key) const;
  std::optional<double> optional_number(std::string_view key) const;
  // A whole number in [min, max] (5 and 5.0 are whole; 5.5 is not).
  Years whole_number(std::string_view key, Years min, Years max = kMaxYears) const;
  std::optional<Years> optional_whole_number(std::string_view key, Years min,
                                             Years max = kMaxYears) const;
  bool boolean(std::string_view key) const;
  std::string string(std::string_view key) const;
  // A non-empty array of at most kMaxYears finite numbers.
  std::vector<double> numbers(std::string_view key) const;
  JsonObject object(std::string_view key) const;
  std::optional<JsonObject> optional_object(std::string_view key) const;
  // An array of objects (possibly empty), each with its path ("$.challengers[1]").
  std::vector<JsonObject> objects(std::string_view key) const;

 private:
  const nlohmann::json* find(std::string_view key) const;
  // The value of a required key; "required <kind> is missing" names what was expected.
  const nlohmann::json& require(std::string_view key, std::string_view kind) const;

  const nlohmann::json* value_;
  std::string path_;
};

}  // namespace tenure::formats
