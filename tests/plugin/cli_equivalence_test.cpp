// The extension does in SQL what the command does: tenure_case returns the document `tenure case`
// prints (compared as JSON values, for every case fixture), and tenure_review, run from the stock
// sqlite3 shell, leaves the same rows in every output view as `tenure review` does on a copy of
// the same invented demo database (run timestamps aside).
#include <gtest/gtest.h>

#include <algorithm>
#include <filesystem>
#include <string>
#include <vector>

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "db/connection.h"
#include "shell.h"

namespace tenure::plugin::testing {
namespace {

std::string source_path(const std::string& relative) {
  return std::string(TENURE_SOURCE_DIR) + "/" + relative;
}

std::vector<std::string> case_fixtures() {
  std::vector<std::string> files;
  for (const auto& entry : std::filesystem::directory_iterator(source_path("fixtures/cases"))) {
    if (entry.path().extension() == ".json") files.push_back(entry.path().string());
  }
  std::sort(files.begin(), files.end());
  return files;
}

TEST(CliEquivalenceTest, TenureCaseReturnsWhatTheCaseCommandPrints) {
  if (!have_sqlite3_shell()) GTEST_SKIP() << "the sqlite3 shell was not found";
  const std::vector<std::string> files = case_fixtures();
  ASSERT_FALSE(files.empty());
  for (const std::string& file : files) {
    const Output command = run(tenure_command() + " case --format json " + quoted(file));
    ASSERT_EQ(command.status, 0) << file << ": " << command.err;
    const Output sql = run(sqlite_with_tenure(":memory:") + " " +
                           quoted("SELECT tenure_case(readfile('" + file + "'));"));
    ASSERT_EQ(sql.status, 0) << file << ": " << sql.err;
    const nlohmann::json expected = nlohmann::json::parse(command.out);
    const nlohmann::json actual = nlohmann::json::parse(sql.out);
    ASSERT_TRUE(expected.contains("challenger")) << file;
    EXPECT_EQ(actual, expected) << file;
  }
}

// Every row of `sql`, each value written exactly (reals at round-trip precision).
std::vector<std::string> rows(const std::string& database, const std::string& sql) {
  db::Connection db = db::Connection::open(database);
  db::Statement query(db, sql);
  std::vector<std::string> out;
  while (query.step()) {
    std::string row;
    for (int c = 0; c < sqlite3_column_count(query.handle()); ++c) {
      switch (query.column_type(c)) {
        case SQLITE_NULL: row += "NULL"; break;
        case SQLITE_INTEGER: row += fmt::format("{}", query.integer(c)); break;
        case SQLITE_FLOAT: row += fmt::format("{}", query.real(c)); break;
        default: row += fmt::format("'{}'", query.text(c)); break;
      }
      row += "|";
    }
    out.push_back(row);
  }
  return out;
}

TEST(CliEquivalenceTest, TenureReviewLeavesTheSameViewsAsTheReviewCommand) {
  if (!have_sqlite3_shell()) GTEST_SKIP() << "the sqlite3 shell was not found";
  const TempDir dir;
  const std::string by_command = dir.path("command.db"), by_sql = dir.path("sql.db");
  const Output demo = run(tenure_command() + " demo --db " + quoted(by_command) + " --assets 80");
  ASSERT_EQ(demo.status, 0) << demo.err;
  std::filesystem::copy_file(by_command, by_sql);

  // Two runs, so that tenure_newly_due compares one run with the one before: the stored policy
  // a year back, then a policy from a file at the demo's date.
  const std::string policy = source_path("fixtures/policies/demo_policy.json");
  const Output first =
      run(tenure_command() + " review --quiet --db " + quoted(by_command) + " --as-of 2025-11-30");
  ASSERT_EQ(first.status, 0) << first.err;
  const Output second = run(tenure_command() + " review --quiet --db " + quoted(by_command) +
                            " --as-of 2026-11-30 --policy " + quoted(policy));
  ASSERT_EQ(second.status, 0) << second.err;
  const Output sql = run(
      sqlite_with_tenure(by_sql) + " " + quoted("SELECT tenure_review(NULL, '2025-11-30');") +
      " " + quoted("SELECT tenure_review(readfile('" + policy + "'), '2026-11-30');"));
  ASSERT_EQ(sql.status, 0) << sql.err;
  EXPECT_EQ(sql.out, "1\n2\n");

  const std::vector<std::string> queries = {
      "SELECT * FROM tenure_latest ORDER BY asset_id",
      "SELECT * FROM tenure_due ORDER BY asset_id",
      "SELECT * FROM tenure_newly_due ORDER BY asset_id",
      "SELECT * FROM tenure_class_latest ORDER BY asset_class",
      "SELECT run_id, source, row_ref, reason FROM tenure_rejected ORDER BY 1, 2, 3, 4",
      // tenure_run without its timestamps (started_at, finished_at).
      "SELECT run_id, as_of, policy_json, policy_sha256, rows_read, rows_rejected, status "
      "FROM tenure_run ORDER BY run_id",
  };
  for (const std::string& query : queries) {
    const std::vector<std::string> expected = rows(by_command, query);
    EXPECT_FALSE(expected.empty()) << query;
    EXPECT_EQ(rows(by_sql, query), expected) << query;
  }
}

}  // namespace
}  // namespace tenure::plugin::testing
