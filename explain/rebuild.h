// Rebuilding a stored run's analysis from the figures it stored: the class model from its stored
// curve parameters and the run's own policy, an asset's defender from its stored inputs, and the
// verdict from review::judge, the same code the nightly run used. Every REAL survives a round
// trip through SQLite exactly, so the recomputation must equal the stored row to the last bit;
// `differences` lists what does not.
//
//   review::Policy policy = formats::read_policy(run.policy_json);
//   review::ClassModel model = rebuild_class_model(stored_class, policy);
//   review::AssetReview again = recompute(stored_asset, model, policy);
//   differences(stored_asset, again);   // empty when the stored figures are reproduced
#pragma once

#include <string>
#include <vector>

#include "results/rows.h"
#include "review/asset_review.h"
#include "review/class_model.h"
#include "review/policy.h"

namespace tenure::explain {

// The class model of a stored class row. The model points into `policy`, which must outlive it.
// Throws RuntimeFailure when the policy has no such class.
review::ClassModel rebuild_class_model(const results::ClassRow& stored,
                                       const review::Policy& policy);

// The defender as the run saw it: its age, market value now and where that came from, its
// credibility (m, r and factor as stored; z = m / (m + 3)) and its future on the class curves.
review::DefenderInputs rebuild_defender_inputs(const results::AssetRow& stored,
                                               const review::ClassModel& model);

// The asset's analysis and verdict, recomputed by review::judge.
review::AssetReview recompute(const results::AssetRow& stored, const review::ClassModel& model,
                              const review::Policy& policy);

// One line per stored figure the recomputation does not reproduce exactly, e.g.
// "defender_euac: stored 8482.01 (8482.0100000000002), recomputed 8482.02 (...)". Compared:
// defender_euac, challenger_euac, marginal_cost_next_year, replace_after_years, verdict, reason,
// and also book_value_now, class_esl_years, defender_best_years, both before/after-tax defender
// EUACs and what is at stake (delay_cost, early_cost, repair_limit, both break-evens,
// close_call).
std::vector<std::string> differences(const results::AssetRow& stored,
                                     const review::AssetReview& again);

// The same for the class figures the rebuilt model recomputes: esl_band_low and esl_band_high,
// compared where the run stored them (a run made before they were stored has none). The
// bootstrap percentiles are not recomputed: their refits need every asset's cost years.
std::vector<std::string> class_differences(const results::ClassRow& stored,
                                           const review::ClassModel& again);

}  // namespace tenure::explain
