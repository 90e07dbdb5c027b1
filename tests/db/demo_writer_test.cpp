// The demo writer: the three host tables exactly as SPEC 3 declares them, filled in generation
// order (rowids are the generator's row numbers), the index on cost_event(asset_id,
// occurred_on), the demo policy stored and readable, existing tables refused unless replaced,
// and a review of the demo database rejecting exactly the injected bad rows.
#include "db/demo_writer.h"

#include <gtest/gtest.h>

#include <cmath>
#include <string>
#include <vector>

#include "core/errors.h"
#include "db/policy_store.h"
#include "app/review_run.h"
#include "db_test_support.h"
#include "demo/demo_classes.h"
#include "demo/demo_policy.h"
#include "formats/policy_json.h"

namespace tenure::db {
namespace {

using testing_support::scalar;
using testing_support::TempDatabase;
using testing_support::text_of;

demo::Options small_fleet() {
  demo::Options options;
  options.assets = 60;
  options.events = 4000;
  return options;
}

// "name type notnull pk" for each column, as PRAGMA table_info reports them.
std::vector<std::string> columns(Connection& db, const std::string& table) {
  Statement q(db, "SELECT name, type, \"notnull\", pk FROM pragma_table_info(?1)");
  q.bind(1, table);
  std::vector<std::string> found;
  while (q.step()) {
    found.push_back(std::string(q.text(0)) + " " + std::string(q.text(1)) + " " +
                    std::to_string(q.integer(2)) + " " + std::to_string(q.integer(3)));
  }
  return found;
}

TEST(DemoWriter, CreatesTheHostTablesOfSpecThree) {
  TempDatabase file;
  Connection db = file.open();
  write_demo_fleet(db, small_fleet());
  EXPECT_EQ(columns(db, "asset"),
            (std::vector<std::string>{"asset_id TEXT 0 1", "asset_class TEXT 1 0",
                                      "in_service_on TEXT 1 0", "first_cost REAL 1 0",
                                      "retired_on TEXT 0 0"}));
  EXPECT_EQ(columns(db, "cost_event"),
            (std::vector<std::string>{"asset_id TEXT 1 0", "occurred_on TEXT 1 0",
                                      "amount REAL 1 0", "kind TEXT 0 0"}));
  EXPECT_EQ(columns(db, "asset_valuation"),
            (std::vector<std::string>{"asset_id TEXT 1 0", "valued_on TEXT 1 0", "amount REAL 1 0",
                                      "basis TEXT 0 0"}));
}

TEST(DemoWriter, IndexesCostEventsByAssetAndDay) {
  TempDatabase file;
  Connection db = file.open();
  write_demo_fleet(db, small_fleet());
  EXPECT_EQ(text_of(db, "SELECT tbl_name FROM sqlite_schema WHERE name = 'cost_event_asset_day'"),
            "cost_event");
  EXPECT_EQ(text_of(db,
                    "SELECT group_concat(name, ',') FROM"
                    " (SELECT name FROM pragma_index_info('cost_event_asset_day') ORDER BY seqno)"),
            "asset_id,occurred_on");
}

TEST(DemoWriter, StoresEveryRowInGenerationOrder) {
  TempDatabase file;
  Connection db = file.open();
  const DemoWrite written = write_demo_fleet(db, small_fleet());
  const demo::Summary& s = written.summary;
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM asset"), static_cast<double>(s.assets));
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM cost_event"), static_cast<double>(s.events));
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM asset_valuation"), static_cast<double>(s.valuations));
  EXPECT_EQ(scalar(db, "SELECT max(rowid) FROM cost_event"), static_cast<double>(s.events));
  ASSERT_EQ(s.bad_rows.size(), static_cast<std::size_t>(demo::kBadRowKindCount));
  for (const demo::BadRow& bad : s.bad_rows) {
    SCOPED_TRACE(bad.detail);
    Statement row(db, "SELECT asset_id FROM " + quoted(bad.relation) + " WHERE rowid = ?1");
    row.bind(1, bad.row_number);
    ASSERT_TRUE(row.step());
    EXPECT_EQ(row.text(0), bad.asset_id);
  }
  // The text amount stays text in the REAL column; the infinite one is a REAL infinity.
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM cost_event WHERE typeof(amount) = 'text'"), 1);
  EXPECT_EQ(text_of(db, "SELECT amount FROM cost_event WHERE typeof(amount) = 'text'"), "n/a");
  EXPECT_TRUE(
      std::isinf(scalar(db, "SELECT max(amount) FROM cost_event WHERE typeof(amount) = 'real'")));
}

TEST(DemoWriter, StoresTheDemoPolicyWhichThePolicyReaderAccepts) {
  TempDatabase file;
  Connection db = file.open();
  const DemoWrite written = write_demo_fleet(db, small_fleet());
  EXPECT_GT(written.policy_id, 0);
  const auto stored = latest_policy(db);
  ASSERT_TRUE(stored);
  EXPECT_EQ(*stored, demo::demo_policy_json());
  const review::Policy policy = formats::read_policy(*stored);
  EXPECT_EQ(policy.classes.size(), demo::demo_classes().size());
  EXPECT_TRUE(policy.real_money());
}

TEST(DemoWriter, RefusesExistingTablesUnlessToldToReplaceThem) {
  TempDatabase file;
  Connection db = file.open();
  write_demo_fleet(db, small_fleet());
  try {
    write_demo_fleet(db, small_fleet());
    ADD_FAILURE() << "expected InputError";
  } catch (const InputError& error) {
    EXPECT_EQ(error.where(), "asset");
  }
  demo::Options other = small_fleet();
  other.assets = 30;
  const DemoWrite replaced = write_demo_fleet(db, other, ExistingDemoTables::replace);
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM asset"), static_cast<double>(replaced.summary.assets));
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM cost_event"),
            static_cast<double>(replaced.summary.events));
}

TEST(DemoWriter, RefusesAViewNamedLikeAHostTable) {
  TempDatabase file;
  Connection db = file.open();
  db.exec("CREATE VIEW cost_event AS SELECT 1 AS x");
  EXPECT_THROW(write_demo_fleet(db, small_fleet()), InputError);
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM sqlite_schema WHERE name = 'asset'"),
            0);  // rolled back
  write_demo_fleet(db, small_fleet(), ExistingDemoTables::replace);
  EXPECT_EQ(text_of(db, "SELECT type FROM sqlite_schema WHERE name = 'cost_event'"), "table");
}

// End to end: the review of the demo database rejects each injected bad row, at its row, and
// nothing else.
TEST(DemoWriter, TheReviewRejectsExactlyTheInjectedBadRows) {
  TempDatabase file;
  Connection db = file.open();
  const demo::Options options = small_fleet();
  const DemoWrite written = write_demo_fleet(db, options);
  app::ReviewOptions review;
  review.as_of = options.as_of;
  const app::RunSummary run = app::run_review(db, review);
  EXPECT_EQ(run.rows_rejected, static_cast<std::int64_t>(written.summary.bad_rows.size()));
  for (const demo::BadRow& bad : written.summary.bad_rows) {
    SCOPED_TRACE(std::string(demo::name(bad.kind)) + ": " + bad.detail);
    Statement found(db,
                    "SELECT count(*) FROM tenure_rejected WHERE run_id = ?1 AND source = ?2"
                    " AND row_ref LIKE ?3");
    found.bind(1, run.run_id);
    found.bind(2, bad.relation);
    found.bind(3, "position " + std::to_string(bad.row_number) + " %");
    ASSERT_TRUE(found.step());
    EXPECT_EQ(found.integer(0), 1);
  }
}

}  // namespace
}  // namespace tenure::db
