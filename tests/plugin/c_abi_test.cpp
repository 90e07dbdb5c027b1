// The C ABI of tenure.h, called as a host calls it (linked against libtenure.so): return codes
// (0 ok, 1 failure, 2 bad input, as the command's exit codes), messages and their ownership, NULL
// arguments, and the review's transactions on the host's own connection. The invented noiseless
// fixture fleet (fixtures/fleets/fixture_fleets.h) is the database.
#include <gtest/gtest.h>
#include <sqlite3.h>

#include <memory>
#include <string>

#include <nlohmann/json.hpp>

#include "core/version.h"
#include "fixtures/fleets/fixture_fleets.h"
#include "tenure.h"

namespace tenure::plugin::testing {
namespace {

struct Freed {
  void operator()(char* text) const { tenure_free(text); }
};
using Text = std::unique_ptr<char, Freed>;

struct Closed {
  void operator()(sqlite3* db) const { sqlite3_close(db); }
};
using Database = std::unique_ptr<sqlite3, Closed>;

Database fleet_database() {
  sqlite3* db = nullptr;
  EXPECT_EQ(sqlite3_open(":memory:", &db), SQLITE_OK);
  fixtures::create_input_tables(db);
  fixtures::add_noiseless_fleet(db);
  return Database(db);
}

std::int64_t count(sqlite3* db, const std::string& sql) {
  sqlite3_stmt* query = nullptr;
  EXPECT_EQ(sqlite3_prepare_v2(db, sql.c_str(), -1, &query, nullptr), SQLITE_OK) << sql;
  EXPECT_EQ(sqlite3_step(query), SQLITE_ROW) << sql;
  const std::int64_t n = sqlite3_column_int64(query, 0);
  sqlite3_finalize(query);
  return n;
}

const std::string kCase = R"({"marr": 0.10, "income_tax_rate": 0,
  "challenger": {"first_cost": 10000, "operating_costs": [1000, 1000, 1000],
                 "market_values": [0, 0, 0], "depreciation": {"method": "none"}}})";

TEST(CAbiTest, Versions) {
  EXPECT_EQ(tenure_abi_version(), TENURE_ABI_VERSION);
  EXPECT_STREQ(tenure_library_version(), tenure::kVersion);
}

TEST(CAbiTest, CaseReturnsTheResultDocument) {
  char* result = nullptr;
  char* error = nullptr;
  ASSERT_EQ(tenure_case_json(kCase.c_str(), &result, &error), TENURE_OK);
  const Text owned(result);
  EXPECT_EQ(error, nullptr);
  // Closed form: EUAC(n) = 10000 (A/P, 10%, n) + 1000 falls with n: the longest life, 3 years.
  const nlohmann::json doc = nlohmann::json::parse(result);
  EXPECT_EQ(doc["challenger"]["before_tax"]["esl_years"], 3);
}

TEST(CAbiTest, BadCaseIsBadInputWithItsPath) {
  char* result = nullptr;
  char* error = nullptr;
  const std::string bad = R"({"marr": 0.10, "income_tax_rate": 0,
    "challenger": {"first_cost": -5, "operating_costs": [1000], "market_values": [0],
                   "depreciation": {"method": "none"}}})";
  EXPECT_EQ(tenure_case_json(bad.c_str(), &result, &error), TENURE_BAD_INPUT);
  const Text owned(error);
  EXPECT_EQ(result, nullptr);
  ASSERT_NE(error, nullptr);
  EXPECT_STREQ(error, "$.challenger.first_cost: must be > 0");
}

TEST(CAbiTest, NullArgumentsAreBadInputAndTheMessageIsOptional) {
  char* result = nullptr;
  char* error = nullptr;
  EXPECT_EQ(tenure_case_json(nullptr, &result, &error), TENURE_BAD_INPUT);
  const Text owned(error);
  EXPECT_STREQ(error, "case_json: must not be NULL");
  EXPECT_EQ(tenure_case_json(kCase.c_str(), nullptr, nullptr), TENURE_BAD_INPUT);
  long long run_id = 7;
  EXPECT_EQ(tenure_review_db(nullptr, nullptr, nullptr, &run_id, nullptr), TENURE_BAD_INPUT);
  EXPECT_EQ(run_id, 0);
  tenure_free(nullptr);
}

TEST(CAbiTest, ReviewRunsOnTheHostConnection) {
  const Database db = fleet_database();
  const std::string policy = fixtures::noiseless_policy();
  long long run_id = 0;
  char* error = nullptr;
  ASSERT_EQ(tenure_review_db(db.get(), policy.c_str(), fixtures::kAsOf, &run_id, &error),
            TENURE_OK)
      << error;
  EXPECT_EQ(run_id, 1);
  EXPECT_EQ(count(db.get(), "SELECT count(*) FROM tenure_latest"), 30);
  EXPECT_EQ(sqlite3_get_autocommit(db.get()), 1) << "the run left a transaction open";
}

TEST(CAbiTest, ReviewInsideTheHostTransactionGoesWithIt) {
  const Database db = fleet_database();
  const std::string policy = fixtures::noiseless_policy();
  long long run_id = 0;
  ASSERT_EQ(sqlite3_exec(db.get(), "BEGIN", nullptr, nullptr, nullptr), SQLITE_OK);
  ASSERT_EQ(tenure_review_db(db.get(), policy.c_str(), fixtures::kAsOf, &run_id, nullptr),
            TENURE_OK);
  EXPECT_EQ(sqlite3_get_autocommit(db.get()), 0) << "the host's transaction must stay open";
  ASSERT_EQ(sqlite3_exec(db.get(), "ROLLBACK", nullptr, nullptr, nullptr), SQLITE_OK);
  EXPECT_EQ(count(db.get(), "SELECT count(*) FROM sqlite_schema WHERE name = 'tenure_run'"), 0);

  ASSERT_EQ(sqlite3_exec(db.get(), "BEGIN", nullptr, nullptr, nullptr), SQLITE_OK);
  ASSERT_EQ(tenure_review_db(db.get(), policy.c_str(), fixtures::kAsOf, &run_id, nullptr),
            TENURE_OK);
  ASSERT_EQ(sqlite3_exec(db.get(), "COMMIT", nullptr, nullptr, nullptr), SQLITE_OK);
  EXPECT_EQ(count(db.get(), "SELECT count(*) FROM tenure_run"), 1);
}

TEST(CAbiTest, BadPolicyAndDateAreBadInput) {
  const Database db = fleet_database();
  long long run_id = 0;
  char* error = nullptr;
  EXPECT_EQ(tenure_review_db(db.get(), R"({"marr": 0.1})", nullptr, &run_id, &error),
            TENURE_BAD_INPUT);
  Text owned(error);
  EXPECT_STREQ(error, "$.income_tax_rate: required number is missing");
  const std::string policy = fixtures::noiseless_policy();
  EXPECT_EQ(tenure_review_db(db.get(), policy.c_str(), "2026-6-30", &run_id, &error),
            TENURE_BAD_INPUT);
  owned.reset(error);
  EXPECT_STREQ(error, "as_of: must be a date 'YYYY-MM-DD'");
  EXPECT_EQ(tenure_review_db(db.get(), nullptr, nullptr, &run_id, &error), TENURE_BAD_INPUT);
  owned.reset(error);
  EXPECT_STREQ(error, "policy: no policy given and none stored in the database (store one with "
                      "'tenure policy set')");
}

TEST(CAbiTest, ADatabaseThatCannotBeWrittenIsAFailure) {
  const Database db = fleet_database();
  ASSERT_EQ(sqlite3_exec(db.get(), "PRAGMA query_only = ON", nullptr, nullptr, nullptr),
            SQLITE_OK);
  const std::string policy = fixtures::noiseless_policy();
  long long run_id = 0;
  char* error = nullptr;
  EXPECT_EQ(tenure_review_db(db.get(), policy.c_str(), fixtures::kAsOf, &run_id, &error),
            TENURE_FAILURE);
  const Text owned(error);
  ASSERT_NE(error, nullptr);
  EXPECT_NE(std::string(error).find("readonly"), std::string::npos) << error;
  EXPECT_EQ(sqlite3_get_autocommit(db.get()), 1) << "a failed run must not leave a transaction";
}

TEST(CAbiTest, RefusesToRunInsideAStatementThatWrites) {
  const Database db = fleet_database();
  const std::string policy = fixtures::noiseless_policy();
  ASSERT_EQ(sqlite3_exec(db.get(), "CREATE TABLE log(x); INSERT INTO log VALUES (1), (2)",
                         nullptr, nullptr, nullptr),
            SQLITE_OK);
  sqlite3_stmt* writing = nullptr;
  ASSERT_EQ(sqlite3_prepare_v2(db.get(), "UPDATE log SET x = x + 1 RETURNING x", -1, &writing,
                               nullptr),
            SQLITE_OK);
  ASSERT_EQ(sqlite3_step(writing), SQLITE_ROW);  // the UPDATE is now running
  long long run_id = 0;
  char* error = nullptr;
  EXPECT_EQ(tenure_review_db(db.get(), policy.c_str(), fixtures::kAsOf, &run_id, &error),
            TENURE_BAD_INPUT);
  const Text owned(error);
  EXPECT_STREQ(error, "cannot run inside a statement that writes; call it from a SELECT");
  sqlite3_finalize(writing);
}

}  // namespace
}  // namespace tenure::plugin::testing
