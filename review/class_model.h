// One asset class in the nightly review (SPEC 6): its cost curve fitted on the pooled complete
// asset-years of all its assets (retired ones too), its market-value curve, and its challenger,
// a new unit analysed over 1..max_life_years whose economic service life is the class's best
// economic age.
//
//   ClassModel vans = build_class_model("van-delivery", policy.classes.at("van-delivery"),
//                                       data, members, policy.rates);
//   if (vans.challenger) vans.challenger->on(Basis::after_tax).curve.best_years;
#pragma once

#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "fleet/cost_curve.h"
#include "fleet/value_curve.h"
#include "replacement/break_even.h"
#include "replacement/case_analysis.h"
#include "review/fleet_data.h"
#include "review/policy.h"

namespace tenure::review {

struct ClassModel {
  std::string asset_class;
  const ClassPolicy* policy;
  std::size_t assets;                          // accepted assets of the class, retired included
  std::shared_ptr<const depreciation::Method> depreciation;  // the policy's, made once
  std::optional<fleet::CostCurve> cost_curve;  // none without a complete cost year
  fleet::ValueCurve value_curve;
  std::optional<replacement::Ownership> challenger_input;
  std::optional<replacement::AssetAnalysis> challenger;  // present with a cost curve
  // The challenger's EUAC(n) against its price on the decision's basis (replacement/break_even.h
  // rule (2)); empty without a challenger.
  std::vector<replacement::Line> price_lines;
  std::string note;  // why there is no challenger, or what was assumed; empty when nothing

  // Expected operating cost of age-year k for a unit at `factor` times the class level; a curve
  // that falls below zero at high ages is read as zero (see note).
  Money cost_at(Years age_year, double factor = 1.0) const;
};

// The class model from curves already fitted (or read back from a stored run, as `tenure
// explain` does): builds and analyses the challenger when there is a cost curve.
ClassModel make_class_model(const std::string& asset_class, const ClassPolicy& policy,
                            std::size_t assets, std::optional<fleet::CostCurve> cost_curve,
                            fleet::ValueCurve value_curve, const tax::Rates& rates);

// Fits the class's curves on its members' data, then make_class_model. `members` are the indices
// in data.assets of the class's assets.
ClassModel build_class_model(const std::string& asset_class, const ClassPolicy& policy,
                             const FleetData& data, const std::vector<std::size_t>& members,
                             const tax::Rates& rates);

}  // namespace tenure::review
