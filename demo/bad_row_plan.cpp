// Placing the demo's bad rows (see bad_row_plan.h). Each bad row sits next to real activity of
// its host asset, so the rejected rows look like the slips a live system collects.
#include "demo/bad_row_plan.h"

#include <fmt/format.h>

#include <algorithm>
#include <limits>

#include "demo/day_numbers.h"

namespace tenure::demo {

namespace {

constexpr std::int32_t kBeforeInServiceDays = 40;
constexpr std::int32_t kAfterRetirementDays = 30;
constexpr std::int32_t kUnknownAssetDaysBeforeAsOf = 100;
constexpr std::int32_t kMinHostDays = 60;
constexpr std::int32_t kDaysPerYearWhole = 365;

std::string iso(std::int32_t day) { return date_from_days(day).to_iso(); }

bool is_leap(int year) { return Date::from_ymd(year, 2, 29).has_value(); }

// The latest common year whose 28 February is within [first, last], else the latest common year
// whose 28 February is on or before `last`.
int common_year_for_leap_day(std::int32_t first, std::int32_t last) {
  const Date last_date = date_from_days(last);
  int fallback = 0;
  for (int year = last_date.year(); year > last_date.year() - 8; --year) {
    const Date feb28 = *Date::from_ymd(year, 2, 28);
    if (is_leap(year) || feb28.days_since_epoch() > last) continue;
    if (feb28.days_since_epoch() >= first) return year;
    if (fallback == 0) fallback = year;
  }
  return fallback;
}

// Events on a sound asset in service: unparseable and impossible dates, bad amounts.
void add_events_on_active_asset(const std::vector<Unit>& units, BadRowPlan& plan) {
  const auto host = std::find_if(units.begin(), units.end(), [](const Unit& u) {
    return !u.retired && u.last_day - u.in_service.days_since_epoch() >= kMinHostDays;
  });
  if (host == units.end()) return;
  const std::int32_t first = host->in_service.days_since_epoch();
  const std::int32_t middle = first + (host->last_day - first) / 2;
  const Date mid = date_from_days(middle);
  const std::string slashed = fmt::format("{:02}/{:02}/{:04}", mid.day(), mid.month(), mid.year());
  plan.events.push_back({BadRowKind::unparseable_date, middle, host->id, slashed, 412.50,
                         std::nullopt, "repair",
                         fmt::format("occurred_on '{}' is not YYYY-MM-DD", slashed)});

  const int year = common_year_for_leap_day(first, host->last_day);
  const std::string leap_day = fmt::format("{:04}-02-29", year);
  plan.events.push_back({BadRowKind::impossible_date,
                         Date::from_ymd(year, 2, 28)->days_since_epoch(), host->id, leap_day,
                         268.00, std::nullopt, "parts",
                         fmt::format("occurred_on '{}': {} is a common year", leap_day, year)});

  const std::int32_t later = std::min(middle + 3, host->last_day);
  plan.events.push_back({BadRowKind::non_numeric_amount, later, host->id, iso(later), 0,
                         std::string("n/a"), "labour", "amount is the text 'n/a'"});
  plan.events.push_back({BadRowKind::non_finite_amount, later, host->id, iso(later),
                         std::numeric_limits<double>::infinity(), std::nullopt, "parts",
                         "amount is +infinity"});
}

void add_event_before_in_service(const std::vector<Unit>& units, BadRowPlan& plan) {
  const Unit& host = units.back();  // the newest unit: the slip lands among recent events
  const std::int32_t day = host.in_service.days_since_epoch() - kBeforeInServiceDays;
  plan.events.push_back({BadRowKind::event_before_in_service, day, host.id, iso(day), 150.00,
                         std::nullopt, "inspection",
                         fmt::format("occurred_on {} is before in_service_on {}", iso(day),
                                     host.in_service.to_iso())});
}

void add_event_after_retirement(const std::vector<Unit>& units, std::int32_t as_of,
                                BadRowPlan& plan) {
  const auto host = std::find_if(units.begin(), units.end(), [as_of](const Unit& u) {
    return u.retired && u.retired->days_since_epoch() + kAfterRetirementDays <= as_of;
  });
  if (host == units.end()) return;
  const std::int32_t day = host->retired->days_since_epoch() + kAfterRetirementDays;
  plan.events.push_back(
      {BadRowKind::event_after_retirement, day, host->id, iso(day), 180.00, std::nullopt, "parts",
       fmt::format("occurred_on {} is after retired_on {}", iso(day), host->retired->to_iso())});
}

}  // namespace

BadRowPlan plan_bad_rows(const std::vector<Unit>& units, const Options& options) {
  BadRowPlan plan;
  const std::int32_t as_of = options.as_of.days_since_epoch();
  const int width = id_width(options);
  const auto classes = demo_classes();
  // Bad assets and the unknown id take the numbers after the sound assets'.
  const std::size_t next = options.assets + 1;

  const std::string zero_cost_start = years_earlier(options.as_of, 3).to_iso();
  plan.assets.push_back({BadRowKind::non_positive_first_cost,
                         asset_id(classes[0].id_prefix, next, width), classes[0].name,
                         zero_cost_start, 0.0, "first_cost is 0"});
  const Date slashed_start = years_earlier(options.as_of, 5);
  const std::string slashed = fmt::format("{:04}/{:02}/{:02}", slashed_start.year(),
                                          slashed_start.month(), slashed_start.day());
  plan.assets.push_back({BadRowKind::unparseable_in_service_on,
                         asset_id(classes[1].id_prefix, next + 1, width), classes[1].name, slashed,
                         classes[1].price,
                         fmt::format("in_service_on '{}' is not YYYY-MM-DD", slashed)});

  const auto valued = std::find_if(units.begin(), units.end(), [](const Unit& u) {
    return u.last_day - u.in_service.days_since_epoch() > kDaysPerYearWhole;
  });
  if (valued != units.end()) {
    const std::int32_t day = valued->in_service.days_since_epoch() + kDaysPerYearWhole;
    const Money amount = -to_cents(0.3 * valued->first_cost);
    plan.valuations.push_back(
        {day, valued->id, iso(day), amount, fmt::format("amount {:.2f} is negative", amount)});
  }

  add_events_on_active_asset(units, plan);
  add_event_before_in_service(units, plan);
  add_event_after_retirement(units, as_of, plan);
  const std::int32_t ghost_day = as_of - kUnknownAssetDaysBeforeAsOf;
  const std::string ghost = asset_id(classes[0].id_prefix, next + 2, width);
  plan.events.push_back({BadRowKind::unknown_asset, ghost_day, ghost, iso(ghost_day), 95.00,
                         std::nullopt, "fuel",
                         fmt::format("asset_id '{}' is not in asset", ghost)});
  std::stable_sort(plan.events.begin(), plan.events.end(),
                   [](const BadEvent& x, const BadEvent& y) { return x.day < y.day; });
  return plan;
}

}  // namespace tenure::demo
