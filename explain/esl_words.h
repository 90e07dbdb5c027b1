// How firm a class's economic life is, in one sentence a manager can read (SPEC 11 "Per class"),
// from a stored class row: the life, the lives within esl_band of the least EUAC and the
// bootstrap's 10th-90th percentile. `tenure explain` and the report's class paragraph say it in
// these words.
//
//   esl_sentence(stored_class, Basis::after_tax, 0.02);
//   // "economic life 9 years; lives within 2.00% of the least EUAC: 7 to 12 years; bootstrap
//   //  10th-90th percentile: 8 to 11 years (200 refits of the cost curve on resampled assets)"
#pragma once

#include <optional>
#include <string>

#include "core/types.h"
#include "replacement/keeping_costs.h"
#include "results/rows.h"

namespace tenure::explain {

// "9 years" when low = high, else "7 to 12 years"; "-" when either is missing.
std::string life_span_words(const std::optional<Years>& low, const std::optional<Years>& high);

// The sentence above on `basis`, each part left out when the row does not hold it (a run made
// before the figures were stored); empty without an economic life.
std::string esl_sentence(const results::ClassRow& stored, replacement::Basis basis,
                         double esl_band);

}  // namespace tenure::explain
