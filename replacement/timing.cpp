// Optimal replacement timing against a challenger repeated forever (see timing.h).
#include "replacement/timing.h"

#include "interest/factors.h"
#include "replacement/life_curve.h"

namespace tenure::replacement {

Timing optimal_replacement(const KeepingCosts& defender, Money challenger_least_euac) {
  const Rate i = defender.rate();
  // The challenger chain as a perpetuity: C*/i, valued at the moment it starts.
  const Money chain = challenger_least_euac / i;
  Timing timing;
  for (Years k = 0; k <= defender.max_years(); ++k) {
    timing.present_worth.push_back(defender.pw_cost(k) + chain * interest::pf(i, k));
  }
  timing.keep_years = static_cast<Years>(least_with_ties(timing.present_worth));
  return timing;
}

Timing optimal_replacement(const KeepingCosts& defender,
                           std::span<const Money> least_euac_by_year) {
  const Rate i = defender.rate();
  Timing timing;
  for (Years k = 0; k <= defender.max_years(); ++k) {
    const Money chain = least_euac_by_year[static_cast<std::size_t>(k)] / i;
    timing.present_worth.push_back(defender.pw_cost(k) + chain * interest::pf(i, k));
  }
  timing.keep_years = static_cast<Years>(least_with_ties(timing.present_worth));
  return timing;
}

}  // namespace tenure::replacement
