// A thin RAII layer over the SQLite C API for db/: an owned or borrowed connection, prepared
// statements with bound parameters, and transactions that roll back unless committed. Every
// failure throws tenure::RuntimeFailure carrying SQLite's message (or InputError where the
// caller says the input is at fault).
//
//   Connection db = Connection::open("fleet.db");
//   Statement q(db, "SELECT asset_id FROM asset WHERE asset_class = ?1");
//   q.bind(1, "pump-duty");
//   while (q.step()) use(q.text(0));
//   Transaction tx(db, Transaction::Kind::immediate);  ...; tx.commit();
#pragma once

#include <sqlite3.h>

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>

namespace tenure::db {

class Connection {
 public:
  // Opens (creating if asked) a database file with a busy timeout, so that a host holding the
  // write lock for a while makes tenure wait rather than fail.
  static Connection open(const std::string& path, bool create = false);
  // Opens a database that must exist (a path or a file: URI). A missing file, or one that is not a
  // SQLite database, is bad input: InputError naming `option` ("--db: no database file 'x'",
  // "--db: 'x' is not a SQLite database"), so nothing is created by a typo.
  static Connection open_existing(const std::string& path, const std::string& option);
  // Wraps a connection the caller owns (the extension's, a host's); not closed here.
  static Connection borrow(sqlite3* handle);
  // A second, read-only connection to a database file tenure already has open, for reading in
  // parallel (cost_ranges.h). It never waits for a lock: SQLITE_BUSY comes back at once.
  static Connection open_reader(const std::string& path);

  Connection(Connection&& other) noexcept;
  Connection& operator=(Connection&&) = delete;
  Connection(const Connection&) = delete;
  ~Connection();

  sqlite3* handle() const { return handle_; }
  // True when tenure opened this connection (open, open_existing, open_reader), not borrow.
  bool owned() const { return owned_; }
  // Runs one or more statements without results; throws on failure.
  void exec(std::string_view sql);
  bool in_transaction() const { return sqlite3_get_autocommit(handle_) == 0; }
  // True while a statement that writes is running on the connection (a SQL function called from
  // INSERT ... SELECT): SQLite refuses both a COMMIT and a new SAVEPOINT until it ends.
  bool writing_statement_running() const;

  static constexpr int kBusyTimeoutMs = 60000;

 private:
  Connection(sqlite3* handle, bool owned) : handle_(handle), owned_(owned) {}
  sqlite3* handle_;
  bool owned_;
};

class Statement {
 public:
  Statement(const Connection& db, std::string_view sql);
  Statement(const Statement&) = delete;
  Statement& operator=(const Statement&) = delete;
  ~Statement();

  // Parameters are 1-based, as in SQLite.
  void bind(int index, double value);
  void bind(int index, std::int64_t value);
  void bind(int index, int value) { bind(index, static_cast<std::int64_t>(value)); }
  void bind(int index, std::string_view value);
  void bind(int index, const char* value) { bind(index, std::string_view(value)); }
  void bind_null(int index);
  template <class T>
  void bind(int index, const std::optional<T>& value) {
    if (value) bind(index, *value); else bind_null(index);
  }

  // Steps once: true when a row is ready, false when done. Throws on error.
  bool step();
  // Steps to completion (for statements without rows), then resets for reuse.
  void run();
  void reset();

  int column_type(int column) const { return sqlite3_column_type(stmt_, column); }
  bool is_null(int column) const { return column_type(column) == SQLITE_NULL; }
  double real(int column) const { return sqlite3_column_double(stmt_, column); }
  std::int64_t integer(int column) const { return sqlite3_column_int64(stmt_, column); }
  // The column as text without copying; valid until the next step or reset.
  std::string_view text(int column) const;
  sqlite3_stmt* handle() const { return stmt_; }

 private:
  void check(int rc, const char* what) const;
  sqlite3* db_;
  sqlite3_stmt* stmt_ = nullptr;
};

// BEGIN ... COMMIT; the destructor rolls back a transaction that was not committed. Inside a
// transaction the caller already holds, it is a SAVEPOINT instead: its work joins the caller's
// transaction (committed or rolled back with it), and a failure rolls back only its own part.
class Transaction {
 public:
  enum class Kind { deferred, immediate };
  Transaction(Connection& db, Kind kind);
  Transaction(const Transaction&) = delete;
  Transaction& operator=(const Transaction&) = delete;
  ~Transaction();
  void commit();

 private:
  Connection& db_;
  bool open_ = true;
  bool nested_ = false;
};

// "name" with double quotes, for an identifier that passed tenure::is_plain_identifier
// (core/checks.h): db/ splices only such identifiers into SQL, always quoted.
std::string quoted(std::string_view identifier);

}  // namespace tenure::db
