// The C ABI (see tenure.h). Every function catches everything: no exception leaves the library.
// Strings handed to the caller are malloc'ed, so tenure_free is free().
#include "plugin/tenure.h"

#include <cstdlib>
#include <cstring>
#include <new>
#include <optional>
#include <string>
#include <string_view>

#include "app/case_run.h"
#include "core/errors.h"
#include "core/version.h"
#include "formats/json_text.h"
#include "plugin/review_call.h"

namespace tenure::plugin {
namespace {

// A malloc'ed copy of `text`, or null when out of memory.
char* copy(std::string_view text) noexcept {
  auto* out = static_cast<char*>(std::malloc(text.size() + 1));
  if (out == nullptr) return nullptr;
  std::memcpy(out, text.data(), text.size());
  out[text.size()] = '\0';
  return out;
}

void set_message(char** error_message, std::string_view text) noexcept {
  if (error_message != nullptr) *error_message = copy(text);
}

void require_pointer(const void* pointer, const char* name) {
  if (pointer == nullptr) throw InputError(name, "must not be NULL");
}

std::optional<std::string> optional_text(const char* text) {
  if (text == nullptr) return std::nullopt;
  return std::string(text);
}

// The C ABI's return codes are the command's exit codes (core/errors.h).
static_assert(TENURE_OK == static_cast<int>(ExitCode::ok));
static_assert(TENURE_FAILURE == static_cast<int>(ExitCode::failure));
static_assert(TENURE_BAD_INPUT == static_cast<int>(ExitCode::bad_input));

// Runs `body` and maps what it throws to a return code and a message (tenure.h).
template <class Body>
int guarded_call(char** error_message, Body&& body) noexcept {
  if (error_message != nullptr) *error_message = nullptr;
  try {
    body();
    return TENURE_OK;
  } catch (...) {
    const std::exception_ptr error = std::current_exception();
    try {
      set_message(error_message, message_of(error));
    } catch (...) {
      set_message(error_message, "out of memory");
    }
    return static_cast<int>(exit_code_of(error));
  }
}

}  // namespace
}  // namespace tenure::plugin

using tenure::plugin::guarded_call;

extern "C" {

int tenure_abi_version(void) { return TENURE_ABI_VERSION; }

const char* tenure_library_version(void) { return tenure::kVersion; }

int tenure_review_db(sqlite3* db, const char* policy_json, const char* as_of, long long* run_id,
                     char** error_message) {
  if (run_id != nullptr) *run_id = 0;
  return guarded_call(error_message, [&] {
    tenure::plugin::require_pointer(db, "db");
    tenure::plugin::require_pointer(run_id, "run_id");
    *run_id = tenure::plugin::review_on(db, tenure::plugin::optional_text(policy_json),
                                        tenure::plugin::optional_text(as_of),
                                        /*scenario=*/std::nullopt);  // baseline runs only
  });
}

int tenure_case_json(const char* case_json, char** result_json, char** error_message) {
  if (result_json != nullptr) *result_json = nullptr;
  return guarded_call(error_message, [&] {
    tenure::plugin::require_pointer(case_json, "case_json");
    tenure::plugin::require_pointer(result_json, "result_json");
    const std::string json = tenure::formats::json_output(tenure::app::case_result_json(case_json));
    *result_json = tenure::plugin::copy(json);
    if (*result_json == nullptr) throw std::bad_alloc();
  });
}

void tenure_free(char* text) { std::free(text); }

}  // extern "C"
