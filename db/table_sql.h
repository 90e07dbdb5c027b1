// The SQL of a stored table, generated from its column list (results/tables.h): CREATE TABLE with
// its indexes, ALTER TABLE ... ADD COLUMN for a later column, the INSERT and the SELECT, and the
// binding and reading of one row through the columns' accessors. Every value is bound, and every
// name is qualified main.: a host's TEMP table of the same name is never read or written.
//
//   TableWriter<AssetRow> assets(db, results::asset_table());
//   assets.insert(row, run_id);
//   Statement q(db, select_sql(results::asset_table()) + " WHERE run_id = ?1");
//   q.bind(1, run_id);
//   while (q.step()) rows.push_back(read_row(q, results::asset_table()));
//
//   create_table_sql(results::rejected_table());
//   // CREATE TABLE tenure_rejected(
//   //   run_id INTEGER NOT NULL REFERENCES tenure_run(run_id),
//   //   source TEXT NOT NULL,  -- the input relation, as named by the policy's sources
//   //   ...
#pragma once

#include <fmt/format.h>

#include <cmath>
#include <cstdint>
#include <optional>
#include <string>
#include <vector>

#include "core/errors.h"
#include "db/connection.h"
#include "results/tables.h"

namespace tenure::db {

// The column of the tables of one run that refers to it (results::Table::of_run).
inline constexpr const char* kRunIdColumn = "run_id INTEGER NOT NULL REFERENCES tenure_run(run_id)";

void bind_value(Statement& q, int index, const results::Value& value);
// The value of a result column as SQLite returns it; text is a view valid until the next step.
results::Value column_value(const Statement& q, int column);

template <class Row>
std::string create_table_sql(const results::Table<Row>& table) {
  std::vector<std::pair<std::string, std::string_view>> lines;  // definition, note
  if (table.of_run) lines.emplace_back(kRunIdColumn, "");
  for (const results::Column<Row>& c : table.columns) {
    lines.emplace_back(fmt::format("{} {}", c.name, c.sql_type), c.options.note);
  }
  if (!table.constraints.empty()) lines.emplace_back(std::string(table.constraints), "");
  std::string sql = fmt::format("CREATE TABLE main.{}(\n", table.name);
  for (std::size_t i = 0; i < lines.size(); ++i) {
    const std::string line = "  " + lines[i].first + (i + 1 < lines.size() ? "," : "");
    // Notes line up at column 40, as a person would write them.
    sql += lines[i].second.empty() ? line : fmt::format("{:<38} -- {}", line, lines[i].second);
    if (i + 1 < lines.size()) {
      sql += "\n";
    } else {
      sql += lines[i].second.empty() ? ");\n" : "\n);\n";  // not inside a comment
    }
  }
  for (const results::Index& index : table.indexes) {
    sql += fmt::format("CREATE INDEX main.{} ON {}{};\n", index.name, table.name, index.columns);
  }
  return sql;
}

template <class Row>
std::string add_column_sql(const results::Table<Row>& table, const results::Column<Row>& c) {
  return fmt::format("ALTER TABLE main.{} ADD COLUMN {} {}", table.name, c.name, c.sql_type);
}

// "SELECT a, b, ... FROM table": the row's columns in table order (not run_id, for the tables of
// one run); the caller appends its WHERE and ORDER BY.
template <class Row>
std::string select_sql(const results::Table<Row>& table) {
  std::vector<std::string_view> names;
  for (const results::Column<Row>& c : table.columns) names.push_back(c.name);
  return fmt::format("SELECT {} FROM main.{}", fmt::join(names, ", "), table.name);
}

// The row at the statement's current step, its columns in select_sql's order. Throws
// RuntimeFailure naming the table and column when a stored value does not fit its field (a word
// this build does not know, say).
template <class Row>
Row read_row(const Statement& q, const results::Table<Row>& table) {
  Row row{};
  int index = 0;
  for (const results::Column<Row>& c : table.columns) {
    if (!c.set(row, column_value(q, index))) {
      throw RuntimeFailure(
          fmt::format("{}.{}: the stored value '{}' does not read as this "
                      "build of tenure stores it",
                      table.name, c.name, q.text(index)));
    }
    ++index;
  }
  return row;
}

// One prepared INSERT of a table, reused for every row.
template <class Row>
class TableWriter {
 public:
  TableWriter(const Connection& db, const results::Table<Row>& table)
      : table_(table), insert_(db, insert_sql()) {}

  // Inserts `row`; `run_id` is the run it belongs to (required for the tables of one run).
  // Throws RuntimeFailure naming the table and column of a REAL that is not a finite number:
  // SQLite would store NaN as NULL and the run would say nothing (the review gives such an
  // asset its own reason first, review/verdict_rule.h rule (0), so this is a last guard).
  void insert(const Row& row, std::optional<std::int64_t> run_id = std::nullopt) {
    int index = 1;
    if (table_.of_run) insert_.bind(index++, *run_id);
    for (const results::Column<Row>& c : table_.columns) {
      if (c.options.assigned_by_database) continue;
      const results::Value value = c.get(row);
      if (const auto* real = std::get_if<double>(&value); real && !std::isfinite(*real)) {
        throw RuntimeFailure(fmt::format("{}.{}: {} is not a finite number", table_.name, c.name,
                                         *real));
      }
      bind_value(insert_, index++, value);
    }
    insert_.run();
  }

 private:
  std::string insert_sql() const {
    std::vector<std::string_view> names;
    if (table_.of_run) names.push_back("run_id");
    for (const results::Column<Row>& c : table_.columns) {
      if (!c.options.assigned_by_database) names.push_back(c.name);
    }
    std::vector<std::string> places;
    for (std::size_t i = 1; i <= names.size(); ++i) places.push_back(fmt::format("?{}", i));
    return fmt::format("INSERT INTO main.{}({}) VALUES ({})", table_.name, fmt::join(names, ", "),
                       fmt::join(places, ", "));
  }

  const results::Table<Row>& table_;
  Statement insert_;
};

}  // namespace tenure::db
