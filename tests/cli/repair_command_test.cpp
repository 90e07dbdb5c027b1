// `tenure repair` as a user runs it at the counter, on a stored run of the noiseless fixture fleet
// (fixtures/fleets, invented): the limit it prints is the run's stored repair_limit (itself checked
// against the case analysis in tests/db/review_run_test.cpp), repair at the limit and replace a
// cent above it; the text has the verdict word, the limit, k* after repairing, the reason and
// the caution last; the JSON has exactly its keys; an asset the run did not weigh is an answer
// (exit 0); an unknown asset and a bad estimate exit 2, a database that is not one exits 1, each
// with its one-line message.
#include <fmt/format.h>
#include <gtest/gtest.h>

#include <nlohmann/json.hpp>
#include <set>

#include "app/review_run.h"
#include "db/connection.h"
#include "fixtures/fleets/fixture_fleets.h"
#include "formats/caution.h"
#include "formats/text_table.h"
#include "run_tenure.h"

namespace tenure::cli {
namespace {

using testing::run_tenure;
using testing::TempDir;

class RepairCommand : public ::testing::Test {
 protected:
  void SetUp() override {
    db::Connection db = db::Connection::open(path, true);
    fixtures::create_input_tables(db.handle());
    fixtures::add_noiseless_fleet(db.handle());
    db.exec(
        "INSERT INTO asset VALUES ('PF-RET', 'pump-fixture', '2024-01-15', 18000, "
        "'2025-04-30');"
        "INSERT INTO cost_event VALUES ('PF-RET', '2024-07-15', 1000, 'repair');");
    app::run_review(db, {fixtures::noiseless_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
  }
  // The stored figure of the run, from the view.
  double stored(const std::string& column, const std::string& asset) {
    db::Connection db = db::Connection::open(path);
    db::Statement q(db, "SELECT " + column + " FROM tenure_latest WHERE asset_id = ?1");
    q.bind(1, asset);
    EXPECT_TRUE(q.step());
    return q.real(0);
  }
  nlohmann::json repair_json(const std::string& asset, const std::string& estimate) {
    const testing::Run r =
        run_tenure({"repair", "--db", path, asset, "--estimate", estimate, "--format", "json"});
    EXPECT_EQ(r.exit_code, 0) << r.err;
    EXPECT_EQ(r.err, "");
    return nlohmann::json::parse(r.out);
  }
  TempDir dir;
  std::string path = dir.path("fleet.db");
};

TEST_F(RepairCommand, RepairsUpToTheStoredLimitAndReplacesAboveIt) {
  const double limit = stored("repair_limit", "PF-010");
  ASSERT_GT(limit, 0);
  const nlohmann::json at = repair_json("PF-010", fmt::format("{:.17g}", limit));
  EXPECT_EQ(at.at("verdict"), "repair");
  EXPECT_EQ(at.at("repair_limit").get<double>(), limit);
  EXPECT_EQ(at.at("replace_after_years"), stored("replace_after_years", "PF-010"));
  EXPECT_EQ(at.at("replace_after_years_if_repaired"), stored("replace_after_years", "PF-010"));
  const nlohmann::json above = repair_json("PF-010", fmt::format("{:.17g}", limit + 0.01));
  EXPECT_EQ(above.at("verdict"), "replace");
  EXPECT_EQ(above.at("replace_after_years_if_repaired"), 0);
}

TEST_F(RepairCommand, JsonHasExactlyItsKeys) {
  const nlohmann::json doc = repair_json("PF-010", "500");
  std::set<std::string> keys;
  for (const auto& [key, value] : doc.items()) keys.insert(key);
  EXPECT_EQ(keys,
            (std::set<std::string>{
                "asset_id", "asset_class", "run_id", "as_of", "basis", "estimate", "verdict",
                "not_weighed", "repair_limit", "repair_deduction_factor", "estimate_net_cost",
                "replace_after_years", "replace_after_years_if_repaired", "reason", "caution"}));
  EXPECT_EQ(doc.at("asset_id"), "PF-010");
  EXPECT_EQ(doc.at("asset_class"), "pump-fixture");
  EXPECT_EQ(doc.at("run_id"), 1);
  EXPECT_EQ(doc.at("as_of"), fixtures::kAsOf);
  EXPECT_EQ(doc.at("basis"), "after_tax");
  EXPECT_EQ(doc.at("estimate"), 500);
  EXPECT_EQ(doc.at("not_weighed"), nullptr);
  EXPECT_EQ(doc.at("caution"), std::string(formats::kCaution));
  // By hand: 1 - t (P/F, 7.5%, 1) = 1 - 0.25 / 1.075 (the fixture policy: marr 0.10, t 0.25).
  EXPECT_NEAR(doc.at("repair_deduction_factor").get<double>(), 1 - 0.25 / 1.075, 1e-15);
  EXPECT_NEAR(doc.at("estimate_net_cost").get<double>(), 500 * (1 - 0.25 / 1.075), 1e-12);
}

TEST_F(RepairCommand, TextIsAFewLinesForTheCounterEndingWithTheCaution) {
  const double limit = stored("repair_limit", "PF-010");
  const int years = static_cast<int>(stored("replace_after_years", "PF-010"));
  const testing::Run r = run_tenure({"repair", "--db", path, "PF-010", "--estimate", "100"});
  ASSERT_EQ(r.exit_code, 0) << r.err;
  EXPECT_EQ(r.err, "");
  const std::string expected_head = fmt::format(
      "REPAIR  asset PF-010 (class pump-fixture), run 1 as of 2026-06-30, after-tax basis\n"
      "  repair limit      {}\n"
      "  estimate          100.00 ({:.2f} net of its tax deduction, in present worth)\n"
      "  after repairing   keep it {} years more, then replace (k* = {})\n"
      "Repair: the estimate of 100.00 is within the repair limit of {} on an after-tax basis; "
      "repaired, keeping it {} years more and then replacing it is cheapest.\n\n",
      formats::money(limit), 100 * (1 - 0.25 / 1.075), years, years, formats::money(limit), years);
  EXPECT_EQ(r.out, expected_head + std::string(formats::kCaution) + "\n");
}

TEST_F(RepairCommand, ReplaceShowsTheWordAndNoYearsAfterRepairing) {
  const double limit = stored("repair_limit", "PF-010");
  const testing::Run r = run_tenure(
      {"repair", "--db", path, "PF-010", "--estimate", fmt::format("{:.2f}", limit + 1)});
  ASSERT_EQ(r.exit_code, 0) << r.err;
  EXPECT_EQ(r.out.rfind("REPLACE  asset PF-010 (class pump-fixture), run 1 as of 2026-06-30", 0),
            0u)
      << r.out;
  EXPECT_NE(r.out.find("  after repairing   replacing it now costs less (k* = 0)\n"),
            std::string::npos)
      << r.out;
}

TEST_F(RepairCommand, AnAssetTheRunDidNotWeighIsAnAnswerSayingWhy) {
  const testing::Run r = run_tenure({"repair", "--db", path, "PF-RET", "--estimate", "300"});
  EXPECT_EQ(r.exit_code, 0) << r.err;
  EXPECT_EQ(r.out.rfind("NOT WEIGHED  asset PF-RET, run 1 as of 2026-06-30\n"
                        "asset 'PF-RET' was retired on 2025-04-30: there is nothing to repair\n",
                        0),
            0u)
      << r.out;
  const nlohmann::json doc = repair_json("PF-RET", "300");
  EXPECT_EQ(doc.at("verdict"), "not_weighed");
  EXPECT_EQ(doc.at("not_weighed"), "retired");
  EXPECT_EQ(doc.at("repair_limit"), nullptr);
  EXPECT_EQ(doc.at("replace_after_years_if_repaired"), nullptr);
}

TEST_F(RepairCommand, BadInputExitsTwoNamingIt) {
  const auto expect_refused = [&](std::initializer_list<std::string> args,
                                  const std::string& message) {
    const testing::Run r = run_tenure(args);
    EXPECT_EQ(r.exit_code, 2) << message;
    EXPECT_EQ(r.err, message + "\n");
    EXPECT_EQ(r.out, "");
  };
  expect_refused({"repair", "--db", path, "PF-999", "--estimate", "300"},
                 "tenure repair: ASSET: no asset 'PF-999' in the asset relation");
  for (const char* bad : {"-1", "1e16", "nan", "inf"}) {
    expect_refused({"repair", "--db", path, "PF-010", "--estimate", bad},
                   "tenure repair: --estimate: must be a finite amount >= 0 and at most 1e15");
  }
  expect_refused({"repair", "--db", path, "PF-010", "--estimate", "300", "--run", "9"},
                 "tenure repair: --run: no successful run 9");
  expect_refused({"repair", "--db", dir.path("none.db"), "PF-010", "--estimate", "300"},
                 fmt::format("tenure repair: --db: no database file '{}'", dir.path("none.db")));
  const testing::Run missing = run_tenure({"repair", "--db", path, "PF-010"});
  EXPECT_EQ(missing.exit_code, 2);
  EXPECT_NE(missing.err.find("--estimate"), std::string::npos) << missing.err;
}

TEST_F(RepairCommand, AFileThatIsNotADatabaseIsBadInputNamingIt) {
  const std::string junk = dir.write("junk.db", std::string(4096, 'x'));
  const testing::Run r = run_tenure({"repair", "--db", junk, "PF-010", "--estimate", "300"});
  EXPECT_EQ(r.exit_code, 2) << r.err;
  EXPECT_EQ(r.err, "tenure repair: --db: '" + junk + "' is not a SQLite database\n");
  EXPECT_EQ(r.out, "");
}

TEST_F(RepairCommand, HelpHasExamplesOnTheDemoFleet) {
  const testing::Run r = run_tenure({"repair", "--help"});
  EXPECT_EQ(r.exit_code, 0);
  EXPECT_NE(r.out.find("tenure repair --db demo.db FLT-00137 --estimate 2500"), std::string::npos)
      << r.out;
}

}  // namespace
}  // namespace tenure::cli
