// The repair check of one stored asset (see repair_check.h).
#include "app/repair_check.h"

#include <fmt/format.h>

#include <string>

#include "core/errors.h"
#include "app/unreviewed_asset.h"
#include "db/run_reader.h"
#include "explain/explanation.h"
#include "replacement/stakes.h"
#include "review/repair_reasons.h"

namespace tenure::app {
namespace {

// The asset the run reviewed: weighed, or a class that cannot be.
void weigh(RepairCheck& out, const explain::Explanation& e) {
  if (!e.reproduced()) {
    throw RuntimeFailure(fmt::format(
        "the stored figures of asset '{}' in run {} are not reproduced by the recomputation (see "
        "'tenure explain'): {}",
        out.asset_id, out.run_id, fmt::join(e.differences, "; ")));
  }
  out.asset_class = e.stored.asset_class;
  out.basis = e.review.basis;
  if (!e.review.decision) {
    out.not_weighed = review::NotWeighed::cannot_weigh;
    out.reason = review::cannot_weigh_repair_reason(out.asset_id, e.model.note);
    return;
  }
  const replacement::Decision& d = *e.review.decision;
  out.weighing = review::weigh_repair(
      d.timing, replacement::repair_deduction_factor(e.policy->rates, d.basis), out.estimate);
  out.reason = review::repair_reason(*out.weighing, out.estimate, d.basis);
}

// The asset the run did not review, in the repair check's words.
void say_why_not(RepairCheck& out, const Unreviewed& u) {
  out.not_weighed = u.why;
  switch (u.why) {
    case review::NotWeighed::retired:
      out.reason = review::retired_reason(out.asset_id, u.retired_on);
      break;
    case review::NotWeighed::not_yet_in_service:
      out.reason =
          review::not_yet_in_service_reason(out.asset_id, u.in_service_on, out.run_id, out.as_of);
      break;
    case review::NotWeighed::rejected:
      out.reason = review::rejected_reason(out.asset_id, out.run_id, u.rejection);
      break;
    case review::NotWeighed::cannot_weigh:
    case review::NotWeighed::not_in_run:
      out.reason = review::not_in_run_reason(out.asset_id, out.run_id);
      break;
  }
}

}  // namespace

RepairCheck check_repair(db::Connection& db, std::string_view asset_id, Money estimate,
                         std::optional<std::int64_t> run_id) {
  review::require_repair_estimate(estimate, "estimate");
  // Inside a statement that writes (INSERT ... SELECT tenure_repair_check(...)) SQLite can hold
  // no transaction of ours; the reads then go one by one, and the answer is the same: a stored
  // run's rows never change.
  std::optional<db::Transaction> snapshot;
  if (!db.writing_statement_running()) snapshot.emplace(db, db::Transaction::Kind::deferred);
  results::RunRow run = db::read_run(db, run_id);
  RepairCheck out;
  out.asset_id = asset_id;
  out.run_id = run.run_id;
  out.as_of = run.as_of;
  out.basis = run.basis;
  out.estimate = estimate;
  auto policy = explain::run_policy(run);
  if (auto asset = db::read_asset_result(db, run.run_id, asset_id)) {
    auto stored_class = db::read_class_result(db, run.run_id, asset->asset_class);
    if (!stored_class) {
      throw RuntimeFailure(
          fmt::format("run {} has no row for class '{}'", run.run_id, asset->asset_class));
    }
    if (snapshot) snapshot->commit();
    // No input row: the repair check needs neither the asset's cost events nor its own costs.
    weigh(out, explain::explain_asset(std::move(run), std::move(policy), std::move(*stored_class),
                                      std::move(*asset), std::nullopt));
    return out;
  }
  say_why_not(out, why_not_reviewed(db, *policy, run, asset_id));
  if (snapshot) snapshot->commit();
  return out;
}

}  // namespace tenure::app
