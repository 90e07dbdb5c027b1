// libFuzzer target: the case parser and the whole analysis behind `tenure case` (SPEC 5):
// formats::read_case, replacement::analyse, then the result as JSON text. A bad case must be
// refused with tenure::InputError; an accepted one must analyse and serialise without NaN or
// infinity reaching the output (nlohmann writes those as null). Anything else is a bug.
//
//   build-fuzz/fuzz/case_fuzzer -dict=fuzz/case.dict -max_total_time=60 \
//     build-fuzz/corpus/case fixtures/fuzz/case
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <string>
#include <string_view>

#include "core/errors.h"
#include "formats/case_json.h"
#include "replacement/case_analysis.h"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  const std::string_view text(reinterpret_cast<const char*>(data), size);
  try {
    const tenure::replacement::Case input = tenure::formats::read_case(text);
    const auto result = tenure::replacement::analyse(input);
    const std::string out = tenure::formats::case_result_to_json(input, result).dump();
    if (out.find("null") != std::string::npos) {
      std::fprintf(stderr, "non-finite number in the case result: %s\n", out.c_str());
      std::abort();
    }
  } catch (const tenure::InputError& error) {
    if (error.what()[0] == '\0') std::abort();
  }
  return 0;
}
