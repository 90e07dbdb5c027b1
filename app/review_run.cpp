// The nightly review on one connection (see review_run.h).
#include "app/review_run.h"

#include <fmt/chrono.h>
#include <fmt/format.h>

#include <chrono>
#include <ctime>
#include <optional>

#include "app/sha256.h"
#include "core/checks.h"
#include "core/errors.h"
#include "core/version.h"
#include "db/fleet_reader.h"
#include "db/policy_store.h"
#include "db/results_writer.h"
#include "db/run_reader.h"
#include "db/schema.h"
#include "formats/policy_json.h"
#include "results/from_review.h"

namespace tenure::app {
namespace {

using Clock = std::chrono::steady_clock;

double seconds_since(Clock::time_point start) {
  return std::chrono::duration<double>(Clock::now() - start).count();
}

// Now in UTC, ISO 8601 to the second or (with `millis`) to the millisecond.
std::string now_utc_iso(bool millis = false) {
  const auto now = std::chrono::system_clock::now();
  const std::time_t seconds = std::chrono::system_clock::to_time_t(now);
  std::string text = fmt::format("{:%Y-%m-%dT%H:%M:%S}", fmt::gmtime(seconds));
  if (millis) {
    const auto ms = std::chrono::duration_cast<std::chrono::milliseconds>(now.time_since_epoch());
    text += fmt::format(".{:03d}", ms.count() % 1000);
  }
  return text + "Z";
}

// Runs `step`; a failure of the database (SQLite's own words, "database or disk is full") comes
// back saying what the review was doing: "cannot store the results: database or disk is full".
template <class Step>
void doing(const char* what, Step&& step) {
  try {
    step();
  } catch (const RuntimeFailure& e) {
    throw RuntimeFailure(fmt::format("{}: {}", what, e.what()));
  }
}

std::string policy_text_of(db::Connection& db, const ReviewOptions& options) {
  if (options.policy_json) return *options.policy_json;
  if (auto stored = db::latest_policy(db)) return std::move(*stored);
  throw InputError("policy",
                   "no policy given and none stored in the database (store one "
                   "with 'tenure policy set')");
}

results::RunRow run_row(const Date& as_of, std::optional<std::string> scenario,
                        std::string started_at, std::string policy_text,
                        const review::Policy& policy, const review::ReviewResult& result,
                        const db::ReadReport& report) {
  results::RunRow row;
  row.scenario = std::move(scenario);
  row.as_of = as_of.to_iso();
  row.started_at = std::move(started_at);
  row.finished_at = now_utc_iso(true);
  row.policy_sha256 = sha256_hex(policy_text);
  row.policy_json = std::move(policy_text);
  row.rows_read = report.rows_read;
  row.rows_rejected = static_cast<std::int64_t>(report.rejected.size());
  row.basis = results::basis_of(policy);
  row.money = results::money_of(policy);
  row.assets_reviewed = static_cast<std::int64_t>(result.assets.size());
  row.assets_retired = static_cast<std::int64_t>(result.retired);
  row.assets_not_yet_in_service = static_cast<std::int64_t>(result.not_yet_in_service);
  row.rows_after_as_of = report.rows_after_as_of;
  row.tenure_version = kVersion;
  return row;
}

}  // namespace

Date today_local() {
  const std::time_t now = std::time(nullptr);
  std::tm local{};
  if (::localtime_r(&now, &local) == nullptr) throw RuntimeFailure("cannot read the local date");
  return *Date::from_ymd(local.tm_year + 1900, local.tm_mon + 1, local.tm_mday);
}

RunSummary run_review(db::Connection& db, const ReviewOptions& options) {
  if (options.scenario) require_scenario_name(*options.scenario, "scenario");
  std::string started_at = now_utc_iso();
  std::string policy_text = policy_text_of(db, options);
  const review::Policy policy = formats::read_policy(policy_text);
  const Date as_of = options.as_of.value_or(today_local());

  review::FleetData data(as_of, policy.cost_escalation);
  db::ReadReport report;
  const auto read_start = Clock::now();
  doing("cannot read the inputs", [&] {
    // One read transaction: a consistent snapshot of the three relations.
    db::Transaction snapshot(db, db::Transaction::Kind::deferred);
    db::check_sources(db, policy.sources);
    report = db::read_fleet(db, policy, data, options.split_min_rows);
    snapshot.commit();
  });
  RunSummary summary;
  summary.read_seconds = seconds_since(read_start);
  const auto analyse_start = Clock::now();
  review::ReviewResult result = review::plan_review(data, policy);
  {
    constexpr const char* kStoring = "cannot store the results";
    std::optional<db::Transaction> tx;
    std::optional<db::ResultsWriter> writer;
    doing(kStoring, [&] {
      tx.emplace(db, db::Transaction::Kind::immediate);
      db::migrate(db);
      writer.emplace(db,
                     run_row(as_of, options.scenario, std::move(started_at), std::move(policy_text),
                             policy, result, report),
                     data, result);
    });
    review::analyse_assets(data, policy, result, options.progress,
                           [&](std::span<const review::AssetReview> done) {
                             doing(kStoring, [&] { writer->add_assets(done); });
                           });
    doing(kStoring, [&] { writer->add_rejected(report.rejected); });
    summary.run_id = writer->run_id();
    if (options.before_commit) options.before_commit();
    summary.analyse_write_seconds = seconds_since(analyse_start);
    const auto commit_start = Clock::now();
    doing(kStoring, [&] { tx->commit(); });
    summary.commit_seconds = seconds_since(commit_start);
  }
  summary.as_of = as_of.to_iso();
  summary.scenario = options.scenario;
  summary.rows_read = report.rows_read;
  summary.rows_rejected = static_cast<std::int64_t>(report.rejected.size());
  summary.rows_after_as_of = report.rows_after_as_of;
  summary.assets_reviewed = static_cast<std::int64_t>(result.assets.size());
  for (const review::AssetReview& a : result.assets) {
    switch (a.finding.verdict) {
      case review::Verdict::keep:
        ++summary.keep;
        break;
      case review::Verdict::review:
        ++summary.review;
        break;
      case review::Verdict::replace:
        ++summary.replace;
        break;
    }
  }
  summary.due = summary.review + summary.replace;
  summary.newly_due = db::count_newly_due(db, summary.run_id);
  summary.basis = results::basis_of(policy);
  summary.money = results::money_of(policy);
  return summary;
}

}  // namespace tenure::app
