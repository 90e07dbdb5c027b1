// Test helpers for the review tests: dates from ISO text, an invented policy built in code (no
// JSON: formats/ is not on tenure::review's link line), assets with one cost event per complete
// age-year, and an invented deterministic fleet of any size. Every figure here is invented.
//
//   FleetData data(day("2025-06-30"), 0);
//   add_asset(data, "PU-0001", "pump-duty", day("2020-03-15"), 18500, {900, 1000, 1150});
//   Policy policy = invented_policy();
#pragma once

#include <algorithm>
#include <cstdint>
#include <optional>
#include <stdexcept>
#include <string>
#include <vector>

#include "depreciation/method.h"
#include "fleet/date.h"
#include "review/fleet_data.h"
#include "review/policy.h"
#include "tax/rates.h"

namespace tenure::review::testing {

inline Date day(const char* iso) {
  const auto date = parse_iso_date(iso);
  if (!date) throw std::invalid_argument(iso);
  return *date;
}

// Invented classes: a pump on MACRS 7 whose costs the review fits, and a van on straight line.
inline ClassPolicy pump_policy() {
  return ClassPolicy{18500, 15, depreciation::MacrsSpec{7}, 0.15,
                     fleet::CostModelChoice::automatic};
}
inline ClassPolicy van_policy() {
  return ClassPolicy{52000, 12, depreciation::StraightLineSpec{10, 0}, 0.18,
                     fleet::CostModelChoice::linear};
}

// Invented rates: MARR 10%, t = 25% (after-tax MARR 7.5% by default).
inline Policy invented_policy(Detail detail = Detail::none) {
  Policy policy;
  policy.rates = tax::Rates::make(0.10, 0.25);
  policy.detail = detail;
  policy.classes.emplace("pump-duty", pump_policy());
  policy.classes.emplace("van-delivery", van_policy());
  return policy;
}

// Adds an asset with costs[k-1] spent on the first day of its age-year k (its (k-1)-th
// anniversary), so each amount is the total of that age-year.
inline std::size_t add_asset(FleetData& data, std::string id, std::string asset_class,
                             Date in_service, Money first_cost, const std::vector<Money>& costs,
                             std::optional<Date> retired_on = std::nullopt) {
  const auto index =
      data.add_asset({std::move(id), std::move(asset_class), in_service, first_cost, retired_on});
  for (std::size_t k = 0; k < costs.size(); ++k) {
    data.costs.add_event(index, anniversary(in_service, static_cast<int>(k)), costs[k]);
  }
  return index;
}

// A small deterministic generator (an LCG, Knuth's MMIX constants) for invented fleets.
class Invented {
 public:
  explicit Invented(std::uint64_t seed) : state_(seed) {}
  std::uint32_t next() {
    state_ = state_ * 6364136223846793005ULL + 1442695040888963407ULL;
    return static_cast<std::uint32_t>(state_ >> 33);
  }
  int between(int low, int high) { return low + static_cast<int>(next() % (high - low + 1)); }
  double uniform(double low, double high) { return low + (high - low) * (next() / 2147483648.0); }

 private:
  std::uint64_t state_;
};

// An invented fleet of `count` assets, as of 2025-06-30, in the two classes of invented_policy:
// ages 0..16 years, costs rising with age and scaled per asset (so the verdicts differ), some
// valuations, a few retired and a few not yet in service. Assets are added in a scrambled order
// of their ids, so the review has to sort them.
inline FleetData invented_fleet(std::size_t count, std::uint64_t seed = 2025) {
  FleetData data(day("2025-06-30"), 0);
  Invented random(seed);
  for (std::size_t n = 0; n < count; ++n) {
    // 7919 is prime and does not divide the counts used, so this visits every id once.
    const std::size_t number = (n * 7919) % count;
    const bool pump = number % 3 != 0;
    std::string id = std::to_string(number);
    id = std::string(pump ? "PU-" : "VN-") +
         std::string(5 - std::min<std::size_t>(5, id.size()), '0') + id;
    const int year = 2025 - random.between(0, 16);
    const Date in_service = *Date::from_ymd(year, random.between(1, 12), random.between(1, 28));
    const Money first_cost = pump ? random.uniform(15000, 22000) : random.uniform(40000, 60000);
    const double level = random.uniform(0.6, 1.6);
    std::optional<Date> retired;
    const std::uint32_t kind = random.next() % 50;
    if (kind == 0 && year < 2024) retired = day("2024-12-31");  // retired before the as-of date
    std::vector<Money> costs;
    const int years = completed_years(in_service, retired.value_or(data.as_of));
    for (int k = 1; k <= years; ++k) {
      const Money base = pump ? 900 + 260.0 * (k - 1) : 4000 + 900.0 * (k - 1);
      costs.push_back(base * level * random.uniform(0.9, 1.1));
    }
    Date start = in_service;
    if (kind == 1) start = day("2025-09-01");  // put in service after the as-of date
    const std::size_t index =
        add_asset(data, id, pump ? "pump-duty" : "van-delivery", start, first_cost,
                  kind == 1 ? std::vector<Money>{} : costs, retired);
    if (kind >= 2 && kind < 12 && start < day("2024-07-01")) {
      // A valuation within the last year, near the class's value curve.
      data.valuations[index].push_back({day("2025-01-15"), first_cost * random.uniform(0.2, 0.7)});
    }
  }
  return data;
}

}  // namespace tenure::review::testing
