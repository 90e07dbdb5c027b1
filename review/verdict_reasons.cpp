// The sentences of verdicts (see verdict_reasons.h).
#include "review/verdict_reasons.h"

#include <fmt/format.h>

#include "replacement/reason_text.h"

namespace tenure::review {
namespace {

using replacement::reason_money;
using replacement::reason_years;

std::string basis_words(replacement::Basis basis) {
  return basis == replacement::Basis::after_tax ? "after-tax" : "before-tax";
}

}  // namespace

std::string nightly_reason(VerdictTest test, const VerdictFigures& f, Years age,
                           double review_margin) {
  const std::string basis = basis_words(f.basis);
  switch (test) {
    case VerdictTest::replace_now:
      return fmt::format(
          "Replace: keeping it any longer costs more than a new unit; its least {} EUAC is {} "
          "against the challenger's {} and next year's marginal cost is {}.",
          basis, reason_money(f.defender_euac), reason_money(f.challenger_euac),
          reason_money(f.marginal_cost_next_year));
    case VerdictTest::past_economic_life:
      return fmt::format(
          "Review: at {} it is at or past the class's economic life of {}; replacing after {} "
          "more is cheapest ({} EUAC {} against the challenger's {}).",
          reason_years(age), reason_years(f.challenger_esl), reason_years(f.keep_years), basis,
          reason_money(f.defender_euac), reason_money(f.challenger_euac));
    case VerdictTest::close_to_challenger:
      return fmt::format(
          "Review: its least {} EUAC of {} is within {:g}% of the challenger's {}; replacing "
          "after {} more is cheapest.",
          basis, reason_money(f.defender_euac), review_margin * 100,
          reason_money(f.challenger_euac), reason_years(f.keep_years));
    case VerdictTest::none_held:
    case VerdictTest::cannot_weigh:
      break;
  }
  return fmt::format(
      "Keep: at {} it is short of the class's economic life of {}; its least {} EUAC is {} "
      "against the challenger's {}, and replacing after {} more is cheapest.",
      reason_years(age), reason_years(f.challenger_esl), basis, reason_money(f.defender_euac),
      reason_money(f.challenger_euac), reason_years(f.keep_years));
}

std::string case_reason(const VerdictFigures& f) {
  const std::string basis = basis_words(f.basis);
  if (f.keep_years == 0) {
    return fmt::format(
        "Replace now: on an {} basis the defender's least EUAC is {} (keeping {}) against the "
        "challenger's {} (economic life {}), and no period of keeping it costs less than "
        "replacing it at once.",
        basis, reason_money(f.defender_euac), reason_years(f.defender_best_years),
        reason_money(f.challenger_euac), reason_years(f.challenger_esl));
  }
  const std::string horizon =
      f.keep_years == f.last_year_weighed ? " (the end of the years given for it)" : "";
  return fmt::format(
      "Keep the defender {} more{} and then replace it: on an {} basis its least EUAC is {} "
      "(keeping {}) against the challenger's {} (economic life {}).",
      reason_years(f.keep_years), horizon, basis, reason_money(f.defender_euac),
      reason_years(f.defender_best_years), reason_money(f.challenger_euac),
      reason_years(f.challenger_esl));
}

std::string cannot_weigh_reason(std::string_view why) {
  return fmt::format(
      "Review: {}; tenure cannot weigh this asset until the class has a complete year of costs.",
      why);
}

std::string nightly_rule_in_words() {
  return "  replace when k* = 0; otherwise review when the age is at or past the class's economic "
         "life,\n  or when |D - C| <= review margin x C; otherwise keep (D, C: least EUACs on the "
         "basis)\n";
}

}  // namespace tenure::review
