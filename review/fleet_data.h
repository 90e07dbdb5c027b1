// What the nightly review reads from the maintenance database, already validated: the accepted
// assets, their cost totals by complete age-year, and their valuations. db/ fills it in one pass
// over each input relation; the review (fleet_review.h) never sees a bad row.
//
//   FleetData data{as_of, {}, fleet::CostHistory(as_of, policy.cost_escalation), {}};
//   auto index = data.add_asset({"PU-0001", "pump-duty", in_service, 18500, std::nullopt});
//   data.costs.add_event(index, occurred_on, 412.50);
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "core/types.h"
#include "fleet/cost_history.h"
#include "fleet/date.h"

namespace tenure::review {

struct AssetRecord {
  std::string asset_id;
  std::string asset_class;
  Date in_service;
  Money first_cost;
  std::optional<Date> retired_on;
};

struct Valuation {
  Date valued_on;
  Money amount;
};

struct FleetData {
  Date as_of;
  std::vector<AssetRecord> assets;               // index = fleet::CostHistory::AssetIndex
  fleet::CostHistory costs;                      // restated totals per complete age-year
  std::vector<std::vector<Valuation>> valuations;  // per asset, in reading order

  FleetData(Date as_of_date, Rate cost_escalation) : as_of(as_of_date), costs(as_of_date, cost_escalation) {}

  fleet::CostHistory::AssetIndex add_asset(AssetRecord record) {
    const auto index = costs.add_asset(record.in_service, record.retired_on);
    assets.push_back(std::move(record));
    valuations.emplace_back();
    return index;
  }
};

}  // namespace tenure::review
