// libFuzzer target: the policy parser (formats::read_policy, SPEC 4) on arbitrary bytes. A bad
// policy must be refused with tenure::InputError naming a JSON path; anything else that escapes
// (another exception, a crash, a sanitizer report) is a bug.
//
//   build-fuzz/fuzz/policy_fuzzer -dict=fuzz/policy.dict -max_total_time=60 \
//     build-fuzz/corpus/policy fixtures/fuzz/policy
#include <cstddef>
#include <cstdint>
#include <cstdlib>
#include <cstdio>
#include <string_view>

#include "core/errors.h"
#include "formats/policy_json.h"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  const std::string_view text(reinterpret_cast<const char*>(data), size);
  try {
    const tenure::review::Policy policy = tenure::formats::read_policy(text);
    // What the reader promises about a policy it accepts.
    if (policy.classes.empty() || !(policy.rates.marr > 0)) std::abort();
  } catch (const tenure::InputError& error) {
    if (error.where().empty() || error.where()[0] != '$') {
      std::fprintf(stderr, "policy error without a JSON path: %s\n", error.what());
      std::abort();
    }
  }
  return 0;
}
