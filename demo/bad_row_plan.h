// Which bad rows the demo injects and where (rule (6) of fleet_generator.h): chosen from the
// drawn units without random numbers, so turning bad rows on or off leaves the sound rows as
// they are. Internal to demo/.
//
//   BadRowPlan plan = plan_bad_rows(units, options);   // plan.events sorted by position day
#pragma once

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "core/types.h"
#include "demo/bad_rows.h"
#include "demo/fleet_units.h"

namespace tenure::demo {

struct BadAsset {
  BadRowKind kind;
  std::string id;
  std::string_view asset_class;
  std::string in_service_on;
  Money first_cost;
  std::string detail;
};

struct BadValuation {
  std::int32_t day;  // where it sorts among the valuations
  std::string asset_id;
  std::string valued_on;
  Money amount;
  std::string detail;
};

struct BadEvent {
  BadRowKind kind;
  std::int32_t day;  // where it sorts among the events (its date, or the day it stands for)
  std::string asset_id;
  std::string occurred_on;
  double amount;                           // used when amount_text is empty
  std::optional<std::string> amount_text;  // stored as text
  std::string_view event_kind;
  std::string detail;
};

struct BadRowPlan {
  std::vector<BadAsset> assets;
  std::vector<BadValuation> valuations;  // sorted by day
  std::vector<BadEvent> events;          // sorted by day
};

// One bad row of each kind the units allow (see bad_rows.h for the kinds).
BadRowPlan plan_bad_rows(const std::vector<Unit>& units, const Options& options);

}  // namespace tenure::demo
