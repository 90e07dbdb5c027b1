// Shared helpers for the db tests: a temporary database file, queries that return one value,
// and a digest of a relation's rows (to prove input tables are never written).
#pragma once

#include <gtest/gtest.h>
#include <sqlite3.h>

#include <filesystem>
#include <string>
#include <unistd.h>

#include "db/connection.h"
#include "app/sha256.h"

namespace tenure::testing_support {

class TempDatabase {
 public:
  TempDatabase() {
    path_ = std::filesystem::temp_directory_path() /
            ("tenure-test-" + std::to_string(::getpid()) + "-" + std::to_string(counter()++) + ".db");
    std::filesystem::remove(path_);
  }
  ~TempDatabase() {
    for (const char* suffix : {"", "-journal", "-wal", "-shm"}) {
      std::filesystem::remove(path_.string() + suffix);
    }
  }
  std::string path() const { return path_.string(); }
  db::Connection open() const { return db::Connection::open(path(), true); }

 private:
  static int& counter() {
    static int n = 0;
    return n;
  }
  std::filesystem::path path_;
};

inline double scalar(db::Connection& db, const std::string& sql) {
  db::Statement q(db, sql);
  if (!q.step()) throw std::runtime_error("no row: " + sql);
  return q.real(0);
}

inline std::string text_of(db::Connection& db, const std::string& sql) {
  db::Statement q(db, sql);
  if (!q.step()) throw std::runtime_error("no row: " + sql);
  return std::string(q.text(0));
}

// SHA-256 over every row of a relation, in a fixed order, with each value's type and text.
inline std::string relation_digest(db::Connection& db, const std::string& relation) {
  db::Statement q(db, "SELECT * FROM " + relation + " ORDER BY 1, 2, 3");
  std::string all;
  while (q.step()) {
    for (int c = 0; c < sqlite3_column_count(q.handle()); ++c) {
      all += std::to_string(q.column_type(c)) + ":" + std::string(q.text(c)) + "|";
    }
    all += "\n";
  }
  return app::sha256_hex(all);
}

}  // namespace tenure::testing_support
