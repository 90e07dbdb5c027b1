// One asset's row in the input relation (policy sources.assets) and its cost events
// (sources.costs) as they are now, read again for `tenure explain`: a run stores totals, not
// events, so explain reads the events again to show the asset's own costs beside the class curve.
//
//   std::optional<InputAsset> input = db::read_input_asset(db, policy.sources, "PU-0042");
//   input->events.size();
#pragma once

#include <cstddef>
#include <optional>
#include <string>
#include <vector>

#include "core/types.h"

namespace tenure::results {

// One cost event. Rows whose date is not text or whose amount is not a number are counted in
// InputAsset::events_unreadable instead.
struct CostEventRow {
  std::string occurred_on;
  Money amount = 0;
};

struct InputAsset {
  std::string in_service_on;
  std::optional<std::string> retired_on;
  Money first_cost = 0;
  std::vector<CostEventRow> events;
  std::size_t events_unreadable = 0;
};

}  // namespace tenure::results
