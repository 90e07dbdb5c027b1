// Random draws that are the same on every machine, compiler and standard library, for results
// that must be reproducible (the bootstrap of review/esl_bootstrap.h): a name hashed to a seed,
// a SplitMix64 stream and unbiased indices drawn from it, all written out here (the standard
// library's distributions are implementation-defined, so they are not used).
//
//   StableRandom random(fnv1a_64("van-delivery"));
//   random.next();        // 64 random bits
//   random.below(15000);  // an index in [0, 15000), every one equally likely
//
// Rules:
//   (1) fnv1a_64 is the 64-bit FNV-1a hash of the bytes: offset basis 0xcbf29ce484222325, each
//       byte XORed in, then multiplied by the prime 0x100000001b3 (mod 2^64).
//   (2) next() is SplitMix64 (Steele, Lea and Flood, 2014): the state grows by
//       0x9e3779b97f4a7c15 and is mixed by two xor-shift-multiply rounds.
//   (3) below(n) is Lemire's multiply-shift draw (2019) with its rejection of the few outputs
//       that would favour some indices: exactly uniform, and rarely more than one next().
#pragma once

#include <cstdint>
#include <string_view>

namespace tenure {

// Rule (1).
std::uint64_t fnv1a_64(std::string_view bytes);

// Defined here so that a loop of draws inlines them (the bootstrap makes millions).
class StableRandom {
 public:
  explicit StableRandom(std::uint64_t seed) : state_(seed) {}

  // Rule (2).
  std::uint64_t next() {
    std::uint64_t z = (state_ += 0x9e3779b97f4a7c15ULL);
    z = (z ^ (z >> 30)) * 0xbf58476d1ce4e5b9ULL;
    z = (z ^ (z >> 27)) * 0x94d049bb133111ebULL;
    return z ^ (z >> 31);
  }

  // Rule (3); n >= 1 (below(0) returns 0).
  std::uint64_t below(std::uint64_t n) {
    if (n == 0) return 0;
    // The high word of next() * n is an index; the low word tells whether it came from one of
    // the 2^64 mod n outputs that would make some indices likelier, which are drawn again.
    Wide product = static_cast<Wide>(next()) * n;
    auto low = static_cast<std::uint64_t>(product);
    if (low < n) {
      const std::uint64_t threshold = (0 - n) % n;  // 2^64 mod n
      while (low < threshold) {
        product = static_cast<Wide>(next()) * n;
        low = static_cast<std::uint64_t>(product);
      }
    }
    return static_cast<std::uint64_t>(product >> 64);
  }

 private:
  __extension__ using Wide = unsigned __int128;
  std::uint64_t state_;
};

}  // namespace tenure
