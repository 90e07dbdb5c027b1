// What is at stake in a decision (see stakes.h).
#include "replacement/stakes.h"

#include <algorithm>

#include "interest/factors.h"
#include "replacement/life_curve.h"

namespace tenure::replacement {

double repair_deduction_factor(const tax::Rates& rates, Basis basis) {
  if (basis == Basis::before_tax) return 1;
  return 1 - rates.income_tax_rate * interest::pf(rates.after_tax_marr, 1);
}

Stakes stakes(const Timing& timing, double repair_deduction_factor) {
  const std::vector<Money>& t = timing.present_worth;
  const auto k = static_cast<std::size_t>(timing.keep_years);
  Stakes s;
  if (k + 1 < t.size()) s.delay_cost = t[k + 1] - t[k];  // rule (1)
  s.early_cost = t[0] - t[k];                             // rule (2)
  if (k > 0) {                                            // rule (3)
    const Money best_kept = *std::min_element(t.begin() + 1, t.end());
    s.repair_limit = std::max(0.0, t[0] - best_kept) / repair_deduction_factor;
  }
  return s;
}

Timing after_repair(const Timing& timing, Money repair, double repair_deduction_factor) {
  Timing repaired = timing;
  for (std::size_t k = 1; k < repaired.present_worth.size(); ++k) {
    repaired.present_worth[k] += repair * repair_deduction_factor;
  }
  repaired.keep_years = static_cast<Years>(least_with_ties(repaired.present_worth));
  return repaired;
}

}  // namespace tenure::replacement
