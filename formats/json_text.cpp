// Strict JSON parsing (see json_text.h). nlohmann::json keeps the last of duplicate keys and
// reports number overflow without a position, so a parser callback follows the path being read:
// it rejects duplicates where they occur and lets an overflow name the field it happened in.
#include "formats/json_text.h"

#include <set>
#include <string>
#include <vector>

#include "core/errors.h"
#include "formats/json_path.h"

namespace tenure::formats {
namespace {

using nlohmann::json;

// Where the parser is: one frame per open object or array.
class PathTracker {
 public:
  bool on_event(json::parse_event_t event, const json& parsed) {
    switch (event) {
      case json::parse_event_t::object_start:
        frames_.push_back(Frame{false, {}, {}, 0});
        break;
      case json::parse_event_t::array_start:
        frames_.push_back(Frame{true, {}, {}, 0});
        break;
      case json::parse_event_t::key: {
        Frame& frame = frames_.back();
        frame.key = parsed.get<std::string>();
        if (!frame.keys.insert(frame.key).second) throw InputError(path(), "duplicate key");
        break;
      }
      case json::parse_event_t::object_end:
      case json::parse_event_t::array_end:
        frames_.pop_back();
        value_done();
        break;
      case json::parse_event_t::value:
        value_done();
        break;
    }
    return true;
  }

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

 private:
  struct Frame {
    bool is_array;
    std::set<std::string> keys;  // keys seen so far in an object
    std::string key;             // the key of the value being read
    std::size_t index;           // the index of the element being read in an array
  };

  void value_done() {
    if (!frames_.empty() && frames_.back().is_array) ++frames_.back().index;
  }

  std::vector<Frame> frames_;
};

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

}  // namespace

json parse_json_text(std::string_view text) {
  PathTracker tracker;
  const json::parser_callback_t follow = [&tracker](int, json::parse_event_t event, json& parsed) {
    return tracker.on_event(event, parsed);
  };
  try {
    return json::parse(text, follow, /*allow_exceptions=*/true, /*ignore_comments=*/true);
  } catch (const json::parse_error& error) {
    throw InputError("$", describe_parse_error(error.what()));
  } catch (const json::out_of_range&) {
    // The only range error while parsing is a number beyond the range of a double.
    throw InputError(tracker.path(), "must be a finite number (this one overflows a double)");
  }
}

}  // namespace tenure::formats
