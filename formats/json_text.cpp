// Strict JSON parsing (see json_text.h). nlohmann::json keeps the last of duplicate keys and
// reports number overflow without a position, so a first pass through its SAX interface follows
// the path being read: it rejects duplicates where they occur and lets an overflow name the
// field it happened in. The document is then built by a plain parse. (nlohmann's parser
// callbacks would do both in one pass, but their bookkeeping walks each object's members once
// per member: a policy of 40,000 classes took seconds, 200,000 minutes.)
#include "formats/json_text.h"

#include <algorithm>
#include <cmath>
#include <cstdlib>
#include <set>
#include <string>
#include <vector>

#include <fmt/format.h>

#include "core/errors.h"
#include "formats/json_path.h"

namespace tenure::formats {
namespace {

using nlohmann::json;

// nlohmann's message is "[json.exception.parse_error.101] parse error at line 2, column 7:
// syntax error ..."; keep what follows "parse error".
std::string describe_parse_error(const std::string& what) {
  const std::string marker = "parse error";
  const std::size_t at = what.find(marker);
  if (at == std::string::npos) return "invalid JSON: " + what;
  std::string rest = what.substr(at + marker.size());
  if (rest.starts_with(": ")) rest.erase(0, 1);
  return "invalid JSON" + rest;
}

// The SAX events of one document, checked: one frame per open object or array.
class StrictReader {
 public:
  bool null() { return value_done(); }
  bool boolean(bool) { return value_done(); }
  bool number_integer(json::number_integer_t) { return value_done(); }
  bool number_unsigned(json::number_unsigned_t) { return value_done(); }
  bool number_float(json::number_float_t, const json::string_t&) { return value_done(); }
  bool string(json::string_t&) { return value_done(); }
  bool binary(json::binary_t&) { return value_done(); }
  bool start_object(std::size_t) {
    frames_.push_back(Frame{false, {}, {}, 0});
    return true;
  }
  bool key(json::string_t& key) {
    Frame& frame = frames_.back();
    frame.key = key;
    if (!frame.keys.insert(key).second) throw InputError(path(), "duplicate key");
    return true;
  }
  bool end_object() { return end_structure(); }
  bool start_array(std::size_t) {
    frames_.push_back(Frame{true, {}, {}, 0});
    return true;
  }
  bool end_array() { return end_structure(); }
  bool parse_error(std::size_t, const std::string&, const nlohmann::detail::exception& error) {
    // 406: a number beyond the range of a double (the only range error of parsing).
    if (error.id == 406) {
      throw InputError(path(), "must be a finite number (this one overflows a double)");
    }
    throw InputError("$", describe_parse_error(error.what()));
  }

 private:
  struct Frame {
    bool is_array;
    std::set<std::string> keys;  // keys seen so far in an object
    std::string key;             // the key of the value being read
    std::size_t index;           // the index of the element being read in an array
  };

  // The path of the value being read now.
  std::string path() const {
    std::string result = "$";
    for (const Frame& frame : frames_) {
      if (frame.is_array) {
        result = index_path(result, frame.index);
      } else if (!frame.keys.empty()) {
        result = key_path(result, frame.key);
      }
    }
    return result;
  }

  bool value_done() {
    if (!frames_.empty() && frames_.back().is_array) ++frames_.back().index;
    return true;
  }

  bool end_structure() {
    frames_.pop_back();
    return value_done();
  }

  std::vector<Frame> frames_;
};

}  // namespace

std::string too_large_rule(std::size_t bytes) {
  return fmt::format("is {} bytes; a case or policy file may be at most {} bytes (16 MiB)", bytes,
                     kMaxJsonTextBytes);
}

json parse_json_text(std::string_view text) {
  if (text.size() > kMaxJsonTextBytes) throw InputError("$", too_large_rule(text.size()));
  // The parser would stop at a NUL byte and ignore what follows it.
  if (const std::size_t nul = text.find('\0'); nul != std::string_view::npos) {
    throw InputError("$", fmt::format("invalid JSON: a NUL byte at offset {}", nul));
  }
  StrictReader reader;
  json::sax_parse(text, &reader, json::input_format_t::json, /*strict=*/true,
                  /*ignore_comments=*/true);
  return json::parse(text, nullptr, /*allow_exceptions=*/true, /*ignore_comments=*/true);
}

double without_float_noise(double value) {
  if (!std::isfinite(value) || value == 0) return value;
  const double short_form = std::strtod(fmt::format("{:.12g}", value).c_str(), nullptr);
  double low = value;
  double high = value;
  for (int ulp = 0; ulp < kNoiseUlps; ++ulp) {
    low = std::nextafter(low, -INFINITY);
    high = std::nextafter(high, INFINITY);
  }
  return short_form >= low && short_form <= high ? short_form : value;
}

namespace {

void remove_float_noise(json& node) {
  if (node.is_number_float()) {
    node = without_float_noise(node.get<double>());
  } else if (node.is_structured()) {
    for (json& child : node) remove_float_noise(child);
  }
}

}  // namespace

std::string json_output(const json& document, int indent,
                        std::initializer_list<std::string_view> exact) {
  json tidy = document;
  if (tidy.is_object()) {
    for (auto member = tidy.begin(); member != tidy.end(); ++member) {
      if (std::find(exact.begin(), exact.end(), member.key()) == exact.end()) {
        remove_float_noise(member.value());
      }
    }
  } else {
    remove_float_noise(tidy);
  }
  return tidy.dump(indent, ' ', false, json::error_handler_t::replace);
}

}  // namespace tenure::formats
