// Transforms of raw std::mt19937_64 output (see random.h).
#include "demo/random.h"

#include <cmath>
#include <numbers>

namespace tenure::demo {

double Random::uniform() { return static_cast<double>(engine_() >> 11) * 0x1.0p-53; }

double Random::uniform_positive() {
  // Shifting by half a step keeps the 2^53 values evenly spaced and away from 0.
  return (static_cast<double>(engine_() >> 11) + 0.5) * 0x1.0p-53;
}

std::uint64_t Random::below(std::uint64_t n) {
  const auto index = static_cast<std::uint64_t>(uniform() * static_cast<double>(n));
  return index < n ? index : n - 1;
}

double Random::normal() {
  if (spare_normal_) {
    const double value = *spare_normal_;
    spare_normal_.reset();
    return value;
  }
  const double radius = std::sqrt(-2.0 * std::log(uniform_positive()));
  const double angle = 2.0 * std::numbers::pi * uniform();
  spare_normal_ = radius * std::sin(angle);
  return radius * std::cos(angle);
}

double Random::mean_one_lognormal(double sd) { return std::exp(sd * normal() - sd * sd / 2.0); }

std::int64_t Random::poisson(double mean) {
  if (mean <= 0) return 0;
  if (mean > 30) {
    const double draw = std::round(mean + std::sqrt(mean) * normal());
    return draw < 0 ? 0 : static_cast<std::int64_t>(draw);
  }
  // Knuth: count uniforms until their product falls below e^-mean.
  const double limit = std::exp(-mean);
  std::int64_t count = 0;
  double product = uniform_positive();
  while (product > limit) {
    ++count;
    product *= uniform_positive();
  }
  return count;
}

std::size_t Random::pick(std::span<const double> weights) {
  double total = 0;
  for (double weight : weights) total += weight;
  double target = uniform() * total;
  for (std::size_t i = 0; i < weights.size(); ++i) {
    if (target < weights[i]) return i;
    target -= weights[i];
  }
  // Rounding can leave target just above the last weight: the last positive one takes it.
  std::size_t last = weights.size() - 1;
  while (last > 0 && weights[last] <= 0) --last;
  return last;
}

}  // namespace tenure::demo
