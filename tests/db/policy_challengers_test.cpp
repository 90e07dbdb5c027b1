// Several challengers per policy class in the nightly review (SPEC 14), on the invented demo
// fleet: the demo policy and the same policy with each class's challenger written as a
// one-element challengers list store identical figures; a challenger dearer to run than another
// at the same price is never chosen, whatever its place in the list; one cheaper to run is, and
// every defender is then weighed against a lower EUAC; an explicit improvement of 0 stores the
// same figures, and with improvement > 0 replacements are delayed (SPEC 14's T(k): a challenger
// that gets cheaper is worth waiting for).
#include <gtest/gtest.h>
#include <sqlite3.h>

#include <cstdint>
#include <map>
#include <nlohmann/json.hpp>
#include <string>

#include "app/explain_run.h"
#include "app/review_run.h"
#include "db/demo_writer.h"
#include "db_test_support.h"
#include "demo/demo_policy.h"
#include "core/money_text.h"
#include "explain/explain_text.h"
#include "formats/json_text.h"

namespace tenure::db {
namespace {

using nlohmann::json;
using testing_support::TempDatabase;

demo::Options small_fleet() {
  demo::Options options;
  options.assets = 60;
  options.events = 4000;
  return options;
}

// Every row a run stored in `table`, each value's type and text, all columns but run_id and the
// chosen challenger's name (checked on its own).
std::string run_rows(Connection& db, const std::string& table, std::int64_t run_id) {
  Statement q(db, "SELECT * FROM " + table + " WHERE run_id = ?1 ORDER BY 2");
  q.bind(1, run_id);
  std::string all;
  while (q.step()) {
    for (int c = 0; c < sqlite3_column_count(q.handle()); ++c) {
      const std::string name = sqlite3_column_name(q.handle(), c);
      if (name == "run_id" || name == "challenger") continue;
      all += std::string(sqlite3_column_name(q.handle(), c)) + "=" +
             std::to_string(q.column_type(c)) + ":" + std::string(q.text(c)) + "|";
    }
    all += "\n";
  }
  return all;
}

// asset_id -> a column of tenure_asset_result for one run.
std::map<std::string, double> per_asset(Connection& db, std::int64_t run_id,
                                        const std::string& column) {
  Statement q(db, "SELECT asset_id, " + column +
                      " FROM tenure_asset_result WHERE run_id = ?1 "
                      "AND " +
                      column + " IS NOT NULL");
  q.bind(1, run_id);
  std::map<std::string, double> out;
  while (q.step()) out[std::string(q.text(0))] = q.real(1);
  return out;
}

json demo_policy() { return formats::parse_json_text(demo::demo_policy_json()); }

// The demo policy with each class's challenger given as `make(price)`, a challengers list.
template <class Make>
json with_challengers(Make make) {
  json policy = demo_policy();
  for (auto& [name, c] : policy["classes"].items()) {
    const double price = c["challenger_first_cost"];
    c.erase("challenger_first_cost");
    c["challengers"] = make(price);
  }
  return policy;
}

class PolicyChallengers : public ::testing::Test {
 protected:
  void SetUp() override { write_demo_fleet(db, small_fleet()); }
  std::int64_t review(const json& policy) {
    return app::run_review(db, {policy.dump(), parse_iso_date("2026-06-30"), {}, {}}).run_id;
  }
  TempDatabase file;
  Connection db = file.open();
};

TEST_F(PolicyChallengers, OneElementListStoresTheSameFiguresAsTheOneChallengerForm) {
  const std::int64_t plain = review(demo_policy());
  const std::int64_t listed = review(with_challengers([](double price) {
    return json::array({{{"name", "standard"}, {"first_cost", price}}});
  }));
  for (const char* table : {"tenure_asset_result", "tenure_class_result"}) {
    const std::string stored = run_rows(db, table, plain);
    EXPECT_GT(stored.size(), 1000u) << table;  // the demo run stored its rows
    EXPECT_EQ(run_rows(db, table, listed), stored) << table;
  }
  EXPECT_EQ(testing_support::scalar(db, "SELECT count(*) FROM tenure_asset_result WHERE run_id = " +
                                            std::to_string(listed) +
                                            " AND challenger_euac IS NOT NULL AND challenger IS "
                                            "NOT 'standard'"),
            0);
}

TEST_F(PolicyChallengers, DearerToRunIsNeverChosenAndCheaperToRunIs) {
  const std::int64_t plain = review(demo_policy());
  const auto standard = per_asset(db, plain, "challenger_euac");
  ASSERT_GT(standard.size(), 30u);
  for (const bool dearer_first : {false, true}) {
    const std::int64_t run = review(with_challengers([&](double price) {
      json standard_unit = {{"name", "standard"}, {"first_cost", price}};
      json dearer = {{"name", "dearer-to-run"}, {"first_cost", price}, {"cost_factor", 1.3}};
      return dearer_first ? json::array({dearer, standard_unit})
                          : json::array({standard_unit, dearer});
    }));
    EXPECT_EQ(per_asset(db, run, "challenger_euac"), standard) << dearer_first;
  }
  const std::int64_t frugal = review(with_challengers([](double price) {
    return json::array({{{"name", "standard"}, {"first_cost", price}},
                        {{"name", "frugal"}, {"first_cost", price}, {"cost_factor", 0.6}}});
  }));
  // The chosen one is named per asset, in the table and in the latest view (db/schema.cpp).
  EXPECT_EQ(testing_support::scalar(db, "SELECT count(*) FROM tenure_asset_result WHERE run_id = " +
                                            std::to_string(frugal) +
                                            " AND challenger_euac IS NOT NULL AND "
                                            "challenger IS NOT 'frugal'"),
            0);
  EXPECT_EQ(testing_support::scalar(db,
                                    "SELECT count(*) FROM tenure_latest WHERE challenger = "
                                    "'frugal'"),
            static_cast<double>(standard.size()));
  EXPECT_EQ(testing_support::scalar(db, "SELECT count(*) FROM tenure_asset_result WHERE run_id = " +
                                            std::to_string(plain) + " AND challenger IS NOT NULL"),
            0);
  const auto lower = per_asset(db, frugal, "challenger_euac");
  ASSERT_EQ(lower.size(), standard.size());
  for (const auto& [asset, euac] : standard) EXPECT_LT(lower.at(asset), euac) << asset;
}

// The class result and explain give the chosen challenger's price, not the first listed one's,
// and explain names the one chosen.
TEST_F(PolicyChallengers, TheChosenChallengersPriceIsStoredAndExplained) {
  const std::int64_t run = review(with_challengers([&](double price) {
    return json::array({{{"name", "standard"}, {"first_cost", price}},
                        {{"name", "frugal"}, {"first_cost", price * 1.1}, {"cost_factor", 0.5}}});
  }));
  const json policy = demo_policy();
  Statement q(db,
              "SELECT asset_class, challenger_first_cost FROM tenure_class_result WHERE run_id = "
              "?1 AND euac_before_tax IS NOT NULL");
  q.bind(1, run);
  int classes = 0;
  while (q.step()) {
    const std::string asset_class(q.text(0));
    const double price = policy["classes"][asset_class]["challenger_first_cost"];
    EXPECT_DOUBLE_EQ(q.real(1), price * 1.1) << asset_class;
    ++classes;
  }
  EXPECT_GT(classes, 2);
  Statement first(db,
                  "SELECT asset_id FROM tenure_asset_result WHERE run_id = ?1 AND challenger = "
                  "'frugal' ORDER BY asset_id LIMIT 1");
  first.bind(1, run);
  ASSERT_TRUE(first.step());
  const std::string asset(first.text(0));
  Statement class_of(db, "SELECT asset_class FROM asset WHERE asset_id = ?1");
  class_of.bind(1, asset);
  ASSERT_TRUE(class_of.step());
  const std::string asset_class(class_of.text(0));
  const double price = policy["classes"][asset_class]["challenger_first_cost"];
  // The table wraps its last column: compare with the spaces and line breaks collapsed.
  std::string text;
  for (const char c : explain::explanation_to_text(app::explain_stored_asset(db, asset, run))) {
    const bool space = c == ' ' || c == '\n';
    if (!space || (!text.empty() && text.back() != ' ')) text += space ? ' ' : c;
  }
  EXPECT_NE(text.find("challenger 'frugal' (the best of the 2 listed on the decision's basis): a "
                      "new unit at " +
                      money(price * 1.1) + ","),
            std::string::npos)
      << text;
}

TEST_F(PolicyChallengers, ImprovementZeroChangesNothingAndImprovementDelaysReplacements) {
  const std::int64_t plain = review(demo_policy());
  json zero = demo_policy();
  for (auto& [name, c] : zero["classes"].items()) c["improvement"] = 0;
  const std::int64_t explicit_zero = review(zero);
  EXPECT_EQ(run_rows(db, "tenure_asset_result", explicit_zero),
            run_rows(db, "tenure_asset_result", plain));
  json improving = demo_policy();
  for (auto& [name, c] : improving["classes"].items()) c["improvement"] = 0.03;
  const std::int64_t later = review(improving);
  // Today's challenger is the same: C*_0 is stored as challenger_euac.
  EXPECT_EQ(per_asset(db, later, "challenger_euac"), per_asset(db, plain, "challenger_euac"));
  const auto before = per_asset(db, plain, "replace_after_years");
  const auto after = per_asset(db, later, "replace_after_years");
  ASSERT_EQ(after.size(), before.size());
  int delayed = 0;
  int earlier = 0;
  for (const auto& [asset, years] : before) {
    delayed += after.at(asset) > years ? 1 : 0;
    earlier += after.at(asset) < years ? 1 : 0;
  }
  // A cheaper challenger later is worth waiting for (replacement/challengers_test.cpp proves
  // k* never shrinks for one case); here a k* may move a year earlier only where two T(k) tie
  // within kTieTolerance, as the tie rule scans them in order.
  EXPECT_GT(delayed, 5 * earlier + 5) << delayed << " delayed, " << earlier << " earlier";
}

}  // namespace
}  // namespace tenure::db
