// One whole replacement analysis (SPEC 5, 6 and 14): each challenger's economic service life
// before and after tax, the best of them on the basis, the defender's best remaining life and
// marginal costs, the decision's figures from the optimal replacement timing (with improving
// challengers when `improvement` > 0), and an optional study period. The verdict the figures
// lead to is review/verdict_rule.h's.
//
//   Case c{Rates::make(0.10, 0.25), challenger, defender, 3};
//   CaseResult r = analyse(c);
//   r.decision->timing.keep_years;   // k*: 0 means replace now
//   c.challengers = {{"diesel", diesel}, {"electric", electric}};   // the several-challengers form
//   analyse(c).chosen;                                              // index of the best
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "core/types.h"
#include "replacement/keeping_costs.h"
#include "replacement/life_curve.h"
#include "replacement/ownership.h"
#include "replacement/study_period.h"
#include "replacement/timing.h"
#include "tax/rates.h"

namespace tenure::replacement {

struct NamedChallenger {
  std::string name;
  Ownership asset;
};

struct Case {
  tax::Rates rates;
  Ownership challenger;  // the one-challenger form; not read when `challengers` is given
  std::optional<Ownership> defender;
  std::optional<Years> study_period_years;
  // How its verdict is weighed (review/case_verdict.h), as the policy's keys of these names.
  Years lead_time_years = 1;
  double review_margin = 0.05;
  // The several-challengers form (SPEC 14); when not empty, `challenger` is not read.
  std::vector<NamedChallenger> challengers = {};
  // g: a challenger bought k years from now has every amount scaled by (1 - g)^k (SPEC 14).
  double improvement = 0;
};

// One asset's analysis on one basis.
struct BasisAnalysis {
  KeepingCosts costs;
  LifeCurve curve;
};

struct AssetAnalysis {
  BasisAnalysis before_tax;
  std::optional<BasisAnalysis> after_tax;  // present when income_tax_rate > 0
  AfterTaxTable table;                     // the after-tax audit table (also when t = 0)
  const BasisAnalysis& on(Basis basis) const;
};

// The figures of a defender against a challenger, on the basis.
struct Decision {
  Basis basis;              // after_tax when income_tax_rate > 0
  Timing timing;            // k* and the present worths behind it
  Money challenger_euac;    // challenger's least EUAC on the basis
  Years challenger_esl;
  Money defender_euac;      // defender's least EUAC on the basis
  Years defender_best_years;
  // With improvement > 0, for k = 0..M: the least EUAC C*_k and economic life of the challenger
  // bought k years from now (replacement/challengers.h); empty otherwise.
  std::vector<Money> challenger_euac_by_year = {};
  std::vector<Years> challenger_esl_by_year = {};
};

struct CaseResult {
  Basis basis;
  AssetAnalysis challenger;                // the chosen (best) challenger
  std::optional<AssetAnalysis> defender;
  std::optional<Decision> decision;        // present with a defender
  std::optional<StudyPeriod> study_period; // present when asked for
  // The several-challengers form: each one's analysis, in the order given, and the index of the
  // chosen one (its analysis is also `challenger`); empty and 0 in the one-challenger form.
  std::vector<AssetAnalysis> challengers = {};
  std::size_t chosen = 0;
};

// Validates the case (errors name the JSON path) and analyses it.
CaseResult analyse(const Case& input);

// One asset on both bases (used by analyse and by the nightly review).
AssetAnalysis analyse_asset(const Ownership& asset, const tax::Rates& rates);

struct ImprovedChallengers;  // replacement/challengers.h

// The decision between a defender and a challenger already analysed. With improving technology
// (SPEC 14), `later` holds C*_k of `challenger` bought k = 0.. years from now (at least the
// defender's years + 1; a class computes it once for all its assets) and the timing weighs it.
Decision decide(const AssetAnalysis& defender, const AssetAnalysis& challenger,
                const tax::Rates& rates, const ImprovedChallengers* later = nullptr);

// The challenger the case's decision weighs: `challenger`, or the chosen one of `challengers`.
const Ownership& chosen_challenger(const Case& input, const CaseResult& result);

const char* to_string(Basis basis);

}  // namespace tenure::replacement
