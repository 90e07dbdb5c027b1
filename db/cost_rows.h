// Rule (2) of fleet_reader.h for the rows of one scan of the cost events (the whole relation, or
// one rowid range of it read beside the other, see cost_ranges.h): checks each row, adds the
// counted events to a cost history, and keeps the rejected rows. Row numbers count within the
// scan until finish() places the scan after the rows of the scans before it, so the references
// read as one pass over the relation would give them.
//
//   CostRows rows("cost_event", accepted, data, data.costs);
//   scan_cost_events(db, "cost_event", {}, [&](const EventBatch& b) { rows.read(b); });
//   std::move(rows).finish(report, 0);
#pragma once

#include <cstdint>
#include <optional>
#include <string>
#include <vector>

#include "db/cost_event_scan.h"
#include "db/fleet_reader.h"
#include "db/row_checks.h"
#include "fleet/cost_history.h"
#include "review/fleet_data.h"

namespace tenure::db {

class CostRows {
 public:
  // `accepted` and `data` (its assets and as-of date) are only read, so several CostRows may
  // work at once, each adding to its own `totals`.
  CostRows(std::string source, const AcceptedAssets& accepted, const review::FleetData& data,
           fleet::CostHistory& totals);

  void read(const EventBatch& batch);
  std::int64_t rows() const { return rows_; }
  // Adds this scan's counts and rejections to `report`, numbering its rows after `rows_before`.
  void finish(ReadReport& report, std::int64_t rows_before) &&;

 private:
  struct Rejected {
    std::int64_t row;  // within this scan
    std::string keys;  // "(asset_id 'PU-1', occurred_on '2024-02-30')"
    std::string reason;
  };

  // Adds one checked event to the totals; a restatement too large to add names the row.
  fleet::EventFate add_event(std::uint32_t asset, Date occurred, const RawEvent& e,
                             const EventBatch& batch);

  // Cost events arrive in date order, so most rows repeat the previous row's date text: parse it
  // once per distinct text.
  class DateMemo {
   public:
    std::optional<Date> parse(std::string_view text);

   private:
    char text_[16] = {};
    std::size_t length_ = 0;
    std::optional<Date> date_;
  };

  std::string source_;
  const AcceptedAssets& accepted_;
  const review::FleetData& data_;
  fleet::CostHistory& totals_;
  std::int64_t rows_ = 0;
  std::int64_t rows_after_as_of_ = 0;
  std::vector<Rejected> rejected_;
  DateMemo dates_;
  std::vector<std::uint64_t> hashes_;  // per row of the batch being read
  std::vector<std::uint32_t> assets_;
  std::vector<std::optional<Date>> days_;
};

}  // namespace tenure::db
