// Study-period options: defender j years, then challenger T - j years (see study_period.h).
#include "replacement/study_period.h"

#include <fmt/format.h>

#include "core/errors.h"
#include "interest/factors.h"
#include "replacement/life_curve.h"

namespace tenure::replacement {

StudyPeriod study_period(const KeepingCosts* defender, const KeepingCosts& challenger,
                         Years years) {
  if (years < 1) throw InputError("$.study_period_years", "must be a whole number >= 1");
  const Rate i = challenger.rate();
  StudyPeriod study{years, {}, 0};
  const Years max_defender = defender ? defender->max_years() : 0;
  for (Years j = 0; j <= years && j <= max_defender; ++j) {
    const Years challenger_years = years - j;
    if (challenger_years > challenger.max_years()) continue;
    const Money defender_pw = defender ? defender->pw_cost(j) : 0.0;
    const Money pw = defender_pw + interest::pf(i, j) * challenger.pw_cost(challenger_years);
    study.options.push_back({j, pw});
  }
  if (study.options.empty()) {
    throw InputError("$.study_period_years",
                     fmt::format("{} years cannot be covered: the defender's series has {} years "
                                 "and the challenger's {}",
                                 years, max_defender, challenger.max_years()));
  }
  std::vector<Money> costs;
  for (const auto& option : study.options) costs.push_back(option.present_worth_cost);
  study.best_defender_years = study.options[least_with_ties(costs)].defender_years;
  return study;
}

}  // namespace tenure::replacement
