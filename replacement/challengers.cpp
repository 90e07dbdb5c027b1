// Several challengers, the best one and its improved successors (see challengers.h).
#include "replacement/challengers.h"

#include <fmt/format.h>

#include <cmath>
#include <set>

#include "core/errors.h"
#include "replacement/life_curve.h"

namespace tenure::replacement {

std::size_t best_challenger(std::span<const AssetAnalysis> analysed, Basis basis) {
  std::vector<Money> least;
  least.reserve(analysed.size());
  for (const AssetAnalysis& a : analysed) least.push_back(a.on(basis).curve.best_euac);
  return least_with_ties(least);  // rule (1): the first listed on ties
}

Ownership improved(const Ownership& challenger, double improvement, Years years_from_now) {
  const double factor = std::pow(1.0 - improvement, years_from_now);  // rule (2)
  Ownership later = challenger;
  later.first_cost *= factor;
  later.value_now *= factor;
  for (Money& cost : later.operating_costs) cost *= factor;
  for (Money& value : later.market_values) value *= factor;
  later.depreciation = challenger.depreciation->scaled(factor);
  return later;
}

ImprovedChallengers improved_least_euacs(const Ownership& challenger, const tax::Rates& rates,
                                         Basis basis, double improvement, Years years) {
  ImprovedChallengers out;
  for (Years k = 0; k <= years; ++k) {
    const LifeCurve curve =
        analyse_asset(improved(challenger, improvement, k), rates).on(basis).curve;
    out.least_euac.push_back(curve.best_euac);
    out.esl_years.push_back(curve.best_years);
  }
  return out;
}

void validate_challenger_names(std::span<const std::string> names, const std::string& where) {
  if (names.empty()) throw InputError(where, "must list at least one challenger");
  std::set<std::string_view> seen;
  for (std::size_t i = 0; i < names.size(); ++i) {
    const std::string at = fmt::format("{}[{}].name", where, i);
    if (names[i].empty()) throw InputError(at, "must not be empty");
    if (!seen.insert(names[i]).second) {
      throw InputError(at, fmt::format("duplicate challenger name '{}'", names[i]));
    }
  }
}

void validate_improvement(double improvement, const std::string& where) {
  if (!(improvement >= 0 && improvement < 1)) throw InputError(where, "must be in [0, 1)");
}

}  // namespace tenure::replacement
