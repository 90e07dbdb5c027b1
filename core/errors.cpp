// The map from caught exceptions to exit codes and messages (see errors.h).
#include "core/errors.h"

#include <algorithm>
#include <new>

namespace tenure {

ExitCode exit_code_of(const std::exception_ptr& error) noexcept {
  try {
    std::rethrow_exception(error);
  } catch (const Error& e) {
    return e.exit_code();
  } catch (...) {
    return ExitCode::failure;
  }
}

std::string message_of(const std::exception_ptr& error) {
  std::string text;
  try {
    std::rethrow_exception(error);
  } catch (const Error& e) {
    text = e.what();
  } catch (const std::bad_alloc&) {
    text = "out of memory";
  } catch (const std::exception& e) {
    text = std::string("internal error: ") + e.what();
  } catch (...) {
    text = "internal error of an unknown kind";
  }
  std::replace(text.begin(), text.end(), '\n', ' ');
  return text;
}

}  // namespace tenure
