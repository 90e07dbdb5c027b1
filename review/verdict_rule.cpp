// The verdict rule (see verdict_rule.h).
#include "review/verdict_rule.h"

#include <cmath>

#include "review/verdict_reasons.h"

namespace tenure::review {

const char* to_string(Verdict verdict) {
  switch (verdict) {
    case Verdict::keep:
      return "keep";
    case Verdict::review:
      return "review";
    case Verdict::replace:
      return "replace";
  }
  return "keep";
}

VerdictFigures figures_of(const replacement::Decision& d, Money marginal_cost_next_year,
                          Years last_year_weighed) {
  return {d.basis,          d.timing.keep_years,    last_year_weighed,
          d.defender_euac,  d.defender_best_years,  d.challenger_euac,
          d.challenger_esl, marginal_cost_next_year};
}

VerdictFinding nightly_verdict(const VerdictFigures& figures, Years age, double review_margin) {
  VerdictFinding f;
  f.figures = figures;
  f.age = age;
  f.past_economic_life = age >= figures.challenger_esl;
  f.review_margin = review_margin;
  f.gap = std::abs(figures.defender_euac - figures.challenger_euac);
  f.allowed = review_margin * figures.challenger_euac;
  f.close_to_challenger = f.gap <= f.allowed;
  if (figures.keep_years == 0) {  // rule (1)
    f.verdict = Verdict::replace;
    f.decided_by = VerdictTest::replace_now;
  } else if (f.past_economic_life) {  // rule (2)
    f.verdict = Verdict::review;
    f.decided_by = VerdictTest::past_economic_life;
  } else if (f.close_to_challenger) {  // rule (3)
    f.verdict = Verdict::review;
    f.decided_by = VerdictTest::close_to_challenger;
  } else {  // rule (4)
    f.verdict = Verdict::keep;
    f.decided_by = VerdictTest::none_held;
  }
  f.reason = nightly_reason(f.decided_by, figures, age, review_margin);
  return f;
}

VerdictFinding case_verdict(const VerdictFigures& figures) {
  VerdictFinding f;
  f.figures = figures;
  const bool now = figures.keep_years == 0;  // rule (1), else rule (4)
  f.verdict = now ? Verdict::replace : Verdict::keep;
  f.decided_by = now ? VerdictTest::replace_now : VerdictTest::none_held;
  f.reason = case_reason(figures);
  return f;
}

VerdictFinding cannot_weigh(std::string_view why) {
  VerdictFinding f;  // rule (0): review, decided by cannot_weigh
  f.reason = cannot_weigh_reason(why);
  return f;
}

}  // namespace tenure::review
