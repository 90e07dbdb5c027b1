// Strict reading of JSON objects with paths in errors (see json_path.h).
#include "formats/json_path.h"

#include <cmath>

#include <fmt/format.h>

#include "core/checks.h"

namespace tenure::formats {
namespace {

double number_at(const nlohmann::json& value, const std::string& path) {
  if (!value.is_number()) throw InputError(path, "expected a number");
  const double number = value.get<double>();
  require_finite(number, path);
  return number;
}

Years whole_number_at(const nlohmann::json& value, const std::string& path, Years min, Years max) {
  if (!value.is_number()) throw InputError(path, "expected a whole number");
  return whole_years(value.get<double>(), path, min, max);
}

}  // namespace

Years whole_years(double value, const std::string& where, Years min, Years max) {
  require_finite(value, where);
  if (value != std::floor(value)) {
    throw InputError(where, fmt::format("must be a whole number, not {}", value));
  }
  if (value < min) throw InputError(where, fmt::format("must be >= {}", min));
  if (value > max) throw InputError(where, fmt::format("must be <= {}", max));
  return static_cast<Years>(value);
}

std::string key_path(std::string_view parent, std::string_view key) {
  std::string path = fmt::format("{}.", parent);
  // A key longer than any name a person types is cut, at a UTF-8 character boundary, so that
  // one line of a message stays one readable line.
  constexpr std::size_t kShown = 48;
  std::string_view shown = key;
  std::string rest;
  if (key.size() > 2 * kShown) {
    std::size_t cut = kShown;
    while (cut > 0 && (static_cast<unsigned char>(key[cut]) & 0xC0) == 0x80) --cut;
    shown = key.substr(0, cut);
    rest = fmt::format("...(a key of {} bytes)", key.size());
  }
  for (const char c : shown) {
    // A control character would reach the terminal raw: written as JSON writes it.
    const auto byte = static_cast<unsigned char>(c);
    if (byte < 0x20 || byte == 0x7F) {
      path += fmt::format("\\u{:04x}", byte);
    } else {
      path += c;
    }
  }
  return path + rest;
}

std::string index_path(std::string_view parent, std::size_t index) {
  return fmt::format("{}[{}]", parent, index);
}

InputError under_path(const InputError& error, std::string_view path) {
  if (error.where().starts_with('$')) return error;
  if (error.where().empty()) return InputError(std::string(path), error.rule());
  return InputError(key_path(path, error.where()), error.rule());
}

JsonObject::JsonObject(const nlohmann::json& value, std::string path)
    : value_(&value), path_(std::move(path)) {
  if (!value.is_object()) throw InputError(path_, "expected an object");
}

const nlohmann::json* JsonObject::find(std::string_view key) const {
  const auto found = value_->find(key);
  return found == value_->end() ? nullptr : &*found;
}

bool JsonObject::has(std::string_view key) const { return find(key) != nullptr; }

const nlohmann::json& JsonObject::require(std::string_view key, std::string_view kind) const {
  const nlohmann::json* value = find(key);
  if (value == nullptr) throw InputError(path_of(key), fmt::format("required {} is missing", kind));
  return *value;
}

void JsonObject::allow_only(const std::vector<std::string_view>& keys) const {
  for (const auto& item : value_->items()) {
    bool known = false;
    for (std::string_view key : keys) known = known || key == item.key();
    if (!known) {
      throw InputError(path_of(item.key()),
                       fmt::format("unknown key (expected one of {})", fmt::join(keys, ", ")));
    }
  }
}

double JsonObject::number(std::string_view key) const {
  return number_at(require(key, "number"), path_of(key));
}

std::optional<double> JsonObject::optional_number(std::string_view key) const {
  if (!has(key)) return std::nullopt;
  return number(key);
}

Years JsonObject::whole_number(std::string_view key, Years min, Years max) const {
  return whole_number_at(require(key, "whole number"), path_of(key), min, max);
}

std::optional<Years> JsonObject::optional_whole_number(std::string_view key, Years min,
                                                       Years max) const {
  if (!has(key)) return std::nullopt;
  return whole_number(key, min, max);
}

bool JsonObject::boolean(std::string_view key) const {
  const nlohmann::json& value = require(key, "true or false");
  if (!value.is_boolean()) throw InputError(path_of(key), "expected true or false");
  return value.get<bool>();
}

std::string JsonObject::string(std::string_view key) const {
  const nlohmann::json& value = require(key, "string");
  if (!value.is_string()) throw InputError(path_of(key), "expected a string");
  return value.get<std::string>();
}

std::vector<JsonObject> JsonObject::objects(std::string_view key) const {
  const nlohmann::json& value = require(key, "array of objects");
  const std::string path = path_of(key);
  if (!value.is_array()) throw InputError(path, "expected an array of objects");
  std::vector<JsonObject> result;
  for (std::size_t i = 0; i < value.size(); ++i) result.emplace_back(value[i], index_path(path, i));
  return result;
}

std::vector<double> JsonObject::numbers(std::string_view key) const {
  const nlohmann::json& value = require(key, "array of numbers");
  const std::string path = path_of(key);
  if (!value.is_array()) throw InputError(path, "expected an array of numbers");
  if (value.empty()) throw InputError(path, "must not be empty");
  if (value.size() > static_cast<std::size_t>(kMaxYears)) {
    throw InputError(path, fmt::format("must have at most {} values", kMaxYears));
  }
  std::vector<double> result;
  result.reserve(value.size());
  for (std::size_t i = 0; i < value.size(); ++i) {
    result.push_back(number_at(value[i], index_path(path, i)));
  }
  return result;
}

JsonObject JsonObject::object(std::string_view key) const {
  return JsonObject(require(key, "object"), path_of(key));
}

std::optional<JsonObject> JsonObject::optional_object(std::string_view key) const {
  if (!has(key)) return std::nullopt;
  return object(key);
}

}  // namespace tenure::formats
