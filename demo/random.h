// The demo's random numbers: one std::mt19937_64 turned into uniforms, normals, Poisson counts
// and weighted picks by transforms written here. The standard library's distributions are not
// used because their output is implementation-defined; the engine's raw output is fixed by the
// C++ standard, so a seed gives the same fleet with every standard library (up to the last bit
// of std::exp, std::log and std::cos).
//
//   Random random(42);
//   random.uniform();                 // in [0, 1), 53 random bits
//   random.mean_one_lognormal(0.15);  // a multiplicative noise factor with mean 1
//   random.poisson(6.5);              // a count with mean 6.5
#pragma once

#include <cstdint>
#include <optional>
#include <random>
#include <span>

namespace tenure::demo {

class Random {
 public:
  explicit Random(std::uint64_t seed) : engine_(seed) {}

  // Uniform in [0, 1): the top 53 bits of one engine output.
  double uniform();
  // Uniform in (0, 1): never 0, so its logarithm is finite.
  double uniform_positive();
  // Uniform integer in [0, n), n >= 1 (n below 2^53).
  std::uint64_t below(std::uint64_t n);
  // Standard normal by the Box-Muller transform (the second value of each pair is kept).
  double normal();
  // exp(sd * z - sd^2 / 2): lognormal with mean 1 and log-scale standard deviation sd.
  double mean_one_lognormal(double sd);
  // Poisson count with the given mean >= 0: Knuth's product of uniforms up to a mean of 30,
  // above that the normal approximation rounded (and never negative).
  std::int64_t poisson(double mean);
  // An index into `weights` (all >= 0, not all 0) with probability proportional to its weight.
  std::size_t pick(std::span<const double> weights);

 private:
  std::mt19937_64 engine_;
  std::optional<double> spare_normal_;
};

}  // namespace tenure::demo
