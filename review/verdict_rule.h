// The one rule that turns a defender-against-challenger decision into a verdict (SPEC 6), for
// the nightly review, `tenure explain`, the report and `tenure case` alike. It returns each
// test's figures and which test decided, so that a reader can print the rule with the numbers
// put in it; the one-sentence reasons are all in verdict_reasons.h.
//
//   VerdictFinding f = nightly_verdict(figures_of(decision, marginal_next, last_year), age, 0.05);
//   f.verdict;      // Verdict::review
//   f.decided_by;   // VerdictTest::past_economic_life
//   f.reason;       // "Review: at 9 years it is at or past the class's economic life of ..."
//
// Rules (cited by the code):
//   (0) An asset whose class cannot be weighed (no cost curve, so no challenger) is under review,
//       the reason saying why.
//   (1) replace when k* = 0: keeping it any longer costs more than a new unit.
//   (2) Nightly: otherwise review when its age is at or past the class's economic service life on
//       the decision's basis.
//   (3) Nightly: otherwise review when |D - C| <= review_margin x C (D, C: the defender's and the
//       challenger's least EUACs on the basis).
//   (4) Otherwise keep. A case file's defender is weighed on (1) alone: keep or replace.
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
  cannot_weigh,         // rule (0)
  replace_now,          // rule (1)
  past_economic_life,   // rule (2)
  close_to_challenger,  // rule (3)
  none_held,            // rule (4): keep
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
  // Rule (2)'s figures and whether it holds; present when it was weighed (nightly).
  std::optional<Years> age;
  bool past_economic_life = false;
  // Rule (3)'s figures and whether it holds; present when it was weighed (nightly).
  std::optional<double> review_margin;
  Money gap = 0;      // |D - C|
  Money allowed = 0;  // review_margin x C
  bool close_to_challenger = false;
  std::string reason;  // one sentence with the numbers (verdict_reasons.h)

  bool due() const { return verdict != Verdict::keep; }
};

// Rules (1) to (4) for an asset of `age` completed years in the nightly review.
VerdictFinding nightly_verdict(const VerdictFigures& figures, Years age, double review_margin);
// Rules (1) and (4) for a case file's defender.
VerdictFinding case_verdict(const VerdictFigures& figures);
// Rule (0): `why` says what is missing, e.g. the class model's note.
VerdictFinding cannot_weigh(std::string_view why);

}  // namespace tenure::review
