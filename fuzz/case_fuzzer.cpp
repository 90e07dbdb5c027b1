// libFuzzer target: the case parser and the whole analysis behind `tenure case` (SPEC 5):
// formats::read_case, replacement::analyse, then the result as JSON text. A bad case must be
// refused with tenure::InputError; an accepted one must analyse and serialise without NaN or
// infinity reaching the output (nlohmann would write those as null, which the result also uses
// for a figure that does not exist, such as no delay cost). Anything else is a bug.
//
//   build-fuzz/fuzz/case_fuzzer -dict=fuzz/case.dict -max_total_time=60 \
//     build-fuzz/corpus/case fixtures/fuzz/case
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <string>
#include <string_view>

#include <nlohmann/json.hpp>

#include "core/errors.h"
#include "formats/case_json.h"
#include "replacement/case_analysis.h"

namespace {

// The first number in `value` that is NaN or infinite, as its JSON pointer; "" when none is.
std::string non_finite_at(const nlohmann::json& value, const std::string& pointer = "") {
  if (value.is_number_float() && !std::isfinite(value.get<double>())) {
    return pointer.empty() ? "/" : pointer;
  }
  std::string found;
  if (value.is_object()) {
    for (auto item = value.begin(); item != value.end() && found.empty(); ++item) {
      found = non_finite_at(item.value(), pointer + "/" + item.key());
    }
  } else if (value.is_array()) {
    for (std::size_t i = 0; i < value.size() && found.empty(); ++i) {
      found = non_finite_at(value[i], pointer + "/" + std::to_string(i));
    }
  }
  return found;
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  const std::string_view text(reinterpret_cast<const char*>(data), size);
  try {
    const tenure::replacement::Case input = tenure::formats::read_case(text);
    const auto result = tenure::replacement::analyse(input);
    const nlohmann::json out = tenure::formats::case_result_to_json(input, result);
    const std::string where = non_finite_at(out);
    if (!where.empty()) {
      std::fprintf(stderr, "non-finite number at %s in the case result: %s\n", where.c_str(),
                   out.dump().c_str());
      std::abort();
    }
  } catch (const tenure::InputError& error) {
    if (error.what()[0] == '\0') std::abort();
  }
  return 0;
}
