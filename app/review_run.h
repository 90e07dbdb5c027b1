// The nightly review on one database connection, start to end (SPEC 6 and 7), as `tenure
// review`, tenure_review() and tenure_review_db() all run it:
//   1. read the policy (stored or given) and check the input relations and columns exist;
//   2. read the relations in one read transaction (a consistent snapshot, no lock held after);
//   3. build the class models (review/), touching no table;
//   4. in ONE write transaction: schema migrations, the run and class rows, then each asset's
//      result as the analysis (on the other cores) finishes it, then the rejected rows. A
//      failure or a kill before its commit leaves the previous results intact.
//
//   db::Connection db = db::Connection::open("fleet.db");
//   RunSummary s = run_review(db, {.policy_json = text, .as_of = as_of});
//   s.run_id; s.due; s.newly_due;
//   run_review(db, {.policy_json = dearer, .scenario = "price-up"});   // a what-if run
//
// A run with a scenario is a what-if run (tenure_run.scenario): stored like any other, but the
// nightly views and the default run of explain and the report follow the baseline runs only
// (db/schema.h).
#pragma once

#include <cstdint>
#include <functional>
#include <optional>
#include <string>

#include "db/connection.h"
#include "db/cost_ranges.h"
#include "fleet/date.h"
#include "results/rows.h"
#include "review/fleet_review.h"

namespace tenure::app {

struct ReviewOptions {
  std::optional<std::string> policy_json;  // nullopt: the latest stored policy
  std::optional<Date> as_of;               // nullopt: today (local date)
  review::Progress progress;               // optional progress callback
  std::function<void()> before_commit;     // optional hook, called just before COMMIT
  // A cost-event table whose rowids span at least this many is read in two halves at once
  // where that is safe (db/cost_ranges.h); tests lower it to read small tables so.
  std::int64_t split_min_rows = db::kSplitMinRows;
  // nullopt: a baseline run; else the what-if run's name (core/checks.h, require_scenario_name).
  std::optional<std::string> scenario = std::nullopt;
};

struct RunSummary {
  std::int64_t run_id = 0;
  std::string as_of;
  std::int64_t rows_read = 0;
  std::int64_t rows_rejected = 0;
  std::int64_t rows_after_as_of = 0;
  std::int64_t assets_reviewed = 0;
  std::int64_t keep = 0, review = 0, replace = 0;
  std::optional<std::string> scenario;  // as given; nullopt for a baseline run
  std::int64_t due = 0;                 // review + replace
  // Due now, not due in the run it is compared with: for a baseline run the baseline run before
  // it (by as_of, then run_id), for a what-if run the latest baseline run
  // (db::count_newly_due).
  std::int64_t newly_due = 0;
  replacement::Basis basis = replacement::Basis::after_tax;
  results::MoneyTerms money = results::MoneyTerms::nominal;
  // Wall time of the phases, in seconds: reading the inputs; building the models, analysing the
  // assets and inserting the results (these overlap); the commit.
  double read_seconds = 0, analyse_write_seconds = 0, commit_seconds = 0;
};

// Throws InputError for a bad policy, a missing relation or column, no policy at all, or a
// scenario name that breaks require_scenario_name (naming "scenario"), before anything is read
// or written; RuntimeFailure when the database cannot be read or written.
RunSummary run_review(db::Connection& db, const ReviewOptions& options);

// Today's date where the machine is (its TZ): a site east of UTC running at 02:15 reviews as of
// its own today, not UTC's yesterday.
Date today_local();

}  // namespace tenure::app
