// The band of near-best lives around a class's economic life (SPEC 11 "Per class"): the
// shortest and longest challenger lives whose EUAC is within the policy's `esl_band` of the
// least. A flat EUAC curve gives a wide band (the life matters little); a sharp one a narrow
// band. The nightly review stores it (esl_band_low, esl_band_high) and explain recomputes it
// from the rebuilt challenger curve.
//
//   EslBand band = esl_band(challenger.on(basis).curve.euac, policy.esl_band);
//   band.low; band.high;   // e.g. 7 and 12 years around an economic life of 9
//
// Rule (cited by the code):
//   (1) Life n (1..N, euac[n-1] its EUAC) is in the band when
//       EUAC(n) <= least + esl_band x |least|, which is (1 + esl_band) x least for a positive
//       least. The least is the EUAC of the economic life (replacement/life_curve.h
//       least_with_ties), and a value within kTieTolerance (relative) of the bound counts as on
//       it, so a band of 0 holds the lives tied with the least (SPEC 6 "Ties"). low and high are
//       the least and the greatest such n; the economic life is always between them. The lives
//       between low and high need not all be in the band (a curve may dip twice).
#pragma once

#include <vector>

#include "core/types.h"

namespace tenure::review {

struct EslBand {
  Years low;
  Years high;
};

// Rule (1). `euac` must not be empty; `band` >= 0 (the policy reader checks [0, 1)).
EslBand esl_band(const std::vector<Money>& euac, double band);

}  // namespace tenure::review
