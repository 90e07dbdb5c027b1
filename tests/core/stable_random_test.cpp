// Reproducible random draws (core/stable_random.h): FNV-1a 64 and SplitMix64 against their
// published test vectors, and below(n) against identities of the multiply-shift draw.
#include "core/stable_random.h"

#include <gtest/gtest.h>

#include <array>
#include <cstdint>

namespace tenure {
namespace {

TEST(Fnv1a64, PublishedTestVectors) {
  // The FNV authors' test vectors for FNV-1a 64 (from memory: "" is the offset basis).
  EXPECT_EQ(fnv1a_64(""), 0xcbf29ce484222325ULL);
  EXPECT_EQ(fnv1a_64("a"), 0xaf63dc4c8601ec8cULL);
  EXPECT_EQ(fnv1a_64("foobar"), 0x85944171f73967e8ULL);
}

TEST(Fnv1a64, ReadsBytesNotCharacters) {
  // A byte above 0x7f is XORed in as its unsigned value: by hand, one byte b hashes to
  // (basis ^ b) * prime mod 2^64.
  const std::uint64_t expected = (0xcbf29ce484222325ULL ^ 0xe9ULL) * 0x100000001b3ULL;
  EXPECT_EQ(fnv1a_64("\xe9"), expected);
}

TEST(StableRandom, SplitMix64FirstOutputsFromSeedZero) {
  // The first outputs of Vigna's splitmix64.c with state 0 (the values xoshiro's seeding quotes).
  StableRandom random(0);
  const std::array<std::uint64_t, 4> expected = {0xe220a8397b1dcdafULL, 0x6e789e6aa1b965f4ULL,
                                                 0x06c45d188009454fULL, 0xf88bb8a8724c81ecULL};
  for (const std::uint64_t value : expected) EXPECT_EQ(random.next(), value);
}

TEST(StableRandom, BelowAPowerOfTwoIsTheTopBits) {
  // For n = 2^s, next() * n >> 64 is next() >> (64 - s) and 2^64 mod n = 0, so nothing is drawn
  // again: the identity gives the SplitMix64 outputs above shifted.
  StableRandom random(0);
  EXPECT_EQ(random.below(std::uint64_t{1} << 32), 0xe220a839ULL);
  EXPECT_EQ(random.below(std::uint64_t{1} << 63), 0x6e789e6aa1b965f4ULL >> 1);
  EXPECT_EQ(random.below(16), 0x0ULL);    // top nibble of 0x06c45d188009454f
  EXPECT_EQ(random.below(256), 0xf8ULL);  // top byte of 0xf88bb8a8724c81ec
}

TEST(StableRandom, BelowStaysInRangeAndCoversIt) {
  StableRandom random(2026);
  std::array<int, 7> seen{};
  for (int i = 0; i < 7000; ++i) {
    const std::uint64_t index = random.below(7);
    ASSERT_LT(index, 7u);
    ++seen[index];
  }
  // Each of the seven indices about 1000 times: a uniform draw's count has a standard deviation
  // of sqrt(7000 x 1/7 x 6/7) = 29.3, so 850..1150 is more than five of them.
  for (const int count : seen) {
    EXPECT_GT(count, 850);
    EXPECT_LT(count, 1150);
  }
  EXPECT_EQ(random.below(1), 0u);
  EXPECT_EQ(random.below(0), 0u);
}

TEST(StableRandom, SameSeedSameStream) {
  StableRandom a(fnv1a_64("van-delivery")), b(fnv1a_64("van-delivery")), c(fnv1a_64("van-service"));
  bool differs = false;
  for (int i = 0; i < 50; ++i) {
    const std::uint64_t x = a.below(15000);
    EXPECT_EQ(x, b.below(15000));
    differs = differs || x != c.below(15000);
  }
  EXPECT_TRUE(differs);
}

}  // namespace
}  // namespace tenure
