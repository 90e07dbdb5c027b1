// The verdict on a case's defender (see case_verdict.h).
#include "review/case_verdict.h"

namespace tenure::review {

CaseVerdict case_verdict(const replacement::Case& input, const replacement::CaseResult& result) {
  const replacement::Decision& d = *result.decision;
  const replacement::BasisAnalysis& defender = result.defender->on(d.basis);
  const replacement::Ownership& challenger = replacement::chosen_challenger(input, result);
  const auto price_lines =
      replacement::price_lines(challenger, result.challenger, input.rates, d.basis);
  return {weigh(figures_of(d, defender.curve.marginal_costs[0], defender.costs.max_years()),
                input.defender->age_years, input.lead_time_years),
          at_stake(d, *result.defender, *input.defender, price_lines, challenger.first_cost,
                   input.rates, input.review_margin)};
}

}  // namespace tenure::review
