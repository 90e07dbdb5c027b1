// Drawing the demo's assets and valuations (see fleet_units.h).
#include "demo/fleet_units.h"

#include <fmt/format.h>

#include <algorithm>
#include <array>
#include <cmath>

#include "demo/day_numbers.h"

namespace tenure::demo {

namespace {

constexpr int kDaysPerYearWhole = 365;
constexpr int kMinAgeToRetireDays = 3 * kDaysPerYearWhole;
constexpr int kEarliestRetirementDays = 2 * kDaysPerYearWhole;
constexpr int kRetiredBeforeAsOfDays = 30;
constexpr int kBadAssetCount = 3;  // two bad assets and one unknown id (bad_row_plan.cpp)

// Deflates as-of money to money of `days_before` the as-of date at the demo's inflation.
double deflator(std::int32_t days_before) {
  return std::exp(-days_before * std::log1p(kDemoInflation) / kDaysPerYear);
}

const DemoClass& draw_class(Random& random) {
  static const std::vector<double> shares = [] {
    std::vector<double> fleet_shares;
    for (const DemoClass& c : demo_classes()) fleet_shares.push_back(c.fleet_share);
    return fleet_shares;
  }();
  return demo_classes()[random.pick(shares)];
}

}  // namespace

Money to_cents(Money amount) { return std::round(amount * 100.0) / 100.0; }

int id_width(const Options& options) {
  const std::string largest = std::to_string(options.assets + kBadAssetCount);
  return std::max(5, static_cast<int>(largest.size()));
}

std::string asset_id(std::string_view prefix, std::size_t number, int width) {
  return fmt::format("{}-{:0{}}", prefix, number, width);
}

std::vector<Unit> draw_units(const Options& options, Random& random) {
  const std::int32_t as_of = options.as_of.days_since_epoch();
  std::vector<Unit> units;
  units.reserve(options.assets);
  for (std::size_t i = 0; i < options.assets; ++i) {
    const DemoClass& demo_class = draw_class(random);
    const int years = std::min(options.history_years, demo_class.oldest_unit_years);
    const std::int32_t window = as_of - years_earlier(options.as_of, years).days_since_epoch();
    const auto age_days =
        static_cast<std::int32_t>(random.below(static_cast<std::uint64_t>(window)));
    const std::int32_t in_service = as_of - age_days;
    const double level = random.mean_one_lognormal(kAssetLevelNoise);
    const Money first_cost =
        to_cents(demo_class.price * random.mean_one_lognormal(kPriceNoise) * deflator(age_days));
    std::optional<Date> retired;
    if (age_days > kMinAgeToRetireDays && random.uniform() < kRetiredShare) {
      const std::int32_t span = age_days - kEarliestRetirementDays - kRetiredBeforeAsOfDays;
      retired =
          date_from_days(in_service + kEarliestRetirementDays +
                         static_cast<std::int32_t>(random.below(static_cast<std::uint64_t>(span))));
    }
    units.push_back({&demo_class,
                     date_from_days(in_service),
                     retired,
                     retired ? retired->days_since_epoch() : as_of,
                     level,
                     first_cost,
                     {}});
  }
  std::stable_sort(units.begin(), units.end(),
                   [](const Unit& x, const Unit& y) { return x.in_service < y.in_service; });
  const int width = id_width(options);
  for (std::size_t i = 0; i < units.size(); ++i) {
    units[i].id = asset_id(units[i].demo_class->id_prefix, i + 1, width);
  }
  return units;
}

std::vector<PlannedValuation> draw_valuations(const std::vector<Unit>& units, Random& random) {
  constexpr std::array<double, 2> kBasisShares = {0.7, 0.3};
  constexpr std::array<std::string_view, 2> kBases = {"appraisal", "trade-in quote"};
  std::vector<PlannedValuation> valuations;
  for (std::uint32_t u = 0; u < units.size(); ++u) {
    const Unit& unit = units[u];
    const std::int32_t earliest = unit.in_service.days_since_epoch() + kDaysPerYearWhole;
    if (unit.last_day <= earliest || random.uniform() >= kValuedShare) continue;
    const std::uint64_t count = 1 + random.below(2);
    for (std::uint64_t n = 0; n < count; ++n) {
      const auto day = earliest + static_cast<std::int32_t>(random.below(
                                      static_cast<std::uint64_t>(unit.last_day - earliest + 1)));
      const double age = (day - unit.in_service.days_since_epoch()) / kDaysPerYear;
      const DemoClass& c = *unit.demo_class;
      const Money value = unit.first_cost * c.value_start * std::pow(1.0 - c.value_decline, age) *
                          random.mean_one_lognormal(kValueNoise);
      valuations.push_back({day, u, to_cents(value), kBases[random.pick(kBasisShares)]});
    }
  }
  std::stable_sort(
      valuations.begin(), valuations.end(),
      [](const PlannedValuation& x, const PlannedValuation& y) { return x.day < y.day; });
  return valuations;
}

}  // namespace tenure::demo
