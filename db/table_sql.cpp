// Binding and reading the values of stored tables (see table_sql.h).
#include "db/table_sql.h"

#include <type_traits>
#include <variant>

namespace tenure::db {

void bind_value(Statement& q, int index, const results::Value& value) {
  std::visit(
      [&](const auto& v) {
        if constexpr (std::is_same_v<std::decay_t<decltype(v)>, std::monostate>) {
          q.bind_null(index);
        } else {
          q.bind(index, v);
        }
      },
      value);
}

results::Value column_value(const Statement& q, int column) {
  switch (q.column_type(column)) {
    case SQLITE_INTEGER:
      return q.integer(column);
    case SQLITE_FLOAT:
      return q.real(column);
    case SQLITE_NULL:
      return {};
    default:
      return q.text(column);
  }
}

}  // namespace tenure::db
