// Reading a stored run back (db/run_reader.h) on the noiseless fixture fleet: the run, class and
// asset rows as the views show them, the challenger curves, rejected rows, the previous run's due
// assets and one asset's input row and events; clear errors for a database without runs and for
// a run that does not exist; and every asset of a run explained with the stored figures
// reproduced exactly, whether or not its tables were kept (policy detail "all" or "none").
#include <gtest/gtest.h>

#include <fmt/format.h>

#include "core/errors.h"
#include "app/review_run.h"
#include "db/run_reader.h"
#include "db_test_support.h"
#include "explain/explanation.h"
#include "fixtures/fleets/fixture_fleets.h"
#include "formats/policy_json.h"

namespace tenure::db {
namespace {

using testing_support::scalar;
using testing_support::TempDatabase;
using testing_support::text_of;

class RunReader : public ::testing::Test {
 protected:
  void SetUp() override {
    Connection db = file.open();
    fixtures::create_input_tables(db.handle());
    fixtures::add_noiseless_fleet(db.handle());
  }
  app::RunSummary review(const std::string& policy, const char* as_of = fixtures::kAsOf) {
    Connection db = file.open();
    return app::run_review(db, {policy, parse_iso_date(as_of), {}, {}});
  }
  TempDatabase file;
};

TEST_F(RunReader, DatabaseWithoutRunsIsNamed) {
  Connection db = file.open();
  try {
    read_run(db, std::nullopt);
    FAIL() << "expected an InputError";
  } catch (const InputError& e) {
    EXPECT_EQ(std::string(e.what()), "--db: no review run in this database (run 'tenure review' first)");
  }
}

TEST_F(RunReader, ReadsTheLatestOrTheNamedRun) {
  review(fixtures::noiseless_policy(), "2025-06-30");
  const app::RunSummary second = review(fixtures::noiseless_policy());
  Connection db = file.open();
  const results::RunRow latest = read_run(db, std::nullopt);
  EXPECT_EQ(latest.run_id, second.run_id);
  EXPECT_EQ(latest.as_of, fixtures::kAsOf);
  EXPECT_EQ(latest.policy_json, fixtures::noiseless_policy());
  EXPECT_EQ(latest.basis, replacement::Basis::after_tax);
  EXPECT_EQ(latest.money, results::MoneyTerms::nominal);
  EXPECT_EQ(read_run(db, 1).as_of, "2025-06-30");
  try {
    read_run(db, 99);
    FAIL() << "expected an InputError";
  } catch (const InputError& e) {
    EXPECT_EQ(std::string(e.what()), "--run: no successful run 99");
  }
}

TEST_F(RunReader, AssetAndClassRowsAreTheViewsRows) {
  const app::RunSummary run = review(fixtures::noiseless_policy());
  Connection db = file.open();
  const auto asset = read_asset_result(db, run.run_id, "PF-010");
  ASSERT_TRUE(asset);
  EXPECT_EQ(asset->asset_class, "pump-fixture");
  EXPECT_EQ(asset->defender_euac, scalar(db, "SELECT defender_euac FROM tenure_latest WHERE asset_id = 'PF-010'"));
  EXPECT_EQ(review::to_string(asset->verdict), text_of(db, "SELECT verdict FROM tenure_latest WHERE asset_id = 'PF-010'"));
  EXPECT_EQ(asset->reason, text_of(db, "SELECT reason FROM tenure_latest WHERE asset_id = 'PF-010'"));
  EXPECT_FALSE(read_asset_result(db, run.run_id, "PF-010' OR '1'='1"));
  EXPECT_EQ(read_asset_results(db, run.run_id).size(),
            static_cast<std::size_t>(scalar(db, "SELECT count(*) FROM tenure_latest")));
  const auto classes = read_class_results(db, run.run_id);
  ASSERT_EQ(classes.size(), 1u);
  EXPECT_EQ(classes[0].cost_model, fleet::CostModel::linear);
  EXPECT_EQ(classes[0].cost_a, scalar(db, "SELECT cost_a FROM tenure_class_latest"));
  EXPECT_EQ(classes[0].value_model, fleet::ValueModel::fitted);
  EXPECT_FALSE(read_class_result(db, run.run_id, "no-such-class"));
  // Twelve years on each basis (max_life_years 12, taxed).
  const auto curves = read_challenger_curves(db, run.run_id);
  ASSERT_EQ(curves.size(), 24u);
  EXPECT_EQ(curves.front().basis, replacement::Basis::after_tax);
  EXPECT_EQ(curves.front().years, 1);
  EXPECT_EQ(curves.back().basis, replacement::Basis::before_tax);
  EXPECT_EQ(curves.back().years, 12);
}

TEST_F(RunReader, RejectedRowsAndThePreviousRunsDueAssets) {
  {
    Connection db = file.open();
    db.exec("INSERT INTO cost_event VALUES ('PF-001', '2026-13-01', 10, 'repair'),"
            " ('PF-404', '2026-01-01', 10, 'repair'), ('PF-002', '2026-01-01', 'n/a', 'repair')");
  }
  const app::RunSummary first = review(fixtures::noiseless_policy(), "2024-06-30");
  const app::RunSummary second = review(fixtures::noiseless_policy());
  Connection db = file.open();
  EXPECT_EQ(read_rejected(db, second.run_id, 100).size(), 3u);
  const auto two = read_rejected(db, second.run_id, 2);
  ASSERT_EQ(two.size(), 2u);
  EXPECT_EQ(two[0].source, "cost_event");
  EXPECT_TRUE(due_in_previous_run(db, first.run_id).empty());
  std::unordered_set<std::string> due_at_first;
  Statement q(db, "SELECT asset_id FROM tenure_asset_result WHERE run_id = ?1 AND verdict <> 'keep'");
  q.bind(1, first.run_id);
  while (q.step()) due_at_first.insert(std::string(q.text(0)));
  EXPECT_FALSE(due_at_first.empty());
  EXPECT_EQ(due_in_previous_run(db, second.run_id), due_at_first);
}

TEST_F(RunReader, InputAssetAndItsEvents) {
  review(fixtures::noiseless_policy());
  Connection db = file.open();
  const auto input = read_input_asset(db, review::Sources{}, "PF-003");
  ASSERT_TRUE(input);
  EXPECT_EQ(input->first_cost, 18750);
  EXPECT_EQ(input->events.size(),
            static_cast<std::size_t>(scalar(db, "SELECT count(*) FROM cost_event WHERE asset_id = 'PF-003'")));
  EXPECT_FALSE(read_input_asset(db, review::Sources{}, "PF-999"));
  review::Sources bad;
  bad.costs = "cost_event; DROP TABLE asset";
  EXPECT_THROW(read_input_asset(db, bad, "PF-003"), InputError);
}

class EveryAsset : public RunReader, public ::testing::WithParamInterface<const char*> {};

TEST_P(EveryAsset, IsExplainedWithItsStoredFiguresReproduced) {
  std::string policy = fixtures::noiseless_policy();
  policy.replace(policy.find("\"detail\": \"all\""), 15, fmt::format("\"detail\": \"{}\"", GetParam()));
  const app::RunSummary run = review(policy);
  Connection db = file.open();
  const results::RunRow stored_run = read_run(db, std::nullopt);
  const auto stored_class = read_class_result(db, run.run_id, "pump-fixture");
  ASSERT_TRUE(stored_class);
  std::size_t explained = 0;
  for (const results::AssetRow& asset : read_asset_results(db, run.run_id)) {
    SCOPED_TRACE(asset.asset_id);
    const explain::Explanation e = explain::explain_asset(
        stored_run, explain::run_policy(stored_run), *stored_class, asset, read_input_asset(db, review::Sources{}, asset.asset_id));
    EXPECT_TRUE(e.reproduced()) << ::testing::PrintToString(e.differences);
    ASSERT_TRUE(e.own);
    EXPECT_EQ(e.own->credibility.years, asset.cost_years);
    EXPECT_NEAR(e.own->credibility.factor, asset.credibility_factor, 1e-12);
    ++explained;
  }
  EXPECT_EQ(explained, 30u);
}

INSTANTIATE_TEST_SUITE_P(Detail, EveryAsset, ::testing::Values("all", "none"));

}  // namespace
}  // namespace tenure::db
