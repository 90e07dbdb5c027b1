// The nightly review on one connection (see review_run.h).
#include "db/review_run.h"

#include <chrono>
#include <optional>

#include <fmt/chrono.h>
#include <fmt/format.h>

#include "core/errors.h"
#include "db/fleet_reader.h"
#include "db/policy_store.h"
#include "db/results_writer.h"
#include "db/schema.h"
#include "db/sha256.h"
#include "formats/policy_json.h"

namespace tenure::db {
namespace {

std::string now_utc_iso() {
  const std::time_t now = std::chrono::system_clock::to_time_t(std::chrono::system_clock::now());
  return fmt::format("{:%Y-%m-%dT%H:%M:%S}Z", fmt::gmtime(now));
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

}  // namespace

Date today_utc() {
  const auto days = std::chrono::floor<std::chrono::days>(std::chrono::system_clock::now());
  const std::chrono::year_month_day ymd(days);
  return *Date::from_ymd(static_cast<int>(ymd.year()), static_cast<int>(unsigned(ymd.month())),
                         static_cast<int>(unsigned(ymd.day())));
}

RunSummary run_review(Connection& db, const ReviewOptions& options) {
  const std::string started_at = now_utc_iso();
  using Clock = std::chrono::steady_clock;
  const auto seconds_since = [](Clock::time_point start) {
    return std::chrono::duration<double>(Clock::now() - start).count();
  };
  std::string policy_text;
  if (options.policy_json) {
    policy_text = *options.policy_json;
  } else if (auto stored = latest_policy(db)) {
    policy_text = std::move(*stored);
  } else {
    throw InputError("policy", "no policy given and none stored in the database (store one "
                               "with 'tenure policy set')");
  }
  const review::Policy policy = formats::read_policy(policy_text);
  const Date as_of = options.as_of.value_or(today_utc());

  review::FleetData data(as_of, policy.cost_escalation);
  ReadReport report;
  const auto read_start = Clock::now();
  doing("cannot read the inputs", [&] {
    // One read transaction: a consistent snapshot of the three relations.
    Transaction snapshot(db, Transaction::Kind::deferred);
    check_sources(db, policy.sources);
    report = read_fleet(db, policy, data, options.split_min_rows);
    snapshot.commit();
  });
  RunSummary summary;
  summary.read_seconds = seconds_since(read_start);
  const auto analyse_start = Clock::now();
  review::ReviewResult result = review::plan_review(data, policy);
  {
    constexpr const char* kStoring = "cannot store the results";
    std::optional<Transaction> tx;
    std::optional<ResultsWriter> writer;
    doing(kStoring, [&] {
      tx.emplace(db, Transaction::Kind::immediate);
      migrate(db);
      const RunRecord run{as_of.to_iso(), started_at, policy_text, sha256_hex(policy_text), &policy};
      writer.emplace(db, run, data, result, report);
    });
    review::analyse_assets(data, policy, result, options.progress,
                           [&](std::span<const review::AssetReview> done) {
                             doing(kStoring, [&] { writer->add_assets(done); });
                           });
    doing(kStoring, [&] { writer->add_rejected(report); });
    summary.run_id = writer->run_id();
    if (options.before_commit) options.before_commit();
    summary.analyse_write_seconds = seconds_since(analyse_start);
    const auto commit_start = Clock::now();
    doing(kStoring, [&] { tx->commit(); });
    summary.commit_seconds = seconds_since(commit_start);
  }
  summary.as_of = as_of.to_iso();
  summary.rows_read = report.rows_read;
  summary.rows_rejected = static_cast<std::int64_t>(report.rejected.size());
  summary.rows_after_as_of = report.rows_after_as_of;
  summary.assets_reviewed = static_cast<std::int64_t>(result.assets.size());
  for (const review::AssetReview& a : result.assets) {
    switch (a.verdict) {
      case review::Verdict::keep: ++summary.keep; break;
      case review::Verdict::review: ++summary.review; break;
      case review::Verdict::replace: ++summary.replace; break;
    }
  }
  summary.due = summary.review + summary.replace;
  Statement newly(db, "SELECT count(*) FROM tenure_newly_due WHERE run_id = ?1");
  newly.bind(1, summary.run_id);
  newly.step();
  summary.newly_due = newly.integer(0);
  summary.basis = policy.rates.after_tax() ? "after_tax" : "before_tax";
  summary.money = policy.real_money() ? "real" : "nominal";
  return summary;
}

}  // namespace tenure::db
