// `tenure explain` as a user runs it, on the noiseless fixture fleet (fixtures/fleets): the JSON
// reproduces the stored figures exactly and agrees with `tenure case` on the same series built
// from the fixture's formulas; the equivalent case it prints gives `tenure case`'s figures
// exactly; the text has its sections and the caution; an unknown asset or run is exit 2 and a
// stored figure that no longer reproduces is exit 1, each with a one-line message.
#include <gtest/gtest.h>

#include <cmath>
#include <string>
#include <utility>
#include <vector>

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "db/connection.h"
#include "app/review_run.h"
#include "fixtures/fleets/fixture_fleets.h"
#include "run_tenure.h"

namespace tenure::cli {
namespace {

using testing::run_tenure;
using testing::slurp;
using testing::TempDir;

constexpr double kFitted = 1e-6;  // relative: the fitted curves equal the formulas to ~1e-12

class ExplainCommand : public ::testing::Test {
 protected:
  void SetUp() override {
    db::Connection db = db::Connection::open(path, true);
    fixtures::create_input_tables(db.handle());
    fixtures::add_noiseless_fleet(db.handle());
    app::run_review(db, {fixtures::noiseless_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
  }
  nlohmann::json explain_json(const std::string& asset) {
    const testing::Run r = run_tenure({"explain", "--db", path, asset, "--format", "json"});
    EXPECT_EQ(r.exit_code, 0) << r.err;
    EXPECT_EQ(r.err, "");
    return nlohmann::json::parse(r.out);
  }
  double stored(const std::string& column, const std::string& asset) {
    db::Connection db = db::Connection::open(path);
    db::Statement q(db, "SELECT " + column + " FROM tenure_latest WHERE asset_id = ?1");
    q.bind(1, asset);
    EXPECT_TRUE(q.step());
    return q.real(0);
  }
  TempDir dir;
  std::string path = dir.path("fleet.db");
};

TEST_F(ExplainCommand, JsonReproducesTheStoredFiguresExactly) {
  for (const char* asset : {"PF-001", "PF-010", "PF-020", "PF-030"}) {
    SCOPED_TRACE(asset);
    const nlohmann::json doc = explain_json(asset);
    EXPECT_EQ(doc.at("check").at("reproduced"), true);
    EXPECT_EQ(doc.at("verdict").at("defender_euac").get<double>(), stored("defender_euac", asset));
    EXPECT_EQ(doc.at("verdict").at("challenger_euac").get<double>(), stored("challenger_euac", asset));
    EXPECT_EQ(doc.at("verdict").at("marginal_cost_next_year").get<double>(),
              stored("marginal_cost_next_year", asset));
    EXPECT_EQ(doc.at("verdict").at("replace_after_years").get<double>(),
              stored("replace_after_years", asset));
    EXPECT_EQ(doc.at("cost_history").at("agrees_with_run"), true);
  }
}

// The asset as a case file (SPEC 5), from the fixture's formulas: costs 1000 + 400 (k - 1),
// values 0.9 x 0.85^age of first cost, straight line over 8 years; credibility factor 1 (its
// costs are exactly on the curve).
std::string case_from_formulas(int age, double first_cost, double value_now) {
  std::vector<double> ch_costs, ch_values, costs, values;
  for (int k = 1; k <= 12; ++k) {
    ch_costs.push_back(fixtures::noiseless_cost(k));
    ch_values.push_back(20000 * fixtures::kValueStart * std::pow(1 - fixtures::kValueDecline, k));
  }
  for (int k = 1; k <= std::max(1, 12 - age); ++k) {
    costs.push_back(fixtures::noiseless_cost(age + k));
    values.push_back(first_cost * fixtures::kValueStart * std::pow(1 - fixtures::kValueDecline, age + k));
  }
  return fmt::format(
      R"({{"marr": 0.10, "income_tax_rate": 0.25,
  "challenger": {{"first_cost": 20000, "operating_costs": [{:.17g}], "market_values": [{:.17g}],
    "depreciation": {{"method": "straight_line", "life_years": 8, "salvage": 0}}}},
  "defender": {{"first_cost": {:.17g}, "age_years": {}, "market_value_now": {:.17g},
    "operating_costs": [{:.17g}], "market_values": [{:.17g}],
    "depreciation": {{"method": "straight_line", "life_years": 8, "salvage": 0}}}}}})",
      fmt::join(ch_costs, ","), fmt::join(ch_values, ","), first_cost, age, value_now,
      fmt::join(costs, ","), fmt::join(values, ","));
}

void expect_near(const nlohmann::json& ours, const nlohmann::json& theirs, const std::string& what) {
  const double a = ours.get<double>(), b = theirs.get<double>();
  EXPECT_NEAR(a, b, kFitted * std::max(1.0, std::abs(b))) << what;
}

TEST_F(ExplainCommand, AgreesWithTenureCaseOnTheSameInputs) {
  for (const char* asset : {"PF-004", "PF-012", "PF-025"}) {
    SCOPED_TRACE(asset);
    const nlohmann::json doc = explain_json(asset);
    const nlohmann::json& in = doc.at("inputs");
    const std::string file = dir.write(
        "case.json", case_from_formulas(in.at("age_years"), in.at("first_cost"),
                                        in.at("market_value_now")));
    const testing::Run c = run_tenure({"case", file, "--format", "json"});
    ASSERT_EQ(c.exit_code, 0) << c.err;
    const nlohmann::json result = nlohmann::json::parse(c.out);
    for (const char* basis : {"before_tax", "after_tax"}) {
      const nlohmann::json& ours = doc.at("defender").at(basis);
      const nlohmann::json& theirs = result.at("defender").at(basis);
      EXPECT_EQ(ours.at("best_years"), theirs.at("best_years")) << basis;
      expect_near(ours.at("euac"), theirs.at("euac"), basis);
      for (std::size_t k = 0; k < theirs.at("marginal_costs").size(); ++k) {
        expect_near(ours.at("marginal_costs")[k], theirs.at("marginal_costs")[k], basis);
      }
    }
    expect_near(doc.at("verdict").at("challenger_euac"), result.at("decision").at("challenger_euac"),
                "challenger_euac");
    EXPECT_EQ(doc.at("verdict").at("replace_after_years"),
              result.at("decision").at("replace_after_years"));
    // The case it prints itself gives `tenure case`'s figures to the last bit.
    const testing::Run same = run_tenure(
        {"case", dir.write("same.json", doc.at("equivalent_case").dump()), "--format", "json"});
    ASSERT_EQ(same.exit_code, 0) << same.err;
    const nlohmann::json exact = nlohmann::json::parse(same.out);
    EXPECT_EQ(doc.at("defender").at("after_tax").at("euac"), exact.at("defender").at("after_tax").at("euac"));
    EXPECT_EQ(doc.at("defender").at("after_tax").at("marginal_costs"),
              exact.at("defender").at("after_tax").at("marginal_costs"));
    EXPECT_EQ(doc.at("verdict").at("defender_euac"), exact.at("decision").at("defender_euac"));
    EXPECT_EQ(doc.at("timing").at("replace_after_years"), exact.at("decision").at("replace_after_years"));
  }
}

TEST_F(ExplainCommand, TextHasItsSectionsAndEndsWithTheCaution) {
  const testing::Run r = run_tenure({"explain", "--db", path, "PF-012"});
  ASSERT_EQ(r.exit_code, 0) << r.err;
  for (const char* text : {"tenure explain: asset PF-012 (class pump-fixture), run 1 as of 2026-06-30",
                           "are reproduced\nexactly", "1. Inputs", "in service on",
                           "4. Own cost history", "the events read now agree with the run",
                           "PW at\n", "13. Replacement timing", "14. Verdict"}) {
    EXPECT_NE(r.out.find(text), std::string::npos) << text;
  }
  EXPECT_NE(r.out.find("a regulator's retirement rule.\n"), std::string::npos);
  EXPECT_EQ(r.out.back(), '\n');
}

TEST_F(ExplainCommand, UnknownAssetIsExitTwo) {
  const testing::Run r = run_tenure({"explain", "--db", path, "NOPE"});
  EXPECT_EQ(r.exit_code, 2);
  EXPECT_EQ(r.out, "");
  EXPECT_EQ(r.err, "tenure explain: ASSET: no asset 'NOPE' in the asset relation\n");
}

// An asset the run did not weigh says why: retired on which date, rejected and why (its row in
// tenure_rejected), not yet in service, or added after the run. Invented rows.
TEST_F(ExplainCommand, AnAssetTheRunDidNotWeighSaysWhy) {
  {
    db::Connection db = db::Connection::open(path);
    db.exec(
        "INSERT INTO asset VALUES ('PF-RET', 'pump-fixture', '2024-01-15', 18000, '2025-04-30');"
        "INSERT INTO asset VALUES ('PF-BAD', 'pump-fixture', '2019-05-15', 0, NULL);"
        "INSERT INTO asset VALUES ('PF-NEW', 'pump-fixture', '2026-09-15', 18000, NULL);");
    app::run_review(db, {fixtures::noiseless_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
    db.exec("INSERT INTO asset VALUES ('PF-LATE', 'pump-fixture', '2020-01-15', 18000, NULL);");
  }
  const std::string as_of = fixtures::kAsOf;
  const std::vector<std::pair<std::string, std::string>> cases = {
      {"PF-RET", "asset 'PF-RET' was retired on 2025-04-30, on or before run 2's as-of date " +
                     as_of + ": a retired unit's costs feed its class's curves, but it gets no "
                             "verdict"},
      {"PF-BAD", "asset 'PF-BAD' was rejected by run 2: first_cost 0 must be greater than 0 (its "
                 "row in tenure_rejected)"},
      {"PF-NEW", "asset 'PF-NEW' goes into service on 2026-09-15, after run 2's as-of date " +
                     as_of + ": the run did not weigh it"},
      {"PF-LATE", "asset 'PF-LATE' is in the asset relation but not in run 2: it was most likely "
                  "added after the run (run 'tenure review' to weigh it)"},
  };
  for (const auto& [asset, rule] : cases) {
    const testing::Run r = run_tenure({"explain", "--db", path, asset});
    EXPECT_EQ(r.exit_code, 2) << asset;
    EXPECT_EQ(r.out, "") << asset;
    EXPECT_EQ(r.err, "tenure explain: ASSET: " + rule + "\n");
  }
}

TEST_F(ExplainCommand, UnknownRunIsExitTwoAndAnOlderRunCanBeNamed) {
  {
    db::Connection db = db::Connection::open(path);
    app::run_review(db, {fixtures::noiseless_policy(), parse_iso_date("2026-12-31"), {}, {}});
  }
  const testing::Run old = run_tenure({"explain", "--db", path, "PF-005", "--run", "1", "--format", "json"});
  ASSERT_EQ(old.exit_code, 0) << old.err;
  EXPECT_EQ(nlohmann::json::parse(old.out).at("run").at("as_of"), fixtures::kAsOf);
  const testing::Run r = run_tenure({"explain", "--db", path, "PF-005", "--run", "5"});
  EXPECT_EQ(r.exit_code, 2);
  EXPECT_EQ(r.err, "tenure explain: --run: no successful run 5\n");
}

TEST_F(ExplainCommand, DatabaseWithoutRunIsExitTwo) {
  const std::string empty = dir.path("empty.db");
  {
    db::Connection db = db::Connection::open(empty, true);
    fixtures::create_input_tables(db.handle());
  }
  const testing::Run r = run_tenure({"explain", "--db", empty, "PF-001"});
  EXPECT_EQ(r.exit_code, 2);
  EXPECT_EQ(r.err, "tenure explain: --db: no review run in this database (run 'tenure review' first)\n");
}

TEST_F(ExplainCommand, AStoredFigureThatDiffersIsExitOneAndSaidLoudly) {
  {
    db::Connection db = db::Connection::open(path);
    db.exec("UPDATE tenure_asset_result SET defender_euac = defender_euac + 0.01 WHERE asset_id = 'PF-012'");
  }
  const testing::Run r = run_tenure({"explain", "--db", path, "PF-012"});
  EXPECT_EQ(r.exit_code, 1);
  EXPECT_NE(r.out.find("CHECK FAILED: stored figures differ from the recomputation:"), std::string::npos);
  EXPECT_EQ(r.err.rfind("tenure explain: stored figures differ from the recomputation: "
                        "defender_euac: stored ", 0),
            0u)
      << r.err;
  EXPECT_EQ(std::count(r.err.begin(), r.err.end(), '\n'), 1);
}

}  // namespace
}  // namespace tenure::cli
