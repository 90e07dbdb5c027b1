// The fleet's cost history (see cost_history.h). add_event is the nightly hot path (one call per
// cost event): integer date comparisons, one exp per day, one rounding, one integer add.
#include "fleet/cost_history.h"

#include <algorithm>
#include <cmath>
#include <limits>

#include <fmt/format.h>

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
  costs_.resize(costs_.size() + static_cast<std::size_t>(years), 0);
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
  const double restated = amount * factor_;
  if (!(std::abs(restated) <= kMaxRestated)) {
    throw InputError("cost_escalation",
                     fmt::format("restates a cost of {} on {} to {:g}, beyond {:g}", amount,
                                 occurred_on.to_iso(), restated, kMaxRestated));
  }
  costs_[e.first_slot + static_cast<std::size_t>(k - 1)] +=
      static_cast<Millionths>(std::nearbyint(restated * 1e6));  // rule (2)
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

std::vector<Money> CostHistory::year_costs(AssetIndex asset) const {
  const Entry& e = entry(asset);
  std::vector<Money> totals(static_cast<std::size_t>(e.complete_years));
  for (std::size_t k = 0; k < totals.size(); ++k) {
    totals[k] = static_cast<double>(costs_[e.first_slot + k]) / 1e6;
  }
  return totals;
}

CostHistory CostHistory::empty_copy() const {
  CostHistory copy(as_of(), escalation_.rate());
  copy.assets_ = assets_;
  copy.costs_.assign(costs_.size(), 0);
  return copy;
}

void CostHistory::merge(const CostHistory& part) {
  if (part.costs_.size() != costs_.size() || part.assets_.size() != assets_.size() ||
      part.as_of() != as_of()) {
    throw RuntimeFailure("cost history merged with a part of other assets");
  }
  for (std::size_t i = 0; i < costs_.size(); ++i) costs_[i] += part.costs_[i];
}

}  // namespace tenure::fleet
