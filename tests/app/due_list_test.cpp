// The due list of a stored run (app/due_list.h) on invented runs written row by row
// (tests/support/stored_runs.h), every expected list worked out by hand from SPEC 6's verdicts
// and the morning-list order (results::more_urgent: the largest delay cost first, none last,
// then replace before review, then asset_id): the order, the newly-due mark against the run
// before (a failed run in between does not count; the view tenure_newly_due must agree), the
// --newly and --class filters and both together, an older run by id, the refusal of a class the
// run does not have with its classes listed (at most 10); and, on a reviewed fixture fleet, the
// order checked against SQLite's own ORDER BY on the view tenure_due.
#include <gtest/gtest.h>

#include <algorithm>
#include <string>
#include <vector>

#include <fmt/format.h>

#include "../support/stored_runs.h"
#include "../support/temp_dir.h"
#include "app/due_list.h"
#include "app/review_run.h"
#include "core/errors.h"
#include "fixtures/fleets/fixture_fleets.h"

namespace tenure::app {
namespace {

using review::Verdict;
using test_support::add_stored_run;
using test_support::due_asset;

std::vector<std::string> ids(const formats::DueList& list) {
  std::vector<std::string> out;
  for (const formats::DueAsset& a : list.assets) out.push_back(a.row.asset_id);
  return out;
}

std::vector<std::string> column(db::Connection& db, const std::string& sql) {
  db::Statement q(db, sql);
  std::vector<std::string> out;
  while (q.step()) out.emplace_back(q.text(0));
  return out;
}

std::string refusal(db::Connection& db, const std::string& asset_class) {
  try {
    read_due_list(db, std::nullopt, {.newly = false, .asset_class = asset_class});
  } catch (const InputError& e) {
    EXPECT_EQ(e.where(), "--class");
    return e.what();
  }
  ADD_FAILURE() << "expected an InputError for --class " << asset_class;
  return "";
}

// Run 1 (ok), run 2 (failed), run 3 (ok, the latest). Invented classes pump-x, van-x, hvac-x.
class DueList : public ::testing::Test {
 protected:
  void SetUp() override {
    add_stored_run(db, "2025-11-30",
                   {due_asset("PX-0", "pump-x", Verdict::review, 100),
                    due_asset("PX-2", "pump-x", Verdict::keep, std::nullopt),
                    due_asset("PX-3", "pump-x", Verdict::keep, 50),
                    due_asset("VX-5", "van-x", Verdict::replace, std::nullopt)});
    add_stored_run(db, "2026-05-31",
                   {due_asset("PX-1", "pump-x", Verdict::review, 10),
                    due_asset("VX-4", "van-x", Verdict::replace, 10)},
                   results::RunStatus::failed);
    add_stored_run(db, "2026-11-30",
                   {due_asset("PX-0", "pump-x", Verdict::review, 500),
                    due_asset("PX-1", "pump-x", Verdict::review, 500),
                    due_asset("PX-2", "pump-x", Verdict::replace, 500),
                    due_asset("PX-3", "pump-x", Verdict::review, std::nullopt),
                    due_asset("VX-4", "van-x", Verdict::replace, std::nullopt),
                    due_asset("VX-5", "van-x", Verdict::review, 2000),
                    due_asset("VX-6", "van-x", Verdict::keep, 9999),
                    due_asset("HX-7", "hvac-x", Verdict::keep, 300)});
  }
  test_support::TempDir dir{"tenure_app_test"};
  db::Connection db = db::Connection::open(dir.path("fleet.db"), true);
};

TEST_F(DueList, TheLatestRunsDueAssetsMostUrgentFirst) {
  const formats::DueList list = read_due_list(db, std::nullopt, {});
  EXPECT_EQ(list.run.run_id, 3);
  EXPECT_EQ(list.run.as_of, "2026-11-30");
  // By hand: VX-5 has the largest delay cost (2000); PX-2, PX-0 and PX-1 tie at 500 and PX-2 is
  // replace; PX-0 before PX-1 by id; VX-4 and PX-3 have none, replace first. The keeps are out.
  EXPECT_EQ(ids(list), (std::vector<std::string>{"VX-5", "PX-2", "PX-0", "PX-1", "VX-4", "PX-3"}));
  // Due in run 1 (the run before; run 2 failed): PX-0 and VX-5.
  std::vector<bool> newly;
  for (const formats::DueAsset& a : list.assets) newly.push_back(a.newly_due);
  EXPECT_EQ(newly, (std::vector<bool>{false, true, false, true, true, true}));
  EXPECT_FALSE(list.filters.newly);
  EXPECT_FALSE(list.filters.asset_class);
}

TEST_F(DueList, NewlyKeepsThoseNotDueInTheRunBeforeAsTheViewDoes) {
  const formats::DueList list =
      read_due_list(db, std::nullopt, {.newly = true, .asset_class = std::nullopt});
  EXPECT_EQ(ids(list), (std::vector<std::string>{"PX-2", "PX-1", "VX-4", "PX-3"}));
  for (const formats::DueAsset& a : list.assets) EXPECT_TRUE(a.newly_due);
  EXPECT_EQ(column(db, "SELECT asset_id FROM tenure_newly_due ORDER BY asset_id"),
            (std::vector<std::string>{"PX-1", "PX-2", "PX-3", "VX-4"}));
  EXPECT_TRUE(list.filters.newly);
}

TEST_F(DueList, ClassKeepsOneClassAndCombinesWithNewly) {
  EXPECT_EQ(ids(read_due_list(db, std::nullopt, {.newly = false, .asset_class = "pump-x"})),
            (std::vector<std::string>{"PX-2", "PX-0", "PX-1", "PX-3"}));
  EXPECT_EQ(ids(read_due_list(db, std::nullopt, {.newly = true, .asset_class = "van-x"})),
            (std::vector<std::string>{"VX-4"}));
  // A class of the run with nothing due is an empty list, not a refusal.
  EXPECT_TRUE(
      read_due_list(db, std::nullopt, {.newly = false, .asset_class = "hvac-x"}).assets.empty());
}

TEST_F(DueList, AnOlderRunByItsId) {
  const formats::DueList list = read_due_list(db, 1, {});
  EXPECT_EQ(list.run.as_of, "2025-11-30");
  // No run before run 1, so both are newly due; PX-0 has a delay cost, VX-5 none.
  EXPECT_EQ(ids(list), (std::vector<std::string>{"PX-0", "VX-5"}));
  EXPECT_TRUE(list.assets[0].newly_due && list.assets[1].newly_due);
  EXPECT_THROW(read_due_list(db, 2, {}), InputError);  // failed: not a run to list
}

TEST_F(DueList, AClassTheRunDoesNotHaveIsRefusedWithItsClasses) {
  EXPECT_EQ(refusal(db, "pump"),
            "--class: no class 'pump' in run 3; its classes are hvac-x, pump-x, van-x");
  EXPECT_EQ(refusal(db, "PUMP-X"),
            "--class: no class 'PUMP-X' in run 3; its classes are hvac-x, pump-x, van-x");
}

TEST(DueListClasses, TenAreNamedAllElevenOnlyTheFirstTen) {
  test_support::TempDir dir{"tenure_app_test"};
  db::Connection db = db::Connection::open(dir.path("fleet.db"), true);
  std::vector<std::string> ten;
  for (int c = 1; c <= 10; ++c) ten.push_back(fmt::format("c{:02}", c));
  add_stored_run(db, "2026-11-30", {}, results::RunStatus::ok, ten);
  EXPECT_EQ(refusal(db, "c11"),
            "--class: no class 'c11' in run 1; its classes are c01, c02, c03, c04, c05, c06, "
            "c07, c08, c09, c10");
  add_stored_run(db, "2026-12-31", {due_asset("A-1", "c11", Verdict::review, 1)},
                 results::RunStatus::ok, ten);
  EXPECT_EQ(refusal(db, "c12"),
            "--class: no class 'c12' in run 2; it has 11 classes, the first 10: c01, c02, c03, "
            "c04, c05, c06, c07, c08, c09, c10");
  add_stored_run(db, "2027-01-31", {});
  EXPECT_EQ(refusal(db, "c01"), "--class: no class 'c01' in run 3; it has no classes");
}

// The fixture fleet (fixtures/fleets) reviewed at two dates: the list is the view tenure_due in
// the order SQLite's ORDER BY gives for the same rule, and --newly is the view tenure_newly_due.
TEST(DueListOfAReview, IsTheViewInSqlitesOrder) {
  test_support::TempDir dir{"tenure_app_test"};
  db::Connection db = db::Connection::open(dir.path("fleet.db"), true);
  fixtures::create_input_tables(db.handle());
  fixtures::add_noiseless_fleet(db.handle());
  run_review(db, {fixtures::noiseless_policy(), parse_iso_date("2024-06-30"), {}, {}});
  run_review(db, {fixtures::noiseless_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
  const std::vector<std::string> due = ids(read_due_list(db, std::nullopt, {}));
  ASSERT_GE(due.size(), 2u);
  EXPECT_EQ(due, column(db,
                        "SELECT asset_id FROM tenure_due ORDER BY delay_cost IS NULL, "
                        "delay_cost DESC, verdict <> 'replace', asset_id"));
  std::vector<std::string> newly =
      ids(read_due_list(db, std::nullopt, {.newly = true, .asset_class = std::nullopt}));
  std::sort(newly.begin(), newly.end());
  EXPECT_EQ(newly, column(db, "SELECT asset_id FROM tenure_newly_due ORDER BY asset_id"));
}

}  // namespace
}  // namespace tenure::app
