// SHA-256 of a text as 64 lower-case hex digits (OpenSSL's libcrypto), for tenure_run's
// policy_sha256: two runs with the same policy text have the same digest.
//
//   sha256_hex("abc");  // "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad"
#pragma once

#include <string>
#include <string_view>

namespace tenure::app {

std::string sha256_hex(std::string_view text);

}  // namespace tenure::app
