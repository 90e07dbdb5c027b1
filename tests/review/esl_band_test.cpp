// The band of near-best lives (review/esl_band.h rule 1) on invented EUAC curves, each row's
// band worked by hand: the bound is least + band x |least|, lives at or under it are in.
#include "review/esl_band.h"

#include <gtest/gtest.h>

#include <vector>

#include "core/errors.h"

namespace tenure::review {
namespace {

struct BandCase {
  const char* what;
  std::vector<Money> euac;  // EUAC of lives 1..N
  double band;
  Years low, high;  // by hand
};

TEST(EslBand, HandMadeCurves) {
  const std::vector<BandCase> cases = {
      // Least 100 at 3 years; bound 102 takes 101 (4 years), not 103 or 105.
      {"2% of a U", {120, 105, 100, 101, 103, 110}, 0.02, 3, 4},
      // Bound 105: 105 is on it (<=), so 2 to 5 years.
      {"5% of the same U", {120, 105, 100, 101, 103, 110}, 0.05, 2, 5},
      {"a band of 0 is the economic life", {120, 105, 100, 101, 103, 110}, 0, 3, 3},
      // Equal within 1e-9 relative (SPEC 6 ties) counts as on the bound.
      {"ties at a band of 0", {100, 100, 100 + 1e-8, 120}, 0, 1, 3},
      // 102.000001 is above the bound 102 by 1e-8 relative: out.
      {"just past the bound", {102.000001, 100, 130}, 0.02, 2, 2},
      // Two dips: 1 and 3 years are within 2% (bound 102), 2 years is not.
      {"a curve that dips twice", {101, 130, 100, 140}, 0.02, 1, 3},
      // Falling to the last life: bound 110 takes 4 and 5 years.
      {"least at the longest life", {200, 150, 120, 110, 100}, 0.1, 4, 5},
      // A negative least (sales above the costs): bound -100 + 0.2 x 100 = -80 takes -90, where
      // (1 + band) x least = -120 would hold no life at all.
      {"negative least", {-50, -100, -90}, 0.2, 2, 3},
      {"one life", {500}, 0.02, 1, 1},
      // Bound 199.9: every life.
      {"a wide band", {100, 150, 199.8}, 0.999, 1, 3},
  };
  for (const BandCase& c : cases) {
    const EslBand band = esl_band(c.euac, c.band);
    EXPECT_EQ(band.low, c.low) << c.what;
    EXPECT_EQ(band.high, c.high) << c.what;
  }
}

TEST(EslBand, AnEmptyCurveIsAFailure) { EXPECT_THROW(esl_band({}, 0.02), RuntimeFailure); }

}  // namespace
}  // namespace tenure::review
