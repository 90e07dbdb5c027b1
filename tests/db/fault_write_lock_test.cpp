// A host holding the database's write lock makes the review wait, not fail: another process
// opens the file, takes the lock with BEGIN IMMEDIATE or BEGIN EXCLUSIVE, writes a cost event,
// holds the lock for about two seconds and commits, while the review starts (db::Connection
// has a 60 s busy timeout). In rollback-journal and in WAL mode.
#include <gtest/gtest.h>

#include <sys/wait.h>
#include <unistd.h>

#include <chrono>
#include <thread>
#include <tuple>

#include <fmt/format.h>

#include "app/review_run.h"
#include "db_test_support.h"
#include "fixtures/fleets/fixture_fleets.h"

namespace tenure::db {
namespace {

using testing_support::scalar;
using testing_support::TempDatabase;
using testing_support::text_of;

constexpr auto kHold = std::chrono::milliseconds(2000);

// (journal mode, how the host begins its transaction)
class HeldWriteLock : public ::testing::TestWithParam<std::tuple<const char*, const char*>> {
 protected:
  void SetUp() override {
    Connection db = file.open();
    db.exec(fmt::format("PRAGMA journal_mode = {}", std::get<0>(GetParam())));
    fixtures::create_input_tables(db.handle());
    fixtures::add_noiseless_fleet(db.handle());
  }
  TempDatabase file;
};

TEST_P(HeldWriteLock, ReviewWaitsForTheHostAndSucceeds) {
  const char* begin = std::get<1>(GetParam());
  int locked[2];
  ASSERT_EQ(pipe(locked), 0);
  const pid_t host = fork();
  if (host == 0) {
    try {
      Connection db = file.open();
      db.exec(begin);
      db.exec("INSERT INTO cost_event VALUES ('PF-001', '2026-06-01', 123.5, 'host write')");
      const char ready = 'L';
      if (write(locked[1], &ready, 1) != 1) _exit(4);
      std::this_thread::sleep_for(kHold);
      db.exec("COMMIT");
      _exit(0);
    } catch (...) {
      _exit(3);
    }
  }
  char ready = 0;
  ASSERT_EQ(read(locked[0], &ready, 1), 1);  // the host holds the lock from here
  const auto start = std::chrono::steady_clock::now();
  Connection db = file.open();
  const app::RunSummary s = app::run_review(db, {fixtures::noiseless_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
  const auto waited = std::chrono::steady_clock::now() - start;
  int status = 0;
  waitpid(host, &status, 0);
  close(locked[0]);
  close(locked[1]);
  EXPECT_TRUE(WIFEXITED(status) && WEXITSTATUS(status) == 0) << "the host's own write failed";
  // The review could not commit before the host did.
  EXPECT_GE(waited, kHold * 3 / 4);
  EXPECT_EQ(s.assets_reviewed, 30);
  EXPECT_EQ(text_of(db, "SELECT status FROM tenure_run WHERE run_id = (SELECT max(run_id) FROM tenure_run)"), "ok");
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM tenure_latest"), 30);
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM cost_event WHERE kind = 'host write'"), 1);
  EXPECT_EQ(text_of(db, "PRAGMA integrity_check"), "ok");
}

INSTANTIATE_TEST_SUITE_P(JournalModesAndLocks, HeldWriteLock,
                         ::testing::Combine(::testing::Values("DELETE", "WAL"),
                                            ::testing::Values("BEGIN IMMEDIATE", "BEGIN EXCLUSIVE")));

}  // namespace
}  // namespace tenure::db
