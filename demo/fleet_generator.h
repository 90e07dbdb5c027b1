// The demo fleet of "Larkmoor Water", an invented water utility: a few hundred pumps, vans,
// standby generators and forklifts with up to twenty years of cost events, some appraisals and a
// handful of bad rows, generated deterministically from a seed and streamed to a Sink. Events
// are never all held in memory: memory grows with the assets (about 55 MB for 100,000 of them),
// not with the events (10,000,000 of them would take over 400 MB).
//
//   struct Count : Sink { ... on_asset / on_valuation / on_event ... } count;
//   Options options;                 // 320 assets, about 60,000 events, as of 2026-11-30
//   options.assets = 100000;
//   options.events = 10000000;       // the target; the total lands within a few percent
//   Summary summary = generate(options, count);
//
// What it generates (the invented numbers are in demo_classes.h):
//   (1) Assets: a class drawn by fleet share; in service on a day drawn uniformly over the
//       `history_years` (or the class's oldest_unit_years, when fewer) before the as-of date; first cost = list price times noise, deflated to
//       the in-service date; about kRetiredShare of the units older than three years retired at a
//       day drawn between their second birthday and 30 days before the as-of date. Ids
//       "<prefix>-<number>" are numbered in in-service order.
//   (2) Costs: each asset has a lasting level (noise around 1); age-year k costs
//       level x true_cost(k) x year noise in as-of money. That sum is split over the year's
//       events (at least one; more with the event rate) by random weights, each event's share
//       deflated to its own day at kDemoInflation and rounded to cents. So the restated total of
//       every complete asset-year is the noisy curve, up to those roundings. Events after the
//       as-of date or after retirement are never emitted.
//   (3) Event rate: one rate per unit-day, scaled by the class's event_rate_weight, set so that
//       the expected total is Options::events; the total is within a few percent of it whenever
//       the target allows more than one event per asset-year.
//   (4) Order: events are emitted month by month and, within a month, sorted by day across the
//       whole fleet: the order a live system appends them.
//   (5) Valuations: kValuedShare of the units that have been in service over a year get one or
//       two, dated after their first year, worth first cost x value_start x
//       (1 - value_decline)^age x noise.
//   (6) With Options::bad_rows, one bad row of each BadRowKind (bad_rows.h) where the fleet
//       allows it (the retired-asset one needs a retired asset); bad assets have no events.
#pragma once

#include <cstddef>
#include <cstdint>
#include <vector>

#include "demo/bad_rows.h"
#include "demo/fleet_rows.h"
#include "fleet/date.h"

namespace tenure::demo {

inline constexpr std::size_t kDefaultAssets = 320;
inline constexpr std::size_t kDefaultEvents = 60000;
inline constexpr double kRetiredShare = 0.04;  // rule (1)
inline constexpr double kValuedShare = 0.30;   // rule (5)

// 2026-11-30, the demo's as-of date.
Date default_as_of();

struct Options {
  std::size_t assets = kDefaultAssets;  // sound assets, >= 1 (bad ones come on top)
  std::size_t events = kDefaultEvents;  // target total of sound cost events, >= 1
  std::uint64_t seed = 1;
  Date as_of = default_as_of();
  int history_years = 20;  // in-service dates spread over these years, 1..100
  bool bad_rows = true;    // rule (6)
};

struct Summary {
  std::size_t assets = 0;        // asset rows emitted, bad ones included
  std::size_t events = 0;        // cost_event rows emitted, bad ones included
  std::size_t valuations = 0;    // asset_valuation rows emitted, bad ones included
  std::vector<BadRow> bad_rows;  // by kind, in BadRowKind order
};

// Generates the fleet into `sink` (call order in fleet_rows.h). The same options give the same
// rows. Throws InputError naming "assets", "events", "history_years" or "as_of" when an option
// is out of range; exceptions from the sink pass through.
// Throws InputError naming the field ("assets", "events", "history_years", "as_of") of an option
// out of range; generate checks the same first.
void check_options(const Options& options);

Summary generate(const Options& options, Sink& sink);

}  // namespace tenure::demo
