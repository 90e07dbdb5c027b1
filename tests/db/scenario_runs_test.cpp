// What-if runs (tenure_run.scenario) and the one definition of "latest" (db/schema.h) on the
// invented noiseless fixture fleet (fixtures/fleets): a what-if run leaves the nightly views and
// the default run of read_run exactly as they were; a back-dated baseline run (an earlier as_of,
// a higher run_id) never becomes latest, and tenure_newly_due compares with the baseline run just
// before the latest by as_of; tenure_scenario_diff shows, for a longer lead time and for a dearer
// challenger, exactly the verdicts that SPEC 6 and 11 say must change; a bad name is refused
// before anything is written.
#include <gtest/gtest.h>

#include <map>
#include <string>
#include <unordered_set>

#include "app/review_run.h"
#include "core/errors.h"
#include "db/run_reader.h"
#include "db_test_support.h"
#include "fixtures/fleets/fixture_fleets.h"

namespace tenure::db {
namespace {

using testing_support::relation_digest;
using testing_support::scalar;
using testing_support::TempDatabase;

const char* const kNightlyViews[] = {"tenure_latest", "tenure_due", "tenure_newly_due",
                                     "tenure_class_latest"};

// The fixture policy with another challenger price (its own is 20000).
std::string with_challenger_price(const std::string& policy, const std::string& price) {
  std::string out = policy;
  out.replace(out.find("\"challenger_first_cost\": 20000"), 30,
              "\"challenger_first_cost\": " + price);
  return out;
}

// The fixture policy with lead_time_years set (its own is the default, 1).
std::string with_lead_time(const std::string& policy, int years) {
  std::string out = policy;
  out.insert(out.find("\"review_margin\""), "\"lead_time_years\": " + std::to_string(years) + ", ");
  return out;
}

std::map<std::string, std::string> digests_of_nightly_views(Connection& db) {
  std::map<std::string, std::string> out;
  for (const char* view : kNightlyViews) out[view] = relation_digest(db, view);
  return out;
}

std::unordered_set<std::string> due_in(Connection& db, std::int64_t run_id) {
  std::unordered_set<std::string> out;
  for (const results::AssetRow& a : read_asset_results(db, run_id)) {
    if (a.due()) out.insert(a.asset_id);
  }
  return out;
}

std::int64_t count_of(Connection& db, const std::string& sql) {
  return static_cast<std::int64_t>(scalar(db, sql));
}

class ScenarioRuns : public ::testing::Test {
 protected:
  void SetUp() override {
    Connection db = file.open();
    fixtures::create_input_tables(db.handle());
    fixtures::add_noiseless_fleet(db.handle());
  }
  app::RunSummary review(const char* as_of, std::optional<std::string> scenario = std::nullopt,
                         const std::string& policy = fixtures::noiseless_policy()) {
    Connection db = file.open();
    app::ReviewOptions options{policy, parse_iso_date(as_of), {}, {}};
    options.scenario = std::move(scenario);
    return app::run_review(db, options);
  }
  TempDatabase file;
};

TEST_F(ScenarioRuns, WhatIfRunsLeaveTheNightlyViewsAndTheDefaultRunAlone) {
  review("2025-06-30");
  const app::RunSummary baseline = review(fixtures::kAsOf);
  std::map<std::string, std::string> before;
  {
    Connection db = file.open();
    before = digests_of_nightly_views(db);
    ASSERT_GT(count_of(db, "SELECT count(*) FROM tenure_newly_due"), 0);
  }
  // One what-if run of the same date, one dated after the baseline: neither is followed.
  const app::RunSummary longer =
      review(fixtures::kAsOf, "lead-3", with_lead_time(fixtures::noiseless_policy(), 3));
  const app::RunSummary later =
      review("2026-12-31", "dearer", with_challenger_price(fixtures::noiseless_policy(), "26000"));
  Connection db = file.open();
  // Both changed what is due, so views that followed them would have changed too.
  EXPECT_NE(longer.due, baseline.due);
  EXPECT_NE(later.due, baseline.due);
  EXPECT_EQ(digests_of_nightly_views(db), before);
  EXPECT_EQ(count_of(db, "SELECT count(*) FROM tenure_latest WHERE run_id <> " +
                             std::to_string(baseline.run_id)),
            0);
  EXPECT_EQ(read_run(db, std::nullopt).run_id, baseline.run_id);
  EXPECT_FALSE(read_run(db, std::nullopt).scenario);
  // The what-if runs are stored under their names and read by run id.
  EXPECT_EQ(read_run(db, longer.run_id).scenario, "lead-3");
  EXPECT_EQ(read_run(db, later.run_id).scenario, "dearer");
  EXPECT_EQ(count_of(db, "SELECT count(*) FROM tenure_run WHERE scenario IS NULL"), 2);
}

TEST_F(ScenarioRuns, ABackDatedBaselineRunNeverBecomesLatest) {
  const app::RunSummary current = review(fixtures::kAsOf);  // run 1
  const app::RunSummary older = review("2024-06-30");       // run 2: earlier as_of
  const app::RunSummary between = review("2025-06-30");     // run 3: between the two
  Connection db = file.open();
  ASSERT_LT(current.run_id, older.run_id);
  EXPECT_EQ(count_of(db, "SELECT run_id FROM tenure_latest_run"), current.run_id);
  EXPECT_EQ(count_of(db, "SELECT count(DISTINCT run_id) FROM tenure_latest"), 1);
  EXPECT_EQ(count_of(db, "SELECT max(run_id) FROM tenure_latest"), current.run_id);
  EXPECT_EQ(count_of(db, "SELECT max(run_id) FROM tenure_class_latest"), current.run_id);
  EXPECT_EQ(read_run(db, std::nullopt).run_id, current.run_id);
  // The run before the latest is the one of the latest earlier as_of (run 3), not run 2.
  EXPECT_EQ(count_of(db, "SELECT previous_run_id FROM tenure_latest_run"), between.run_id);
  std::unordered_set<std::string> newly_due = due_in(db, current.run_id);
  for (const std::string& id : due_in(db, between.run_id)) newly_due.erase(id);
  ASSERT_FALSE(newly_due.empty());
  std::unordered_set<std::string> in_view;
  Statement q(db, "SELECT asset_id FROM tenure_newly_due");
  while (q.step()) in_view.insert(std::string(q.text(0)));
  EXPECT_EQ(in_view, newly_due);
  EXPECT_EQ(due_in_previous_run(db, current.run_id), due_in(db, between.run_id));
  // The summaries compare each run with the baseline run before it by as_of: run 2 has none
  // (all its due assets are newly due), run 3 has run 2.
  EXPECT_EQ(older.newly_due, older.due);
  std::unordered_set<std::string> newly_at_between = due_in(db, between.run_id);
  for (const std::string& id : due_in(db, older.run_id)) newly_at_between.erase(id);
  EXPECT_EQ(between.newly_due, static_cast<std::int64_t>(newly_at_between.size()));
}

TEST_F(ScenarioRuns, OfTwoBaselineRunsOfOneDateTheLaterIsLatest) {
  review(fixtures::kAsOf);
  const app::RunSummary again = review(fixtures::kAsOf);
  Connection db = file.open();
  EXPECT_EQ(count_of(db, "SELECT run_id FROM tenure_latest_run"), again.run_id);
  EXPECT_EQ(read_run(db, std::nullopt).run_id, again.run_id);
}

// SPEC 6: the lead time does not enter the timing T(k), so k* and delay_cost = T(k*+1) - T(k*)
// are the same; the verdict rule makes `review` of a `keep` exactly when 1 < k* <= 3 (a keep has
// k* > 1 = the baseline's lead time and an age below the class's economic life, which the lead
// time does not change either), and changes no review or replace.
TEST_F(ScenarioRuns, DiffShowsTheVerdictsALongerLeadTimeChanges) {
  const app::RunSummary baseline = review(fixtures::kAsOf);
  const app::RunSummary scenario =
      review(fixtures::kAsOf, "lead-3", with_lead_time(fixtures::noiseless_policy(), 3));
  Connection db = file.open();
  Statement q(db,
              "SELECT baseline_run_id, scenario_run_id, baseline_verdict, scenario_verdict, "
              "baseline_replace_after_years, scenario_replace_after_years, baseline_delay_cost, "
              "scenario_delay_cost, verdict_differs FROM tenure_scenario_diff "
              "WHERE scenario = 'lead-3'");
  int rows = 0, differing = 0;
  while (q.step()) {
    SCOPED_TRACE(rows);
    ++rows;
    EXPECT_EQ(q.integer(0), baseline.run_id);
    EXPECT_EQ(q.integer(1), scenario.run_id);
    const std::string before(q.text(2)), after(q.text(3));
    const std::int64_t k = q.integer(4);
    EXPECT_EQ(q.integer(5), k);
    EXPECT_EQ(q.real(6), q.real(7));
    const bool must_differ = before == "keep" && k > 1 && k <= 3;
    EXPECT_EQ(q.integer(8), must_differ ? 1 : 0);
    EXPECT_EQ(after, must_differ ? "review" : before);
    differing += must_differ ? 1 : 0;
  }
  EXPECT_EQ(rows, 30);  // the fleet's 30 assets in service
  EXPECT_GT(differing, 0);
  // Its summary's newly due compares with the latest baseline run: exactly the assets it made due.
  EXPECT_EQ(scenario.newly_due, differing);
}

// SPEC 11: k* = 0 exactly when the challenger's least EUAC C* is at most the defender's D*, and
// break_even_price is the price at which they are equal, the same whatever the price. So with the
// price raised from 20000 to 26000 an asset is still `replace` exactly when its baseline
// break_even_price is at least 26000. SPEC 6: a dearer challenger adds (dC*/i)(P/F, i, k) to
// T(k), which falls with k, so k* can only move later.
TEST_F(ScenarioRuns, DiffShowsTheVerdictsADearerChallengerChanges) {
  review(fixtures::kAsOf);
  review(fixtures::kAsOf, "price-up", with_challenger_price(fixtures::noiseless_policy(), "26000"));
  Connection db = file.open();
  Statement q(db,
              "SELECT d.baseline_verdict, d.scenario_verdict, d.baseline_replace_after_years, "
              "d.scenario_replace_after_years, d.verdict_differs, b.break_even_price "
              "FROM tenure_scenario_diff AS d JOIN tenure_latest AS b USING (asset_id) "
              "WHERE d.scenario = 'price-up'");
  int rows = 0, replace_to_other = 0, replace_kept = 0;
  while (q.step()) {
    SCOPED_TRACE(rows);
    ++rows;
    const std::string before(q.text(0)), after(q.text(1));
    ASSERT_FALSE(q.is_null(5));
    const double break_even = q.real(5);
    ASSERT_GT(std::abs(break_even - 26000), 1);  // no tie to settle
    EXPECT_EQ(after == "replace", break_even >= 26000);
    EXPECT_GE(q.integer(3), q.integer(2));
    EXPECT_EQ(q.integer(4), before != after ? 1 : 0);
    if (before == "replace") ++(after == "replace" ? replace_kept : replace_to_other);
  }
  EXPECT_EQ(rows, 30);
  // Both kinds occur: the test sees verdicts that change and verdicts that stay.
  EXPECT_GT(replace_to_other, 0);
  EXPECT_GT(replace_kept, 0);
}

TEST_F(ScenarioRuns, DiffTakesEachScenarioAtItsLatestRun) {
  const app::RunSummary baseline = review(fixtures::kAsOf);
  const std::string longer = with_lead_time(fixtures::noiseless_policy(), 3);
  const app::RunSummary latest_of_lead = review(fixtures::kAsOf, "lead-3", longer);
  review("2025-06-30", "lead-3", longer);  // back-dated: not its latest
  const app::RunSummary only_old = review("2025-06-30", "old-only");
  Connection db = file.open();
  EXPECT_EQ(count_of(db, "SELECT count(*) FROM tenure_scenario_diff"), 2 * 30);
  EXPECT_EQ(count_of(db,
                     "SELECT count(DISTINCT scenario_run_id) FROM tenure_scenario_diff "
                     "WHERE scenario = 'lead-3'"),
            1);
  EXPECT_EQ(count_of(db,
                     "SELECT max(scenario_run_id) FROM tenure_scenario_diff "
                     "WHERE scenario = 'lead-3'"),
            latest_of_lead.run_id);
  EXPECT_EQ(count_of(db, "SELECT count(*) FROM tenure_scenario_diff WHERE baseline_run_id <> " +
                             std::to_string(baseline.run_id)),
            0);
  // A year back, the assets put in service since (one per 7 months: PF-001 on 2025-11-15) were
  // not reviewed: their scenario columns are NULL and their verdicts differ. The others, with
  // the same policy a year earlier, are reviewed.
  EXPECT_EQ(count_of(db,
                     "SELECT count(*) FROM tenure_scenario_diff WHERE scenario = 'old-only' "
                     "AND scenario_verdict IS NULL AND scenario_replace_after_years IS NULL "
                     "AND verdict_differs = 1"),
            30 - only_old.assets_reviewed);
  EXPECT_EQ(count_of(db,
                     "SELECT count(*) FROM tenure_scenario_diff WHERE scenario = 'old-only' "
                     "AND asset_id = 'PF-001' AND scenario_verdict IS NULL"),
            1);
}

TEST_F(ScenarioRuns, ABadNameIsRefusedBeforeAnythingIsWritten) {
  review(fixtures::kAsOf);
  std::string before;
  {
    Connection db = file.open();
    before = relation_digest(db, "tenure_run");
  }
  try {
    review(fixtures::kAsOf, "next year");
    FAIL() << "expected an InputError";
  } catch (const InputError& e) {
    EXPECT_EQ(e.where(), "scenario");
    EXPECT_EQ(e.rule(), "may hold only letters, digits, '-', '_' and '.' (character 5 is not one)");
  }
  EXPECT_THROW(review(fixtures::kAsOf, ""), InputError);
  Connection db = file.open();
  EXPECT_EQ(relation_digest(db, "tenure_run"), before);
}

}  // namespace
}  // namespace tenure::db
