// The generator's units (sound assets) and their valuations, drawn before any event (rules (1)
// and (5) of fleet_generator.h). Internal to demo/.
//
//   Random random(seed);
//   std::vector<Unit> units = draw_units(options, random);      // sorted by in-service day
//   std::vector<PlannedValuation> values = draw_valuations(units, random);
#pragma once

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "core/types.h"
#include "demo/demo_classes.h"
#include "demo/fleet_generator.h"
#include "demo/random.h"

namespace tenure::demo {

struct Unit {
  const DemoClass* demo_class;
  Date in_service;
  std::optional<Date> retired;
  std::int32_t last_day;  // the last day it can have events: retirement or the as-of date
  double level;           // its lasting cost level against the class curve, mean 1
  Money first_cost;       // nominal, on the in-service day
  std::string id;
};

// `options.assets` units sorted by in-service day (ties in draw order), with ids numbered in that
// order at id_width(options) digits.
std::vector<Unit> draw_units(const Options& options, Random& random);

// Digits of the asset numbers: at least 5, enough for the sound and bad assets together.
int id_width(const Options& options);
// "<prefix>-<number>", the number zero-padded to `width` digits.
std::string asset_id(std::string_view prefix, std::size_t number, int width);

struct PlannedValuation {
  std::int32_t day;
  std::uint32_t unit;  // index into the units
  Money amount;
  std::string_view basis;
};

// Rule (5), sorted by day (ties by unit).
std::vector<PlannedValuation> draw_valuations(const std::vector<Unit>& units, Random& random);

// Money rounded to cents.
Money to_cents(Money amount);

}  // namespace tenure::demo
