// `tenure demo`, `tenure review` and `tenure policy` as a user runs them: exit codes (0 done,
// 1 failure, 2 bad input), the one-line error messages, the JSON summary, and the stored policy.
#include <gtest/gtest.h>

#include <cstdio>
#include <filesystem>
#include <regex>

#include <nlohmann/json.hpp>

#include "run_tenure.h"

namespace tenure::cli::testing {
namespace {

// The output of a shell command line.
Run run_local_date(const std::string& command) {
  std::string out;
  if (FILE* pipe = ::popen(command.c_str(), "r")) {
    char buffer[64];
    while (std::fgets(buffer, sizeof buffer, pipe) != nullptr) out += buffer;
    ::pclose(pipe);
  }
  return {0, out, ""};
}

class ReviewCommand : public ::testing::Test {
 protected:
  void SetUp() override {
    const cli::testing::Run demo = run_tenure({"demo", "--db", db, "--assets", "120", "--events", "12000"});
    ASSERT_EQ(demo.exit_code, 0) << demo.err;
  }
  TempDir dir;
  std::string db = dir.path("fleet.db");
};

TEST_F(ReviewCommand, ReviewsTheDemoFleetAndSummarisesAsJson) {
  const cli::testing::Run r = run_tenure({"review", "--db", db, "--as-of", "2026-11-30", "--format", "json"});
  ASSERT_EQ(r.exit_code, 0) << r.err;
  const auto summary = nlohmann::json::parse(r.out);
  EXPECT_EQ(summary.at("run_id"), 1);
  EXPECT_EQ(summary.at("as_of"), "2026-11-30");
  EXPECT_EQ(summary.at("basis"), "after_tax");
  EXPECT_EQ(summary.at("money"), "real");
  EXPECT_GT(summary.at("rows_rejected").get<int>(), 0);  // the demo's bad rows
  EXPECT_EQ(summary.at("keep").get<int>() + summary.at("review").get<int>() +
                summary.at("replace").get<int>(),
            summary.at("assets_reviewed").get<int>());
  EXPECT_EQ(summary.at("newly_due"), summary.at("due"));  // the first run: all due is new
}

TEST_F(ReviewCommand, TextSummaryEndsWithTheCaution) {
  const cli::testing::Run r =
      run_tenure({"review", "--db", db, "--as-of", "2026-11-30", "--format", "text"});
  ASSERT_EQ(r.exit_code, 0) << r.err;
  EXPECT_NE(r.out.find("newly due"), std::string::npos);
  EXPECT_NE(r.out.find("not tax, accounting or legal advice"), std::string::npos);
}

// Not a terminal (a cron job's log) or -q: one line per run, with a local timestamp, the run
// and its counts; the same counts as the JSON summary of the next run.
TEST_F(ReviewCommand, ALogGetsOneLinePerRun) {
  const std::regex line(
      R"(^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d[+-]\d{4} tenure review: run (\d+) as of 2026-11-30, )"
      R"((\d+) assets reviewed \(keep (\d+), review (\d+), replace (\d+)\), due (\d+), )"
      R"(newly due (\d+), (\d+) of (\d+) rows rejected, \d+\.\d\d s\n$)");
  const cli::testing::Run piped = run_tenure({"review", "--db", db, "--as-of", "2026-11-30"});
  const cli::testing::Run quiet = run_tenure({"review", "--db", db, "--as-of", "2026-11-30", "-q"});
  const cli::testing::Run json =
      run_tenure({"review", "--db", db, "--as-of", "2026-11-30", "--format", "json"});
  ASSERT_EQ(quiet.exit_code, 0) << quiet.err;
  std::smatch m;
  ASSERT_TRUE(std::regex_match(piped.out, m, line)) << piped.out;
  EXPECT_EQ(m[1], "1");
  ASSERT_TRUE(std::regex_match(quiet.out, m, line)) << quiet.out;
  EXPECT_EQ(m[1], "2");
  const auto s = nlohmann::json::parse(json.out);
  EXPECT_EQ(m[2], std::to_string(s.at("assets_reviewed").get<int>()));
  EXPECT_EQ(m[3], std::to_string(s.at("keep").get<int>()));
  EXPECT_EQ(m[6], std::to_string(s.at("due").get<int>()));
  EXPECT_EQ(m[8], std::to_string(s.at("rows_rejected").get<int>()));
  EXPECT_EQ(m[9], std::to_string(s.at("rows_read").get<int>()));
  EXPECT_EQ(quiet.err, "");
  const cli::testing::Run both =
      run_tenure({"review", "--db", db, "-q", "--format", "json"});
  EXPECT_EQ(both.exit_code, 2);
  EXPECT_EQ(both.err,
            "tenure review: --format: cannot be given with --quiet (see 'tenure review --help')\n");
}

// With no --as-of, the review is as of the local date: a site at UTC+14 is a day ahead of UTC
// for ten hours of every day, and at UTC-12 a day behind for twelve.
TEST_F(ReviewCommand, TodayIsTheLocalDate) {
  for (const char* zone : {"EAST-14", "WEST+12"}) {  // POSIX TZ strings: no zone files needed
    const cli::testing::Run r = run_tenure({"review", "--db", db, "--format", "json"}, "",
                                           std::string("TZ=") + zone + "; export TZ; ");
    ASSERT_EQ(r.exit_code, 0) << r.err;
    const cli::testing::Run date =
        run_local_date(std::string("TZ=") + zone + " date +%Y-%m-%d");
    EXPECT_EQ(nlohmann::json::parse(r.out).at("as_of").get<std::string>() + "\n", date.out)
        << zone;
  }
}

// TENURE_DB stands in for --db; --db still wins.
TEST_F(ReviewCommand, TheDatabaseMayComeFromTenureDb) {
  const std::string env = std::string("TENURE_DB=") + testing::quoted(db) + "; export TENURE_DB; ";
  const cli::testing::Run r = run_tenure({"due", "--format", "csv"}, "", env);
  EXPECT_EQ(r.exit_code, 2);  // the demo database, which has no run yet
  EXPECT_EQ(r.err, "tenure due: --db: no review run in this database (run 'tenure review' "
                   "first)\n");
  EXPECT_EQ(run_tenure({"due"}).err, "tenure due: --db: is required (see 'tenure due --help')\n");
  const cli::testing::Run other =
      run_tenure({"due", "--db", dir.path("missing.db")}, "", env);
  EXPECT_NE(other.err.find("missing.db"), std::string::npos) << other.err;
}

TEST_F(ReviewCommand, BadPolicyFileIsExitTwoNamingTheJsonPath) {
  const std::string policy = dir.write("bad.json", R"({"marr": 0.1, "income_tax_rate": 1.5, "classes": {}})");
  const cli::testing::Run r = run_tenure({"review", "--db", db, "--policy", policy});
  EXPECT_EQ(r.exit_code, 2);
  EXPECT_EQ(r.err, "tenure review: $.income_tax_rate: must be in [0, 0.99]\n");
}

TEST_F(ReviewCommand, BadAsOfDateIsExitTwo) {
  const cli::testing::Run r = run_tenure({"review", "--db", db, "--as-of", "2026-02-30"});
  EXPECT_EQ(r.exit_code, 2);
  EXPECT_EQ(r.err, "tenure review: --as-of: '2026-02-30' is not a valid date (YYYY-MM-DD)\n");
}

TEST_F(ReviewCommand, EmptyOptionValuesAreRefusedNotTakenForTheDefault) {
  const cli::testing::Run as_of = run_tenure({"review", "--db", db, "--as-of", ""});
  EXPECT_EQ(as_of.exit_code, 2);
  EXPECT_EQ(as_of.err, "tenure review: --as-of: '' is not a valid date (YYYY-MM-DD)\n");
  const cli::testing::Run policy = run_tenure({"review", "--db", db, "--policy", ""});
  EXPECT_EQ(policy.exit_code, 2);
  EXPECT_EQ(policy.err,
            "tenure review: --policy: must not be empty: give a policy file, - for standard "
            "input, or leave it out for the policy stored in the database\n");
}

TEST_F(ReviewCommand, AFileThatIsNotADatabaseIsExitTwoNamingIt) {
  // An empty file is an empty database (exit 2: no policy); one of other bytes is not one.
  const std::string junk = dir.write("junk.db", std::string(4096, 'x'));
  const cli::testing::Run r = run_tenure({"review", "--db", junk});
  EXPECT_EQ(r.exit_code, 2);
  EXPECT_EQ(r.err, "tenure review: --db: '" + junk + "' is not a SQLite database\n");
}

TEST_F(ReviewCommand, MissingDatabaseFileIsExitTwo) {
  const cli::testing::Run r = run_tenure({"review", "--db", dir.path("nowhere.db")});
  EXPECT_EQ(r.exit_code, 2);
  EXPECT_NE(r.err.find("--db: no database file"), std::string::npos) << r.err;
  EXPECT_FALSE(std::filesystem::exists(dir.path("nowhere.db")));
}

TEST_F(ReviewCommand, ReadOnlyDatabaseIsExitOneAndChangesNothing) {
  std::filesystem::permissions(db, std::filesystem::perms::owner_read | std::filesystem::perms::group_read);
  const std::string before = slurp(db);
  // As root the file mode does not stop writes, so open it read-only through SQLite's URI.
  const cli::testing::Run r = run_tenure({"review", "--db", "file:" + db + "?mode=ro", "--as-of", "2026-11-30"});
  EXPECT_EQ(r.exit_code, 1) << r.out;
  EXPECT_NE(r.err.find("tenure review: "), std::string::npos);
  EXPECT_EQ(slurp(db), before);
}

TEST_F(ReviewCommand, PolicySetShowAndCheck) {
  const std::string policy = dir.write("p.json",
      "// invented\n{\"marr\": 0.08, \"income_tax_rate\": 0,\n \"classes\": {\"van-service\": {"
      "\"challenger_first_cost\": 40000, \"max_life_years\": 12,"
      "\"depreciation\": {\"method\": \"none\"}, \"market_value\": {\"annual_decline\": 0.2}}}}\n");
  EXPECT_EQ(run_tenure({"policy", "check", policy}).exit_code, 0);
  const cli::testing::Run set = run_tenure({"policy", "set", "--db", db, policy});
  ASSERT_EQ(set.exit_code, 0) << set.err;
  EXPECT_EQ(set.out, "stored policy 2 in " + db + "\n");  // the demo stored policy 1
  // show names it in a comment line, so that what it prints is still a policy file ...
  const cli::testing::Run show = run_tenure({"policy", "show", "--db", db});
  const std::regex header(R"(^// policy 2, stored \d{4}-\d\d-\d\dT\d\d:\d\d:\d\dZ\n)");
  EXPECT_TRUE(std::regex_search(show.out, header)) << show.out;
  EXPECT_EQ(show.out.substr(show.out.find('\n') + 1), slurp(policy));
  // ... and storing it again, or the same values laid out otherwise, stores nothing.
  const std::string shown = dir.write("shown.json", show.out);
  const std::string relaid = dir.write("relaid.json",
      "{\"classes\": {\"van-service\": {\"max_life_years\": 12, \"challenger_first_cost\": 40000,"
      "\"market_value\": {\"annual_decline\": 0.2}, \"depreciation\": {\"method\": \"none\"}}},"
      " \"income_tax_rate\": 0, \"marr\": 0.08}");
  for (const std::string& file : {policy, shown, relaid}) {
    const cli::testing::Run again = run_tenure({"policy", "set", "--db", db, file});
    EXPECT_EQ(again.exit_code, 0) << again.err;
    EXPECT_TRUE(std::regex_match(
        again.out, std::regex("policy 2 in " + db + R"( \(stored [0-9T:Z-]+\) already has )"
                              R"(these values: nothing stored\n)")))
        << again.out;
  }
  // The stored policy has no class for most demo assets: they are rejected, the run goes on.
  const cli::testing::Run r = run_tenure({"review", "--db", db, "--as-of", "2026-11-30", "--format", "json"});
  ASSERT_EQ(r.exit_code, 0) << r.err;
  EXPECT_EQ(nlohmann::json::parse(r.out).at("basis"), "before_tax");
  const std::string bad = dir.write("typo.json", R"({"marr": 0.08, "income_tax_rat": 0, "classes": {}})");
  const cli::testing::Run refused = run_tenure({"policy", "set", "--db", db, bad});
  EXPECT_EQ(refused.exit_code, 2);
  EXPECT_NE(refused.err.find("$.income_tax_rat: unknown key"), std::string::npos) << refused.err;
}

}  // namespace
}  // namespace tenure::cli::testing
