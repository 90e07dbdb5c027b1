// `tenure due` as a user runs it. On invented stored runs written row by row
// (tests/support/stored_runs.h), with every expected value worked out by hand: the table in the
// morning-list order with the caution last, the CSV byte for byte against RFC 4180 (a reason
// holding a comma, a double quote and a line break), the JSON's shape and nulls (and U+FFFD,
// Unicode's replacement character, for stored text that is not UTF-8), --newly and --class, an
// empty list (a clear line, exit 0), and each refusal with its exact message and exit code 2.
// On the demo fleet: the due list agrees with the review's own counts of due and newly due, and
// the help's examples run as printed.
#include <gtest/gtest.h>

#include <nlohmann/json.hpp>

#include "../support/stored_runs.h"
#include "formats/caution.h"
#include "run_tenure.h"

namespace tenure::cli {
namespace {

using review::Verdict;
using test_support::add_stored_run;
using test_support::due_asset;
using testing::run_tenure;
using testing::TempDir;

results::AssetRow with_figures(results::AssetRow row, Years age, Years replace_after,
                               Money early_cost, Money repair_limit, Money break_even_price,
                               bool close_call) {
  row.age_years = age;
  row.replace_after_years = replace_after;
  row.early_cost = early_cost;
  row.repair_limit = repair_limit;
  row.break_even_price = break_even_price;
  row.close_call = close_call;
  return row;
}

// Invented: run 1, then run 2 (the latest) with two pumps and a van due and an HVAC unit kept.
class DueCommand : public ::testing::Test {
 protected:
  void SetUp() override {
    db::Connection db = db::Connection::open(path, true);
    add_stored_run(db, "2025-11-30", {due_asset("PX-0", "pump-x", Verdict::review, 100)});
    results::AssetRow px0 = with_figures(due_asset("PX-0", "pump-x", Verdict::review, 500), 15, 2,
                                         355.5, 1466.25, 21004, true);
    px0.reason = "Review: worn, \"tired\"\nand old";
    results::AssetRow px1 = with_figures(due_asset("PX-1", "pump-x", Verdict::review, 800.125), 9,
                                         1, 84, 110.5, 22944.5, false);
    px1.reason = "Review: invented.";
    results::AssetRow vx4 = due_asset("VX-4", "van-x", Verdict::replace, std::nullopt);
    vx4.age_years = 11;
    add_stored_run(db, "2026-11-30",
                   {px0, px1, vx4, due_asset("HX-7", "hvac-x", Verdict::keep, 300)});
  }
  TempDir dir;
  std::string path = dir.path("fleet.db");
};

TEST_F(DueCommand, TableMostUrgentFirstWithTheCautionLast) {
  const testing::Run r = run_tenure({"due", "--db", path});
  ASSERT_EQ(r.exit_code, 0) << r.err;
  EXPECT_EQ(r.err, "");
  EXPECT_TRUE(
      r.out.starts_with("tenure due: run 2 as of 2026-11-30, after-tax basis\n"
                        "3 assets due.\n"))
      << r.out;
  // By hand: PX-1 (delay cost 800.125) before PX-0 (500) before VX-4 (none); HX-7 is kept.
  const std::size_t px1 = r.out.find("\n  PX-1 "), px0 = r.out.find("\n  PX-0 "),
                    vx4 = r.out.find("\n  VX-4 ");
  ASSERT_NE(px1, std::string::npos);
  EXPECT_LT(px1, px0);
  EXPECT_LT(px0, vx4);
  EXPECT_EQ(r.out.find("HX-7"), std::string::npos);
  EXPECT_NE(r.out.find("     800.13 "), std::string::npos);  // formats::money: half away from 0
  EXPECT_NE(r.out.find("      Review: worn, \"tired\" and old\n"), std::string::npos);
  EXPECT_TRUE(r.out.ends_with("\n\n" + std::string(formats::kCaution) + "\n"));
}

TEST_F(DueCommand, CsvIsRfc4180ByteForByte) {
  const testing::Run r = run_tenure({"due", "--db", path, "--format", "csv"});
  ASSERT_EQ(r.exit_code, 0) << r.err;
  // Typed by hand from RFC 4180 section 2: CRLF after every record (rules 1, 2), a header row
  // (rule 3), the reason with a comma, quotes and an LF enclosed in quotes (rule 6) with its
  // quotes doubled (rule 7); an empty field for none; no caution in the data.
  EXPECT_EQ(r.out,
            "asset_id,asset_class,verdict,age_years,replace_after_years,delay_cost,early_cost,"
            "repair_limit,break_even_price,close_call,newly_due,reason\r\n"
            "PX-1,pump-x,review,9,1,800.125,84,110.5,22944.5,0,1,Review: invented.\r\n"
            "PX-0,pump-x,review,15,2,500,355.5,1466.25,21004,1,0,"
            "\"Review: worn, \"\"tired\"\"\nand old\"\r\n"
            "VX-4,van-x,replace,11,,,,,,,1,invented\r\n");
}

TEST_F(DueCommand, JsonHasTheRunTheFiltersAndNullForNone) {
  const testing::Run r = run_tenure({"due", "--db", path, "--format", "json", "--class", "van-x"});
  ASSERT_EQ(r.exit_code, 0) << r.err;
  const nlohmann::json doc = nlohmann::json::parse(r.out);
  EXPECT_EQ(doc.at("run_id"), 2);
  EXPECT_EQ(doc.at("as_of"), "2026-11-30");
  EXPECT_EQ(doc.at("basis"), "after_tax");
  EXPECT_EQ(doc.at("filters"),
            nlohmann::json::parse(R"({"newly": false, "asset_class": "van-x"})"));
  ASSERT_EQ(doc.at("rows").size(), 1u);
  const nlohmann::json& vx4 = doc.at("rows")[0];
  EXPECT_EQ(vx4.at("asset_id"), "VX-4");
  EXPECT_EQ(vx4.at("age_years"), 11);
  EXPECT_TRUE(vx4.at("delay_cost").is_null());
  EXPECT_TRUE(vx4.at("replace_after_years").is_null());
  EXPECT_TRUE(vx4.at("close_call").is_null());
  EXPECT_EQ(vx4.at("newly_due"), true);
  EXPECT_EQ(doc.at("caution"), std::string(formats::kCaution));
}

TEST_F(DueCommand, JsonWritesTextThatIsNotUtf8WithTheReplacementCharacter) {
  {
    db::Connection db = db::Connection::open(path, true);
    add_stored_run(db, "2026-12-31", {due_asset("PX-\xff", "pump-x", Verdict::review, 1)});
  }
  const testing::Run r = run_tenure({"due", "--db", path, "--format", "json"});
  ASSERT_EQ(r.exit_code, 0) << r.err;
  EXPECT_EQ(nlohmann::json::parse(r.out).at("rows")[0].at("asset_id"), "PX-\xef\xbf\xbd");
}

TEST_F(DueCommand, NewlyLeavesOutWhatWasDueInTheRunBefore) {
  const testing::Run r = run_tenure({"due", "--db", path, "--newly", "--format", "csv"});
  ASSERT_EQ(r.exit_code, 0) << r.err;
  // PX-0 was due in run 1.
  EXPECT_EQ(r.out.substr(r.out.find("\r\n") + 2),
            "PX-1,pump-x,review,9,1,800.125,84,110.5,22944.5,0,1,Review: invented.\r\n"
            "VX-4,van-x,replace,11,,,,,,,1,invented\r\n");
}

TEST_F(DueCommand, NothingDueIsAClearLineAndExitZero) {
  const testing::Run r = run_tenure({"due", "--db", path, "--class", "hvac-x", "--newly"});
  EXPECT_EQ(r.exit_code, 0) << r.err;
  EXPECT_EQ(r.out,
            "tenure due: run 2 as of 2026-11-30, after-tax basis\n"
            "No asset is newly due in class hvac-x (review or replace).\n\n" +
                std::string(formats::kCaution) + "\n");
}

TEST_F(DueCommand, RefusalsNameTheOptionWithExitTwo) {
  const auto refused = [](const testing::Run& r, const std::string& message) {
    EXPECT_EQ(r.exit_code, 2);
    EXPECT_EQ(r.err, message);
    EXPECT_EQ(r.out, "");
  };
  refused(run_tenure({"due", "--db", path, "--class", "vans"}),
          "tenure due: --class: no class 'vans' in run 2; its classes are hvac-x, pump-x, van-x\n");
  refused(run_tenure({"due", "--db", path, "--run", "9"}),
          "tenure due: --run: no successful run 9\n");
  refused(run_tenure({"due", "--db", path, "--format", "xml"}),
          "tenure due: --format: must be one of text, csv, json, not 'xml' (see 'tenure due --help')\n");
  const std::string missing = dir.path("missing.db");
  refused(run_tenure({"due", "--db", missing}),
          "tenure due: --db: no database file '" + missing + "'\n");
  const std::string empty = dir.path("empty.db");
  db::Connection::open(empty, true).exec("CREATE TABLE asset(asset_id TEXT)");
  refused(run_tenure({"due", "--db", empty}),
          "tenure due: --db: no review run in this database (run 'tenure review' first)\n");
}

// The demo fleet as the help's examples use it.
TEST(DueOnTheDemo, AgreesWithTheReviewAndRunsTheHelpsExamples) {
  TempDir dir;
  const std::string db = dir.path("demo.db");
  ASSERT_EQ(run_tenure({"demo", "--db", db}).exit_code, 0);
  const testing::Run review =
      run_tenure({"review", "--db", db, "--as-of", "2026-11-30", "--format", "json"});
  ASSERT_EQ(review.exit_code, 0) << review.err;
  const nlohmann::json summary = nlohmann::json::parse(review.out);
  const testing::Run all = run_tenure({"due", "--db", db, "--format", "json"});
  ASSERT_EQ(all.exit_code, 0) << all.err;
  const nlohmann::json rows = nlohmann::json::parse(all.out).at("rows");
  EXPECT_EQ(rows.size(), summary.at("due").get<std::size_t>());
  const testing::Run newly = run_tenure({"due", "--db", db, "--newly", "--format", "json"});
  EXPECT_EQ(nlohmann::json::parse(newly.out).at("rows").size(),
            summary.at("newly_due").get<std::size_t>());

  const testing::Run help = run_tenure({"due", "--help"});
  EXPECT_EQ(help.exit_code, 0);
  for (const std::string example : {"tenure due --db demo.db --newly --class van-service",
                                    "tenure due --db demo.db --class pump-centrifugal --format csv",
                                    "tenure explain --db demo.db VAN-00087"}) {
    EXPECT_NE(help.out.find(example), std::string::npos) << example;
  }
  for (const std::string asset_class : {"van-service", "pump-centrifugal"}) {
    const testing::Run r = run_tenure({"due", "--db", db, "--class", asset_class});
    EXPECT_EQ(r.exit_code, 0) << r.err;
    EXPECT_NE(r.out.find("assets due in class " + asset_class + "."), std::string::npos);
  }
  bool van_87_due = false;
  for (const nlohmann::json& row : rows) van_87_due |= row.at("asset_id") == "VAN-00087";
  EXPECT_TRUE(van_87_due);
}

}  // namespace
}  // namespace tenure::cli
