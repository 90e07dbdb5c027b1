// One whole replacement analysis: both assets on both bases, the decision, the study period
// (see case_analysis.h).
#include "replacement/case_analysis.h"

#include "core/errors.h"

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
                const tax::Rates& rates) {
  Decision d{};
  d.basis = rates.after_tax() ? Basis::after_tax : Basis::before_tax;
  const BasisAnalysis& def = defender.on(d.basis);
  const BasisAnalysis& ch = challenger.on(d.basis);
  d.challenger_euac = ch.curve.best_euac;
  d.challenger_esl = ch.curve.best_years;
  d.defender_euac = def.curve.best_euac;
  d.defender_best_years = def.curve.best_years;
  d.timing = optimal_replacement(def.costs, d.challenger_euac);
  return d;
}

CaseResult analyse(const Case& input) {
  validate(input.challenger, "$.challenger");
  if (input.challenger.age_years != 0) {
    throw InputError("$.challenger.age_years", "a challenger is new: age must be 0");
  }
  if (input.defender) validate(*input.defender, "$.defender");
  const tax::Rates& rates = input.rates;
  CaseResult result{rates.after_tax() ? Basis::after_tax : Basis::before_tax,
                    analyse_asset(input.challenger, rates), std::nullopt, std::nullopt,
                    std::nullopt};
  if (input.defender) {
    result.defender = analyse_asset(*input.defender, rates);
    result.decision = decide(*result.defender, result.challenger, rates);
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
