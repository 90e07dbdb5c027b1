// The fleet's cost history (see cost_history.h). add_event is the nightly hot path (one call per
// cost event): integer date comparisons, one exp, one add.
#include "fleet/cost_history.h"

#include <algorithm>
#include <cmath>
#include <limits>

#include "core/errors.h"

namespace tenure::fleet {

CostHistory::CostHistory(Date as_of, Rate cost_escalation)
    : escalation_(as_of, cost_escalation), factor_day_(as_of) {}

CostHistory::AssetIndex CostHistory::add_asset(Date in_service, std::optional<Date> retired_on) {
  if (retired_on && *retired_on < in_service) {
    throw InputError("retired_on", "is before the in-service date");
  }
  if (assets_.size() >= std::numeric_limits<AssetIndex>::max()) {
    throw InputError("asset", "too many assets");
  }
  const Date end = retired_on ? std::min(*retired_on, as_of()) : as_of();  // rule (1)
  const int years = completed_years(in_service, end);
  assets_.push_back({in_service,
                     retired_on ? retired_on->days_since_epoch()
                                : std::numeric_limits<std::int32_t>::max(),
                     years, costs_.size()});
  costs_.resize(costs_.size() + static_cast<std::size_t>(years), 0.0);
  return static_cast<AssetIndex>(assets_.size() - 1);
}

void CostHistory::reserve_assets(std::size_t count) { assets_.reserve(count); }

const CostHistory::Entry& CostHistory::entry(AssetIndex asset) const {
  if (asset >= assets_.size()) throw InputError("asset", "unknown asset index");
  return assets_[asset];
}

EventFate CostHistory::add_event(AssetIndex asset, Date occurred_on, Money amount) {
  const Entry& e = entry(asset);
  if (!std::isfinite(amount)) return EventFate::non_finite_amount;
  if (occurred_on < e.in_service) return EventFate::before_in_service;
  if (occurred_on.days_since_epoch() > e.retired_day) return EventFate::after_retirement;
  // Rule (1) also bounds events after the as-of date: their age-year ends after it.
  const int k = completed_years(e.in_service, occurred_on) + 1;
  if (k > e.complete_years) return EventFate::outside_complete_years;
  if (occurred_on != factor_day_) {
    factor_day_ = occurred_on;
    factor_ = escalation_.factor(occurred_on);
  }
  costs_[e.first_slot + static_cast<std::size_t>(k - 1)] += amount * factor_;
  return EventFate::counted;
}

void CostHistory::prefetch(AssetIndex asset, Date occurred_on) const noexcept {
  if (asset >= assets_.size()) return;
  const Entry& e = assets_[asset];
  const int k = completed_years(e.in_service, occurred_on) + 1;
  if (k >= 1 && k <= e.complete_years) {
    __builtin_prefetch(&costs_[e.first_slot + static_cast<std::size_t>(k - 1)], 1);
  }
}

std::span<const Money> CostHistory::year_costs(AssetIndex asset) const {
  const Entry& e = entry(asset);
  return {costs_.data() + e.first_slot, static_cast<std::size_t>(e.complete_years)};
}

}  // namespace tenure::fleet
