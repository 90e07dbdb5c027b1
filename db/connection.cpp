// RAII over the SQLite C API (see connection.h).
#include "db/connection.h"

#include <filesystem>
#include <string>

#include "core/errors.h"

namespace tenure::db {

Connection Connection::open(const std::string& path, bool create) {
  sqlite3* handle = nullptr;
  // NOMUTEX: a connection tenure opens is used by one thread at a time (the cost-event scan
  // hands it to its thread and back), so SQLite need not lock it on every call.
  const int flags = SQLITE_OPEN_READWRITE | SQLITE_OPEN_URI | SQLITE_OPEN_NOMUTEX |
                    (create ? SQLITE_OPEN_CREATE : 0);
  const int rc = sqlite3_open_v2(path.c_str(), &handle, flags, nullptr);
  if (rc != SQLITE_OK) {
    std::string message = handle ? sqlite3_errmsg(handle) : sqlite3_errstr(rc);
    sqlite3_close(handle);
    throw RuntimeFailure("cannot open database '" + path + "': " + message);
  }
  sqlite3_busy_timeout(handle, kBusyTimeoutMs);
  sqlite3_extended_result_codes(handle, 1);
  return Connection(handle, true);
}

Connection Connection::open_existing(const std::string& path, const std::string& option) {
  if (!path.starts_with("file:") && !std::filesystem::exists(path)) {
    throw InputError(option, "no database file '" + path + "'");
  }
  Connection db = open(path);
  // SQLite reads the header only at the first statement: a file that is not a database is bad
  // input, said here with its name, not a failure later.
  sqlite3_stmt* probe = nullptr;
  int rc =
      sqlite3_prepare_v2(db.handle_, "SELECT count(*) FROM sqlite_schema", -1, &probe, nullptr);
  if (rc == SQLITE_OK) rc = sqlite3_step(probe);
  sqlite3_finalize(probe);
  if (rc == SQLITE_NOTADB) {
    throw InputError(option, "'" + path + "' is not a SQLite database");
  }
  return db;
}

Connection Connection::borrow(sqlite3* handle) { return Connection(handle, false); }

Connection Connection::open_reader(const std::string& path) {
  sqlite3* handle = nullptr;
  const int rc = sqlite3_open_v2(path.c_str(), &handle, SQLITE_OPEN_READONLY | SQLITE_OPEN_NOMUTEX,
                                 nullptr);
  if (rc != SQLITE_OK) {
    std::string message = handle ? sqlite3_errmsg(handle) : sqlite3_errstr(rc);
    sqlite3_close(handle);
    throw RuntimeFailure("cannot open database '" + path + "' to read: " + message);
  }
  sqlite3_extended_result_codes(handle, 1);
  return Connection(handle, true);
}

Connection::Connection(Connection&& other) noexcept : handle_(other.handle_), owned_(other.owned_) {
  other.handle_ = nullptr;
  other.owned_ = false;
}

Connection::~Connection() {
  if (owned_ && handle_) sqlite3_close_v2(handle_);
}

bool Connection::writing_statement_running() const {
  for (sqlite3_stmt* s = sqlite3_next_stmt(handle_, nullptr); s;
       s = sqlite3_next_stmt(handle_, s)) {
    if (sqlite3_stmt_busy(s) && !sqlite3_stmt_readonly(s)) return true;
  }
  return false;
}

void Connection::exec(std::string_view sql) {
  char* error = nullptr;
  const int rc = sqlite3_exec(handle_, std::string(sql).c_str(), nullptr, nullptr, &error);
  if (rc != SQLITE_OK) {
    std::string message = error ? error : sqlite3_errstr(rc);
    sqlite3_free(error);
    throw RuntimeFailure(message);
  }
}

Statement::Statement(const Connection& db, std::string_view sql) : db_(db.handle()) {
  const int rc = sqlite3_prepare_v3(db_, sql.data(), static_cast<int>(sql.size()),
                                    SQLITE_PREPARE_PERSISTENT, &stmt_, nullptr);
  if (rc != SQLITE_OK) throw RuntimeFailure(std::string(sqlite3_errmsg(db_)));
}

Statement::~Statement() { sqlite3_finalize(stmt_); }

void Statement::check(int rc, const char* what) const {
  if (rc != SQLITE_OK) {
    throw RuntimeFailure(std::string(what) + ": " + sqlite3_errmsg(db_));
  }
}

void Statement::bind(int index, double value) {
  check(sqlite3_bind_double(stmt_, index, value), "bind");
}
void Statement::bind(int index, std::int64_t value) {
  check(sqlite3_bind_int64(stmt_, index, value), "bind");
}
void Statement::bind(int index, std::string_view value) {
  check(sqlite3_bind_text(stmt_, index, value.data(), static_cast<int>(value.size()),
                          SQLITE_TRANSIENT),
        "bind");
}
void Statement::bind_null(int index) { check(sqlite3_bind_null(stmt_, index), "bind"); }

bool Statement::step() {
  const int rc = sqlite3_step(stmt_);
  if (rc == SQLITE_ROW) return true;
  if (rc == SQLITE_DONE) return false;
  throw RuntimeFailure(std::string(sqlite3_errmsg(db_)));
}

void Statement::run() {
  while (step()) {
  }
  reset();
}

void Statement::reset() {
  sqlite3_reset(stmt_);
  sqlite3_clear_bindings(stmt_);
}

std::string_view Statement::text(int column) const {
  const auto* p = reinterpret_cast<const char*>(sqlite3_column_text(stmt_, column));
  if (!p) return {};
  return {p, static_cast<std::size_t>(sqlite3_column_bytes(stmt_, column))};
}

Transaction::Transaction(Connection& db, Kind kind) : db_(db), nested_(db.in_transaction()) {
  if (nested_) {
    db_.exec("SAVEPOINT tenure");
  } else {
    db_.exec(kind == Kind::immediate ? "BEGIN IMMEDIATE" : "BEGIN");
  }
}

Transaction::~Transaction() {
  if (!open_) return;
  const char* undo = nested_ ? "ROLLBACK TO tenure; RELEASE tenure" : "ROLLBACK";
  sqlite3_exec(db_.handle(), undo, nullptr, nullptr, nullptr);
}

void Transaction::commit() {
  db_.exec(nested_ ? "RELEASE tenure" : "COMMIT");
  open_ = false;
}

std::string quoted(std::string_view identifier) {
  std::string text;
  text.reserve(identifier.size() + 2);
  text.push_back('"');
  text.append(identifier);
  text.push_back('"');
  return text;
}

}  // namespace tenure::db
