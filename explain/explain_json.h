// `tenure explain --format json`: the same content as explain_text.h as one JSON document, money
// positive for cost and at full double precision, for tools and for auditors who recompute.
//
//   nlohmann::json doc = explanation_to_json(e);
//   doc["verdict"]["verdict"];                 // "replace"
//   doc["defender"]["cash_flows"][0]["present_worth"];
//   doc["equivalent_case"];                    // a case file `tenure case` reproduces it from
//
// Keys: asset_id, asset_class, run {run_id, as_of, basis, money, tenure_version,
// policy_sha256}, check {reproduced, differences}, inputs {...}, rates {...}, class {esl_band_low,
// esl_band_high, esl_p10, esl_p90 (as stored; SPEC 11 "Per class"), esl_band (the policy's
// width), esl_band_recomputed {low, high} (from the rebuilt challenger), bootstrap_refits,
// cost_curve, value_curve, challenger, note}, cost_history {years, credibility, stored,
// agrees_with_run, events}, and with a class cost curve: defender {future, opportunity_cost,
// before_tax, after_tax, cash_flows}, challenger {before_tax, after_tax, cash_flows}, timing,
// equivalent_case; then verdict {verdict, reason, basis, replace_after_years, ...} and caution. The
// before_tax, after_tax and cash_flows objects have the shape of `tenure case` output (SPEC 5),
// plus "present_worth" in each cash-flow row and "pw_cost" per curve point.
#pragma once

#include <nlohmann/json.hpp>

#include "explain/explanation.h"

namespace tenure::explain {

nlohmann::json explanation_to_json(const Explanation& e);

// The case file (SPEC 5) that holds the same challenger and defender series and rates: `tenure
// case` on it gives the same curves and decision. Null when the class has no cost curve.
nlohmann::json equivalent_case(const Explanation& e);

}  // namespace tenure::explain
