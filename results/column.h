// One column of a stored table: its name, its SQL type as CREATE TABLE states it, and the field of
// the row struct that it holds, read and written through two generated accessors. A table is a
// list of these (results/tables.h), from which db/ generates the CREATE, the INSERT and the
// SELECT, so a column is named in one place only.
//
//   constexpr Column<AssetRow> kAge =
//       column<&AssetRow::age_years>("age_years", "INTEGER NOT NULL");
//   Value v = kAge.get(row);            // std::int64_t{7}
//   bool fits = kAge.set(row, v);       // false when a stored value does not fit the field
//
// Fields map to SQLite's storage classes: integers (and bool as 0/1) to INTEGER, double to REAL,
// std::string to TEXT, enums to TEXT through StoredWords<E> (the words they are stored as),
// std::optional<T> to T or NULL.
#pragma once

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <type_traits>
#include <variant>

namespace tenure::results {

// A stored value as SQLite holds it: NULL, INTEGER, REAL or TEXT. Text is a view: into the row
// when writing, into the statement's current row when reading.
using Value = std::variant<std::monostate, std::int64_t, double, std::string_view>;

// The words an enum is stored as: specialised for each stored enum (results/stored_words.h) with
//   static constexpr E values[] = {...};   static std::string_view word(E);
template <class E>
struct StoredWords;

// How the later columns of a table come to an existing database (db/schema.cpp): a column added
// after the first schema names the schema version that added it, and migrating to that version
// adds it (so it must be nullable or have a DEFAULT in its sql_type).
struct ColumnOptions {
  std::string_view note = {};  // the comment beside it in CREATE TABLE
  int since = 1;               // the schema version that added it
  bool in_views = false;       // also shown by the table's "latest" views, after SPEC 7's columns
  bool assigned_by_database = false;  // INTEGER PRIMARY KEY: left out of the INSERT
};

template <class Row>
struct Column {
  std::string_view name;
  std::string_view sql_type;
  Value (*get)(const Row& row);
  bool (*set)(Row& row, const Value& value);
  ColumnOptions options;
};

namespace detail {

template <class T>
struct IsOptional : std::false_type {};
template <class T>
struct IsOptional<std::optional<T>> : std::true_type {};

template <class T>
Value encode(const T& field) {
  if constexpr (IsOptional<T>::value) {
    return field ? encode(*field) : Value{};
  } else if constexpr (std::is_same_v<T, std::string>) {
    return std::string_view(field);
  } else if constexpr (std::is_enum_v<T>) {
    return std::string_view(StoredWords<T>::word(field));
  } else if constexpr (std::is_same_v<T, bool>) {
    return std::int64_t{field ? 1 : 0};
  } else if constexpr (std::is_integral_v<T>) {
    return static_cast<std::int64_t>(field);
  } else {
    static_assert(std::is_same_v<T, double>, "a stored field is an integer, double, text or enum");
    return field;
  }
}

template <class T>
bool decode(const Value& value, T& field) {
  if constexpr (IsOptional<T>::value) {
    if (std::holds_alternative<std::monostate>(value)) {
      field.reset();
      return true;
    }
    typename T::value_type inner{};
    if (!decode(value, inner)) return false;
    field = std::move(inner);
    return true;
  } else if constexpr (std::is_same_v<T, std::string>) {
    const auto* text = std::get_if<std::string_view>(&value);
    if (text) field.assign(text->data(), text->size());
    return text != nullptr;
  } else if constexpr (std::is_enum_v<T>) {
    const auto* text = std::get_if<std::string_view>(&value);
    if (!text) return false;
    for (T candidate : StoredWords<T>::values) {
      if (*text == StoredWords<T>::word(candidate)) {
        field = candidate;
        return true;
      }
    }
    return false;
  } else if constexpr (std::is_integral_v<T>) {
    const auto* integer = std::get_if<std::int64_t>(&value);
    if (integer) field = static_cast<T>(*integer);
    return integer != nullptr;
  } else {
    if (const auto* real = std::get_if<double>(&value)) {
      field = *real;
      return true;
    }
    const auto* integer = std::get_if<std::int64_t>(&value);  // a REAL stored as an integer
    if (integer) field = static_cast<double>(*integer);
    return integer != nullptr;
  }
}

template <class Member>
struct MemberOf;
template <class R, class F>
struct MemberOf<F R::*> {
  using Row = R;
  using Field = F;
};

}  // namespace detail

// The column that holds the field `Member` (a pointer to a data member of the row struct).
template <auto Member>
constexpr Column<typename detail::MemberOf<decltype(Member)>::Row> column(
    std::string_view name, std::string_view sql_type, ColumnOptions options = {}) {
  using Row = typename detail::MemberOf<decltype(Member)>::Row;
  return {name, sql_type, [](const Row& row) { return detail::encode(row.*Member); },
          [](Row& row, const Value& value) { return detail::decode(value, row.*Member); }, options};
}

}  // namespace tenure::results
