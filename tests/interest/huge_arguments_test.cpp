// Factors at the far ends of their domain, found by fuzzing the extension's SQL functions and the
// case analysis (fuzz/): a rate or a period count so large that (1+i)^n overflows a double must
// give the factor's limit, not NaN, and a huge finite n must not reach the direct sums (their
// loop counter is an int).
#include <gtest/gtest.h>

#include <cmath>
#include <limits>

#include "interest/factors.h"

namespace tenure::interest {
namespace {

constexpr double kRelative = 1e-9;
#define EXPECT_REL(actual, expected, tolerance) \
  EXPECT_NEAR((actual), (expected), std::abs(expected) * (tolerance))

const double kHugeN = std::numeric_limits<double>::max();

// As n -> infinity (closed form): P/A -> 1/i, A/P -> i, P/G -> 1/i^2, A/G -> 1/i, P/F -> 0.
TEST(HugeArguments, OverflowingGrowthGivesTheLimitsNotNaN) {
  for (const double i : {0.10, 1.0, 4.4e66}) {
    for (const double n : {1e4, 1e308}) {
      SCOPED_TRACE(testing::Message() << "i " << i << ", n " << n);
      EXPECT_REL(pa(i, n), 1 / i, kRelative);
      EXPECT_REL(ap(i, n), i, kRelative);
      EXPECT_REL(ag(i, n), 1 / i, kRelative);
      EXPECT_REL(pg(i, n), 1 / (i * i), kRelative);
      EXPECT_EQ(pf(i, n), 0.0);
    }
  }
}

// A huge rate over a few years (the case fuzzer's marr of 4.4e66): P/A is (1 - (1+i)^-n) / i.
TEST(HugeArguments, HugeRateOverFewYears) {
  const double i = 4.4e66;
  for (const double n : {1.0, 5.0, 12.0}) {
    EXPECT_REL(pa(i, n), 1 / i, kRelative);
    EXPECT_TRUE(std::isfinite(pg(i, n)));
    EXPECT_TRUE(std::isfinite(ap(i, n)));
  }
}

// Tiny rates and huge n: the gradient factors leave the direct sum (int counter) for the closed
// form. Checked against the sum itself just past the cut-over, and the limit 1/i^2 at n = max.
TEST(HugeArguments, TinyRateWithHugeYearsTakesTheClosedForm) {
  const double i = 1e-6;
  EXPECT_REL(pg(i, kHugeN), 1 / (i * i), kRelative);
  const double n = 200000;  // past the direct sums' limit
  double sum = 0;
  for (int k = 2; k <= static_cast<int>(n); ++k) sum += (k - 1) * std::pow(1 + i, -k);
  EXPECT_REL(pg(i, n), sum, 1e-7);
  EXPECT_REL(ag(i, n), sum / pa(i, n), 1e-7);
}

TEST(HugeArguments, GeometricSeriesAtEqualRatesAndHugeYears) {
  EXPECT_REL(geometric_pa(0.05, 0.05, 1e12), 1e12 / 1.05, kRelative);
  EXPECT_REL(geometric_pa(1e-7, 1e-7, kHugeN), kHugeN / (1 + 1e-7), kRelative);
  // Payments falling faster than money grows: the series converges to 1 / (i - g).
  EXPECT_REL(geometric_pa(0.10, -0.05, kHugeN), 1 / 0.15, kRelative);
}

}  // namespace
}  // namespace tenure::interest
