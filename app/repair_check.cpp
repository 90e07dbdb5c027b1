// The repair check of one stored asset (see repair_check.h).
#include "app/repair_check.h"

#include <fmt/format.h>

#include <string>

#include "core/errors.h"
#include "db/run_reader.h"
#include "explain/explanation.h"
#include "fleet/date.h"
#include "replacement/stakes.h"
#include "review/repair_reasons.h"

namespace tenure::app {
namespace {

// A date column as the asset relation holds it, when it reads as a date.
std::optional<Date> date_of(const std::optional<std::string>& text) {
  return text ? parse_iso_date(*text) : std::nullopt;
}

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

// The asset the run did not review, from its row in the asset relation and the run's rejections.
void say_why_not(RepairCheck& out, db::Connection& db, const review::Policy& policy) {
  const auto input = db::read_input_row(db, policy.sources, out.asset_id);
  if (!input) throw InputError("ASSET", review::unknown_asset_rule(out.asset_id));
  const auto as_of = parse_iso_date(out.as_of);
  if (!as_of) throw RuntimeFailure(fmt::format("run {} has no as-of date", out.run_id));
  if (const auto retired = date_of(input->retired_on); retired && *retired <= *as_of) {
    out.not_weighed = review::NotWeighed::retired;
    out.reason = review::retired_reason(out.asset_id, *input->retired_on);
  } else if (const auto in_service = date_of(input->in_service_on);
             in_service && *in_service > *as_of) {
    out.not_weighed = review::NotWeighed::not_yet_in_service;
    out.reason = review::not_yet_in_service_reason(out.asset_id, input->in_service_on, out.run_id,
                                                   out.as_of);
  } else if (const auto rejected =
                 db::read_rejected_asset(db, out.run_id, policy.sources.assets, out.asset_id)) {
    out.not_weighed = review::NotWeighed::rejected;
    out.reason = review::rejected_reason(out.asset_id, out.run_id, rejected->reason);
  } else {
    out.not_weighed = review::NotWeighed::not_in_run;
    out.reason = review::not_in_run_reason(out.asset_id, out.run_id);
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
  say_why_not(out, db, *policy);
  if (snapshot) snapshot->commit();
  return out;
}

}  // namespace tenure::app
