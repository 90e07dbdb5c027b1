// Bad policies through the `tenure` command as a user meets them (tests/formats/
// policy_refusals_test.cpp has every kind against the reader): exit 2 and one line naming the
// JSON path and the rule, for `policy check`, `policy set` and `review --policy`; nothing is
// stored or written, and a source that looks like SQL never reaches the database.
#include <gtest/gtest.h>

#include <string>

#include <nlohmann/json.hpp>

#include "run_tenure.h"

namespace tenure::cli::testing {
namespace {

// An invented policy whose `costs` source tries to smuggle SQL in.
const char* const kSqlInSources = R"({"marr": 0.1, "income_tax_rate": 0.25,
  "sources": {"costs": "cost_event; DROP TABLE asset; --"},
  "classes": {"pump-centrifugal": {"challenger_first_cost": 21000, "max_life_years": 25,
    "depreciation": {"method": "macrs", "recovery_years": 7},
    "market_value": {"annual_decline": 0.12}}}})";

const char* const kSourceMessage =
    "$.sources.costs: must be a plain SQL identifier (letters, digits and _, not starting with a "
    "digit); map other names with a CREATE VIEW\n";

class PolicyRefusals : public ::testing::Test {
 protected:
  void SetUp() override {
    const cli::testing::Run demo = run_tenure({"demo", "--db", db, "--assets", "30", "--events", "1500"});
    ASSERT_EQ(demo.exit_code, 0) << demo.err;
  }
  TempDir dir;
  std::string db = dir.path("fleet.db");
};

TEST_F(PolicyRefusals, SqlInSourcesIsExitTwoEverywhere) {
  const std::string policy = dir.write("bad.json", kSqlInSources);
  const cli::testing::Run check = run_tenure({"policy", "check", policy});
  EXPECT_EQ(check.exit_code, 2);
  EXPECT_EQ(check.err, std::string("tenure policy check: ") + kSourceMessage);

  const cli::testing::Run set = run_tenure({"policy", "set", "--db", db, policy});
  EXPECT_EQ(set.exit_code, 2);
  EXPECT_EQ(set.err, std::string("tenure policy set: ") + kSourceMessage);

  const cli::testing::Run review = run_tenure({"review", "--db", db, "--policy", policy, "--as-of", "2026-06-30"});
  EXPECT_EQ(review.exit_code, 2);
  EXPECT_EQ(review.err, std::string("tenure review: ") + kSourceMessage);

  // The stored policy is still the demo's, and a review with it finds the asset table whole.
  const cli::testing::Run shown = run_tenure({"policy", "show", "--db", db});
  ASSERT_EQ(shown.exit_code, 0) << shown.err;
  EXPECT_EQ(shown.out.find("DROP TABLE"), std::string::npos);
  const cli::testing::Run good = run_tenure({"review", "--db", db, "--as-of", "2026-06-30", "--format", "json"});
  EXPECT_EQ(good.exit_code, 0) << good.err;
  EXPECT_GT(nlohmann::json::parse(good.out).at("assets_reviewed").get<int>(), 0) << good.out;
}

TEST_F(PolicyRefusals, UnknownKeyAndOutOfRangeRateNameTheirPaths) {
  const std::string typo = dir.write("typo.json", R"({"marr": 0.1, "income_tax_rate": 0.25,
    "clases": {}})");
  const cli::testing::Run a = run_tenure({"review", "--db", db, "--policy", typo});
  EXPECT_EQ(a.exit_code, 2);
  EXPECT_EQ(a.err, "tenure review: $.clases: unknown key (expected one of marr, income_tax_rate, "
                   "after_tax_marr, capital_gains_tax_rate, cost_escalation, lead_time_years, "
                   "review_margin, esl_band, sources, classes, detail)\n");
  const std::string rate = dir.write("rate.json", R"({"marr": 12, "income_tax_rate": 0.25,
    "classes": {}})");
  const cli::testing::Run b = run_tenure({"policy", "check", rate});
  EXPECT_EQ(b.exit_code, 2);
  EXPECT_EQ(b.err, "tenure policy check: $.marr: must be <= 1 (100% a year)\n");
}

}  // namespace
}  // namespace tenure::cli::testing
