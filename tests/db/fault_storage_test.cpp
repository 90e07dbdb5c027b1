// Storage that refuses the review's writes: a full disk (simulated with PRAGMA max_page_count
// set just above the file's current size, on the review's own connection) and a read-only
// database (opened with the URI parameter mode=ro, since the tests run as root and file
// permissions would not stop them). Each gives a clear tenure::RuntimeFailure and changes
// nothing: the file is sound and every table is exactly as before.
#include <gtest/gtest.h>

#include <string>

#include <fmt/format.h>

#include "core/errors.h"
#include "app/review_run.h"
#include "app/sha256.h"
#include "db_test_support.h"
#include "fixtures/fleets/fixture_fleets.h"

namespace tenure::db {
namespace {

using testing_support::scalar;
using testing_support::TempDatabase;
using testing_support::text_of;

// The schema and every table, rows in rowid order with each value's type and text.
std::string database_digest(Connection& db) {
  std::string all;
  Statement schema(db, "SELECT name, sql FROM sqlite_schema ORDER BY name");
  while (schema.step()) all.append(schema.text(0)).append(":").append(schema.text(1)).append("\n");
  Statement kinds(db, "SELECT name FROM sqlite_schema WHERE type = 'table' ORDER BY name");
  while (kinds.step()) {
    Statement rows(db, fmt::format("SELECT * FROM \"{}\" ORDER BY rowid", kinds.text(0)));
    while (rows.step()) {
      for (int c = 0; c < sqlite3_column_count(rows.handle()); ++c) {
        all.append(std::to_string(rows.column_type(c))).append(":").append(rows.text(c)).append("|");
      }
      all += '\n';
    }
  }
  return app::sha256_hex(all);
}

class RefusingStorage : public ::testing::Test {
 protected:
  void SetUp() override {
    Connection db = file.open();
    fixtures::create_input_tables(db.handle());
    fixtures::add_noiseless_fleet(db.handle());
  }
  app::ReviewOptions second_run() const {
    return {fixtures::noiseless_policy(), parse_iso_date("2026-12-31"), {}, {}};
  }
  // Runs a first, complete review (the "previous results").
  void first_review() {
    Connection db = file.open();
    app::run_review(db, {fixtures::noiseless_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
  }
  std::string digest() {
    Connection db = file.open();
    EXPECT_EQ(text_of(db, "PRAGMA integrity_check"), "ok");
    return database_digest(db);
  }
  TempDatabase file;
};

// The error a review on `db` throws, as its message; fails the test on any other outcome.
std::string runtime_failure_of(Connection& db, const app::ReviewOptions& options) {
  try {
    app::run_review(db, options);
  } catch (const RuntimeFailure& e) {
    return e.what();
  } catch (const std::exception& e) {
    ADD_FAILURE() << "expected a RuntimeFailure, got: " << e.what();
    return e.what();
  }
  ADD_FAILURE() << "expected a RuntimeFailure, the review succeeded";
  return {};
}

TEST_F(RefusingStorage, FullDiskOnTheFirstRunWritesNothing) {
  const std::string before = digest();
  {
    Connection db = file.open();
    const double pages = scalar(db, "PRAGMA page_count");
    db.exec(fmt::format("PRAGMA max_page_count = {}", pages + 1));
    EXPECT_EQ(runtime_failure_of(db, second_run()),
              "cannot store the results: database or disk is full");
  }
  EXPECT_EQ(digest(), before);
  Connection db = file.open();
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM sqlite_schema WHERE name LIKE 'tenure_%'"), 0);
}

TEST_F(RefusingStorage, FullDiskAfterAFirstRunLeavesItsResults) {
  first_review();
  const std::string before = digest();
  for (int spare_pages : {0, 1, 2, 4, 8}) {
    SCOPED_TRACE(fmt::format("{} spare pages", spare_pages));
    {
      Connection db = file.open();
      const double pages = scalar(db, "PRAGMA page_count");
      db.exec(fmt::format("PRAGMA max_page_count = {}", pages + spare_pages));
      EXPECT_EQ(runtime_failure_of(db, second_run()),
                "cannot store the results: database or disk is full");
    }
    EXPECT_EQ(digest(), before);
  }
  // With room again, the same review succeeds on the same file.
  Connection db = file.open();
  const app::RunSummary s = app::run_review(db, second_run());
  EXPECT_EQ(s.run_id, 2);
  EXPECT_EQ(text_of(db, "SELECT as_of FROM tenure_run JOIN tenure_latest USING (run_id) LIMIT 1"),
            "2026-12-31");
}

TEST_F(RefusingStorage, ReadOnlyDatabaseChangesNothing) {
  first_review();
  const std::string before = digest();
  {
    Connection db = Connection::open("file:" + file.path() + "?mode=ro");
    const std::string message = runtime_failure_of(db, second_run());
    EXPECT_EQ(message, "cannot store the results: attempt to write a readonly database");
  }
  EXPECT_EQ(digest(), before);
}

TEST_F(RefusingStorage, ReadOnlyDatabaseWithoutResultsTablesChangesNothing) {
  const std::string before = digest();
  {
    Connection db = Connection::open("file:" + file.path() + "?mode=ro");
    EXPECT_EQ(runtime_failure_of(db, second_run()),
              "cannot store the results: attempt to write a readonly database");
  }
  EXPECT_EQ(digest(), before);
}

}  // namespace
}  // namespace tenure::db
