// The nightly review's policy (SPEC 4): rates, how past costs are restated, the review margin,
// where the input relations are, and per asset class the challenger and the models to fit.
// formats/policy_json.h reads it from JSON; this header is the engine's view of it.
//
//   Policy p = read_policy(text);            // formats/policy_json.h
//   const ClassPolicy& vans = p.classes.at("van-delivery");
#pragma once

#include <map>
#include <optional>
#include <string>
#include <vector>

#include "core/types.h"
#include "depreciation/method.h"
#include "fleet/cost_curve.h"
#include "tax/rates.h"

namespace tenure::review {

// One of a class's several challengers (SPEC 14): a named new unit on the class cost curve.
struct ChallengerPolicy {
  std::string name;
  Money first_cost;        // its installed cost, > 0
  double cost_factor = 1;  // its operating cost of age-year k: the class curve's times this, > 0
  std::optional<depreciation::Spec> depreciation = std::nullopt;  // else the class's
  // Its value curve: value_start 1 and this decline; else the class's value curve.
  std::optional<Rate> annual_decline = std::nullopt;
};

struct ClassPolicy {
  // A new unit's installed cost, > 0; in the several-challengers form the first listed one's.
  Money challenger_first_cost;
  Years max_life_years;                // longest life weighed, >= 1
  depreciation::Spec depreciation;     // applied to each asset's own first cost
  Rate annual_decline;                 // value-curve fallback where valuations are too few
  fleet::CostModelChoice cost_model;   // linear, geometric or automatic ("auto")
  // The several-challengers form (SPEC 14); empty in the one-challenger form.
  std::vector<ChallengerPolicy> challengers = {};
  // g: a challenger bought k years from now costs (1 - g)^k times today's (SPEC 14), in [0, 1).
  double improvement = 0;
};

// Names of the three input relations (tables or views); plain SQL identifiers only.
struct Sources {
  std::string assets = "asset";
  std::string costs = "cost_event";
  std::string valuations = "asset_valuation";
};

// Which assets keep their year-by-year tables (EUAC curves, cash flows) in the results besides
// each class challenger's: every asset's summary row is always kept, and `tenure explain` and
// the report recompute any asset's tables exactly, so the default keeps none (a fleet's nightly
// write stays small); "due" or "all" keep them for SQL users.
enum class Detail { none, due, all };

struct Policy {
  tax::Rates rates;
  Detail detail = Detail::none;
  Rate cost_escalation = 0;    // restates past costs into as-of-year money (then marr is real)
  Years lead_time_years = 1;   // a replacement this near is due now (review/verdict_rule.h (3))
  double review_margin = 0.05; // a break-even price this near the price is a close call
  double esl_band = 0.02;      // lives whose EUAC is within this of the least are the band
  Sources sources;
  std::map<std::string, ClassPolicy, std::less<>> classes;

  // Costs restated by a non-zero escalation are constant money, so rates must be real (SPEC 6).
  bool real_money() const { return cost_escalation != 0; }
};

}  // namespace tenure::review
