// The fleet's cost history: for every asset, its restated cost totals by complete age-year,
// filled in one pass over the cost events in any order (SPEC 6 "Fleet data", SPEC 9). Memory is
// O(assets x complete years): one slot per asset-year, allocated when the asset is added, never
// one per event. The totals are exact sums of the restated amounts rounded to millionths, so
// they do not depend on the order of the events: parts of the events added up separately (on
// several threads) and merged give the very same totals as one pass.
//
//   CostHistory history(as_of, 0.03);                    // policy cost_escalation
//   auto van = history.add_asset(in_service, std::nullopt);
//   history.add_event(van, occurred_on, 412.50);         // EventFate::counted, or why not
//   history.year_costs(van);                              // [k-1] = restated cost of age-year k
//
//   CostHistory part = history.empty_copy();              // the same assets, no events
//   part.add_event(...); history.merge(part);             // = adding them to history directly
//
// Rules:
//   (1) Age-year k (date.h rule 3) is complete when its end, anniversary(k), is on or before the
//       as-of date and, for a retired asset, on or before retired_on. Only complete years are
//       kept: an asset has completed_years(in_service, min(as_of, retired_on)) of them.
//   (2) Each event adds its amount restated to as-of money (escalation.h rule 1), rounded to the
//       nearest millionth of the money unit, to the total of the age-year its day falls in; the
//       totals are kept as exact integers of millionths. Negative amounts (credits, refunds) are
//       kept. A restated amount beyond kMaxRestated is an InputError naming "cost_escalation".
//   (3) An event is not counted when its amount is not finite, it is dated before in service or
//       after retirement (the caller records these as rejected rows), or it falls in an age-year
//       that is not complete (the current year, or after the as-of date: not an error).
#pragma once

#include <cstddef>
#include <cstdint>
#include <optional>
#include <vector>

#include "core/types.h"
#include "fleet/date.h"
#include "fleet/escalation.h"

namespace tenure::fleet {

enum class EventFate {
  counted,                 // added to a complete age-year
  outside_complete_years,  // a valid event in an incomplete age-year (rule 3): skipped, no error
  before_in_service,       // rejected: dated before the asset's in-service date
  after_retirement,        // rejected: dated after the asset's retirement
  non_finite_amount,       // rejected: NaN or infinite amount
};

class CostHistory {
 public:
  using AssetIndex = std::uint32_t;

  // Throws InputError naming "cost_escalation" unless it is finite and > -1.
  CostHistory(Date as_of, Rate cost_escalation);

  // Registers one asset and returns its index (0, 1, 2, ... in call order). Throws InputError
  // naming "retired_on" when it is before in_service.
  AssetIndex add_asset(Date in_service, std::optional<Date> retired_on);
  void reserve_assets(std::size_t count);

  // Rules (2) and (3). Throws InputError naming "asset" for an index add_asset did not return.
  EventFate add_event(AssetIndex asset, Date occurred_on, Money amount);
  // Starts loading what add_event will read for `asset`, so a batch of events can overlap its
  // memory reads (the assets of consecutive events are scattered over the whole fleet).
  void prefetch(AssetIndex asset) const noexcept {
    if (asset < assets_.size()) {
      __builtin_prefetch(&assets_[asset]);
    }
  }
  // Then, once that has arrived, the total the event on `occurred_on` will add to.
  void prefetch(AssetIndex asset, Date occurred_on) const noexcept;

  Date as_of() const { return escalation_.as_of(); }
  const Escalation& escalation() const { return escalation_; }
  std::size_t asset_count() const { return assets_.size(); }
  // m, the asset's complete age-years (rule 1).
  int complete_years(AssetIndex asset) const { return entry(asset).complete_years; }
  // The asset's restated totals: element k-1 is age-year k, k = 1..complete_years(asset).
  std::vector<Money> year_costs(AssetIndex asset) const;

  // The same assets and as-of date with every total zero, for adding up part of the events.
  CostHistory empty_copy() const;
  // Adds the totals of `part`, an empty_copy() of this history given other events. Throws
  // RuntimeFailure when it holds other assets.
  void merge(const CostHistory& part);

  // The largest restated amount one event may add (rule 2), far above any real cost.
  static constexpr double kMaxRestated = 1e24;

 private:
  struct Entry {
    Date in_service;
    std::int32_t retired_day;  // days since epoch; INT32_MAX while in service
    std::int32_t complete_years;
    std::size_t first_slot;    // index of age-year 1 in costs_
  };
  // Exact sums of millionths: 2^127 holds over 10^14 events of kMaxRestated each.
  __extension__ using Millionths = __int128;

  const Entry& entry(AssetIndex asset) const;

  Escalation escalation_;
  // Events arrive in date order, so consecutive ones mostly share a day: its restatement factor
  // is computed once per day, not once per event.
  Date factor_day_;
  double factor_ = 1.0;
  std::vector<Entry> assets_;
  std::vector<Millionths> costs_;  // every asset's complete years, back to back
};

}  // namespace tenure::fleet
