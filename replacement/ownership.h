// An asset as the replacement analysis sees it: what owning it from now on costs and brings.
// A challenger is a new unit (age 0, value now = first cost); a defender is one already owned,
// `age_years` old, whose value now is what selling it today would bring.
//
//   Ownership van{52000, 0, 52000, {4000, 5500}, {41000, 33000}, make_method(MacrsSpec{5})};
#pragma once

#include <memory>
#include <string>
#include <vector>

#include "core/types.h"
#include "depreciation/method.h"

namespace tenure::replacement {

struct Ownership {
  Money first_cost;                    // original installed cost: the depreciation basis
  Years age_years;                     // completed years of service now (0 for a challenger)
  Money value_now;                     // market value now (the first cost for a challenger)
  std::vector<Money> operating_costs;  // costs of the next years 1..N kept, end of year
  std::vector<Money> market_values;    // market values at the end of the next years 1..N
  std::shared_ptr<const depreciation::Method> depreciation;

  Years max_years() const { return static_cast<Years>(operating_costs.size()); }
};

// Checks sizes and values; `where` prefixes the JSON path in errors ("$.defender").
void validate(const Ownership& asset, const std::string& where);

}  // namespace tenure::replacement
