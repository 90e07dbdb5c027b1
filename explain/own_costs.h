// An asset's own cost history read against its class cost curve (SPEC 6 "Fleet data"), for
// `tenure explain`: its restated cost in each complete age-year beside what the class curve
// predicts, and the credibility factor they give, computed again from the raw cost events with
// the run's as-of date and cost escalation (fleet::CostHistory and fleet::credibility, the code
// the nightly run uses).
//
//   std::optional<OwnCosts> own = own_costs(input, as_of, policy.cost_escalation, curve);
//   own->years[0].observed;       // restated cost of age-year 1
//   own->credibility.factor;      // 1 + z (r - 1)
#pragma once

#include <cstddef>
#include <optional>
#include <vector>

#include "results/input_asset.h"
#include "fleet/cost_curve.h"
#include "fleet/credibility.h"
#include "fleet/date.h"

namespace tenure::explain {

struct OwnYear {
  Years age_year;       // k
  std::size_t events;   // events counted in it
  Money observed;       // their total, restated to as-of money
  Money class_curve;    // the class curve's prediction for age-year k (factor 1)
};

struct OwnCosts {
  Date in_service;
  std::vector<OwnYear> years;        // the complete age-years 1..m
  fleet::Credibility credibility;    // m, r, z and factor from these years
  std::size_t events_counted = 0;
  std::size_t events_not_complete = 0;  // in the current age-year or after the as-of date
  std::size_t events_not_usable = 0;    // bad date, before in service, after retirement, ...
};

// nullopt when the input row's in_service_on or retired_on is not a valid date (the row changed
// since the run, which would have rejected it).
std::optional<OwnCosts> own_costs(const results::InputAsset& input, Date as_of, Rate cost_escalation,
                                  const fleet::CostCurve& curve);

}  // namespace tenure::explain
