// The band of near-best lives (see esl_band.h).
#include "review/esl_band.h"

#include <cmath>

#include "core/errors.h"
#include "replacement/life_curve.h"

namespace tenure::review {

EslBand esl_band(const std::vector<Money>& euac, double band) {
  if (euac.empty()) throw RuntimeFailure("esl_band: an EUAC curve has at least one life");
  const Money least = euac[replacement::least_with_ties(euac)];
  // Rule (1): the bound, widened by the tie tolerance.
  const Money bound = least + (band + kTieTolerance) * std::abs(least);
  EslBand out{0, 0};
  for (std::size_t i = 0; i < euac.size(); ++i) {
    if (euac[i] <= bound) {
      const auto life = static_cast<Years>(i) + 1;
      if (out.low == 0) out.low = life;
      out.high = life;
    }
  }
  return out;
}

}  // namespace tenure::review
