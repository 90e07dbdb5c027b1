// Restating costs (fleet/escalation.h) and totals per asset and complete age-year
// (fleet/cost_history.h).
#include "fleet/cost_history.h"

#include <gtest/gtest.h>

#include <cmath>
#include <limits>
#include <stdexcept>
#include <vector>

#include "core/errors.h"

namespace tenure::fleet {
namespace {

Date d(const char* iso) {
  auto date = parse_iso_date(iso);
  if (!date) throw std::invalid_argument(iso);
  return *date;
}

std::vector<Money> costs(const CostHistory& history, CostHistory::AssetIndex asset) {
  auto span = history.year_costs(asset);
  return {span.begin(), span.end()};
}

TEST(Escalation, RestatesByFractionalYears) {
  const Escalation e(d("2024-01-01"), 0.03);
  // Closed form: 1461 days are exactly 4 years of 365.25 days, so the factor is 1.03^4.
  EXPECT_NEAR(e.restate(d("2020-01-01"), 1000.0), 1000.0 * 1.12550881, 1e-9);
  // Closed form: 365 days are 365/365.25 years.
  EXPECT_NEAR(e.factor(d("2023-01-01")), std::pow(1.03, 365 / 365.25), 1e-15);
  EXPECT_EQ(e.factor(d("2024-01-01")), 1.0);  // same day: no restatement
}

TEST(Escalation, ZeroRateKeepsAmountsExactly) {
  const Escalation e(d("2024-01-01"), 0.0);
  EXPECT_EQ(e.restate(d("1990-07-15"), 1234.56), 1234.56);
}

TEST(Escalation, RejectsRatesAtOrBelowMinusOne) {
  EXPECT_THROW(Escalation(d("2024-01-01"), -1.0), InputError);
  EXPECT_THROW(Escalation(d("2024-01-01"), std::nan("")), InputError);
}

TEST(CostHistory, TotalsCompleteAgeYearsOnly) {
  CostHistory history(d("2024-06-30"), 0.0);
  const auto pump = history.add_asset(d("2020-03-10"), std::nullopt);
  // Hand computed: anniversaries 2021..2024-03-10 are all on or before 2024-06-30, so 4 years.
  ASSERT_EQ(history.complete_years(pump), 4);
  EXPECT_EQ(history.add_event(pump, d("2020-03-10"), 100), EventFate::counted);  // year 1
  EXPECT_EQ(history.add_event(pump, d("2021-03-09"), 50), EventFate::counted);   // year 1
  EXPECT_EQ(history.add_event(pump, d("2021-03-10"), 70), EventFate::counted);   // year 2
  EXPECT_EQ(history.add_event(pump, d("2024-03-09"), -20), EventFate::counted);  // year 4, credit
  EXPECT_EQ(history.add_event(pump, d("2024-03-10"), 999), EventFate::outside_complete_years);
  EXPECT_EQ(history.add_event(pump, d("2025-01-01"), 999), EventFate::outside_complete_years);
  EXPECT_EQ(history.add_event(pump, d("2020-03-09"), 999), EventFate::before_in_service);
  EXPECT_EQ(history.add_event(pump, d("2022-01-01"), std::numeric_limits<double>::infinity()),
            EventFate::non_finite_amount);
  EXPECT_EQ(costs(history, pump), (std::vector<Money>{150, 70, 0, -20}));
}

TEST(CostHistory, RetirementEndsTheCompleteYears) {
  CostHistory history(d("2024-06-30"), 0.0);
  const auto van = history.add_asset(d("2018-01-01"), d("2021-07-01"));
  // Hand computed: anniversaries 2019, 2020, 2021-01-01 are on or before retirement: 3 years.
  ASSERT_EQ(history.complete_years(van), 3);
  EXPECT_EQ(history.add_event(van, d("2020-12-31"), 10), EventFate::counted);  // year 3
  EXPECT_EQ(history.add_event(van, d("2021-07-01"), 10), EventFate::outside_complete_years);
  EXPECT_EQ(history.add_event(van, d("2021-07-02"), 10), EventFate::after_retirement);
  EXPECT_EQ(costs(history, van), (std::vector<Money>{0, 0, 10}));
}

TEST(CostHistory, RestatesEachEventToAsOfMoney) {
  CostHistory history(d("2024-01-01"), 0.03);
  const auto unit = history.add_asset(d("2019-01-01"), std::nullopt);
  history.add_event(unit, d("2020-01-01"), 1000);  // age-year 2
  history.add_event(unit, d("2020-01-01"), 500);
  // Closed form: 1461 days to the as-of date are 4 years, factor 1.03^4 = 1.12550881.
  EXPECT_NEAR(history.year_costs(unit)[1], 1500 * 1.12550881, 1e-9);
}

TEST(CostHistory, KeepsAssetsApartInAnyEventOrder) {
  CostHistory history(d("2024-01-01"), 0.0);
  const auto a = history.add_asset(d("2021-01-01"), std::nullopt);
  const auto b = history.add_asset(d("2023-06-01"), std::nullopt);  // no complete year yet
  const auto c = history.add_asset(d("2022-01-01"), std::nullopt);
  history.add_event(c, d("2022-05-01"), 3);
  history.add_event(a, d("2021-05-01"), 1);
  EXPECT_EQ(history.add_event(b, d("2023-07-01"), 2), EventFate::outside_complete_years);
  history.add_event(a, d("2023-05-01"), 4);
  EXPECT_EQ(history.asset_count(), 3u);
  EXPECT_EQ(costs(history, a), (std::vector<Money>{1, 0, 4}));
  EXPECT_TRUE(costs(history, b).empty());
  EXPECT_EQ(costs(history, c), (std::vector<Money>{3, 0}));
}

TEST(CostHistory, SumsAreExactMillionths) {
  CostHistory history(d("2024-01-01"), 0.0);
  const auto unit = history.add_asset(d("2020-01-01"), std::nullopt);
  // Ten dimes make exactly one unit (a running double sum gives 0.9999999999999999).
  for (int i = 0; i < 10; ++i) history.add_event(unit, d("2020-02-01"), 0.1);
  // Amounts are rounded to the nearest millionth (ties to even) as they are added.
  history.add_event(unit, d("2021-02-01"), 0.0000004);
  history.add_event(unit, d("2021-02-01"), 2.0000006);
  EXPECT_EQ(costs(history, unit)[0], 1.0);
  EXPECT_EQ(costs(history, unit)[1], 2.000001);
}

TEST(CostHistory, PartsMergedEqualOnePassInAnyOrder) {
  // Invented events (deterministic pseudo-random amounts with cents and restatement) added in
  // order, in reverse order, and split in two parts that are merged: the totals are identical.
  CostHistory forward(d("2026-11-30"), 0.031);
  std::vector<CostHistory::AssetIndex> assets;
  for (int a = 0; a < 5; ++a) assets.push_back(forward.add_asset(d("2015-04-01"), std::nullopt));
  CostHistory backward = forward.empty_copy();
  CostHistory first_half = forward.empty_copy();
  CostHistory second_half = forward.empty_copy();
  struct Event { CostHistory::AssetIndex asset; Date day; Money amount; };
  std::vector<Event> events;
  std::uint64_t state = 12345;
  const Date start = d("2015-04-01");
  for (int i = 0; i < 5000; ++i) {
    state = state * 6364136223846793005ull + 1442695040888963407ull;
    const auto asset = assets[(state >> 33) % assets.size()];
    const Date day = *Date::from_ymd(start.year() + static_cast<int>((state >> 20) % 11),
                                     1 + static_cast<int>((state >> 12) % 12), 1 + static_cast<int>((state >> 5) % 28));
    events.push_back({asset, day, static_cast<double>((state >> 40) % 900000) / 100.0 - 1000.0});
  }
  for (std::size_t i = 0; i < events.size(); ++i) {
    forward.add_event(events[i].asset, events[i].day, events[i].amount);
    const Event& e = events[events.size() - 1 - i];
    backward.add_event(e.asset, e.day, e.amount);
    (i < events.size() / 2 ? first_half : second_half).add_event(events[i].asset, events[i].day, events[i].amount);
  }
  first_half.merge(second_half);
  for (const auto asset : assets) {
    ASSERT_FALSE(costs(forward, asset).empty());
    EXPECT_EQ(costs(forward, asset), costs(backward, asset));
    EXPECT_EQ(costs(forward, asset), costs(first_half, asset));
  }
  CostHistory other(d("2026-11-30"), 0.031);
  other.add_asset(d("2015-04-01"), std::nullopt);
  EXPECT_THROW(forward.merge(other), RuntimeFailure);
}

TEST(CostHistory, ARestatementBeyondAnyRealCostIsBadEscalation) {
  // 10^15 (the largest amount the reader accepts) restated at 100% a year over 40 years.
  CostHistory history(d("2024-01-01"), 1.0);
  const auto unit = history.add_asset(d("1980-01-01"), std::nullopt);
  try {
    history.add_event(unit, d("1984-01-01"), 1e15);
    FAIL() << "an amount of about 1e27 was added";
  } catch (const InputError& e) {
    EXPECT_EQ(e.where(), "cost_escalation");
  }
}

TEST(CostHistory, RejectsBadAssetsAndIndexes) {
  CostHistory history(d("2024-01-01"), 0.0);
  EXPECT_THROW(history.add_asset(d("2020-01-01"), d("2019-12-31")), InputError);
  EXPECT_THROW(history.add_event(0, d("2020-01-01"), 1), InputError);
  EXPECT_THROW(history.year_costs(7), InputError);
}

}  // namespace
}  // namespace tenure::fleet
