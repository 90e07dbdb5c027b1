// The demo fleet generator: deterministic for a seed, events in fleet-wide date order, the event
// total near its target, class cost curves recoverable from the data, sound rows sound, and one
// bad row of each kind exactly where the summary says.
#include "demo/fleet_generator.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <map>
#include <set>
#include <string>

#include "core/errors.h"
#include "demo/demo_classes.h"
#include "fleet/cost_history.h"
#include "recording_sink.h"

namespace tenure::demo {
namespace {

using testing::RecordingSink;

RecordingSink generated(const Options& options, Summary* summary = nullptr) {
  RecordingSink sink;
  Summary s = generate(options, sink);
  if (summary) *summary = std::move(s);
  return sink;
}

Options sound_only(std::size_t assets, std::size_t events, std::uint64_t seed = 1) {
  Options options;
  options.assets = assets;
  options.events = events;
  options.seed = seed;
  options.bad_rows = false;
  return options;
}

Date date(const std::string& iso) {
  const auto parsed = parse_iso_date(iso);
  if (!parsed) throw std::invalid_argument(iso);
  return *parsed;
}

TEST(FleetGenerator, SameSeedGivesTheSameFleetAndAnotherSeedAnother) {
  Options options;
  options.assets = 80;
  options.events = 6000;
  Summary first_summary, second_summary;
  const RecordingSink first = generated(options, &first_summary);
  const RecordingSink second = generated(options, &second_summary);
  EXPECT_EQ(first.assets, second.assets);
  EXPECT_EQ(first.events, second.events);
  EXPECT_EQ(first.valuations, second.valuations);
  EXPECT_EQ(first_summary.events, second_summary.events);
  ASSERT_EQ(first_summary.bad_rows.size(), second_summary.bad_rows.size());

  options.seed = 2;
  const RecordingSink other = generated(options);
  EXPECT_NE(first.assets, other.assets);
  EXPECT_NE(first.events, other.events);
}

TEST(FleetGenerator, SummaryCountsWhatTheSinkReceived) {
  Summary summary;
  const RecordingSink sink = generated(Options{}, &summary);
  EXPECT_EQ(summary.assets, sink.assets.size());
  EXPECT_EQ(summary.events, sink.events.size());
  EXPECT_EQ(summary.valuations, sink.valuations.size());
  EXPECT_EQ(sink.assets.size(), kDefaultAssets + 2);  // two bad assets on top of the sound ones
}

TEST(FleetGenerator, EventsComeInDateOrderAcrossTheWholeFleet) {
  const RecordingSink sink = generated(Options{});
  std::string previous;
  std::set<std::string> assets_of_first_month;
  std::size_t ordered = 0;
  for (const auto& event : sink.events) {
    if (!parse_iso_date(event.occurred_on)) continue;  // the bad dates have no place in order
    EXPECT_LE(previous, event.occurred_on) << "event " << ordered;
    previous = event.occurred_on;
    ++ordered;
  }
  EXPECT_GT(ordered, sink.events.size() - 5);
  // Interleaved, not grouped by asset: consecutive events change asset most of the time.
  std::size_t switches = 0;
  for (std::size_t i = 1; i < sink.events.size(); ++i) {
    switches += sink.events[i].asset_id != sink.events[i - 1].asset_id ? 1 : 0;
  }
  EXPECT_GT(switches, sink.events.size() / 2);
}

TEST(FleetGenerator, EventTotalIsWithinFivePercentOfTheTarget) {
  for (const auto& [assets, events] : {std::pair<std::size_t, std::size_t>{500, 50000},
                                       {kDefaultAssets, kDefaultEvents},
                                       {2000, 400000}}) {
    Summary summary;
    generated(sound_only(assets, events), &summary);
    EXPECT_NEAR(static_cast<double>(summary.events), static_cast<double>(events), 0.05 * events)
        << assets << " assets";
  }
}

TEST(FleetGenerator, SoundRowsAreSound) {
  const Options options = sound_only(600, 40000, 3);
  Summary summary;
  const RecordingSink sink = generated(options, &summary);
  EXPECT_TRUE(summary.bad_rows.empty());
  std::map<std::string, const testing::Asset*> by_id;
  std::set<std::string> class_names;
  for (const DemoClass& c : demo_classes()) class_names.insert(std::string(c.name));
  std::string previous_in_service;
  for (const auto& asset : sink.assets) {
    EXPECT_TRUE(by_id.emplace(asset.id, &asset).second) << "duplicate " << asset.id;
    EXPECT_TRUE(class_names.count(asset.asset_class)) << asset.asset_class;
    const Date in_service = date(asset.in_service_on);
    EXPECT_LE(in_service, options.as_of);
    EXPECT_GT(in_service, *Date::from_ymd(2006, 11, 30));  // twenty years before the as-of date
    EXPECT_LE(previous_in_service, asset.in_service_on);   // numbered in in-service order
    previous_in_service = asset.in_service_on;
    EXPECT_GT(asset.first_cost, 0);
    if (asset.retired_on) {
      EXPECT_LE(in_service, date(*asset.retired_on));
      EXPECT_LE(date(*asset.retired_on), options.as_of);
    }
  }
  std::set<std::string> kinds;
  for (const auto& event : sink.events) {
    const auto found = by_id.find(event.asset_id);
    ASSERT_NE(found, by_id.end()) << event.asset_id;
    const Date day = date(event.occurred_on);
    EXPECT_GE(day, date(found->second->in_service_on));
    EXPECT_LE(day, found->second->retired_on ? date(*found->second->retired_on) : options.as_of);
    ASSERT_TRUE(std::holds_alternative<double>(event.amount));
    EXPECT_GE(std::get<double>(event.amount), 0);
    EXPECT_TRUE(std::isfinite(std::get<double>(event.amount)));
    kinds.insert(event.kind);
  }
  EXPECT_EQ(kinds, (std::set<std::string>{"fuel", "inspection", "labour", "parts", "repair"}));
  for (const auto& valuation : sink.valuations) {
    const auto found = by_id.find(valuation.asset_id);
    ASSERT_NE(found, by_id.end());
    EXPECT_GT(date(valuation.valued_on), date(found->second->in_service_on));
    EXPECT_LE(date(valuation.valued_on), options.as_of);
    EXPECT_GT(valuation.amount, 0);
    // Below cost but for the noise: value_start < 1, appraisal noise 0.10 (e^0.4 = 1.49).
    EXPECT_LT(valuation.amount, 1.49 * found->second->first_cost);
  }
}

TEST(FleetGenerator, RetiredAndValuedSharesAreAsDocumented) {
  const RecordingSink sink = generated(sound_only(4000, 100000, 4));
  std::size_t retired = 0;
  for (const auto& asset : sink.assets) retired += asset.retired_on ? 1 : 0;
  std::set<std::string> valued;
  for (const auto& valuation : sink.valuations) valued.insert(valuation.asset_id);
  // kRetiredShare of the units older than three years (hand computed from the classes' shares
  // and oldest_unit_years: 80% of them): 3.2%; standard error 0.3%.
  EXPECT_NEAR(static_cast<double>(retired) / 4000, kRetiredShare * 0.80, 0.012);
  // kValuedShare of the units in service over a year (93% of them): 28%; standard error 0.7%.
  EXPECT_NEAR(static_cast<double>(valued.size()) / 4000, kValuedShare * 0.93, 0.03);
  EXPECT_GT(sink.valuations.size(), valued.size());  // some units have two
}

// Restated with the demo's inflation, the complete asset-years of each class average to its true
// curve. Each asset-year is level x curve x year noise, both mean-one lognormal factors, so one
// point's coefficient of variation is sqrt(exp(0.15^2 + 0.20^2) - 1) = 0.253; tolerances are
// four standard errors of the mean plus half a percent.
TEST(FleetGenerator, EachClassAveragesToItsTrueCostCurve) {
  const Options options = sound_only(3000, 200000, 5);
  const RecordingSink sink = generated(options);
  fleet::CostHistory history(options.as_of, kDemoInflation);
  std::map<std::string, fleet::CostHistory::AssetIndex> index;
  std::vector<const DemoClass*> class_of;
  for (const auto& asset : sink.assets) {
    const auto retired =
        asset.retired_on ? std::optional<Date>(date(*asset.retired_on)) : std::nullopt;
    index[asset.id] = history.add_asset(date(asset.in_service_on), retired);
    const auto classes = demo_classes();
    class_of.push_back(&*std::find_if(classes.begin(), classes.end(), [&](const DemoClass& c) {
      return c.name == asset.asset_class;
    }));
  }
  for (const auto& event : sink.events) {
    history.add_event(index.at(event.asset_id), date(event.occurred_on),
                      std::get<double>(event.amount));
  }
  const double cv =
      std::sqrt(std::exp(kAssetLevelNoise * kAssetLevelNoise + kYearNoise * kYearNoise) - 1);
  for (const DemoClass& c : demo_classes()) {
    std::map<int, std::pair<double, int>> by_age;  // age-year -> (sum of cost / curve, count)
    double ratio_sum = 0;
    int points = 0;
    for (fleet::CostHistory::AssetIndex a = 0; a < history.asset_count(); ++a) {
      if (class_of[a] != &c) continue;
      const auto costs = history.year_costs(a);
      for (std::size_t k = 1; k <= costs.size(); ++k) {
        const double ratio = costs[k - 1] / c.true_cost(static_cast<int>(k));
        by_age[static_cast<int>(k)].first += ratio;
        ++by_age[static_cast<int>(k)].second;
        ratio_sum += ratio;
        ++points;
      }
    }
    int ages_checked = 0;
    for (const auto& [age, sum_count] : by_age) {
      const auto [sum, count] = sum_count;
      if (count < 50) continue;
      EXPECT_NEAR(sum / count, 1.0, 4 * cv / std::sqrt(count) + 0.005) << c.name << " age " << age;
      ++ages_checked;
    }
    EXPECT_GE(ages_checked, 10) << c.name;
    EXPECT_NEAR(ratio_sum / points, 1.0, 0.03) << c.name;
  }
}

// What each kind of bad row must look like in the row the summary points at.
void expect_bad(const BadRow& bad, const RecordingSink& sink) {
  std::map<std::string, const testing::Asset*> assets;
  for (const auto& asset : sink.assets) assets.emplace(asset.id, &asset);
  const auto row = static_cast<std::size_t>(bad.row_number - 1);
  SCOPED_TRACE(std::string(name(bad.kind)) + ": " + bad.detail);
  if (bad.relation == "asset") {
    ASSERT_LT(row, sink.assets.size());
    const auto& asset = sink.assets[row];
    EXPECT_EQ(asset.id, bad.asset_id);
    if (bad.kind == BadRowKind::non_positive_first_cost) {
      EXPECT_LE(asset.first_cost, 0);
    } else {
      EXPECT_EQ(bad.kind, BadRowKind::unparseable_in_service_on);
      EXPECT_FALSE(parse_iso_date(asset.in_service_on));
    }
    return;
  }
  if (bad.relation == "asset_valuation") {
    ASSERT_LT(row, sink.valuations.size());
    EXPECT_EQ(bad.kind, BadRowKind::negative_valuation);
    EXPECT_EQ(sink.valuations[row].asset_id, bad.asset_id);
    EXPECT_LT(sink.valuations[row].amount, 0);
    return;
  }
  ASSERT_EQ(bad.relation, "cost_event");
  ASSERT_LT(row, sink.events.size());
  const auto& event = sink.events[row];
  EXPECT_EQ(event.asset_id, bad.asset_id);
  const auto day = parse_iso_date(event.occurred_on);
  const auto asset = assets.find(event.asset_id);
  switch (bad.kind) {
    case BadRowKind::unparseable_date:
      EXPECT_FALSE(day);
      EXPECT_NE(event.occurred_on[4], '-');
      break;
    case BadRowKind::impossible_date:
      EXPECT_FALSE(day);
      EXPECT_EQ(event.occurred_on.substr(4), "-02-29");
      break;
    case BadRowKind::non_numeric_amount:
      EXPECT_EQ(std::get<std::string>(event.amount), "n/a");
      break;
    case BadRowKind::non_finite_amount:
      EXPECT_TRUE(std::isinf(std::get<double>(event.amount)));
      break;
    case BadRowKind::event_before_in_service:
      ASSERT_NE(asset, assets.end());
      EXPECT_LT(*day, date(asset->second->in_service_on));
      break;
    case BadRowKind::event_after_retirement:
      ASSERT_NE(asset, assets.end());
      ASSERT_TRUE(asset->second->retired_on);
      EXPECT_GT(*day, date(*asset->second->retired_on));
      break;
    case BadRowKind::unknown_asset:
      EXPECT_EQ(asset, assets.end());
      break;
    default:
      ADD_FAILURE() << "kind not expected in cost_event";
  }
}

TEST(FleetGenerator, InjectsOneBadRowOfEachKindWhereTheSummarySays) {
  Summary summary;
  const RecordingSink sink = generated(Options{}, &summary);
  ASSERT_EQ(summary.bad_rows.size(), static_cast<std::size_t>(kBadRowKindCount));
  for (int k = 0; k < kBadRowKindCount; ++k) {
    EXPECT_EQ(summary.bad_rows[static_cast<std::size_t>(k)].kind, static_cast<BadRowKind>(k));
  }
  for (const BadRow& bad : summary.bad_rows) expect_bad(bad, sink);
}

TEST(FleetGenerator, BadRowsComeOnTopOfTheSameSoundRows) {
  Options options;
  options.assets = 150;
  options.events = 12000;
  Summary summary;
  const RecordingSink with_bad = generated(options, &summary);
  options.bad_rows = false;
  const RecordingSink sound = generated(options);
  std::set<std::int64_t> bad_events, bad_assets, bad_valuations;
  for (const BadRow& bad : summary.bad_rows) {
    auto& rows = bad.relation == "asset"        ? bad_assets
                 : bad.relation == "cost_event" ? bad_events
                                                : bad_valuations;
    rows.insert(bad.row_number);
  }
  auto without = [](const auto& rows, const std::set<std::int64_t>& drop) {
    std::decay_t<decltype(rows)> kept;
    for (std::size_t i = 0; i < rows.size(); ++i) {
      if (!drop.count(static_cast<std::int64_t>(i + 1))) kept.push_back(rows[i]);
    }
    return kept;
  };
  EXPECT_EQ(without(with_bad.events, bad_events), sound.events);
  EXPECT_EQ(without(with_bad.assets, bad_assets), sound.assets);
  EXPECT_EQ(without(with_bad.valuations, bad_valuations), sound.valuations);
}

TEST(FleetGenerator, RejectsOptionsOutOfRange) {
  RecordingSink sink;
  auto where = [&sink](Options options) {
    try {
      generate(options, sink);
    } catch (const InputError& error) {
      return error.where();
    }
    return std::string("no error");
  };
  Options options;
  options.assets = 0;
  EXPECT_EQ(where(options), "assets");
  options = Options{};
  options.events = 0;
  EXPECT_EQ(where(options), "events");
  options = Options{};
  options.events = static_cast<std::size_t>(-1);  // what `--events -1` wraps to
  EXPECT_EQ(where(options), "events");
  options.events = 1'000'000'001;  // one above the cap
  EXPECT_EQ(where(options), "events");
  options = Options{};
  options.history_years = 0;
  EXPECT_EQ(where(options), "history_years");
  options = Options{};
  options.as_of = *Date::from_ymd(1500, 1, 1);
  EXPECT_EQ(where(options), "as_of");
}

TEST(FleetGenerator, ASingleAssetFleetWorks) {
  Summary summary;
  const RecordingSink sink = generated(sound_only(1, 50, 9), &summary);
  EXPECT_EQ(sink.assets.size(), 1u);
  EXPECT_GE(summary.events, 1u);
}

}  // namespace
}  // namespace tenure::demo
