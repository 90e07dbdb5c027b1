// Reads the cost-event relation in one sequential pass (SPEC 9) and hands its rows to the caller
// in batches of three columns, in scan order.
//
// The pass runs inside a single sqlite3_step of
//   SELECT count(tenure_cost_event_sink(?1, asset_id, occurred_on, amount)) FROM <relation>
// where tenure_cost_event_sink is a C function tenure registers on the connection: SQLite calls it
// once per row with the three values, as it calls length() in the floor query, so no row leaves
// the virtual machine through the slower column API. The scan object reaches the function as a
// bound pointer (sqlite3_bind_pointer), and the count it returns is checked against the rows
// delivered.
//
// With `overlap`, on a connection without a mutex (tenure's own, or a host's in multi-thread
// mode), the pass runs on a second thread while `consume` runs on the caller's, so reading and
// adding up overlap. Otherwise the pass runs on the caller's thread and `consume` is called from
// inside it: always so on a serialized connection, where the caller may be inside sqlite3_step
// holding the connection's mutex (SELECT tenure_review(...)) and a second thread could never
// enter. A scan may be limited to a rowid range, to read a table in parts at once (cost_ranges.h).
//
//   scan_cost_events(db, "cost_event", {}, [&](const EventBatch& batch) {
//     for (const RawEvent& e : batch.rows) use(batch.id(e), batch.date(e), e.amount);
//   });
#pragma once

#include <cstdint>
#include <functional>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "db/connection.h"

namespace tenure::db {

// One row as read: where the text of its id and date (and of an amount that is not a number) is
// kept, and the storage class of each (SQLITE_TEXT, SQLITE_INTEGER, SQLITE_NULL, SQLITE_BLOB...).
struct RawEvent {
  std::uint32_t id_offset;
  std::uint32_t id_length;
  std::uint32_t date_offset;
  std::uint32_t date_length;
  std::uint32_t amount_text_offset;  // the amount's text, kept only when it is not a number
  std::uint32_t amount_text_length;
  double amount;
  std::uint8_t id_type;
  std::uint8_t date_type;
  std::uint8_t amount_type;
};

struct EventBatch {
  std::int64_t first_row = 0;  // 1-based position in the scan of rows[0]
  std::vector<RawEvent> rows;
  std::string text;  // ids, dates and non-numeric amounts, back to back

  std::string_view id(const RawEvent& e) const { return {text.data() + e.id_offset, e.id_length}; }
  std::string_view date(const RawEvent& e) const {
    return {text.data() + e.date_offset, e.date_length};
  }
  std::string_view amount_text(const RawEvent& e) const {
    return {text.data() + e.amount_text_offset, e.amount_text_length};
  }
};

struct ScanOptions {
  // Only the rows whose rowid (as `rowid_name`, a name the relation has no column of) is in
  // (after, through]; every row when rowid_name is empty. Rows come in rowid order either way.
  std::string rowid_name;
  std::optional<std::int64_t> after, through;
  // Scan on a second thread while the caller consumes, when the connection allows it.
  bool overlap = true;
};

// Scans `relation` (a checked plain identifier) and calls `consume` on the caller's thread with
// every batch, in order. The connection must not be used by anything else until it returns. A
// failure of the scan or of `consume` is rethrown here once the scan has stopped.
void scan_cost_events(Connection& db, const std::string& relation, const ScanOptions& options,
                      const std::function<void(const EventBatch&)>& consume);

}  // namespace tenure::db
