// The engine against the plain reference model (reference_model.h) on random cases of every
// depreciation method, tax setting, defender age and study period. Tolerance: relative 1e-9
// (both sides are double-precision sums of the same terms in a different order).
#include <gtest/gtest.h>

#include <random>

#include "replacement/case_analysis.h"
#include "reference_model.h"

namespace tenure::replacement {
namespace {

constexpr double kRelTol = 1e-9;

void expect_close(double expected, double actual, const char* what) {
  EXPECT_NEAR(expected, actual, kRelTol * std::max(1.0, std::abs(expected))) << what;
}

depreciation::Spec random_spec(std::mt19937& rng) {
  std::uniform_int_distribution<int> pick(0, 4), life(1, 12), macrs(0, 5);
  std::uniform_real_distribution<double> frac(0.0, 0.2), rate(1.0, 2.5);
  const int recovery[] = {3, 5, 7, 10, 15, 20};
  switch (pick(rng)) {
    case 0: return depreciation::StraightLineSpec{life(rng), 0};
    case 1: return depreciation::DecliningBalanceSpec{life(rng), rate(rng), 0, pick(rng) % 2 == 0};
    case 2: return depreciation::SumOfYearsDigitsSpec{life(rng), 0};
    case 3: return depreciation::MacrsSpec{recovery[macrs(rng)]};
    default: return depreciation::NoDepreciationSpec{};
  }
}

Ownership random_asset(std::mt19937& rng, Years age, int years) {
  std::uniform_real_distribution<double> cost(20000, 90000), u(0, 1);
  Ownership a;
  a.first_cost = cost(rng);
  a.age_years = age;
  double value = a.first_cost * (age == 0 ? 1.0 : std::pow(0.8, age) * (0.6 + 0.8 * u(rng)));
  a.value_now = age == 0 ? a.first_cost : value;
  double op = 2000 + 6000 * u(rng);
  for (int k = 0; k < years; ++k) {
    op *= 1.0 + 0.3 * u(rng);
    value *= 0.6 + 0.35 * u(rng);
    // Now and then a value above the basis, to exercise the capital-gains branch.
    a.operating_costs.push_back(op);
    a.market_values.push_back(u(rng) < 0.05 ? a.first_cost * 1.1 : value);
  }
  auto spec = random_spec(rng);
  if (auto* sl = std::get_if<depreciation::StraightLineSpec>(&spec)) sl->salvage = 0.1 * a.first_cost * u(rng);
  a.depreciation = depreciation::make_method(spec);
  return a;
}

TEST(RandomCases, EngineAgreesWithReferenceModel) {
  std::mt19937 rng(20261202);
  std::uniform_real_distribution<double> marr(0.03, 0.18), tax(0.0, 0.45), u(0, 1);
  std::uniform_int_distribution<int> years(1, 16), age(0, 12), study(1, 6);
  for (int trial = 0; trial < 400; ++trial) {
    const double t = trial % 5 == 0 ? 0.0 : tax(rng);
    const auto rates = tax::Rates::make(marr(rng), t, std::nullopt,
                                        trial % 3 == 0 ? std::optional<double>(0.15) : std::nullopt);
    Case c{rates, random_asset(rng, 0, years(rng)), random_asset(rng, age(rng), years(rng)),
           study(rng)};
    c.study_period_years = std::min<int>(*c.study_period_years, c.challenger.max_years());
    const CaseResult r = analyse(c);
    SCOPED_TRACE(testing::Message() << "trial " << trial);
    for (bool after : {false, true}) {
      if (after && !rates.after_tax()) {
        EXPECT_FALSE(r.challenger.after_tax.has_value());
        continue;
      }
      const Basis basis = after ? Basis::after_tax : Basis::before_tax;
      for (const auto* pair : {&c.challenger, &*c.defender}) {
        const AssetAnalysis& a = pair == &c.challenger ? r.challenger : *r.defender;
        const LifeCurve& curve = a.on(basis).curve;
        for (Years n = 1; n <= pair->max_years(); ++n) {
          expect_close(reference::euac(*pair, n, after, rates), curve.euac[std::size_t(n - 1)], "euac");
        }
      }
    }
    // k* by brute force over the reference model.
    const bool after = rates.after_tax();
    const double i = after ? rates.after_tax_marr : rates.marr;
    double best_ch = 1e300;
    for (Years n = 1; n <= c.challenger.max_years(); ++n) {
      best_ch = std::min(best_ch, reference::euac(c.challenger, n, after, rates));
    }
    expect_close(best_ch, r.decision->challenger_euac, "challenger least euac");
    for (Years k = 0; k <= c.defender->max_years(); ++k) {
      const double total = reference::pw_cost(*c.defender, k, after, rates) +
                           best_ch / i / std::pow(1 + i, k);
      expect_close(total, r.decision->timing.present_worth[std::size_t(k)], "timing");
    }
    // Study period options.
    for (const auto& option : r.study_period->options) {
      const Years j = option.defender_years;
      const double expected = reference::pw_cost(*c.defender, j, after, rates) +
                              reference::pw_cost(c.challenger, *c.study_period_years - j, after, rates) /
                                  std::pow(1 + i, j);
      expect_close(expected, option.present_worth_cost, "study option");
    }
  }
}

}  // namespace
}  // namespace tenure::replacement
