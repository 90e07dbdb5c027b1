// One whole replacement analysis: both assets on both bases, the decision, the study period
// (see case_analysis.h).
#include "replacement/case_analysis.h"

#include <fmt/format.h>

#include "core/errors.h"
#include "replacement/challengers.h"

namespace tenure::replacement {

const BasisAnalysis& AssetAnalysis::on(Basis basis) const {
  return basis == Basis::after_tax && after_tax ? *after_tax : before_tax;
}

AssetAnalysis analyse_asset(const Ownership& asset, const tax::Rates& rates) {
  KeepingCosts before = before_tax_keeping_costs(asset, rates.marr);
  LifeCurve before_curve = life_curve(before);
  AssetAnalysis result{
      {std::move(before), std::move(before_curve)}, std::nullopt, after_tax_table(asset, rates)};
  if (rates.after_tax()) {
    KeepingCosts after = after_tax_keeping_costs(result.table, rates.after_tax_marr);
    LifeCurve after_curve = life_curve(after);
    result.after_tax = BasisAnalysis{std::move(after), std::move(after_curve)};
  }
  return result;
}

Decision decide(const AssetAnalysis& defender, const AssetAnalysis& challenger,
                const tax::Rates& rates, const ImprovedChallengers* later) {
  Decision d{};
  d.basis = rates.after_tax() ? Basis::after_tax : Basis::before_tax;
  const BasisAnalysis& def = defender.on(d.basis);
  const BasisAnalysis& ch = challenger.on(d.basis);
  d.challenger_euac = ch.curve.best_euac;
  d.challenger_esl = ch.curve.best_years;
  d.defender_euac = def.curve.best_euac;
  d.defender_best_years = def.curve.best_years;
  if (later) {
    const auto years = static_cast<std::size_t>(def.costs.max_years()) + 1;
    if (later->least_euac.size() < years) {
      throw RuntimeFailure("the improved challengers do not cover the defender's years");
    }
    d.challenger_euac_by_year.assign(later->least_euac.begin(), later->least_euac.begin() + years);
    d.challenger_esl_by_year.assign(later->esl_years.begin(), later->esl_years.begin() + years);
    d.timing = optimal_replacement(def.costs, d.challenger_euac_by_year);
  } else {
    d.timing = optimal_replacement(def.costs, d.challenger_euac);
  }
  return d;
}

const Ownership& chosen_challenger(const Case& input, const CaseResult& result) {
  return input.challengers.empty() ? input.challenger : input.challengers[result.chosen].asset;
}

namespace {

void validate_challenger(const Ownership& challenger, const std::string& where) {
  validate(challenger, where);
  if (challenger.age_years != 0) {
    throw InputError(where + ".age_years", "a challenger is new: age must be 0");
  }
}

// Every challenger of the several-challengers form analysed, in the order given.
std::vector<AssetAnalysis> analyse_challengers(const Case& input) {
  std::vector<std::string> names;
  for (const NamedChallenger& c : input.challengers) names.push_back(c.name);
  validate_challenger_names(names, "$.challengers");
  for (std::size_t i = 0; i < input.challengers.size(); ++i) {
    validate_challenger(input.challengers[i].asset, fmt::format("$.challengers[{}]", i));
  }
  std::vector<AssetAnalysis> analysed;
  for (const NamedChallenger& c : input.challengers) {
    analysed.push_back(analyse_asset(c.asset, input.rates));
  }
  return analysed;
}

}  // namespace

CaseResult analyse(const Case& input) {
  const tax::Rates& rates = input.rates;
  const Basis basis = rates.after_tax() ? Basis::after_tax : Basis::before_tax;
  validate_improvement(input.improvement, "$.improvement");
  std::vector<AssetAnalysis> several;
  std::size_t chosen = 0;
  if (input.challengers.empty()) {
    validate_challenger(input.challenger, "$.challenger");
  } else {
    several = analyse_challengers(input);
    chosen = best_challenger(several, basis);
  }
  if (input.defender) validate(*input.defender, "$.defender");
  AssetAnalysis challenger =
      several.empty() ? analyse_asset(input.challenger, rates) : several[chosen];
  CaseResult result{basis,        std::move(challenger), std::nullopt, std::nullopt,
                    std::nullopt, std::move(several),    chosen};
  if (input.defender) {
    result.defender = analyse_asset(*input.defender, rates);
    std::optional<ImprovedChallengers> later;
    if (input.improvement > 0) {
      later = improved_least_euacs(chosen_challenger(input, result), rates, basis,
                                   input.improvement, result.defender->before_tax.costs.max_years());
    }
    result.decision = decide(*result.defender, result.challenger, rates, later ? &*later : nullptr);
  }
  if (input.study_period_years) {
    const KeepingCosts* defender =
        result.defender ? &result.defender->on(result.basis).costs : nullptr;
    result.study_period =
        study_period(defender, result.challenger.on(result.basis).costs, *input.study_period_years);
  }
  return result;
}

const char* to_string(Basis basis) {
  return basis == Basis::after_tax ? "after_tax" : "before_tax";
}

}  // namespace tenure::replacement
