// The demo's cost events, emitted month by month in fleet-wide date order (rules (2) to (4) of
// fleet_generator.h). Only the current age-year of each unit and one month of events are held in
// memory. Internal to demo/.
//
//   emit_events(units, bad_plan, options, random, sink, summary);
#pragma once

#include <vector>

#include "demo/bad_row_plan.h"
#include "demo/fleet_units.h"
#include "demo/random.h"

namespace tenure::demo {

// Sends every event to sink.on_event, counts them in summary.events and records the bad ones in
// summary.bad_rows with their row numbers.
void emit_events(const std::vector<Unit>& units, const BadRowPlan& bad, const Options& options,
                 Random& random, Sink& sink, Summary& summary);

}  // namespace tenure::demo
