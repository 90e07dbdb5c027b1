// A host writing cost events all through a series of reviews loses no write: another process
// inserts rows one statement at a time (each its own transaction, with the same 60 s busy
// timeout tenure uses) and counts those whose commit succeeded, while this process runs reviews
// back to back on the same file, reading the events in two halves at once where the journal
// mode allows (db/cost_ranges.h). Afterwards the rows present are exactly the rows committed,
// every review succeeded, and the file is sound. In rollback-journal and in WAL mode.
#include <gtest/gtest.h>

#include <fcntl.h>
#include <signal.h>
#include <sys/prctl.h>
#include <sys/wait.h>
#include <unistd.h>

#include <chrono>
#include <cstdint>
#include <string>
#include <thread>
#include <vector>

#include <fmt/format.h>

#include "db/demo_writer.h"
#include "app/review_run.h"
#include "db_test_support.h"

namespace tenure::db {
namespace {

using testing_support::scalar;
using testing_support::TempDatabase;
using testing_support::text_of;

constexpr int kReviews = 6;
constexpr auto kPause = std::chrono::microseconds(500);  // between two host writes

struct WriterCounts {
  std::int64_t committed = 0;
  std::int64_t failed = 0;
};

// The host: inserts until a byte arrives on `stop` (or the test is gone: `stop` at its end),
// then reports its counts on `report`.
[[noreturn]] void run_host_writer(const std::string& path, int started, int stop, int report) {
  prctl(PR_SET_PDEATHSIG, SIGKILL);  // never outlive the test process
  WriterCounts counts;
  try {
    Connection db = Connection::open(path);
    std::vector<std::string> ids;
    {
      Statement q(db, "SELECT asset_id FROM asset WHERE asset_id IS NOT NULL LIMIT 400");
      while (q.step()) ids.emplace_back(q.text(0));
    }
    Statement insert(db, "INSERT INTO cost_event(asset_id, occurred_on, amount, kind) "
                         "VALUES (?2, '2026-06-15', ?1, 'host write')");
    fcntl(stop, F_SETFL, O_NONBLOCK);
    char byte = 'S';
    if (write(started, &byte, 1) != 1) _exit(4);
    for (std::int64_t i = 0;; ++i) {
      if (read(stop, &byte, 1) >= 0) break;  // a byte, or the test closed the pipe
      insert.bind(1, static_cast<double>(i % 500) + 0.25);
      insert.bind(2, ids[static_cast<std::size_t>(i) % ids.size()]);
      // As a host should write: BEGIN IMMEDIATE takes the write lock first, waiting through its
      // busy timeout. (A bare INSERT in a rollback journal first reads, then asks for the lock,
      // and SQLite answers BUSY at once rather than let it deadlock with a committing review.)
      try {
        db.exec("BEGIN IMMEDIATE");
        insert.run();
        db.exec("COMMIT");
        ++counts.committed;
      } catch (const std::exception&) {
        insert.reset();
        if (db.in_transaction()) db.exec("ROLLBACK");
        ++counts.failed;
      }
      // A busy host, not a tight loop: back to back, a writer that never pauses starves
      // every reader of a rollback-journal database (SQLite's locks are not fair).
      std::this_thread::sleep_for(kPause);
    }
  } catch (...) {
    _exit(3);
  }
  if (write(report, &counts, sizeof counts) != sizeof counts) _exit(5);
  _exit(0);
}

// A forked child that does not outlive the test: killed and reaped if the test ends first.
class ChildProcess {
 public:
  explicit ChildProcess(pid_t pid) : pid_(pid) {}
  ChildProcess(const ChildProcess&) = delete;
  ChildProcess& operator=(const ChildProcess&) = delete;
  ~ChildProcess() {
    if (pid_ > 0) {
      kill(pid_, SIGKILL);
      waitpid(pid_, nullptr, 0);
    }
  }
  // Waits for the child's end; its wait status.
  int wait() {
    int status = 0;
    waitpid(pid_, &status, 0);
    pid_ = 0;
    return status;
  }

 private:
  pid_t pid_;
};

class HostWritingThroughReviews : public ::testing::TestWithParam<const char*> {
 protected:
  void SetUp() override {
    Connection db = file.open();
    demo::Options options;
    options.assets = 400;
    options.events = 40000;
    options.seed = 11;
    options.as_of = *parse_iso_date("2026-06-30");
    write_demo_fleet(db, options);
    db.exec(fmt::format("PRAGMA journal_mode = {}", GetParam()));
  }
  TempDatabase file;
};

TEST_P(HostWritingThroughReviews, LosesNoWrite) {
  int started[2], stop[2], report[2];
  ASSERT_EQ(pipe(started), 0);
  ASSERT_EQ(pipe(stop), 0);
  ASSERT_EQ(pipe(report), 0);
  const pid_t host = fork();
  if (host == 0) {
    for (int fd : {started[0], stop[1], report[0]}) close(fd);
    run_host_writer(file.path(), started[1], stop[0], report[1]);
  }
  ChildProcess guard(host);
  char byte = 0;
  ASSERT_EQ(read(started[0], &byte, 1), 1);

  Connection db = file.open();
  std::vector<std::int64_t> rows_read;
  for (int i = 0; i < kReviews; ++i) {
    app::ReviewOptions options{std::nullopt, parse_iso_date("2026-06-30"), {}, {}};
    options.split_min_rows = 1;  // read the events in two halves where the journal mode allows
    const app::RunSummary s = app::run_review(db, options);
    rows_read.push_back(s.rows_read);
  }
  byte = 'X';
  ASSERT_EQ(write(stop[1], &byte, 1), 1);
  WriterCounts counts;
  ASSERT_EQ(read(report[0], &counts, sizeof counts), static_cast<ssize_t>(sizeof counts));
  const int status = guard.wait();
  for (int fd : {started[0], started[1], stop[0], stop[1], report[0], report[1]}) close(fd);

  EXPECT_TRUE(WIFEXITED(status) && WEXITSTATUS(status) == 0);
  EXPECT_EQ(counts.failed, 0);
  EXPECT_GT(counts.committed, 0);
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM cost_event WHERE kind = 'host write'"), counts.committed);
  // The host's rows arrived while the reviews ran: later reviews read more rows.
  EXPECT_GT(rows_read.back(), rows_read.front());
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM tenure_run WHERE status = 'ok'"), kReviews);
  EXPECT_EQ(text_of(db, "PRAGMA integrity_check"), "ok");
  std::printf("%s: the host committed %lld rows during %d reviews\n", GetParam(),
              static_cast<long long>(counts.committed), kReviews);
}

INSTANTIATE_TEST_SUITE_P(JournalModes, HostWritingThroughReviews, ::testing::Values("DELETE", "WAL"));

}  // namespace
}  // namespace tenure::db
