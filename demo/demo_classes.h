// The invented world behind the demo fleet of "Larkmoor Water", an invented water utility (no
// real organisation, product or price list): its asset classes, what a unit of each costs new,
// how its running cost truly grows with age, how its market value falls, and how its cost events
// split into kinds. The generator draws noisy data around these curves; the nightly review has to
// find them again, and tests compare what it finds with them.
//
//   for (const DemoClass& c : demo_classes()) c.true_cost(5);   // as-of money, age-year 5
//
// All money is as-of-date money (constant money); the generator deflates event amounts and first
// costs back to their own dates at kDemoInflation, which the demo policy's cost_escalation undoes.
#pragma once

#include <array>
#include <span>
#include <string_view>

#include "core/types.h"

namespace tenure::demo {

// The kinds of cost event, with the relative size of one event of each kind.
inline constexpr std::array<std::string_view, 5> kEventKinds = {"repair", "parts", "labour", "fuel",
                                                                "inspection"};
inline constexpr std::array<double, 5> kEventKindScale = {3.0, 1.5, 1.2, 0.6, 0.4};

// Invented price and cost inflation of the demo world, per year.
inline constexpr Rate kDemoInflation = 0.03;

// Noise, as log-scale standard deviations of mean-one lognormal factors.
inline constexpr double kAssetLevelNoise = 0.15;  // one asset's lasting level against its class
inline constexpr double kYearNoise = 0.20;        // one asset-year's cost against that level
inline constexpr double kPriceNoise = 0.05;       // a unit's first cost against the list price
inline constexpr double kValueNoise = 0.10;       // an appraisal against the value curve
inline constexpr double kEventSizeNoise = 0.60;   // one event's size against its kind's scale

enum class CurveShape {
  linear,     // a + g (k - 1)
  geometric,  // a (1 + g)^(k - 1)
};

struct DemoClass {
  std::string_view name;       // the asset_class text, e.g. "pump-centrifugal"
  std::string_view id_prefix;  // asset ids are "<prefix>-<number>"
  double fleet_share;          // expected fraction of the fleet's units
  Money price;                 // a new unit, installed, in as-of money (the challenger's cost)
  CurveShape shape;
  Money a;                            // true cost of age-year 1, as-of money
  double g;                           // linear: money per year; geometric: growth rate per year
  double event_rate_weight;           // relative number of cost events per unit-day
  int oldest_unit_years;              // units in service are at most this old (older ones replaced)
  double value_start;                 // market value just after installation, as a fraction of cost
  Rate value_decline;                 // yearly decline of the market value
  std::array<double, 5> kind_shares;  // share of events of each kEventKinds entry

  // The true expected cost of age-year k >= 1 for a unit of average level, as-of money.
  Money true_cost(int age_year) const;
};

// The four classes of the demo, in a fixed order.
std::span<const DemoClass> demo_classes();

}  // namespace tenure::demo
