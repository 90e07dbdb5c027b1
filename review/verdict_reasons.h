// Every sentence a verdict is given in, in one place: the one-sentence reasons of the nightly
// review and of a case (each with its numbers, written by replacement/reason_text.h), and the
// rule itself in words for `tenure explain`.
//
//   nightly_reason(VerdictTest::replace_now, figures, age, margin);
//   // "Replace: keeping it any longer costs more than a new unit; its least after-tax EUAC is ..."
#pragma once

#include <string>
#include <string_view>

#include "review/verdict_rule.h"

namespace tenure::review {

// The reason of a nightly verdict decided by `test` (rules (1) to (4) of verdict_rule.h).
std::string nightly_reason(VerdictTest test, const VerdictFigures& figures, Years age,
                           double review_margin);
// The reason of a case file's verdict (rules (1) and (4)).
std::string case_reason(const VerdictFigures& figures);
// Rule (0).
std::string cannot_weigh_reason(std::string_view why);

// The nightly rule in words, two lines of at most 100 columns, each indented by two spaces.
std::string nightly_rule_in_words();

}  // namespace tenure::review
