// The name hash of stable_random.h (the generator is defined in the header).
#include "core/stable_random.h"

namespace tenure {

std::uint64_t fnv1a_64(std::string_view bytes) {
  std::uint64_t hash = 0xcbf29ce484222325ULL;
  for (const char c : bytes) {
    hash ^= static_cast<unsigned char>(c);
    hash *= 0x100000001b3ULL;
  }
  return hash;
}

}  // namespace tenure
