// The class market-value curve of fleet/value_curve.h: exact log-linear fits and the policy
// fallback.
#include "fleet/value_curve.h"

#include <gtest/gtest.h>

#include <cmath>
#include <stdexcept>

#include "core/errors.h"

namespace tenure::fleet {
namespace {

constexpr double kExact = 1e-9;  // relative tolerance for fits of noiseless data

Date d(const char* iso) {
  auto date = parse_iso_date(iso);
  if (!date) throw std::invalid_argument(iso);
  return *date;
}

// A valuation exactly on the curve 0.9 * 0.85^age, age in days / 365.25 (closed form).
Money on_curve(Date in_service, Money first_cost, Date valued_on) {
  return first_cost * 0.9 * std::pow(0.85, years_between(in_service, valued_on));
}

TEST(ValueCurve, FitIsExactOnNoiselessValuations) {
  ValuationPool pool;
  const Date van = d("2016-05-20"), truck = d("2019-11-02");
  for (const char* when : {"2017-01-15", "2019-08-30", "2023-02-28"}) {
    EXPECT_EQ(pool.add(van, 40000, d(when), on_curve(van, 40000, d(when))), ValuationFate::used);
  }
  for (const char* when : {"2020-01-01", "2024-12-31"}) {
    pool.add(truck, 85000, d(when), on_curve(truck, 85000, d(when)));
  }
  const ValueCurve curve = fit_value_curve(pool, 0.18);
  EXPECT_EQ(curve.model, ValueModel::fitted);
  EXPECT_NEAR(curve.value_start, 0.9, 0.9 * kExact);
  EXPECT_NEAR(curve.value_decline, 0.15, 0.15 * kExact);
  EXPECT_EQ(curve.valuations_used, 5u);
  EXPECT_NEAR(curve.fraction_at(2.0), 0.9 * 0.85 * 0.85, kExact);  // closed form
}

TEST(ValueCurve, FallsBackToThePolicyWhenValuationsAreTooFew) {
  ValuationPool pool;
  const Date unit = d("2020-01-01");
  pool.add(unit, 1000, d("2021-01-01"), 800);
  pool.add(unit, 1000, d("2022-01-01"), 700);
  ValueCurve curve = fit_value_curve(pool, 0.18);  // two valuations: fewer than 3
  EXPECT_EQ(curve.model, ValueModel::policy);
  EXPECT_EQ(curve.value_start, 1.0);
  EXPECT_EQ(curve.value_decline, 0.18);
  EXPECT_EQ(curve.valuations_used, 0u);
  EXPECT_NEAR(curve.fraction_at(3.0), std::pow(0.82, 3), 1e-15);  // closed form
  pool.add(unit, 1000, d("2023-01-01"), 600);
  EXPECT_EQ(fit_value_curve(pool, 0.18).model, ValueModel::fitted);
}

TEST(ValueCurve, NeedsTwoDistinctAges) {
  ValuationPool pool;
  for (Money amount : {500.0, 600.0, 700.0}) pool.add(d("2020-01-01"), 1000, d("2022-06-01"), amount);
  EXPECT_EQ(pool.used(), 3u);
  EXPECT_EQ(fit_value_curve(pool, 0.2).model, ValueModel::policy);
}

TEST(ValueCurve, ExcludesNonPositiveAndRejectsBadRows) {
  ValuationPool pool;
  const Date unit = d("2020-01-01");
  EXPECT_EQ(pool.add(unit, 1000, d("2021-01-01"), 0), ValuationFate::non_positive_fraction);
  EXPECT_EQ(pool.add(unit, 1000, d("2021-01-01"), -5), ValuationFate::non_positive_fraction);
  EXPECT_EQ(pool.add(unit, 1000, d("2019-12-31"), 900), ValuationFate::before_in_service);
  EXPECT_EQ(pool.add(unit, 1000, d("2021-01-01"), std::nan("")), ValuationFate::non_finite_amount);
  EXPECT_THROW(pool.add(unit, 0, d("2021-01-01"), 900), InputError);
  EXPECT_EQ(pool.used(), 0u);
  EXPECT_EQ(pool.excluded_non_positive(), 2u);
}

TEST(ValueCurve, KeepsARisingCurve) {
  // Closed form: fraction 0.5 * 1.1^age (a unit that gains value), valued at ages 0, 4 and 8
  // (2020-01-01 + 1461 and 2922 days, whole multiples of 365.25).
  ValuationPool pool;
  const Date unit = d("2020-01-01");
  pool.add(unit, 1000, d("2020-01-01"), 500);
  pool.add(unit, 1000, d("2024-01-01"), 500 * std::pow(1.1, 4));
  pool.add(unit, 1000, d("2028-01-01"), 500 * std::pow(1.1, 8));
  const ValueCurve curve = fit_value_curve(pool, 0.18);
  EXPECT_EQ(curve.model, ValueModel::fitted);
  EXPECT_NEAR(curve.value_start, 0.5, 0.5 * kExact);
  EXPECT_NEAR(curve.value_decline, -0.1, 0.1 * kExact);
}

TEST(ValueCurve, RejectsImpossiblePolicyDecline) {
  EXPECT_THROW(policy_value_curve(1.0), InputError);
  EXPECT_THROW(policy_value_curve(std::nan("")), InputError);
  EXPECT_THROW(fit_value_curve(ValuationPool{}, 1.5), InputError);
  EXPECT_EQ(name(ValueModel::policy), "policy");
}

}  // namespace
}  // namespace tenure::fleet
