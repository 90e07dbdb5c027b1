// Reading a large cost-event table in two halves at once (SPEC 9): one pass of SQLite over ten
// million rows is one core's work, so the rows up to the middle rowid are read on the review's
// connection while a second, read-only connection to the same file reads the rest on another
// thread. The cost totals are exact (fleet/cost_history.h), so the halves merged equal one pass,
// and rejected rows keep the numbers one pass would give them (cost_rows.h).
//
// Both connections must see the same data. In rollback-journal mode the review's connection holds
// its shared lock from the first read, so no writer can commit until it ends and the second
// connection, opened after that first read, sees the same database. In WAL mode a writer could
// commit in between, and SQLite's snapshot interface is not in Debian's build, so such a database
// is read in one pass, as is any relation that is not a rowid table of the main database, any
// connection tenure did not open itself (a host's may hold changes of its own), and any
// database that is not a plain file.
//
//   if (auto split = plan_split(db, "cost_event", kSplitMinRows)) {
//     std::optional<Connection> second = open_second_reader(*split);   // nullopt: read it here
//     scan_cost_events(db, "cost_event", split->first_half(), ...);
//     scan_cost_events(*second, "cost_event", split->second_half(), ...);   // on another thread
//   }
#pragma once

#include <cstdint>
#include <optional>
#include <string>

#include "db/connection.h"
#include "db/cost_event_scan.h"

namespace tenure::db {

// Below this many rows (by the span of rowids) one pass is quick enough.
inline constexpr std::int64_t kSplitMinRows = 1 << 18;

struct RowidSplit {
  std::string rowid_name;      // rowid, _rowid_ or oid: the first that is not a column's name
  std::int64_t last_of_first;  // the first half is rowid <= this, the second the rest
  std::string database_path;   // the main database's file

  ScanOptions first_half() const { return {rowid_name, std::nullopt, last_of_first, false}; }
  ScanOptions second_half() const { return {rowid_name, last_of_first, std::nullopt, false}; }
};

// Where to split `relation` (a checked plain identifier) read on `db` inside a read transaction
// that has already read, or nullopt to read it in one pass (see above; also when its rowids span
// fewer than `min_rows`).
std::optional<RowidSplit> plan_split(Connection& db, const std::string& relation,
                                     std::int64_t min_rows);

// A read-only connection to the split's database inside a read transaction that has read, or
// nullopt when it cannot start at once (a writer is waiting for the readers to finish: waiting
// here would hold that writer and this review up against each other).
std::optional<Connection> open_second_reader(const RowidSplit& split);

}  // namespace tenure::db
