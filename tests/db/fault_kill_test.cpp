// A review killed with SIGKILL at many points (SPEC 7: "a failed or interrupted run leaves the
// previous results exactly as they were"). A child process runs app::run_review on a copy of an
// invented demo database that already holds one completed run; the parent kills it after delays
// spread from 0 to past the run's own duration, then checks the file: PRAGMA integrity_check is
// ok, and either every table is exactly as before (killed before the commit) or the new run is
// there whole, equal to the same run left to finish (killed after it).
#include <gtest/gtest.h>

#include <csignal>
#include <sys/wait.h>
#include <unistd.h>

#include <chrono>
#include <filesystem>
#include <cstdio>
#include <thread>
#include <vector>

#include <fmt/format.h>

#include "db/demo_writer.h"
#include "app/review_run.h"
#include "app/sha256.h"
#include "db_test_support.h"

namespace tenure::db {
namespace {

using testing_support::scalar;
using testing_support::TempDatabase;
using testing_support::text_of;

constexpr const char* kFirstAsOf = "2026-03-31";
constexpr const char* kSecondAsOf = "2026-06-30";
constexpr int kDelays = 20;

// SHA-256 over the rows of `relation` in rowid order (or in full column order for a view), with
// each value's storage class and text.
std::string rows_digest(Connection& db, const std::string& relation, bool is_view) {
  Statement q(db, fmt::format("SELECT * FROM \"{}\" ORDER BY {}", relation,
                              is_view ? "1, 2, 3, 4, 5" : "rowid"));
  std::string all;
  while (q.step()) {
    for (int c = 0; c < sqlite3_column_count(q.handle()); ++c) {
      all.append(std::to_string(q.column_type(c))).append(":").append(q.text(c)).append("|");
    }
    all += '\n';
  }
  return app::sha256_hex(all);
}

// The schema and every tenure_ table: all a review writes (input tables are never written,
// review_run_test.cpp checks that).
std::string database_digest(Connection& db) {
  std::string all = rows_digest(db, "sqlite_schema", false);
  Statement tables(db, "SELECT name FROM sqlite_schema WHERE type = 'table' AND name LIKE "
                       "'tenure_%' ORDER BY name");
  while (tables.step()) all += rows_digest(db, std::string(tables.text(0)), false);
  return app::sha256_hex(all);
}

// What a completed second run shows: the two latest views, its rejected rows and the runs'
// counts (timestamps differ between runs and are left out).
std::string completed_run_digest(Connection& db) {
  std::string all = rows_digest(db, "tenure_latest", true) + rows_digest(db, "tenure_class_latest", true);
  all += rows_digest(db, "tenure_rejected", false);
  Statement run(db, "SELECT run_id, as_of, rows_read, rows_rejected, status, assets_reviewed "
                    "FROM tenure_run ORDER BY run_id");
  while (run.step()) {
    for (int c = 0; c < 6; ++c) all.append(run.text(c)).append("|");
  }
  return app::sha256_hex(all);
}

void copy_database(const std::string& from, const std::string& to) {
  std::filesystem::copy_file(from, to, std::filesystem::copy_options::overwrite_existing);
}

class KilledReview : public ::testing::Test {
 protected:
  // One template database for the whole suite: the demo fleet and a first completed run.
  static void SetUpTestSuite() {
    templ = new TempDatabase;
    reference = new TempDatabase;
    {
      Connection db = templ->open();
      demo::Options options;
      options.assets = 1500;
      options.events = 150000;
      options.seed = 7;
      options.as_of = *parse_iso_date(kSecondAsOf);
      write_demo_fleet(db, options);
      app::run_review(db, {std::nullopt, parse_iso_date(kFirstAsOf), {}, {}});
      before = new std::string(database_digest(db));
    }
    // The second run left to finish: what a run killed after its commit must equal.
    copy_database(templ->path(), reference->path());
    // Timed in a child, as the killed runs are: its write transaction has begun by the first
    // progress call (results are inserted as the analysis goes). Timed twice, the second time on
    // a scratch copy, keeping the faster: a timing slowed by other tests running beside it would
    // put most kills after the end of the runs.
    TempDatabase scratch;
    copy_database(templ->path(), scratch.path());
    for (const TempDatabase* timed : {reference, &scratch}) {
      const auto start = std::chrono::steady_clock::now();
      const pid_t child = fork();
      if (child == 0) {
        Connection db = timed->open();
        const auto written = [&] {
          const auto t = std::chrono::steady_clock::now() - start;
          return std::chrono::duration_cast<std::chrono::microseconds>(t).count();
        };
        std::int64_t write_starts = 0;
        app::run_review(db, {std::nullopt, parse_iso_date(kSecondAsOf),
                        [&](std::size_t, std::size_t) {
                          if (write_starts == 0) write_starts = written();
                        },
                        {}});
        // The parent reads the phase times from the database file's neighbour.
        std::FILE* out = std::fopen((timed->path() + ".times").c_str(), "w");
        std::fprintf(out, "%lld %lld\n", static_cast<long long>(write_starts),
                     static_cast<long long>(written()));
        std::fclose(out);
        _exit(0);
      }
      int status = 0;
      waitpid(child, &status, 0);
      ASSERT_TRUE(WIFEXITED(status) && WEXITSTATUS(status) == 0);
      std::FILE* in = std::fopen((timed->path() + ".times").c_str(), "r");
      long long write_starts = 0, ends = 0;
      ASSERT_EQ(std::fscanf(in, "%lld %lld", &write_starts, &ends), 2);
      std::fclose(in);
      std::filesystem::remove(timed->path() + ".times");
      if (timed == reference || ends < run_end.count()) {
        write_start = std::chrono::microseconds(write_starts);
        run_end = std::chrono::microseconds(ends);
      }
    }
    Connection db = reference->open();
    completed = new std::string(completed_run_digest(db));
  }
  static void TearDownTestSuite() {
    delete templ;
    delete reference;
    delete before;
    delete completed;
  }

  // Runs the second review in a child on a fresh copy and kills it after `delay` (or lets the
  // child kill itself through `before_commit` when `in_hook`). True when the child was killed.
  bool review_and_kill(const TempDatabase& copy, std::chrono::microseconds delay, bool in_hook) {
    copy_database(templ->path(), copy.path());
    const pid_t child = fork();
    if (child == 0) {
      try {
        Connection db = copy.open();
        app::ReviewOptions options{std::nullopt, parse_iso_date(kSecondAsOf), {}, {}};
        if (in_hook) options.before_commit = [] { std::raise(SIGKILL); };
        app::run_review(db, options);
        _exit(0);
      } catch (...) {
        _exit(3);
      }
    }
    if (!in_hook) {
      std::this_thread::sleep_for(delay);
      kill(child, SIGKILL);
    }
    int status = 0;
    waitpid(child, &status, 0);
    return WIFSIGNALED(status);
  }

  // After a kill: the file is sound, and holds either the old state or the whole new run.
  // Returns true when the new run is there.
  bool expect_old_or_complete(const TempDatabase& copy) {
    Connection db = copy.open();
    EXPECT_EQ(text_of(db, "PRAGMA integrity_check"), "ok");
    if (scalar(db, "SELECT max(run_id) FROM tenure_run") == 1) {
      EXPECT_EQ(database_digest(db), *before) << "a killed run changed the database";
      EXPECT_EQ(text_of(db, "SELECT DISTINCT as_of FROM tenure_run JOIN tenure_latest USING (run_id)"),
                kFirstAsOf);
      return false;
    }
    EXPECT_EQ(completed_run_digest(db), *completed) << "the new run is not complete";
    return true;
  }

  static TempDatabase* templ;
  static TempDatabase* reference;
  static std::string* before;
  static std::string* completed;
  static std::chrono::microseconds write_start;  // after the child's start
  static std::chrono::microseconds run_end;
};

TempDatabase* KilledReview::templ = nullptr;
TempDatabase* KilledReview::reference = nullptr;
std::string* KilledReview::before = nullptr;
std::string* KilledReview::completed = nullptr;
std::chrono::microseconds KilledReview::write_start{};
std::chrono::microseconds KilledReview::run_end{};

TEST_F(KilledReview, JustBeforeCommitLeavesEverythingAsItWas) {
  TempDatabase copy;
  EXPECT_TRUE(review_and_kill(copy, {}, true));
  EXPECT_FALSE(expect_old_or_complete(copy));
}

// Half the delays spread from 0 to the run's end (kills while the child starts, reads and
// computes), half over its write transaction and a little past its end, and one long after it.
TEST_F(KilledReview, AtDelaysSpreadOverTheRunLeavesOldOrComplete) {
  std::vector<std::chrono::microseconds> delays;
  for (int i = 0; i < kDelays / 2; ++i) delays.push_back(run_end * i / (kDelays / 2));
  const auto writing = run_end * 11 / 10 - write_start;
  for (int i = 0; i < kDelays / 2 - 1; ++i) delays.push_back(write_start + writing * i / (kDelays / 2 - 1));
  delays.push_back(run_end * 4);  // with room to spare: the run completes
  int old_state = 0, complete = 0, killed = 0, mid_write = 0;
  for (const auto delay : delays) {
    SCOPED_TRACE(fmt::format("kill after {} us; the write starts at {} us, the run ends at {} us",
                             delay.count(), write_start.count(), run_end.count()));
    TempDatabase copy;
    if (review_and_kill(copy, delay, false)) ++killed;
    // A rollback journal left behind (a "hot journal") means the kill hit the write
    // transaction; the next open rolls it back.
    const auto journal = copy.path() + "-journal";
    if (std::filesystem::exists(journal) && std::filesystem::file_size(journal) > 0) ++mid_write;
    (expect_old_or_complete(copy) ? complete : old_state)++;
  }
  // Both outcomes occur: early kills keep the old state, late ones find the run complete.
  EXPECT_GT(old_state, 0);
  EXPECT_GT(complete, 0);
  EXPECT_GT(killed, kDelays / 4);
  std::printf("%d kills from 0 to %lld us (write from %lld us): %d children killed, %d of them "
              "inside the write transaction; %d left the old state, %d found the run complete\n",
              kDelays, static_cast<long long>(delays.back().count()),
              static_cast<long long>(write_start.count()), killed, mid_write, old_state, complete);
}

}  // namespace
}  // namespace tenure::db
