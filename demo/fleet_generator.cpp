// The demo fleet generator: draws the units, then streams assets, valuations and events (see
// fleet_generator.h).
#include "demo/fleet_generator.h"

#include <algorithm>
#include <limits>

#include "core/errors.h"
#include "demo/bad_row_plan.h"
#include "demo/day_numbers.h"
#include "demo/event_stream.h"
#include "demo/fleet_units.h"

namespace tenure::demo {

namespace {

constexpr int kMaxHistoryYears = 100;
constexpr std::size_t kMaxAssets = 10'000'000;
constexpr std::size_t kMaxEvents = 1'000'000'000;  // a negative count wraps far beyond it


void emit_assets(const std::vector<Unit>& units, const BadRowPlan& bad, Sink& sink,
                 Summary& summary) {
  std::string in_service_on;
  std::string retired_on;
  for (const Unit& unit : units) {
    in_service_on = unit.in_service.to_iso();
    std::optional<std::string_view> retired;
    if (unit.retired) {
      retired_on = unit.retired->to_iso();
      retired = retired_on;
    }
    sink.on_asset({unit.id, unit.demo_class->name, in_service_on, unit.first_cost, retired});
    ++summary.assets;
  }
  for (const BadAsset& asset : bad.assets) {
    sink.on_asset(
        {asset.id, asset.asset_class, asset.in_service_on, asset.first_cost, std::nullopt});
    ++summary.assets;
    summary.bad_rows.push_back(
        {asset.kind, "asset", static_cast<std::int64_t>(summary.assets), asset.id, asset.detail});
  }
}

// The sound valuations and the bad ones merged by day (a bad one after sound ones of its day).
void emit_valuations(const std::vector<Unit>& units, const std::vector<PlannedValuation>& sound,
                     const BadRowPlan& bad, Sink& sink, Summary& summary) {
  auto next_bad = bad.valuations.begin();
  auto emit_bad_until = [&](std::int32_t day) {
    for (; next_bad != bad.valuations.end() && next_bad->day < day; ++next_bad) {
      sink.on_valuation({next_bad->asset_id, next_bad->valued_on, next_bad->amount, "appraisal"});
      ++summary.valuations;
      summary.bad_rows.push_back({BadRowKind::negative_valuation, "asset_valuation",
                                  static_cast<std::int64_t>(summary.valuations), next_bad->asset_id,
                                  next_bad->detail});
    }
  };
  for (const PlannedValuation& valuation : sound) {
    emit_bad_until(valuation.day);
    const std::string valued_on = date_from_days(valuation.day).to_iso();
    sink.on_valuation({units[valuation.unit].id, valued_on, valuation.amount, valuation.basis});
    ++summary.valuations;
  }
  emit_bad_until(std::numeric_limits<std::int32_t>::max());
}

}  // namespace

void check_options(const Options& options) {
  if (options.assets < 1 || options.assets > kMaxAssets) {
    throw InputError("assets", "must be a whole number from 1 to 10000000");
  }
  if (options.events < 1 || options.events > kMaxEvents) {
    throw InputError("events", "must be a whole number from 1 to 1000000000");
  }
  if (options.history_years < 1 || options.history_years > kMaxHistoryYears) {
    throw InputError("history_years", "must be a whole number from 1 to 100");
  }
  // Dates must stay within fleet/date.h rule (1) a hundred years back and a year ahead.
  if (options.as_of.year() < 1400 + kMaxHistoryYears + 1 || options.as_of.year() > 9998) {
    throw InputError("as_of", "must be a date in the years 1501 to 9998");
  }
}

Date default_as_of() { return *Date::from_ymd(2026, 11, 30); }

Summary generate(const Options& options, Sink& sink) {
  check_options(options);
  Random random(options.seed);
  const std::vector<Unit> units = draw_units(options, random);
  const std::vector<PlannedValuation> valuations = draw_valuations(units, random);
  const BadRowPlan bad = options.bad_rows ? plan_bad_rows(units, options) : BadRowPlan{};

  Summary summary;
  emit_assets(units, bad, sink, summary);
  emit_valuations(units, valuations, bad, sink, summary);
  emit_events(units, bad, options, random, sink, summary);
  std::stable_sort(summary.bad_rows.begin(), summary.bad_rows.end(),
                   [](const BadRow& x, const BadRow& y) { return x.kind < y.kind; });
  return summary;
}

}  // namespace tenure::demo
