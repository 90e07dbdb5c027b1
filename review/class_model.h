// One asset class in the nightly review (SPEC 6): its cost curve fitted on the pooled complete
// asset-years of all its assets (retired ones too), its market-value curve, and its challenger,
// a new unit analysed over 1..max_life_years whose economic service life is the class's best
// economic age; and how firm that life is (SPEC 11 "Per class"): the lives within esl_band of
// the least EUAC (esl_band.h) and the life's bootstrap percentiles (esl_bootstrap.h).
//
//   ClassModel vans = build_class_model("van-delivery", policy.classes.at("van-delivery"),
//                                       data, members, policy.rates, policy.esl_band);
//   if (vans.challenger) vans.challenger->on(Basis::after_tax).curve.best_years;
//   vans.band->low; vans.spread->p90;
//   vans.chosen_name;   // the several-challengers form (SPEC 14): the one the verdicts weigh
#pragma once

#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "fleet/cost_curve.h"
#include "fleet/value_curve.h"
#include "replacement/break_even.h"
#include "replacement/case_analysis.h"
#include "replacement/challengers.h"
#include "review/esl_band.h"
#include "review/esl_bootstrap.h"
#include "review/fleet_data.h"
#include "review/policy.h"

namespace tenure::review {

// One challenger of a class as the review builds it (SPEC 14): the one-challenger form's is the
// policy's price on the class curves with the class's depreciation.
struct ClassChallenger {
  std::string name;  // empty in the one-challenger form
  Money first_cost;
  double cost_factor;
  fleet::ValueCurve value_curve;
  std::shared_ptr<const depreciation::Method> depreciation;
};

// One challenger's economic life and least EUAC on each basis (after tax when t > 0).
struct ChallengerFigures {
  std::string name;
  Years esl_before_tax;
  Money euac_before_tax;
  std::optional<Years> esl_after_tax;
  std::optional<Money> euac_after_tax;
};

// The challengers of `policy` (one in the one-challenger form), `depreciation` being the class's
// method made once and `value_curve` the class's curve.
std::vector<ClassChallenger> class_challengers(
    const ClassPolicy& policy, const fleet::ValueCurve& value_curve,
    const std::shared_ptr<const depreciation::Method>& depreciation);

struct ClassModel {
  std::string asset_class;
  const ClassPolicy* policy;
  std::size_t assets;                          // accepted assets of the class, retired included
  std::shared_ptr<const depreciation::Method> depreciation;  // the policy's, made once
  std::optional<fleet::CostCurve> cost_curve;  // none without a complete cost year
  fleet::ValueCurve value_curve;
  std::optional<replacement::Ownership> challenger_input;
  std::optional<replacement::AssetAnalysis> challenger;  // the chosen one, with a cost curve
  // The several-challengers form: each one's figures in the order listed, and the index of the
  // one chosen (least EUAC on the basis, the first listed on ties); with one challenger, its
  // figures and 0. Empty without a challenger analysis.
  std::vector<ChallengerFigures> challengers_weighed = {};
  std::size_t chosen = 0;
  std::string chosen_name = {};  // empty in the one-challenger form
  Money challenger_price = 0;  // the chosen challenger's first cost
  // The chosen challenger's depreciation: its own where it gives one, else the class's.
  const depreciation::Spec& challenger_depreciation() const {
    if (policy->challengers.empty()) return policy->depreciation;
    const auto& own = policy->challengers[chosen].depreciation;
    return own ? *own : policy->depreciation;
  }
  // With improvement > 0: C*_k of the chosen challenger bought k = 0..max_life_years years from
  // now, computed once for all the class's assets.
  std::optional<replacement::ImprovedChallengers> later = std::nullopt;
  // The challenger's EUAC(n) against its price on the decision's basis (replacement/break_even.h
  // rule (2)); empty without a challenger.
  std::vector<replacement::Line> price_lines = {};
  // On the decision's basis, present with a challenger: the lives whose EUAC is within the
  // policy's esl_band of the least (esl_band.h), and the economic life's 10th and 90th
  // percentiles over the bootstrap refits (esl_bootstrap.h). Only build_class_model has the
  // assets' cost years to draw from: a model made from stored curves has no spread.
  std::optional<EslBand> band = std::nullopt;
  std::optional<EslSpread> spread = std::nullopt;
  std::string note = {};  // why there is no challenger, or what was assumed; empty when nothing

  // Expected operating cost of age-year k for a unit at `factor` times the class level; a curve
  // that falls below zero at high ages is read as zero (see note).
  Money cost_at(Years age_year, double factor = 1.0) const;
};

// A class challenger on a cost curve: a new unit at its price, its operating cost of year k the
// curve at age-year k times its cost factor (read as zero where the curve falls below it), its
// market value its value curve times the price, depreciated by its method, kept
// 1..max_life_years.
replacement::Ownership challenger_ownership(const ClassChallenger& challenger,
                                            const fleet::CostCurve& cost_curve,
                                            Years max_life_years);

// The class model from curves already fitted (or read back from a stored run, as `tenure
// explain` does): builds and analyses the challenger when there is a cost curve, and its band of
// lives within `band_width` (the policy's esl_band) of the least EUAC.
ClassModel make_class_model(const std::string& asset_class, const ClassPolicy& policy,
                            std::size_t assets, std::optional<fleet::CostCurve> cost_curve,
                            fleet::ValueCurve value_curve, const tax::Rates& rates,
                            double band_width);

// Fits the class's curves on its members' data, then make_class_model, then the bootstrap
// spread of its economic life: each refit's challenger is challenger_ownership on the refitted
// curve (same price, value curve, depreciation and max life), its life on the decision's basis.
// `members` are the indices in data.assets of the class's assets.
ClassModel build_class_model(const std::string& asset_class, const ClassPolicy& policy,
                             const FleetData& data, const std::vector<std::size_t>& members,
                             const tax::Rates& rates, double band_width);

}  // namespace tenure::review
