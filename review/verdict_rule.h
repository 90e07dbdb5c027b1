// The one rule that turns a defender-against-challenger decision into a verdict (SPEC 6), for
// the nightly review, `tenure explain`, the report and `tenure case` alike. It returns each
// test's figures and which test decided, so that a reader can print the rule with the numbers
// put in it; the one-sentence reasons are all in verdict_reasons.h.
//
//   VerdictFinding f = weigh(figures_of(decision, marginal_next, last_year), age, 1);
//   f.verdict;      // Verdict::review
//   f.decided_by;   // VerdictTest::past_economic_life
//   f.reason;       // "Review: at 9 years it is at or past a new unit's economic life of ..."
//
// Rules (cited by the code):
//   (0) An asset that cannot be weighed is under review, the reason saying why: its class has no
//       cost curve (so no challenger), or one of its figures is not a finite number (a curve that
//       grows too fast for its age, say), which is never stored.
//   (1) replace when k* = 0: keeping it any longer costs more than a new unit.
//   (2) Otherwise review when its age is at or past the challenger's economic service life on
//       the decision's basis (for the nightly review, the class's economic life).
//   (3) Otherwise review when k* <= lead_time_years: a replacement that near must be budgeted or
//       ordered now.
//   (4) Otherwise keep: a unit younger than its economic life whose replacement is further away
//       than the lead time is never due. (How close D and C are is the close_call flag of
//       review/at_stake.h, not a verdict.)
#pragma once

#include <optional>
#include <string>
#include <string_view>

#include "core/types.h"
#include "replacement/case_analysis.h"

namespace tenure::review {

enum class Verdict { keep, review, replace };
const char* to_string(Verdict verdict);  // "keep" | "review" | "replace"

// Which test decided the verdict.
enum class VerdictTest {
  cannot_weigh,        // rule (0)
  replace_now,         // rule (1)
  past_economic_life,  // rule (2)
  within_lead_time,    // rule (3)
  none_held,           // rule (4): keep
};

// What the rule weighs, all on the decision's basis.
struct VerdictFigures {
  replacement::Basis basis;
  Years keep_years;         // k*
  Years last_year_weighed;  // the defender's last year weighed
  Money defender_euac;      // D
  Years defender_best_years;
  Money challenger_euac;  // C
  Years challenger_esl;
  Money marginal_cost_next_year;  // the defender's, of its next year
};

VerdictFigures figures_of(const replacement::Decision& decision, Money marginal_cost_next_year,
                          Years last_year_weighed);

struct VerdictFinding {
  Verdict verdict = Verdict::review;
  VerdictTest decided_by = VerdictTest::cannot_weigh;
  std::optional<VerdictFigures> figures;  // none under rule (0)
  Years age = 0;                          // rule (2): the defender's age
  bool past_economic_life = false;
  Years lead_time_years = 0;  // rule (3)
  bool within_lead_time = false;
  std::string reason;  // one sentence with the numbers (verdict_reasons.h)

  bool due() const { return verdict != Verdict::keep; }
};

// Rules (1) to (4) for a defender of `age` completed years.
VerdictFinding weigh(const VerdictFigures& figures, Years age, Years lead_time_years);
// Rule (0): `why` says what is missing, e.g. the class model's note.
VerdictFinding cannot_weigh(std::string_view why);
// Rule (0) for an asset one of whose figures overflows a double: `figure` names it.
VerdictFinding overflowed(std::string_view figure);

}  // namespace tenure::review
