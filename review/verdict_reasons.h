// Every sentence a verdict is given in, in one place: the one-sentence reason of each test of
// verdict_rule.h (with its numbers, written by replacement/reason_text.h), the same for the
// nightly review and a case file, and the rule itself in words for `tenure explain`.
//
//   verdict_reason(VerdictTest::replace_now, figures, age, 1);
//   // "Replace: keeping it any longer costs more than a new unit; its least after-tax EUAC is ..."
#pragma once

#include <string>
#include <string_view>

#include "review/verdict_rule.h"

namespace tenure::review {

// The reason of a verdict decided by `test` (rules (1) to (4) of verdict_rule.h).
std::string verdict_reason(VerdictTest test, const VerdictFigures& figures, Years age,
                           Years lead_time_years);
// Rule (0).
std::string cannot_weigh_reason(std::string_view why);
std::string overflow_reason(std::string_view figure);

// The verdict as a headline: "REPLACE now", "REVIEW (cheapest: replace after 2 years more)",
// "KEEP (cheapest: replace after 6 years more)".
std::string verdict_headline(const VerdictFinding& finding);

// The rule in words, lines of at most 100 columns, each indented by two spaces.
std::string rule_in_words();

}  // namespace tenure::review
