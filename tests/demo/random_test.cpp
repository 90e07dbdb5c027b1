// The demo's random numbers: the engine is the standard's mt19937_64, and the transforms give
// the moments they promise (sample checks with tolerances of about four standard errors).
#include "demo/random.h"

#include <gtest/gtest.h>

#include <array>
#include <cmath>
#include <cstdint>

namespace tenure::demo {
namespace {

constexpr int kDraws = 200000;

TEST(Random, UsesTheStandardEngineBitForBit) {
  // C++ standard [rand.predef]: the 10000th consecutive output of a default-constructed
  // mt19937_64 (seed 5489) is 9981545732273789042. uniform() keeps its top 53 bits.
  Random random(5489);
  for (int i = 1; i < 10000; ++i) random.uniform();
  const double expected = static_cast<double>(9981545732273789042ULL >> 11) * 0x1.0p-53;
  EXPECT_EQ(random.uniform(), expected);
}

TEST(Random, SameSeedSameSequence) {
  Random a(7), b(7), c(8);
  bool differs = false;
  for (int i = 0; i < 100; ++i) {
    const double x = a.normal();
    EXPECT_EQ(x, b.normal());
    differs = differs || x != c.normal();
  }
  EXPECT_TRUE(differs);
}

TEST(Random, UniformIsInRangeWithMeanOneHalf) {
  Random random(1);
  double sum = 0;
  for (int i = 0; i < kDraws; ++i) {
    const double u = random.uniform();
    ASSERT_GE(u, 0.0);
    ASSERT_LT(u, 1.0);
    const double p = random.uniform_positive();
    ASSERT_GT(p, 0.0);
    ASSERT_LT(p, 1.0);
    sum += u;
  }
  // Closed form: mean 1/2, standard error sqrt(1/12 / n) = 0.00065.
  EXPECT_NEAR(sum / kDraws, 0.5, 0.003);
}

TEST(Random, NormalHasMeanZeroAndVarianceOne) {
  Random random(2);
  double sum = 0, sum_sq = 0;
  for (int i = 0; i < kDraws; ++i) {
    const double z = random.normal();
    sum += z;
    sum_sq += z * z;
  }
  const double mean = sum / kDraws;
  EXPECT_NEAR(mean, 0.0, 0.01);                            // standard error 0.0022
  EXPECT_NEAR(sum_sq / kDraws - mean * mean, 1.0, 0.015);  // standard error sqrt(2/n) = 0.0032
}

TEST(Random, MeanOneLognormalHasMeanOneAndTheGivenLogSd) {
  Random random(3);
  double sum = 0, sum_log = 0, sum_log_sq = 0;
  for (int i = 0; i < kDraws; ++i) {
    const double x = random.mean_one_lognormal(0.25);
    ASSERT_GT(x, 0.0);
    sum += x;
    sum_log += std::log(x);
    sum_log_sq += std::log(x) * std::log(x);
  }
  const double mean_log = sum_log / kDraws;
  EXPECT_NEAR(sum / kDraws, 1.0, 0.003);  // closed form E = 1; standard error 0.00057
  EXPECT_NEAR(mean_log, -0.25 * 0.25 / 2, 0.003);
  EXPECT_NEAR(std::sqrt(sum_log_sq / kDraws - mean_log * mean_log), 0.25, 0.003);
}

TEST(Random, PoissonHasItsMeanAsMeanAndVariance) {
  for (double mean : {0.7, 4.0, 29.0, 31.0, 120.0}) {  // both sides of the method switch at 30
    Random random(4);
    double sum = 0, sum_sq = 0;
    for (int i = 0; i < kDraws; ++i) {
      const auto n = static_cast<double>(random.poisson(mean));
      ASSERT_GE(n, 0.0);
      sum += n;
      sum_sq += n * n;
    }
    const double m = sum / kDraws;
    EXPECT_NEAR(m, mean, 4 * std::sqrt(mean / kDraws)) << "mean " << mean;
    EXPECT_NEAR((sum_sq / kDraws - m * m) / mean, 1.0, 0.03) << "mean " << mean;
  }
  Random random(5);
  EXPECT_EQ(random.poisson(0.0), 0);
}

TEST(Random, PickFollowsTheWeightsAndNeverPicksAZeroWeight) {
  Random random(6);
  const std::array<double, 4> weights = {1.0, 0.0, 3.0, 0.0};
  std::array<int, 4> counts{};
  for (int i = 0; i < kDraws; ++i) ++counts[random.pick(weights)];
  EXPECT_EQ(counts[1], 0);
  EXPECT_EQ(counts[3], 0);
  EXPECT_NEAR(static_cast<double>(counts[2]) / kDraws, 0.75, 0.005);  // standard error 0.001
}

TEST(Random, BelowStaysBelowItsBoundAndReachesItsEnds) {
  Random random(7);
  std::array<int, 3> counts{};
  for (int i = 0; i < 30000; ++i) {
    const std::uint64_t k = random.below(3);
    ASSERT_LT(k, 3u);
    ++counts[k];
  }
  for (int count : counts) EXPECT_NEAR(count, 10000, 400);
  EXPECT_EQ(random.below(1), 0u);
}

}  // namespace
}  // namespace tenure::demo
