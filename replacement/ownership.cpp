// Checks on an Ownership before it is analysed (see ownership.h).
#include "replacement/ownership.h"

#include <fmt/format.h>

#include "core/checks.h"
#include "core/errors.h"

namespace tenure::replacement {

void validate(const Ownership& asset, const std::string& where) {
  require_positive(asset.first_cost, where + ".first_cost");
  if (asset.age_years < 0) throw InputError(where + ".age_years", "must be >= 0");
  require_non_negative(asset.value_now, where + ".market_value_now");
  if (asset.operating_costs.empty()) {
    throw InputError(where + ".operating_costs", "must list at least one year");
  }
  if (asset.market_values.size() != asset.operating_costs.size()) {
    throw InputError(where + ".market_values",
                     fmt::format("must have one value per year of operating_costs ({} values, "
                                 "{} costs)",
                                 asset.market_values.size(), asset.operating_costs.size()));
  }
  for (std::size_t k = 0; k < asset.operating_costs.size(); ++k) {
    require_non_negative(asset.operating_costs[k], fmt::format("{}.operating_costs[{}]", where, k));
    require_non_negative(asset.market_values[k], fmt::format("{}.market_values[{}]", where, k));
  }
  if (!asset.depreciation) throw InputError(where + ".depreciation", "is required");
}

}  // namespace tenure::replacement
