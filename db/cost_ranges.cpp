// Reading a large cost-event table in two halves at once (see cost_ranges.h).
#include "db/cost_ranges.h"

#include <algorithm>
#include <cctype>
#include <set>

#include <fmt/format.h>

#include "core/errors.h"

namespace tenure::db {
namespace {

std::string lower(std::string_view text) {
  std::string out(text);
  std::transform(out.begin(), out.end(), out.begin(),
                 [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
  return out;
}

// A plain file of the default VFS that this connection only reads so far.
bool reads_a_plain_file(Connection& db) {
  sqlite3* handle = db.handle();
  if (!db.owned() || sqlite3_txn_state(handle, "main") != SQLITE_TXN_READ) return false;
  const char* file = sqlite3_db_filename(handle, "main");
  if (file == nullptr || *file == '\0') return false;  // in memory, or a temporary database
  sqlite3_vfs* vfs = nullptr;
  if (sqlite3_file_control(handle, "main", SQLITE_FCNTL_VFS_POINTER, &vfs) != SQLITE_OK ||
      vfs != sqlite3_vfs_find(nullptr)) {
    return false;
  }
  Statement mode(db, "PRAGMA main.journal_mode");
  return mode.step() && lower(mode.text(0)) != "wal";
}

// True when `relation` names a rowid table of the main database that no temporary object of
// the same name hides.
bool is_main_rowid_table(Connection& db, const std::string& relation) {
  Statement objects(db, "SELECT schema, type, wr FROM pragma_table_list WHERE name = ?1 COLLATE NOCASE");
  objects.bind(1, relation);
  bool main_table = false;
  while (objects.step()) {
    if (objects.text(0) == "temp") return false;
    if (objects.text(0) == "main") main_table = objects.text(1) == "table" && objects.integer(2) == 0;
  }
  return main_table;
}

// rowid, _rowid_ or oid: the first the relation has no column of, or "".
std::string free_rowid_name(Connection& db, const std::string& relation) {
  Statement columns(db, "SELECT name FROM pragma_table_info(?1)");
  columns.bind(1, relation);
  std::set<std::string> names;
  while (columns.step()) names.insert(lower(columns.text(0)));
  for (const char* name : {"rowid", "_rowid_", "oid"}) {
    if (!names.contains(name)) return name;
  }
  return "";
}

}  // namespace

std::optional<RowidSplit> plan_split(Connection& db, const std::string& relation,
                                     std::int64_t min_rows) {
  if (!reads_a_plain_file(db) || !is_main_rowid_table(db, relation)) return std::nullopt;
  const std::string rowid = free_rowid_name(db, relation);
  if (rowid.empty()) return std::nullopt;
  // Two subqueries: SQLite finds a lone min() or max() at an end of the table's b-tree, while
  // both in one SELECT would scan the whole table.
  Statement bounds(db, fmt::format("SELECT (SELECT min({0}) FROM {1}), (SELECT max({0}) FROM {1})",
                                   quoted(rowid), quoted(relation)));
  if (!bounds.step() || bounds.is_null(0)) return std::nullopt;  // no rows
  const std::int64_t first = bounds.integer(0);
  const std::int64_t last = bounds.integer(1);
  // The span in unsigned arithmetic: last - first may not fit a signed 64-bit integer.
  const std::uint64_t span = static_cast<std::uint64_t>(last) - static_cast<std::uint64_t>(first);
  if (min_rows < 1 || span < static_cast<std::uint64_t>(min_rows) - 1) return std::nullopt;
  return RowidSplit{rowid, first + static_cast<std::int64_t>(span / 2),
                    sqlite3_db_filename(db.handle(), "main")};
}

std::optional<Connection> open_second_reader(const RowidSplit& split) {
  try {
    Connection second = Connection::open_reader(split.database_path);
    second.exec("BEGIN");
    {
      Statement first_read(second, "SELECT count(*) FROM sqlite_schema");
      first_read.step();  // takes the shared lock now, or fails at once
    }
    return second;
  } catch (const RuntimeFailure&) {
    // Busy, or the file cannot be opened again (permissions, a changed path): the review's own
    // connection reads this half too.
    return std::nullopt;
  }
}

}  // namespace tenure::db
