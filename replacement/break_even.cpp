// Break-evens read off lines (see break_even.h).
#include "replacement/break_even.h"

#include <algorithm>

#include "core/checks.h"
#include "interest/factors.h"

namespace tenure::replacement {
namespace {

// The largest x with slope x + intercept <= target over the rising lines; none without one.
std::optional<Crossing> largest_crossing(std::span<const Line> lines, double target) {
  std::optional<Crossing> best;
  for (std::size_t n = 0; n < lines.size(); ++n) {
    if (lines[n].slope <= 0) continue;
    const double x = (target - lines[n].intercept) / lines[n].slope;
    if (!best || x > best->value) best = Crossing{x, n};
  }
  return best;
}

}  // namespace

std::vector<Line> price_lines(const Ownership& challenger, const AssetAnalysis& analysed,
                              const tax::Rates& rates, Basis basis) {
  // The same unit at a price of 1 with no operating costs: its EUAC(n) is alpha_n.
  const Money price = challenger.first_cost;
  Ownership unit = challenger;
  unit.first_cost = 1;
  unit.value_now = 1;
  unit.depreciation = challenger.depreciation->scaled(1 / price);
  std::fill(unit.operating_costs.begin(), unit.operating_costs.end(), 0.0);
  for (Money& value : unit.market_values) value /= price;
  const AssetAnalysis unit_analysis = analyse_asset(unit, rates);
  const std::vector<Money>& per_unit = unit_analysis.on(basis).curve.euac;
  const std::vector<Money>& euac = analysed.on(basis).curve.euac;
  std::vector<Line> lines;
  for (std::size_t n = 0; n < euac.size(); ++n) {
    lines.push_back({per_unit[n], euac[n] - per_unit[n] * price});
  }
  return lines;
}

std::vector<Line> cost_factor_lines(const Ownership& defender, const AssetAnalysis& analysed,
                                    const tax::Rates& rates, Basis basis) {
  const bool taxed = basis == Basis::after_tax;
  const Rate i = taxed ? rates.after_tax_marr : rates.marr;
  const double kept = taxed ? 1 - rates.income_tax_rate : 1;
  const std::vector<Money>& euac = analysed.on(basis).curve.euac;
  std::vector<Line> lines;
  Money pw_costs = 0;
  for (std::size_t k = 1; k <= euac.size(); ++k) {
    pw_costs += defender.operating_costs[k - 1] * interest::pf(i, static_cast<double>(k));
    const double a = kept * pw_costs * interest::ap(i, static_cast<double>(k));
    lines.push_back({a, euac[k - 1] - a});
  }
  return lines;
}

std::optional<Crossing> break_even_price(std::span<const Line> challenger,
                                         Money defender_least_euac) {
  const auto price = largest_crossing(challenger, defender_least_euac);
  if (!price || price->value <= 0 || price->value > kMaxAmount) return std::nullopt;
  return price;
}

std::optional<Crossing> break_even_cost_factor(std::span<const Line> defender,
                                               Money challenger_least_euac) {
  for (const Line& line : defender) {
    // A year kept with no operating cost does not move with f: if it is cheaper than C*, no
    // factor makes replacing now the cheapest.
    if (line.slope <= 0 && line.intercept < challenger_least_euac) return std::nullopt;
  }
  const auto factor = largest_crossing(defender, challenger_least_euac);
  if (!factor || factor->value <= 0) return std::nullopt;
  return factor;
}

}  // namespace tenure::replacement
