// The sentences of verdicts (see verdict_reasons.h).
#include "review/verdict_reasons.h"

#include <fmt/format.h>

#include "replacement/reason_text.h"

namespace tenure::review {

using replacement::reason_years;

std::string verdict_reason(VerdictTest test, const VerdictFigures& f, Years age,
                           Years lead_time_years) {
  const std::string basis =
      f.basis == replacement::Basis::after_tax ? "after-tax" : "before-tax";
  // "after 3 years more", and "(the last year weighed)" when k* is the end of the years given.
  const std::string when = fmt::format("after {} more{}", reason_years(f.keep_years),
                                       f.keep_years == f.last_year_weighed
                                           ? " (the last year weighed)"
                                           : "");
  const std::string euacs =
      fmt::format("{} EUAC {} against the challenger's {}", basis, money(f.defender_euac),
                  money(f.challenger_euac));
  switch (test) {
    case VerdictTest::replace_now:
      return fmt::format(
          "Replace: keeping it any longer costs more than a new unit; its least {} EUAC is {} "
          "against the challenger's {}, and next year's marginal cost is {}.",
          basis, money(f.defender_euac), money(f.challenger_euac),
          money(f.marginal_cost_next_year));
    case VerdictTest::past_economic_life:
      return fmt::format(
          "Review: at {} it is at or past a new unit's economic life of {}; replacing {} is "
          "cheapest ({}).",
          reason_years(age), reason_years(f.challenger_esl), when, euacs);
    case VerdictTest::within_lead_time:
      return fmt::format(
          "Review: replacing {} is cheapest, within the lead time of {}, so the replacement is "
          "to be budgeted or ordered now ({}).",
          when, reason_years(lead_time_years), euacs);
    case VerdictTest::none_held:
    case VerdictTest::cannot_weigh:
      break;
  }
  return fmt::format(
      "Keep: at {} it is short of a new unit's economic life of {}, and replacing {} is "
      "cheapest ({}).",
      reason_years(age), reason_years(f.challenger_esl), when, euacs);
}

std::string cannot_weigh_reason(std::string_view why) {
  return fmt::format(
      "Review: {}; tenure cannot weigh this asset until then.",
      why);
}

std::string overflow_reason(std::string_view figure) {
  return fmt::format(
      "Review: its {} overflows (it is not a finite number), so tenure cannot weigh this asset; "
      "check its in-service date and the class's cost curve, which may grow too fast for its "
      "age.",
      figure);
}

std::string verdict_headline(const VerdictFinding& f) {
  std::string words = f.verdict == Verdict::replace  ? "REPLACE now"
                      : f.verdict == Verdict::review ? "REVIEW"
                                                     : "KEEP";
  if (f.figures && f.figures->keep_years > 0) {
    words += fmt::format(" (cheapest: replace after {} more)", reason_years(f.figures->keep_years));
  }
  return words;
}

std::string rule_in_words() {
  return "  replace when k* = 0; otherwise review when the age is at or past a new unit's "
         "economic life,\n  or when k* <= the lead time; otherwise keep\n  (k*: the years to keep "
         "it before replacing is cheapest)\n";
}

}  // namespace tenure::review
