// What is at stake for one defender (see at_stake.h).
#include "review/at_stake.h"

#include <cmath>

namespace tenure::review {

AtStake at_stake(const replacement::Decision& d, const replacement::AssetAnalysis& defender_analysis,
                 const replacement::Ownership& defender,
                 std::span<const replacement::Line> challenger_price_lines, Money challenger_price,
                 const tax::Rates& rates, double review_margin) {
  const replacement::Stakes s =
      replacement::stakes(d.timing, replacement::repair_deduction_factor(rates, d.basis));
  AtStake out;
  out.delay_cost = s.delay_cost;
  out.early_cost = s.early_cost;
  out.repair_limit = s.repair_limit;
  out.improving = !d.challenger_euac_by_year.empty();
  if (out.improving) return out;  // rule (2)
  if (const auto price = replacement::break_even_price(challenger_price_lines, d.defender_euac)) {
    out.break_even_price = price->value;
    out.break_even_price_life = static_cast<Years>(price->line + 1);
  }
  if (const auto factor = replacement::break_even_cost_factor(
          replacement::cost_factor_lines(defender, defender_analysis, rates, d.basis),
          d.challenger_euac)) {
    out.break_even_cost_factor = factor->value;
    out.break_even_factor_years = static_cast<Years>(factor->line + 1);
  }
  out.close_call = out.break_even_price &&  // rule (1)
                   std::abs(*out.break_even_price / challenger_price - 1) <= review_margin;
  return out;
}

}  // namespace tenure::review
