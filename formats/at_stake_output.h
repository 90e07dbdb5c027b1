// What is at stake for one defender (review/at_stake.h, SPEC 11), written out: as a text table a
// manager can read (each figure, its value, what it means), under the decision of `tenure case
// --format table`; and as the JSON keys of SPEC 11, for `tenure case` and `tenure explain
// --format json`. (`tenure explain` shows the same figures with their formulas.)
//
//   at_stake_table(case_verdict.at_stake);
//   //   figure                   value       meaning
//   //   cost of waiting a year   1,234.56    replacing one year after the best time costs ...
//   at_stake_to_json(s);   // {"delay_cost": 1234.56, "early_cost": ..., "close_call": false}
#pragma once

#include <string>

#include <nlohmann/json.hpp>

#include "review/at_stake.h"

namespace tenure::formats {

std::string at_stake_table(const review::AtStake& stake);
// Keys delay_cost, early_cost, repair_limit, break_even_price, break_even_cost_factor (null
// where there is none) and close_call.
nlohmann::json at_stake_to_json(const review::AtStake& stake);

// "-" for a figure that does not exist, else its money text.
std::string money_or_dash(const std::optional<Money>& amount);

}  // namespace tenure::formats
