// One asset's whole computation (see explanation.h).
#include "explain/explanation.h"

#include <fmt/format.h>

#include "core/errors.h"
#include "explain/rebuild.h"
#include "formats/policy_json.h"

namespace tenure::explain {

Rate Explanation::basis_rate() const {
  return review.basis == replacement::Basis::after_tax ? policy->rates.after_tax_marr
                                                       : policy->rates.marr;
}

std::string run_name(const results::RunRow& run) {
  if (run.scenario) return fmt::format("what-if run {} '{}'", run.run_id, *run.scenario);
  return fmt::format("run {}", run.run_id);
}

std::shared_ptr<const review::Policy> run_policy(const results::RunRow& run) {
  try {
    return std::make_shared<const review::Policy>(formats::read_policy(run.policy_json));
  } catch (const InputError& error) {
    throw InputError("policy_json", "the policy stored with run " + std::to_string(run.run_id) +
                                        " does not read: " + error.what());
  }
}

Explanation explain_asset(results::RunRow run, std::shared_ptr<const review::Policy> policy,
                          results::ClassRow stored_class, results::AssetRow stored,
                          std::optional<results::InputAsset> input) {
  review::ClassModel model = rebuild_class_model(stored_class, *policy);
  review::AssetReview again = recompute(stored, model, *policy);
  std::optional<OwnCosts> own;
  const auto as_of = parse_iso_date(run.as_of);
  if (input && model.cost_curve && as_of) {
    own = own_costs(*input, *as_of, policy->cost_escalation, *model.cost_curve);
  }
  std::vector<std::string> diffs = differences(stored, again);
  for (std::string& d : class_differences(stored_class, model)) diffs.push_back(std::move(d));
  return Explanation{std::move(run),    std::move(policy), std::move(stored_class),
                     std::move(stored), std::move(input),  std::move(model),
                     std::move(again),  std::move(own),    std::move(diffs)};
}

}  // namespace tenure::explain
