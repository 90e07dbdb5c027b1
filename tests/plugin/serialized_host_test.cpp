// A host whose connection is serialized (SQLITE_OPEN_FULLMUTEX, the default threading mode of
// Debian's SQLite) calls tenure_review from a SELECT: its thread holds the connection's mutex for
// the whole statement, so the review must read the cost events without a second thread on that
// connection. The same host in multi-thread mode (SQLITE_OPEN_NOMUTEX) gets the same run. The
// review runs on a watched thread: a hang fails the test instead of stalling the suite. The
// invented noiseless fixture fleet (fixtures/fleets/fixture_fleets.h) is the database.
#include <gtest/gtest.h>
#include <sqlite3.h>

#include <chrono>
#include <cstdlib>
#include <future>
#include <string>
#include <thread>

#include "fixtures/fleets/fixture_fleets.h"

namespace tenure::plugin::testing {
namespace {

// Opens an in-memory fleet database in the given threading mode with the extension loaded.
sqlite3* host_database(int threading_flag) {
  sqlite3* db = nullptr;
  EXPECT_EQ(sqlite3_open_v2(":memory:", &db,
                            SQLITE_OPEN_READWRITE | SQLITE_OPEN_CREATE | threading_flag, nullptr),
            SQLITE_OK);
  fixtures::create_input_tables(db);
  fixtures::add_noiseless_fleet(db);
  sqlite3_enable_load_extension(db, 1);
  char* error = nullptr;
  EXPECT_EQ(sqlite3_load_extension(db, TENURE_EXTENSION_FILE, nullptr, &error), SQLITE_OK)
      << (error ? error : "");
  sqlite3_free(error);
  return db;
}

// SELECT tenure_review(policy, as_of) on the host's thread; returns "run <id>" or the error.
std::string review_from_select(sqlite3* db) {
  sqlite3_stmt* select = nullptr;
  if (sqlite3_prepare_v2(db, "SELECT tenure_review(?1, ?2)", -1, &select, nullptr) != SQLITE_OK) {
    return sqlite3_errmsg(db);
  }
  const std::string policy = fixtures::noiseless_policy();
  sqlite3_bind_text(select, 1, policy.c_str(), -1, SQLITE_TRANSIENT);
  sqlite3_bind_text(select, 2, fixtures::kAsOf, -1, SQLITE_STATIC);
  std::string outcome = sqlite3_step(select) == SQLITE_ROW
                            ? "run " + std::to_string(sqlite3_column_int64(select, 0))
                            : std::string(sqlite3_errmsg(db));
  sqlite3_finalize(select);
  return outcome;
}

// Runs the review on its own thread and gives it a minute; a hang cannot be joined, so it ends
// the test program with a failure message.
std::string watched_review(sqlite3* db) {
  std::packaged_task<std::string()> task([db] { return review_from_select(db); });
  std::future<std::string> outcome = task.get_future();
  std::thread runner(std::move(task));
  if (outcome.wait_for(std::chrono::seconds(60)) != std::future_status::ready) {
    ADD_FAILURE() << "SELECT tenure_review(...) did not return within a minute";
    std::fprintf(stderr, "serialized_host_test: the review hung\n");
    std::_Exit(1);
  }
  runner.join();
  return outcome.get();
}

std::int64_t count(sqlite3* db, const char* sql) {
  sqlite3_stmt* query = nullptr;
  EXPECT_EQ(sqlite3_prepare_v2(db, sql, -1, &query, nullptr), SQLITE_OK) << sql;
  EXPECT_EQ(sqlite3_step(query), SQLITE_ROW) << sql;
  const std::int64_t n = sqlite3_column_int64(query, 0);
  sqlite3_finalize(query);
  return n;
}

TEST(SerializedHostTest, ReviewFromASelectOnASerializedConnection) {
  sqlite3* db = host_database(SQLITE_OPEN_FULLMUTEX);
  ASSERT_NE(sqlite3_db_mutex(db), nullptr);
  EXPECT_EQ(watched_review(db), "run 1");
  EXPECT_GT(count(db, "SELECT count(*) FROM tenure_latest"), 0);
  sqlite3_close(db);
}

TEST(SerializedHostTest, TheSameRunOnAMultiThreadConnection) {
  sqlite3* serialized = host_database(SQLITE_OPEN_FULLMUTEX);
  sqlite3* multi_thread = host_database(SQLITE_OPEN_NOMUTEX);
  ASSERT_EQ(sqlite3_db_mutex(multi_thread), nullptr);
  EXPECT_EQ(watched_review(serialized), "run 1");
  EXPECT_EQ(watched_review(multi_thread), "run 1");
  const char* digest =
      "SELECT count(*), total(defender_euac), total(marginal_cost_next_year), "
      "group_concat(verdict, ',') FROM (SELECT * FROM tenure_latest ORDER BY asset_id)";
  sqlite3_stmt* a = nullptr;
  sqlite3_stmt* b = nullptr;
  ASSERT_EQ(sqlite3_prepare_v2(serialized, digest, -1, &a, nullptr), SQLITE_OK);
  ASSERT_EQ(sqlite3_prepare_v2(multi_thread, digest, -1, &b, nullptr), SQLITE_OK);
  ASSERT_EQ(sqlite3_step(a), SQLITE_ROW);
  ASSERT_EQ(sqlite3_step(b), SQLITE_ROW);
  for (int c = 0; c < 4; ++c) {
    EXPECT_STREQ(reinterpret_cast<const char*>(sqlite3_column_text(a, c)),
                 reinterpret_cast<const char*>(sqlite3_column_text(b, c)))
        << "column " << c;
  }
  sqlite3_finalize(a);
  sqlite3_finalize(b);
  sqlite3_close(serialized);
  sqlite3_close(multi_thread);
}

}  // namespace
}  // namespace tenure::plugin::testing
