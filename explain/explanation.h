// One asset's whole computation in a stored run, as `tenure explain` shows it (SPEC 8): the run
// and its policy, the class row and its rebuilt model, the asset's stored row, its analysis and
// verdict recomputed from the stored inputs (explain/rebuild.h), its own cost history against the
// class curve (explain/own_costs.h), and whatever the recomputation failed to reproduce.
// explain_text.h and explain_json.h render it; app/explain_run.h reads it from a database.
//
//   auto policy = run_policy(run);
//   Explanation e = explain_asset(run, policy, stored_class, stored_asset, input_asset);
//   e.reproduced();             // false when a stored figure differs from the recomputation
//   e.review.decision->timing;  // k* and the present worths behind it
#pragma once

#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "explain/own_costs.h"
#include "results/input_asset.h"
#include "results/rows.h"
#include "review/asset_review.h"
#include "review/class_model.h"
#include "review/policy.h"

namespace tenure::explain {

struct Explanation {
  results::RunRow run;
  std::shared_ptr<const review::Policy> policy;  // read from run.policy_json; model points into it
  results::ClassRow stored_class;
  results::AssetRow stored;
  std::optional<results::InputAsset> input;   // the asset's input row now; nullopt when it is gone
  review::ClassModel model;
  review::AssetReview review;        // recomputed from the stored inputs
  std::optional<OwnCosts> own;       // with an input row and a class cost curve
  std::vector<std::string> differences;  // stored figures the recomputation did not reproduce

  bool reproduced() const { return differences.empty(); }
  // The rate the verdict's basis discounts at: the after-tax MARR after tax, else the MARR.
  Rate basis_rate() const;
};

// The policy a run was made with, read from its stored text. Throws InputError naming
// "policy_json" when it no longer reads.
std::shared_ptr<const review::Policy> run_policy(const results::RunRow& run);

// How explain and the report name a run: "run 3" for a baseline run, "what-if run 4
// 'price-up'" for a what-if run (tenure_run.scenario), so a reader never takes one for the other.
std::string run_name(const results::RunRow& run);

// `policy` is run_policy(run). Throws RuntimeFailure when the class row cannot be rebuilt.
Explanation explain_asset(results::RunRow run, std::shared_ptr<const review::Policy> policy,
                          results::ClassRow stored_class, results::AssetRow stored,
                          std::optional<results::InputAsset> input);

}  // namespace tenure::explain
