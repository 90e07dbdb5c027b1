// `tenure review --scenario NAME` as a user runs it, on the invented noiseless fixture fleet
// (fixtures/fleets): a bad name is exit 2 with the rule it broke and writes nothing; a what-if run
// says in its summary that it is one and that the nightly views ignore it, and they do; `tenure
// explain` and `tenure report` read the latest baseline run by default (not a later what-if run,
// not a back-dated baseline run) and name a what-if run as one when it is asked for by --run.
#include <gtest/gtest.h>

#include <nlohmann/json.hpp>
#include <string>

#include "app/review_run.h"
#include "db/connection.h"
#include "fixtures/fleets/fixture_fleets.h"
#include "run_tenure.h"

namespace tenure::cli {
namespace {

using testing::run_tenure;
using testing::slurp;
using testing::TempDir;

// The fixture policy with a lead time of 3 years instead of the default 1.
std::string lead_time_3_policy() {
  std::string policy = fixtures::noiseless_policy();
  policy.insert(policy.find("\"review_margin\""), "\"lead_time_years\": 3, ");
  return policy;
}

class WhatIfRuns : public ::testing::Test {
 protected:
  void SetUp() override {
    db::Connection db = db::Connection::open(path, true);
    fixtures::create_input_tables(db.handle());
    fixtures::add_noiseless_fleet(db.handle());
  }
  // A baseline run with the fixture policy.
  testing::Run nightly(const std::string& as_of) {
    return run_tenure(
        {"review", "--db", path, "--policy", baseline, "--as-of", as_of, "--format", "text"});
  }
  testing::Run what_if(const std::string& as_of, const std::string& name,
                       const std::string& format = "text") {
    return run_tenure({"review", "--db", path, "--policy", lead_3, "--as-of", as_of, "--scenario",
                       name, "--format", format});
  }
  std::int64_t integer(const std::string& sql) {
    db::Connection db = db::Connection::open(path);
    db::Statement q(db, sql);
    EXPECT_TRUE(q.step()) << sql;
    return q.integer(0);
  }
  TempDir dir;
  std::string path = dir.path("fleet.db");
  std::string baseline = dir.write("baseline.json", fixtures::noiseless_policy());
  std::string lead_3 = dir.write("lead-3.json", lead_time_3_policy());
};

TEST_F(WhatIfRuns, BadNamesAreExitTwoWithTheRuleAndWriteNothing) {
  ASSERT_EQ(nightly(fixtures::kAsOf).exit_code, 0);
  const std::string before = slurp(path);
  const struct {
    std::string name, message;
  } cases[] = {
      {"", "must not be empty (a name of letters, digits, '-', '_' and '.')"},
      {"next year", "may hold only letters, digits, '-', '_' and '.' (character 5 is not one)"},
      {"price/up", "may hold only letters, digits, '-', '_' and '.' (character 6 is not one)"},
      {"x'; DROP TABLE asset; --",
       "may hold only letters, digits, '-', '_' and '.' (character 2 is not one)"},
      {"co\xC3\xBBt",
       "may hold only letters, digits, '-', '_' and '.' (character 3 is not one)"},  // UTF-8
      {std::string(65, 'a'), "must be at most 64 characters (it has 65)"},
  };
  for (const auto& c : cases) {
    SCOPED_TRACE(c.name);
    const testing::Run r = what_if(fixtures::kAsOf, c.name);
    EXPECT_EQ(r.exit_code, 2);
    EXPECT_EQ(r.err, "tenure review: --scenario: " + c.message + "\n");
    EXPECT_EQ(r.out, "");
  }
  EXPECT_EQ(slurp(path), before);
}

TEST_F(WhatIfRuns, AWhatIfRunSaysSoAndTheNightlyViewsStayOnTheBaseline) {
  const testing::Run first = nightly(fixtures::kAsOf);
  ASSERT_EQ(first.exit_code, 0) << first.err;
  EXPECT_EQ(first.out.find("what-if"), std::string::npos);
  EXPECT_NE(first.out.find("See the views tenure_latest, tenure_due"), std::string::npos);

  const testing::Run lead = what_if(fixtures::kAsOf, "lead-3");
  ASSERT_EQ(lead.exit_code, 0) << lead.err;
  EXPECT_NE(lead.out.find("lead-3 (a what-if run: the nightly views ignore it)"), std::string::npos)
      << lead.out;
  EXPECT_NE(lead.out.find(" (not due in the latest baseline run)"), std::string::npos);
  EXPECT_NE(
      lead.out.find("This is a what-if run (scenario 'lead-3'): the nightly views tenure_latest, "
                    "tenure_due,\ntenure_newly_due and tenure_class_latest ignore it"),
      std::string::npos)
      << lead.out;
  EXPECT_NE(lead.out.find("not tax, accounting or legal advice"), std::string::npos);

  // The longest name allowed (64 characters, every kind of character), as JSON.
  const std::string longest = "Q4.budget_2027-" + std::string(49, 'x');
  ASSERT_EQ(longest.size(), 64u);
  const testing::Run json = what_if(fixtures::kAsOf, longest, "json");
  ASSERT_EQ(json.exit_code, 0) << json.err;
  const auto summary = nlohmann::json::parse(json.out);
  EXPECT_EQ(summary.at("scenario"), longest);
  EXPECT_EQ(summary.at("run_id"), 3);
  // Its newly due are the assets the longer lead time made due (SPEC 6, verdict rule (3)): kept
  // by the baseline with 2 <= k* <= 3.
  EXPECT_EQ(summary.at("newly_due").get<std::int64_t>(),
            integer("SELECT count(*) FROM tenure_latest WHERE verdict = 'keep' AND "
                    "replace_after_years BETWEEN 2 AND 3"));
  EXPECT_GT(summary.at("newly_due").get<std::int64_t>(), 0);

  EXPECT_EQ(integer("SELECT count(*) FROM tenure_latest WHERE run_id <> 1"), 0);
  EXPECT_EQ(integer("SELECT count(*) FROM tenure_latest"), 30);
  EXPECT_EQ(integer("SELECT count(*) FROM tenure_scenario_diff"), 2 * 30);
}

TEST_F(WhatIfRuns, ExplainAndReportReadTheLatestBaselineRunByDefault) {
  ASSERT_EQ(nightly(fixtures::kAsOf).exit_code, 0);            // run 1
  ASSERT_EQ(what_if(fixtures::kAsOf, "lead-3").exit_code, 0);  // run 2
  ASSERT_EQ(nightly("2025-06-30").exit_code, 0);               // run 3
  // PF-012 is kept with k* = 2 in the baseline and under review with the longer lead time.
  const testing::Run e = run_tenure({"explain", "--db", path, "PF-012", "--format", "json"});
  ASSERT_EQ(e.exit_code, 0) << e.err;
  const auto doc = nlohmann::json::parse(e.out);
  EXPECT_EQ(doc.at("run").at("run_id"), 1);
  EXPECT_EQ(doc.at("run").at("as_of"), fixtures::kAsOf);
  EXPECT_TRUE(doc.at("run").at("scenario").is_null());
  EXPECT_EQ(doc.at("verdict").at("verdict"), "keep");
  const testing::Run e2 =
      run_tenure({"explain", "--db", path, "PF-012", "--run", "2", "--format", "json"});
  ASSERT_EQ(e2.exit_code, 0) << e2.err;
  EXPECT_EQ(nlohmann::json::parse(e2.out).at("verdict").at("verdict"), "review");
  EXPECT_EQ(nlohmann::json::parse(e2.out).at("run").at("scenario"), "lead-3");
  const testing::Run text = run_tenure({"explain", "--db", path, "PF-012"});
  ASSERT_EQ(text.exit_code, 0) << text.err;
  EXPECT_EQ(text.out.rfind(
                "tenure explain: asset PF-012 (class pump-fixture), run 1 as of 2026-06-30\n", 0),
            0u);
  const testing::Run named = run_tenure({"explain", "--db", path, "PF-012", "--run", "2"});
  ASSERT_EQ(named.exit_code, 0) << named.err;
  EXPECT_EQ(
      named.out.rfind("tenure explain: asset PF-012 (class pump-fixture), what-if run 2 'lead-3' "
                      "as of 2026-06-30\n",
                      0),
      0u);

  const std::string page = dir.path("review.html");
  ASSERT_EQ(run_tenure({"report", "--db", path, "--out", page}).exit_code, 0);
  EXPECT_NE(slurp(page).find("<title>Equipment replacement review, run 1 as of 2026-06-30</title>"),
            std::string::npos);
  const std::string what_if_page = dir.path("what-if.html");
  ASSERT_EQ(run_tenure({"report", "--db", path, "--out", what_if_page, "--run", "2"}).exit_code, 0);
  EXPECT_NE(slurp(what_if_page).find("<title>Equipment replacement review, what-if run 2"),
            std::string::npos);
}

}  // namespace
}  // namespace tenure::cli
