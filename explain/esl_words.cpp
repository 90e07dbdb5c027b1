// How firm a class's economic life is, in words (see esl_words.h).
#include "explain/esl_words.h"

#include <fmt/format.h>

#include "formats/text_table.h"
#include "review/esl_bootstrap.h"

namespace tenure::explain {

std::string life_span_words(const std::optional<Years>& low, const std::optional<Years>& high) {
  if (!low || !high) return "-";
  if (*low == *high) return formats::years(*low);
  return fmt::format("{} to {} years", *low, *high);
}

std::string esl_sentence(const results::ClassRow& stored, replacement::Basis basis,
                         double esl_band) {
  const std::optional<Years> esl = basis == replacement::Basis::after_tax
                                       ? stored.esl_years_after_tax
                                       : stored.esl_years_before_tax;
  if (!esl) return "";
  std::string out = "economic life " + formats::years(*esl);
  if (stored.esl_band_low && stored.esl_band_high) {
    out += fmt::format("; lives within {} of the least EUAC: {}", formats::percent(esl_band),
                       life_span_words(stored.esl_band_low, stored.esl_band_high));
  }
  if (stored.esl_p10 && stored.esl_p90) {
    out += fmt::format(
        "; bootstrap 10th-90th percentile: {} ({} refits of the cost curve on resampled assets)",
        life_span_words(stored.esl_p10, stored.esl_p90), review::kBootstrapRefits);
  }
  return out;
}

}  // namespace tenure::explain
