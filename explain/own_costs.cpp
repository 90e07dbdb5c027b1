// An asset's own costs against its class curve (see own_costs.h).
#include "explain/own_costs.h"

#include "fleet/cost_history.h"

namespace tenure::explain {

std::optional<OwnCosts> own_costs(const results::InputAsset& input, Date as_of, Rate cost_escalation,
                                  const fleet::CostCurve& curve) {
  const auto in_service = parse_iso_date(input.in_service_on);
  std::optional<Date> retired;
  if (input.retired_on) {
    retired = parse_iso_date(*input.retired_on);
    if (!retired) return std::nullopt;
  }
  if (!in_service || (retired && *retired < *in_service)) return std::nullopt;

  fleet::CostHistory history(as_of, cost_escalation);
  const auto asset = history.add_asset(*in_service, retired);
  OwnCosts out{*in_service, {}, {}, 0, 0, input.events_unreadable};
  std::vector<std::size_t> events(static_cast<std::size_t>(history.complete_years(asset)), 0);
  for (const results::CostEventRow& event : input.events) {
    const auto day = parse_iso_date(event.occurred_on);
    if (!day) {
      ++out.events_not_usable;
      continue;
    }
    switch (history.add_event(asset, *day, event.amount)) {
      case fleet::EventFate::counted:
        ++out.events_counted;
        ++events[static_cast<std::size_t>(age_year_of(*in_service, *day) - 1)];
        break;
      case fleet::EventFate::outside_complete_years:
        ++out.events_not_complete;
        break;
      case fleet::EventFate::before_in_service:
      case fleet::EventFate::after_retirement:
      case fleet::EventFate::non_finite_amount:
        ++out.events_not_usable;
        break;
    }
  }
  const auto totals = history.year_costs(asset);
  for (std::size_t i = 0; i < totals.size(); ++i) {
    const auto k = static_cast<Years>(i + 1);
    out.years.push_back({k, events[i], totals[i], curve.predict(k)});
  }
  out.credibility = fleet::credibility(totals, curve);
  return out;
}

}  // namespace tenure::explain
