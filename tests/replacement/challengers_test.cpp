// Several challengers and improving technology (SPEC 14, replacement/challengers.h): the
// one-challenger form and a one-element list agree field by field, a dominated challenger is
// never chosen, ties go to the first listed, and the timing with improvement g is checked
// against its closed form. The series are invented.
#include "replacement/challengers.h"

#include <gtest/gtest.h>

#include <cmath>

#include "core/errors.h"
#include "replacement/case_analysis.h"

namespace tenure::replacement {
namespace {

Ownership van(Money price = 60000, double cost_factor = 1,
              depreciation::Spec spec = depreciation::MacrsSpec{5}) {
  const double s = price / 60000;
  std::vector<Money> costs = {4000, 5500, 7000, 8500, 10000, 12500};
  for (Money& c : costs) c *= cost_factor;
  return {price,
          0,
          price,
          costs,
          {45000 * s, 36000 * s, 29000 * s, 23000 * s, 18000 * s, 14000 * s},
          depreciation::make_method(spec)};
}

Ownership old_van() {
  return {38000,
          4,
          14000,
          {9000, 10500, 12000, 14500},
          {11000, 8500, 6500, 5000},
          depreciation::make_method(depreciation::MacrsSpec{5})};
}

Case one_van_case(double tax_rate) {
  return Case{tax::Rates::make(0.10, tax_rate), van(), old_van(), 3};
}

void expect_same_flow(const tax::YearFlow& a, const tax::YearFlow& b) {
  EXPECT_EQ(a.year, b.year);
  EXPECT_EQ(a.operating_cost, b.operating_cost);
  EXPECT_EQ(a.depreciation, b.depreciation);
  EXPECT_EQ(a.book_value, b.book_value);
  EXPECT_EQ(a.taxable_income, b.taxable_income);
  EXPECT_EQ(a.income_tax, b.income_tax);
  EXPECT_EQ(a.after_tax_cash_flow, b.after_tax_cash_flow);
}

void expect_same_sale(const tax::SaleFlow& a, const tax::SaleFlow& b) {
  EXPECT_EQ(a.market_value, b.market_value);
  EXPECT_EQ(a.depreciation_in_year, b.depreciation_in_year);
  EXPECT_EQ(a.book_value, b.book_value);
  EXPECT_EQ(a.gain, b.gain);
  EXPECT_EQ(a.tax, b.tax);
  EXPECT_EQ(a.net_proceeds, b.net_proceeds);
}

void expect_same_basis(const BasisAnalysis& a, const BasisAnalysis& b) {
  ASSERT_EQ(a.costs.max_years(), b.costs.max_years());
  EXPECT_EQ(a.costs.rate(), b.costs.rate());
  for (Years n = 0; n <= a.costs.max_years(); ++n)
    EXPECT_EQ(a.costs.pw_cost(n), b.costs.pw_cost(n));
  EXPECT_EQ(a.curve.euac, b.curve.euac);
  EXPECT_EQ(a.curve.marginal_costs, b.curve.marginal_costs);
  EXPECT_EQ(a.curve.best_years, b.curve.best_years);
  EXPECT_EQ(a.curve.best_euac, b.curve.best_euac);
}

void expect_same_asset(const AssetAnalysis& a, const AssetAnalysis& b) {
  expect_same_basis(a.before_tax, b.before_tax);
  ASSERT_EQ(a.after_tax.has_value(), b.after_tax.has_value());
  if (a.after_tax) expect_same_basis(*a.after_tax, *b.after_tax);
  expect_same_sale(a.table.start, b.table.start);
  ASSERT_EQ(a.table.years.size(), b.table.years.size());
  for (std::size_t k = 0; k < a.table.years.size(); ++k) {
    expect_same_flow(a.table.years[k].kept, b.table.years[k].kept);
    expect_same_flow(a.table.years[k].sold, b.table.years[k].sold);
    expect_same_sale(a.table.years[k].sale, b.table.years[k].sale);
  }
}

void expect_same_result(const CaseResult& a, const CaseResult& b) {
  EXPECT_EQ(a.basis, b.basis);
  expect_same_asset(a.challenger, b.challenger);
  ASSERT_TRUE(a.defender && b.defender);
  expect_same_asset(*a.defender, *b.defender);
  ASSERT_TRUE(a.decision && b.decision);
  EXPECT_EQ(a.decision->basis, b.decision->basis);
  EXPECT_EQ(a.decision->timing.present_worth, b.decision->timing.present_worth);
  EXPECT_EQ(a.decision->timing.keep_years, b.decision->timing.keep_years);
  EXPECT_EQ(a.decision->challenger_euac, b.decision->challenger_euac);
  EXPECT_EQ(a.decision->challenger_esl, b.decision->challenger_esl);
  EXPECT_EQ(a.decision->defender_euac, b.decision->defender_euac);
  EXPECT_EQ(a.decision->defender_best_years, b.decision->defender_best_years);
  EXPECT_EQ(a.decision->challenger_euac_by_year, b.decision->challenger_euac_by_year);
  EXPECT_EQ(a.decision->challenger_esl_by_year, b.decision->challenger_esl_by_year);
  ASSERT_TRUE(a.study_period && b.study_period);
  EXPECT_EQ(a.study_period->years, b.study_period->years);
  EXPECT_EQ(a.study_period->best_defender_years, b.study_period->best_defender_years);
  ASSERT_EQ(a.study_period->options.size(), b.study_period->options.size());
  for (std::size_t j = 0; j < a.study_period->options.size(); ++j) {
    EXPECT_EQ(a.study_period->options[j].defender_years, b.study_period->options[j].defender_years);
    EXPECT_EQ(a.study_period->options[j].present_worth_cost,
              b.study_period->options[j].present_worth_cost);
  }
}

TEST(Challengers, OneChallengerInBothFormsGivesIdenticalResults) {
  for (double tax_rate : {0.0, 0.25}) {
    for (double improvement : {0.0, 0.02}) {
      Case single = one_van_case(tax_rate);
      single.improvement = improvement;
      Case listed = single;
      listed.challenger = van(1);  // not read in the list form: a wrong value must not matter
      listed.challengers = {{"diesel", van()}};
      const CaseResult a = analyse(single);
      const CaseResult b = analyse(listed);
      expect_same_result(a, b);
      EXPECT_EQ(b.chosen, 0u);
      ASSERT_EQ(b.challengers.size(), 1u);
      expect_same_asset(b.challengers[0], a.challenger);
    }
  }
}

TEST(Challengers, DominatedChallengerIsNeverChosen) {
  // "dear" costs more to buy and more to run each year than "lean", with the same value
  // fraction; listed first, so a tie rule alone would pick it.
  for (double tax_rate : {0.0, 0.25}) {
    for (Money extra_price : {1.0, 5000.0, 40000.0}) {
      for (double extra_cost : {1.0, 1.01, 1.5}) {
        Case c = one_van_case(tax_rate);
        c.challengers = {{"dear", van(60000 + extra_price, extra_cost)}, {"lean", van()}};
        const CaseResult r = analyse(c);
        EXPECT_EQ(r.chosen, 1u) << extra_price << " " << extra_cost;
        expect_same_asset(r.challenger, r.challengers[1]);
        EXPECT_EQ(r.decision->challenger_euac, r.challengers[1].on(r.basis).curve.best_euac);
      }
    }
  }
}

TEST(Challengers, BestOnTheBasisIsWeighedAndTiesGoToTheFirstListed) {
  Case c = one_van_case(0.25);
  c.challengers = {{"a", van()}, {"b", van()}, {"cheap-to-run", van(60000, 0.6)}};
  CaseResult r = analyse(c);
  EXPECT_EQ(r.chosen, 2u);
  EXPECT_LT(r.challengers[2].on(r.basis).curve.best_euac,
            r.challengers[0].on(r.basis).curve.best_euac);
  c.challengers.pop_back();
  r = analyse(c);
  EXPECT_EQ(r.chosen, 0u);  // "a" and "b" are equal: the first listed
}

TEST(Challengers, ListErrorsNameTheJsonPath) {
  Case c = one_van_case(0.25);
  c.challengers = {{"a", van()}, {"a", van()}};
  try {
    analyse(c);
    FAIL() << "duplicate names accepted";
  } catch (const InputError& e) {
    EXPECT_STREQ(e.what(), "$.challengers[1].name: duplicate challenger name 'a'");
  }
  c.challengers = {{"a", van()}, {"b", van()}};
  c.challengers[1].asset.first_cost = 0;
  EXPECT_THROW(analyse(c), InputError);
  c.challengers[1].asset.first_cost = 60000;
  for (double g : {-0.01, 1.0}) {
    c.improvement = g;
    try {
      analyse(c);
      FAIL() << "improvement " << g << " accepted";
    } catch (const InputError& e) {
      EXPECT_STREQ(e.what(), "$.improvement: must be in [0, 1)");
    }
  }
}

TEST(Improvement, ZeroLeavesEveryLaterChallengerAsToday) {
  const tax::Rates rates = tax::Rates::make(0.10, 0.25);
  const ImprovedChallengers later = improved_least_euacs(van(), rates, Basis::after_tax, 0, 4);
  const LifeCurve today = analyse_asset(van(), rates).after_tax->curve;
  ASSERT_EQ(later.least_euac.size(), 5u);
  for (std::size_t k = 0; k < 5; ++k) {
    EXPECT_EQ(later.least_euac[k], today.best_euac);
    EXPECT_EQ(later.esl_years[k], today.best_years);
  }
}

TEST(Improvement, ScalesEveryAmountSoTheLeastEuacScalesToo) {
  // Rule (2) scales every amount, and every cash flow (taxes included) is linear in them, so
  // C*_k = (1 - g)^k C*_0 with the same economic life, before and after tax.
  const tax::Rates rates = tax::Rates::make(0.10, 0.25);
  for (const Basis basis : {Basis::before_tax, Basis::after_tax}) {
    const ImprovedChallengers later = improved_least_euacs(
        van(60000, 1, depreciation::StraightLineSpec{5, 6000}), rates, basis, 0.04, 6);
    for (std::size_t k = 0; k < later.least_euac.size(); ++k) {
      EXPECT_NEAR(later.least_euac[k], std::pow(0.96, k) * later.least_euac[0],
                  1e-9 * later.least_euac[0]);
      EXPECT_EQ(later.esl_years[k], later.esl_years[0]);
    }
  }
}

TEST(Improvement, TimingMatchesItsClosedFormForAConstantCostChallenger) {
  // Before tax (t = 0), no depreciation, values 0. The challenger: price P, cost c every year
  // for N years. EUAC(n) = P (A/P,i,n) + c falls with n, so its economic life is N and
  // C*_0 = P (A/P,i,N) + c. Bought k years later every amount is (1-g)^k times as large, so
  // C*_k = (1-g)^k C*_0. The defender: worth V now, cost d a year, worth 0 later; PWcost(0) = 0
  // and PWcost(k) = V + d (1 - (1+i)^-k) / i for k >= 1. So (SPEC 14)
  //   T(0) = C*_0 / i,   T(k) = V + d (1 - (1+i)^-k) / i + ((1-g)/(1+i))^k C*_0 / i.
  const double i = 0.10, g = 0.03, P = 50000, c = 3000, V = 5000, d = 9000;
  const int N = 5;
  const Ownership challenger{P,
                             0,
                             P,
                             std::vector<Money>(N, c),
                             std::vector<Money>(N, 0.0),
                             depreciation::make_method(depreciation::NoDepreciationSpec{})};
  const Ownership defender{30000,
                           6,
                           V,
                           std::vector<Money>(4, d),
                           std::vector<Money>(4, 0.0),
                           depreciation::make_method(depreciation::NoDepreciationSpec{})};
  Case input{tax::Rates::make(i, 0), challenger, defender, std::nullopt};
  input.improvement = g;
  const Decision decision = *analyse(input).decision;
  const double c_star = P * i / (1 - std::pow(1 + i, -N)) + c;
  ASSERT_EQ(decision.timing.present_worth.size(), 5u);
  EXPECT_NEAR(decision.timing.present_worth[0], c_star / i, 1e-9 * c_star / i);
  for (int k = 1; k <= 4; ++k) {
    const double t =
        V + d * (1 - std::pow(1 + i, -k)) / i + std::pow((1 - g) / (1 + i), k) * c_star / i;
    EXPECT_NEAR(decision.timing.present_worth[static_cast<std::size_t>(k)], t, 1e-9 * t) << k;
    EXPECT_NEAR(decision.challenger_euac_by_year[static_cast<std::size_t>(k)],
                std::pow(1 - g, k) * c_star, 1e-9 * c_star);
    EXPECT_EQ(decision.challenger_esl_by_year[static_cast<std::size_t>(k)], N);
  }
}

TEST(Improvement, DecideReadsTheYearsItNeedsFromALongerList) {
  // A class computes C*_k once over its longest life; each defender reads its own years.
  Case c = one_van_case(0.25);
  c.improvement = 0.03;
  const CaseResult r = analyse(c);
  const ImprovedChallengers later =
      improved_least_euacs(c.challenger, c.rates, Basis::after_tax, 0.03, 12);
  const Decision d = decide(*r.defender, r.challenger, c.rates, &later);
  EXPECT_EQ(d.timing.present_worth, r.decision->timing.present_worth);
  EXPECT_EQ(d.challenger_euac_by_year, r.decision->challenger_euac_by_year);
  ASSERT_EQ(d.challenger_euac_by_year.size(), 5u);  // k = 0..4, the defender's four years
  const ImprovedChallengers too_few =
      improved_least_euacs(c.challenger, c.rates, Basis::after_tax, 0.03, 3);
  EXPECT_THROW(decide(*r.defender, r.challenger, c.rates, &too_few), RuntimeFailure);
}

TEST(Improvement, NeverBringsTheReplacementEarlier) {
  // T_g(k) - T_0(k) = (P/F,i,k) ((1-g)^k - 1) C*_0 / i falls with k, so adding it cannot move
  // the least T(k) to an earlier k: k*(g) >= k*(0). (A challenger that gets cheaper is worth
  // waiting for; SPEC 14's T(k) can only delay the replacement, never hasten it.)
  int grew = 0;
  for (double tax_rate : {0.0, 0.25}) {
    for (double defender_factor : {0.5, 0.8, 1.0, 1.3, 2.0}) {
      Case c = one_van_case(tax_rate);
      for (Money& cost : c.defender->operating_costs) cost *= defender_factor;
      const Years today = analyse(c).decision->timing.keep_years;
      Years previous = today;
      for (double g : {0.005, 0.01, 0.03, 0.1, 0.3}) {
        c.improvement = g;
        const Years k = analyse(c).decision->timing.keep_years;
        EXPECT_GE(k, previous) << tax_rate << " " << defender_factor << " " << g;
        previous = k;
      }
      if (previous > today) ++grew;
    }
  }
  EXPECT_GT(grew, 0);  // the property is not vacuous: some replacements are delayed
}

}  // namespace
}  // namespace tenure::replacement
