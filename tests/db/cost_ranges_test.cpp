// Reading the cost events in two halves at once (db/cost_ranges.h): where a split is planned and
// where it is not, and that a review read in halves stores exactly what a review read in one
// pass stores (every result, every rejected row and its row number), and that when the second
// connection cannot start because a writer is waiting, the review's own connection reads both
// halves to the same totals. The databases are the invented demo fleet (demo/) and small tables typed here.
#include <gtest/gtest.h>

#include <fmt/format.h>

#include <limits>
#include <string>
#include <vector>

#include "db/cost_ranges.h"
#include "db/demo_writer.h"
#include "db/fleet_reader.h"
#include "db/policy_store.h"
#include "app/review_run.h"
#include "db_test_support.h"
#include "formats/policy_json.h"

namespace tenure::db {
namespace {

using testing_support::scalar;
using testing_support::TempDatabase;

constexpr std::int64_t kOnePass = std::numeric_limits<std::int64_t>::max();

// A table of `rows` cost events with rowids 1..rows, read inside a read transaction as the
// reader is.
class Planned : public ::testing::Test {
 protected:
  void SetUp() override {
    db.exec("CREATE TABLE cost_event(asset_id TEXT, occurred_on TEXT, amount REAL);"
            "WITH RECURSIVE n(i) AS (SELECT 1 UNION ALL SELECT i + 1 FROM n WHERE i < 1001)"
            " INSERT INTO cost_event SELECT 'PU-' || i, '2024-01-01', i FROM n;");
  }
  std::optional<RowidSplit> plan(const std::string& relation, std::int64_t min_rows = 1) {
    Transaction read(db, Transaction::Kind::deferred);
    scalar(db, "SELECT count(*) FROM sqlite_schema");  // the read transaction has read
    return plan_split(db, relation, min_rows);
  }
  TempDatabase file;
  Connection db = file.open();
};

TEST_F(Planned, ATableOfAFileIsSplitAtItsMiddleRowid) {
  const auto split = plan("cost_event");
  ASSERT_TRUE(split);
  EXPECT_EQ(split->rowid_name, "rowid");
  EXPECT_EQ(split->last_of_first, 501);  // rowids 1..1001
  EXPECT_EQ(split->database_path, file.path());
  EXPECT_EQ(split->first_half().through, 501);
  EXPECT_EQ(split->second_half().after, 501);
  EXPECT_FALSE(split->first_half().overlap);
}

TEST_F(Planned, FewerRowsThanTheMinimumAreReadInOnePass) {
  EXPECT_TRUE(plan("cost_event", 1001));
  EXPECT_FALSE(plan("cost_event", 1002));
  db.exec("DELETE FROM cost_event");
  EXPECT_FALSE(plan("cost_event"));
}

TEST_F(Planned, AColumnNamedRowidIsNotTheRowid) {
  db.exec("CREATE TABLE odd(rowid TEXT, asset_id, occurred_on, amount);"
          "INSERT INTO odd(asset_id) VALUES ('a'), ('b'), ('c')");
  const auto split = plan("odd");
  ASSERT_TRUE(split);
  EXPECT_EQ(split->rowid_name, "_rowid_");
}

TEST_F(Planned, ViewsTablesWithoutRowidAndHiddenTablesAreReadInOnePass) {
  db.exec("CREATE VIEW cost_view AS SELECT * FROM cost_event;"
          "CREATE TABLE keyed(asset_id TEXT, occurred_on TEXT, amount REAL,"
          " PRIMARY KEY (asset_id, occurred_on)) WITHOUT ROWID;"
          "INSERT INTO keyed VALUES ('a', '2024-01-01', 1), ('b', '2024-01-01', 2)");
  EXPECT_FALSE(plan("cost_view"));
  EXPECT_FALSE(plan("keyed"));
  db.exec("CREATE TEMP TABLE cost_event(asset_id, occurred_on, amount)");
  EXPECT_FALSE(plan("cost_event")) << "a temporary table of that name is what the SQL reads";
}

TEST_F(Planned, WalModeBorrowedConnectionsAndNoReadTransactionAreReadInOnePass) {
  EXPECT_FALSE(plan_split(db, "cost_event", 1)) << "no read transaction holds the data still";
  {
    Connection borrowed = Connection::borrow(db.handle());
    Transaction read(borrowed, Transaction::Kind::deferred);
    scalar(borrowed, "SELECT count(*) FROM cost_event");
    EXPECT_FALSE(plan_split(borrowed, "cost_event", 1));
  }
  db.exec("PRAGMA journal_mode = WAL");
  EXPECT_FALSE(plan("cost_event"));
}

TEST(PlannedInMemory, AnInMemoryDatabaseIsReadInOnePass) {
  Connection db = Connection::open(":memory:", true);
  db.exec("CREATE TABLE cost_event(asset_id, occurred_on, amount); INSERT INTO cost_event VALUES (1, 2, 3)");
  Transaction read(db, Transaction::Kind::deferred);
  scalar(db, "SELECT count(*) FROM cost_event");
  EXPECT_FALSE(plan_split(db, "cost_event", 1));
}

// Every stored row of a run, without its run_id, in a fixed order.
std::vector<std::string> stored(Connection& db, std::int64_t run_id) {
  std::vector<std::string> rows;
  for (const char* table : {"tenure_asset_result", "tenure_class_result", "tenure_rejected",
                            "tenure_euac_curve", "tenure_cash_flow"}) {
    Statement q(db, fmt::format("SELECT * FROM {} WHERE run_id = ?1", table));
    q.bind(1, run_id);
    while (q.step()) {
      std::string row(table);
      for (int c = 1; c < sqlite3_column_count(q.handle()); ++c) {
        row.append("|");
        if (q.column_type(c) == SQLITE_FLOAT) {
          row.append(fmt::format("{:.17g}", q.real(c)));
        } else {
          row.append(q.is_null(c) ? std::string_view("NULL") : q.text(c));
        }
      }
      rows.push_back(row);
    }
  }
  return rows;
}

class DemoFleet : public ::testing::Test {
 protected:
  void SetUp() override {
    Connection db = file.open();
    write_demo_fleet(db, demo::Options{});
    // Bad rows at the end of the table too, so both halves have some.
    db.exec("INSERT INTO cost_event(asset_id, occurred_on, amount) VALUES"
            " ('NO-SUCH-UNIT', '2024-01-01', 10),"
            " ('PU-0001', '2024-02-30', 10), ('PU-0001', '2024-01-01', 'ten')");
  }
  app::RunSummary review(std::int64_t split_min_rows) {
    Connection db = file.open();
    app::ReviewOptions options;
    options.as_of = parse_iso_date("2026-11-30");
    options.split_min_rows = split_min_rows;
    return app::run_review(db, options);
  }
  TempDatabase file;
};

TEST_F(DemoFleet, HalvesStoreExactlyWhatOnePassStores) {
  const app::RunSummary one_pass = review(kOnePass);
  const app::RunSummary halves = review(1);
  Connection db = file.open();
  const std::int64_t events = static_cast<std::int64_t>(scalar(db, "SELECT count(*) FROM cost_event"));
  // The rejected cost rows lie in both halves, numbered as one pass numbers them.
  EXPECT_GT(scalar(db, "SELECT count(*) FROM tenure_rejected WHERE run_id = 2 AND source = "
                       "'cost_event' AND CAST(substr(row_ref, 5) AS INTEGER) <= " +
                           std::to_string(events / 2)),
            0);
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM tenure_rejected WHERE run_id = 2 AND row_ref LIKE 'position " +
                           std::to_string(events) + " (%'"),
            1);
  EXPECT_EQ(one_pass.rows_read, halves.rows_read);
  EXPECT_EQ(one_pass.rows_rejected, halves.rows_rejected);
  const std::vector<std::string> first = stored(db, one_pass.run_id);
  EXPECT_GT(first.size(), 300u);
  EXPECT_EQ(first, stored(db, halves.run_id));
}

// The rejected rows and every asset's cost totals, as text, of one read.
std::vector<std::string> read_result(const ReadReport& report, const review::FleetData& data) {
  std::vector<std::string> lines{fmt::format("read {} after {}", report.rows_read,
                                             report.rows_after_as_of)};
  for (const Rejection& r : report.rejected) lines.push_back(r.source + "|" + r.row_ref + "|" + r.reason);
  for (std::uint32_t a = 0; a < data.costs.asset_count(); ++a) {
    std::string line = data.assets[a].asset_id;
    for (Money cost : data.costs.year_costs(a)) line.append(fmt::format("|{:.17g}", cost));
    lines.push_back(line);
  }
  return lines;
}

TEST_F(DemoFleet, AWaitingWriterMakesTheReviewReadBothHalvesItself) {
  Connection db = file.open();
  const review::Policy policy = formats::read_policy(*latest_policy(db));
  const Date as_of = *parse_iso_date("2026-11-30");
  Transaction read(db, Transaction::Kind::deferred);
  scalar(db, "SELECT count(*) FROM asset");  // the review's shared lock
  // A writer's COMMIT fails busy against that lock and keeps its pending lock, which refuses
  // every new reader: the review's second connection cannot start.
  Connection writer = file.open();
  sqlite3_busy_timeout(writer.handle(), 0);
  writer.exec("BEGIN IMMEDIATE; CREATE TABLE host_note(x)");
  ASSERT_NE(sqlite3_exec(writer.handle(), "COMMIT", nullptr, nullptr, nullptr), SQLITE_OK);
  const auto split = plan_split(db, "cost_event", 1);
  ASSERT_TRUE(split);
  EXPECT_FALSE(open_second_reader(*split)) << "the pending lock refuses a new reader";
  review::FleetData halves(as_of, policy.cost_escalation);
  const ReadReport halves_report = read_fleet(db, policy, halves, 1);
  review::FleetData one_pass(as_of, policy.cost_escalation);
  const ReadReport one_pass_report = read_fleet(db, policy, one_pass, kOnePass);
  EXPECT_EQ(read_result(halves_report, halves), read_result(one_pass_report, one_pass));
  EXPECT_GT(halves_report.rejected.size(), 3u);
  writer.exec("ROLLBACK");
}

}  // namespace
}  // namespace tenure::db
