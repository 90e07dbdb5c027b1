// tenure_repair_check returns the document `tenure repair --format json` prints (compared as JSON
// values), on a reviewed copy of the invented demo fleet: for every asset the run did not weigh
// (retired, rejected, not yet in service) and for the first assets it did, at an estimate that
// some are worth and some are not.
#include <gtest/gtest.h>

#include <algorithm>
#include <nlohmann/json.hpp>
#include <string>
#include <vector>

#include "db/connection.h"
#include "shell.h"

namespace tenure::plugin::testing {
namespace {

std::vector<std::string> asset_ids(const std::string& database, const std::string& sql) {
  db::Connection db = db::Connection::open(database);
  db::Statement query(db, sql);
  std::vector<std::string> out;
  while (query.step()) out.emplace_back(query.text(0));
  return out;
}

TEST(RepairCheckEquivalenceTest, TheFunctionReturnsWhatTheCommandPrints) {
  if (!have_sqlite3_shell()) GTEST_SKIP() << "the sqlite3 shell was not found";
  const TempDir dir;
  const std::string database = dir.path("demo.db");
  const Output demo = run(tenure_command() + " demo --db " + quoted(database) + " --assets 80");
  ASSERT_EQ(demo.status, 0) << demo.err;
  const Output review =
      run(tenure_command() + " review --quiet --db " + quoted(database) + " --as-of 2026-11-30");
  ASSERT_EQ(review.status, 0) << review.err;

  std::vector<std::string> assets =
      asset_ids(database,
                "SELECT asset_id FROM asset WHERE asset_id NOT IN (SELECT asset_id FROM "
                "tenure_latest) ORDER BY asset_id");
  ASSERT_FALSE(assets.empty());
  for (const std::string& id :
       asset_ids(database, "SELECT asset_id FROM tenure_latest ORDER BY asset_id LIMIT 12")) {
    assets.push_back(id);
  }
  std::vector<std::string> verdicts;
  for (const std::string& asset : assets) {
    SCOPED_TRACE(asset);
    const Output command = run(tenure_command() + " repair --format json --db " + quoted(database) +
                               " " + quoted(asset) + " --estimate 1500");
    ASSERT_EQ(command.status, 0) << command.err;
    const Output sql = run(sqlite_with_tenure(database) + " " +
                           quoted("SELECT tenure_repair_check('" + asset + "', 1500);"));
    ASSERT_EQ(sql.status, 0) << sql.err;
    const nlohmann::json expected = nlohmann::json::parse(command.out);
    EXPECT_EQ(nlohmann::json::parse(sql.out), expected);
    verdicts.push_back(expected.at("verdict"));
  }
  for (const char* verdict : {"repair", "replace", "not_weighed"}) {
    EXPECT_NE(std::find(verdicts.begin(), verdicts.end(), verdict), verdicts.end()) << verdict;
  }
}

}  // namespace
}  // namespace tenure::plugin::testing
