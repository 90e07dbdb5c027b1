// Properties of the replacement analysis that hold whatever the numbers (closed-form identities
// of SPEC section 6), on small invented series.
#include <gtest/gtest.h>

#include "interest/factors.h"
#include "replacement/case_analysis.h"

namespace tenure::replacement {
namespace {

constexpr double kTol = 1e-9;

Ownership challenger(depreciation::Spec spec = depreciation::StraightLineSpec{5, 0}) {
  return {60000, 0, 60000, {4000, 5500, 7000, 8500, 10000, 12500},
          {45000, 36000, 29000, 23000, 18000, 14000}, depreciation::make_method(spec)};
}

Ownership defender(std::vector<Money> costs = {9000, 10500, 12000},
                   std::vector<Money> values = {11000, 8500, 6500}) {
  return {38000, 4, 14000, std::move(costs), std::move(values),
          depreciation::make_method(depreciation::MacrsSpec{5})};
}

TEST(Properties, HandWorkedBeforeTaxEconomicLife) {
  // Invented series, worked by hand at i = 10%: first cost 10000, costs 1000/2000/3000,
  // values 7000/5000/3000. EUAC(1) = 10000*1.1 - 7000 + 1000 = 5000;
  // EUAC(2) = (10000 + 1000/1.1 - 3000/1.21) * (A/P,10%,2) = 34000/7 = 4857.142857...;
  // EUAC(3) = (10000 + 1000/1.1 + 2000/1.21) * (A/P,10%,3) = 5051.36...; so the ESL is 2 years.
  const Ownership unit{10000, 0, 10000, {1000, 2000, 3000}, {7000, 5000, 3000},
                       depreciation::make_method(depreciation::NoDepreciationSpec{})};
  const LifeCurve curve = life_curve(before_tax_keeping_costs(unit, 0.10));
  EXPECT_NEAR(curve.euac[0], 5000.0, 1e-9);
  EXPECT_NEAR(curve.euac[1], 34000.0 / 7.0, 1e-9);
  EXPECT_NEAR(curve.euac[2], (10000 + 1000 / 1.1 + 2000 / 1.21) * 0.1 * 1.331 / 0.331, 1e-9);
  EXPECT_EQ(curve.best_years, 2);
  // Marginal costs: MV_{k-1}(1+i) - MV_k + c_k = 5000, 4700, 5500.
  EXPECT_NEAR(curve.marginal_costs[0], 5000.0, 1e-9);
  EXPECT_NEAR(curve.marginal_costs[1], 4700.0, 1e-9);
  EXPECT_NEAR(curve.marginal_costs[2], 5500.0, 1e-9);
}

TEST(Properties, AfterTaxWithZeroTaxEqualsBeforeTax) {
  const auto rates = tax::Rates::make(0.10, 0.0);
  for (const auto& asset : {challenger(depreciation::MacrsSpec{7}), defender()}) {
    const KeepingCosts before = before_tax_keeping_costs(asset, rates.marr);
    const KeepingCosts after = after_tax_keeping_costs(asset, rates);
    for (Years n = 0; n <= asset.max_years(); ++n) {
      EXPECT_NEAR(before.pw_cost(n), after.pw_cost(n), kTol * before.pw_cost(asset.max_years()));
    }
  }
}

TEST(Properties, MarginalCostsDiscountedSumToPresentWorth) {
  // sum_{k<=n} MC_k (P/F,i,k) = PWcost(n) - PWcost(0), the telescoping identity of SPEC 6.
  const auto rates = tax::Rates::make(0.12, 0.3);
  for (const auto& asset : {challenger(), defender()}) {
    for (const auto& costs : {before_tax_keeping_costs(asset, rates.marr),
                              after_tax_keeping_costs(asset, rates)}) {
      double sum = 0;
      for (Years k = 1; k <= costs.max_years(); ++k) {
        sum += costs.marginal_cost(k) * interest::pf(costs.rate(), k);
        EXPECT_NEAR(sum, costs.pw_cost(k) - costs.pw_cost(0), kTol * std::abs(costs.pw_cost(k)));
      }
    }
  }
}

TEST(Properties, BeforeTaxMarginalCostIsLostValuePlusInterestPlusOperatingCost) {
  // MC_k = MV_{k-1}(1+i) - MV_k + c_k before tax (closed form), with MV_0 the value now.
  const Ownership d = defender();
  const KeepingCosts costs = before_tax_keeping_costs(d, 0.10);
  EXPECT_NEAR(costs.marginal_cost(1), 14000 * 1.1 - 11000 + 9000, 1e-9);
  EXPECT_NEAR(costs.marginal_cost(2), 11000 * 1.1 - 8500 + 10500, 1e-9);
  EXPECT_NEAR(costs.marginal_cost(3), 8500 * 1.1 - 6500 + 12000, 1e-9);
}

TEST(Properties, DefenderWhoseCostsJumpIsReplacedNow) {
  const auto rates = tax::Rates::make(0.10, 0.25);
  Case c{rates, challenger(), defender({90000, 95000, 99000}, {11000, 8500, 6500}), std::nullopt};
  const CaseResult r = analyse(c);
  ASSERT_TRUE(r.decision);
  EXPECT_EQ(r.decision->timing.keep_years, 0);  // replace now (review/verdict_rule.h rule (1))
}

TEST(Properties, CheapDefenderIsKept) {
  const auto rates = tax::Rates::make(0.10, 0.25);
  Case c{rates, challenger(), defender({500, 600, 700}, {13500, 13000, 12500}), std::nullopt};
  const CaseResult r = analyse(c);
  EXPECT_GT(r.decision->timing.keep_years, 0);  // keep (rule (4) for a case)
}

TEST(Properties, StudyPeriodOfOneYearComparesOneYearAnnualWorths) {
  // With T = 1 the options are "challenger 1 year" (j = 0) and "defender 1 year" (j = 1); their
  // present worths are EUAC(1) / (1 + i), so the lower one-year EUAC wins.
  for (double t : {0.0, 0.3}) {
    const auto rates = tax::Rates::make(0.10, t);
    Case c{rates, challenger(), defender(), 1};
    const CaseResult r = analyse(c);
    const Basis b = r.basis;
    const double i = b == Basis::after_tax ? rates.after_tax_marr : rates.marr;
    ASSERT_EQ(r.study_period->options.size(), 2u);
    const double ch1 = r.challenger.on(b).curve.euac[0];
    const double def1 = r.defender->on(b).curve.euac[0];
    EXPECT_NEAR(r.study_period->options[0].present_worth_cost, ch1 / (1 + i), 1e-6);
    EXPECT_NEAR(r.study_period->options[1].present_worth_cost, def1 / (1 + i), 1e-6);
    EXPECT_EQ(r.study_period->best_defender_years, def1 < ch1 ? 1 : 0);
  }
}

TEST(Properties, TiesWithinTheToleranceGoToTheShorterLife) {
  // SPEC 6: equal within 1e-9 relative goes to the shorter life or the earlier year.
  EXPECT_EQ(least_with_ties({5.0, 5.0 * (1 + 1e-12), 7.0}), 0u);
  EXPECT_EQ(least_with_ties({7.0, 5.0, 5.0 * (1 - 1e-12)}), 1u);
  EXPECT_EQ(least_with_ties({7.0, 5.0, 4.9}), 2u);
}

TEST(Properties, NewChallengerSaleNowBearsNoTax) {
  const auto rates = tax::Rates::make(0.10, 0.35);
  const AfterTaxTable table = after_tax_table(challenger(depreciation::MacrsSpec{5}), rates);
  EXPECT_DOUBLE_EQ(table.start.tax, 0.0);
  EXPECT_DOUBLE_EQ(table.start.net_proceeds, 60000.0);
}

TEST(Properties, DefenderOpportunityCostIsAfterTaxSaleNow) {
  // Basis 38000, MACRS 5-year, 4 completed years: book = 38000 * (5.76 + 11.52)% = 6566.40
  // (IRS Publication 946 Table A-1 rates); sale at 14000 gains 7433.60, taxed at 25%.
  const auto rates = tax::Rates::make(0.10, 0.25);
  const AfterTaxTable table = after_tax_table(defender(), rates);
  EXPECT_NEAR(table.start.book_value, 6566.40, 1e-9);
  EXPECT_NEAR(table.start.tax, 0.25 * (14000 - 6566.40), 1e-9);
}

}  // namespace
}  // namespace tenure::replacement
