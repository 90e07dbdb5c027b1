// One whole replacement analysis (SPEC 5 and 6): the challenger's economic service life before
// and after tax, the defender's best remaining life and marginal costs, the decision's figures
// from the optimal replacement timing, and an optional study period. The verdict the figures
// lead to is review/verdict_rule.h's.
//
//   Case c{Rates::make(0.10, 0.25), challenger, defender, 3};
//   CaseResult r = analyse(c);
//   r.decision->timing.keep_years;   // k*: 0 means replace now
#pragma once

#include <optional>

#include "core/types.h"
#include "replacement/keeping_costs.h"
#include "replacement/life_curve.h"
#include "replacement/ownership.h"
#include "replacement/study_period.h"
#include "replacement/timing.h"
#include "tax/rates.h"

namespace tenure::replacement {

struct Case {
  tax::Rates rates;
  Ownership challenger;
  std::optional<Ownership> defender;
  std::optional<Years> study_period_years;
  // How its verdict is weighed (review/case_verdict.h), as the policy's keys of these names.
  Years lead_time_years = 1;
  double review_margin = 0.05;
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
};

struct CaseResult {
  Basis basis;
  AssetAnalysis challenger;
  std::optional<AssetAnalysis> defender;
  std::optional<Decision> decision;        // present with a defender
  std::optional<StudyPeriod> study_period; // present when asked for
};

// Validates the case (errors name the JSON path) and analyses it.
CaseResult analyse(const Case& input);

// One asset on both bases (used by analyse and by the nightly review).
AssetAnalysis analyse_asset(const Ownership& asset, const tax::Rates& rates);

// The decision between a defender and a challenger already analysed.
Decision decide(const AssetAnalysis& defender, const AssetAnalysis& challenger,
                const tax::Rates& rates);

const char* to_string(Basis basis);

}  // namespace tenure::replacement
