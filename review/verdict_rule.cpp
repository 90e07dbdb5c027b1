// The verdict rule (see verdict_rule.h).
#include "review/verdict_rule.h"

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
  return {d.basis,           d.timing.keep_years, last_year_weighed,
          d.defender_euac,   d.defender_best_years, d.challenger_euac,
          d.challenger_esl,  marginal_cost_next_year};
}

VerdictFinding weigh(const VerdictFigures& figures, Years age, Years lead_time_years) {
  VerdictFinding f;
  f.figures = figures;
  f.age = age;
  f.past_economic_life = age >= figures.challenger_esl;
  f.lead_time_years = lead_time_years;
  f.within_lead_time = figures.keep_years <= lead_time_years;
  if (figures.keep_years == 0) {  // rule (1)
    f.verdict = Verdict::replace;
    f.decided_by = VerdictTest::replace_now;
  } else if (f.past_economic_life) {  // rule (2)
    f.verdict = Verdict::review;
    f.decided_by = VerdictTest::past_economic_life;
  } else if (f.within_lead_time) {  // rule (3)
    f.verdict = Verdict::review;
    f.decided_by = VerdictTest::within_lead_time;
  } else {  // rule (4)
    f.verdict = Verdict::keep;
    f.decided_by = VerdictTest::none_held;
  }
  f.reason = verdict_reason(f.decided_by, figures, age, lead_time_years);
  return f;
}

VerdictFinding cannot_weigh(std::string_view why) {
  VerdictFinding f;  // rule (0): review, decided by cannot_weigh
  f.reason = cannot_weigh_reason(why);
  return f;
}

VerdictFinding overflowed(std::string_view figure) {
  VerdictFinding f;  // rule (0)
  f.reason = overflow_reason(figure);
  return f;
}

}  // namespace tenure::review
