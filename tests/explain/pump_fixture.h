// Test helper: an invented stored run of one class, "pump-fixture", whose curves are known
// exactly (cost of age-year k = 1000 + 400 (k - 1); value = 0.9 x 0.85^age of first cost;
// straight line over 8 years), and the stored row of a defender `age` years old whose figures
// come from the case analysis (replacement::analyse) of the same series, built here from the
// formulas, not by the code under test. Not real data.
//
//   PumpFixture f(5);              // a 5-year-old pump
//   f.stored.defender_euac;        // from the independent case analysis
//   explain_asset(f.run, f.policy, f.stored_class, f.stored, std::nullopt);
#pragma once

#include <algorithm>
#include <cmath>
#include <optional>
#include <string>

#include "depreciation/method.h"
#include "explain/explanation.h"
#include "replacement/case_analysis.h"
#include "results/rows.h"
#include "review/at_stake.h"
#include "review/verdict_rule.h"

namespace tenure::explain::testing {

inline constexpr double kA = 1000, kG = 400, kStart = 0.9, kDecline = 0.15;
inline constexpr double kChallengerCost = 20000, kFirstCost = 16000;
inline constexpr int kMaxLife = 12;

inline std::string pump_policy(double tax = 0.25) {
  return "// Invented test policy.\n{\"marr\": 0.10, \"income_tax_rate\": " + std::to_string(tax) +
         ", \"review_margin\": 0.05, \"classes\": {\"pump-fixture\": {"
         "\"challenger_first_cost\": 20000, \"max_life_years\": 12, \"depreciation\": "
         "{\"method\": \"straight_line\", \"life_years\": 8, \"salvage\": 0}, \"market_value\": "
         "{\"annual_decline\": 0.2}, \"cost_model\": \"linear\"}}}";
}

// The class cost curve at age-year k, times a credibility factor: written as the curve's own
// formula, a + g (k - 1), so the doubles agree to the last bit.
inline double cost(int k, double factor = 1.0) {
  return std::max(0.0, (kA + kG * static_cast<double>(k - 1)) * factor);
}
inline double fraction(int age) { return kStart * std::pow(1 - kDecline, static_cast<double>(age)); }

struct PumpFixture {
  explicit PumpFixture(int age, double tax = 0.25, double ratio = 1.2) {
    run.run_id = 7;
    run.as_of = "2026-06-30";
    run.policy_json = pump_policy(tax);
    run.basis = tax > 0 ? replacement::Basis::after_tax : replacement::Basis::before_tax;
    run.money = results::MoneyTerms::nominal;
    run.tenure_version = "test";

    stored_class.asset_class = "pump-fixture";
    stored_class.assets = 30;
    stored_class.challenger_first_cost = kChallengerCost;
    stored_class.max_life_years = kMaxLife;
    stored_class.cost_model = fleet::CostModel::linear;
    stored_class.cost_a = kA;
    stored_class.cost_g = kG;
    stored_class.cost_r2 = 1.0;
    stored_class.asset_years = 120;
    stored_class.value_model = fleet::ValueModel::fitted;
    stored_class.value_start = kStart;
    stored_class.value_decline = kDecline;
    stored_class.valuations_used = 40;

    // The asset: m complete years at `ratio` times the curve, so z = m / (m + 3).
    const int m = age;
    const double factor = m > 0 ? 1 + static_cast<double>(m) / (m + 3) * (ratio - 1) : 1.0;
    stored.asset_id = "PF-TEST";
    stored.asset_class = "pump-fixture";
    stored.age_years = age;
    stored.first_cost = kFirstCost;
    stored.book_value_now = std::max(0.0, kFirstCost - 2000.0 * age);  // 16000 / 8 a year
    stored.market_value_now = kFirstCost * fraction(age);
    stored.market_value_source = "class value curve";
    stored.cost_years = m;
    stored.cost_ratio = m > 0 ? ratio : 1.0;
    stored.credibility_factor = factor;
    stored.basis = run.basis;

    // The same defender and challenger as a case (SPEC 5), analysed by the case code.
    const auto method = depreciation::make_method(depreciation::StraightLineSpec{8, 0});
    replacement::Ownership challenger{kChallengerCost, 0, kChallengerCost, {}, {}, method};
    for (int k = 1; k <= kMaxLife; ++k) {
      challenger.operating_costs.push_back(cost(k));
      challenger.market_values.push_back(kChallengerCost * fraction(k));
    }
    replacement::Ownership defender{kFirstCost, age, stored.market_value_now, {}, {}, method};
    for (int k = 1; k <= std::max(1, kMaxLife - age); ++k) {
      defender.operating_costs.push_back(cost(age + k, factor));
      defender.market_values.push_back(kFirstCost * fraction(age + k));
    }
    const tax::Rates rates = tax::Rates::make(0.10, tax);
    const replacement::CaseResult r =
        replacement::analyse({rates, challenger, defender, std::nullopt});
    const replacement::Decision& d = *r.decision;
    const int esl = r.challenger.on(r.basis).curve.best_years;
    stored.class_esl_years = esl;
    stored_class.esl_years_before_tax = r.challenger.before_tax.curve.best_years;
    stored_class.euac_before_tax = r.challenger.before_tax.curve.best_euac;
    if (r.challenger.after_tax) {
      stored_class.esl_years_after_tax = r.challenger.after_tax->curve.best_years;
      stored_class.euac_after_tax = r.challenger.after_tax->curve.best_euac;
    }
    // SPEC 11 "Per class": the band by its rule restated here (EUAC(n) <= least + 0.02 |least|,
    // the policy's default esl_band, ties within 1e-9) on the case analysis's curve; the
    // bootstrap percentiles are invented (explain shows them as stored: it has no asset data to
    // draw from).
    const replacement::LifeCurve& curve = r.challenger.on(r.basis).curve;
    for (std::size_t n = 0; n < curve.euac.size(); ++n) {
      if (curve.euac[n] <= curve.best_euac + (0.02 + 1e-9) * std::abs(curve.best_euac)) {
        if (!stored_class.esl_band_low) stored_class.esl_band_low = static_cast<int>(n) + 1;
        stored_class.esl_band_high = static_cast<int>(n) + 1;
      }
    }
    stored_class.esl_p10 = esl - 1;
    stored_class.esl_p90 = esl + 1;
    stored.defender_best_years = d.defender_best_years;
    stored.defender_euac = d.defender_euac;
    stored.challenger_euac = d.challenger_euac;
    stored.defender_euac_before_tax = r.defender->before_tax.curve.best_euac;
    if (r.defender->after_tax) stored.defender_euac_after_tax = r.defender->after_tax->curve.best_euac;
    stored.marginal_cost_next_year = r.defender->on(r.basis).curve.marginal_costs[0];
    stored.replace_after_years = d.timing.keep_years;
    // SPEC 6 "Nightly verdict", by the one rule (review/verdict_rule.h) on the case's figures.
    stored.verdict = review::weigh(
                         review::figures_of(d, *stored.marginal_cost_next_year,
                                            r.defender->on(r.basis).costs.max_years()),
                         age, 1)
                         .verdict;
    // What is at stake, by the one rule (review/at_stake.h) on the case's figures.
    const review::AtStake s = review::at_stake(
        d, *r.defender, defender,
        replacement::price_lines(challenger, r.challenger, rates, r.basis), kChallengerCost,
        rates, 0.05);
    stored.delay_cost = s.delay_cost;
    stored.early_cost = s.early_cost;
    stored.repair_limit = s.repair_limit;
    stored.break_even_price = s.break_even_price;
    stored.break_even_cost_factor = s.break_even_cost_factor;
    stored.close_call = s.close_call;
    stored.reason = "";  // the review's wording; each test fills it or expects it to differ
    result = r;
    policy = run_policy(run);
  }

  results::RunRow run;
  std::shared_ptr<const review::Policy> policy;  // run_policy(run)
  results::ClassRow stored_class;
  results::AssetRow stored;
  std::optional<replacement::CaseResult> result;  // the independent case analysis
};

}  // namespace tenure::explain::testing
