// tenure_depreciation(method, basis, salvage, life[, rate, switch_to_straight_line,
// dispose_in_year, section_179, bonus, convention, quarter]): a depreciation schedule as rows,
// one per year, in year order. A table-valued function: an eponymous-only virtual table whose
// arguments are HIDDEN columns, as SQLite's generate_series(start, stop, step).
//
// Usage:
//   SELECT * FROM tenure_depreciation('macrs', 10000, 0, 5);   -- year|depreciation|book_value
//     1|2000.0|8000.0
//     2|3200.0|4800.0
//     3|1920.0|2880.0
//     4|1152.0|1728.0
//     5|1152.0|576.0
//     6|576.0|0.0
//   SELECT year, depreciation, book_value
//     FROM tenure_depreciation('straight_line', 12000, 2000, 5);   -- 2000 a year down to 2000
//   SELECT * FROM tenure_depreciation('declining_balance', 10000, 0, 5, 2, 1);
//     -- 4000, 2400, 1440, 1080, 1080: double declining balance switching to straight line
//   SELECT * FROM tenure_depreciation('macrs', 10000, 0, 5, NULL, NULL, 3);
//     -- sold at the end of year 3: rows 1..3, year 3 takes half of 1920 (960.0), book 3840.0
//   SELECT a.asset_id, d.year, d.depreciation
//     FROM asset AS a, tenure_depreciation('macrs', a.first_cost, 0, 7) AS d;  -- a join
//   SELECT sum(depreciation) FROM tenure_depreciation('sum_of_years_digits', 15000, 0, 5);
//     -- 15000.0
//   SELECT * FROM tenure_depreciation('{"method": "macrs", "recovery_years": 5}', 10000);
//     -- the method as a case file's depreciation object: the same six rows as the first call
//   SELECT * FROM tenure_depreciation('macrs', 10000, 0, 5, NULL, NULL, NULL, 1000, 0.5);
//     -- section 179 of 1000, then a 50% special allowance on 9000: year 1 5500 + 20% of 4500
//   SELECT * FROM tenure_depreciation('macrs', 10000, 0, 5, NULL, NULL, NULL, NULL, NULL,
//                                     'mid_quarter', 4);   -- Pub 946 Table A-5: 500, 3800, ...
//   SELECT * FROM tenure_depreciation('macrs_ads', 10000, 0, 5);   -- 1000, 2000 x 4, 1000
//
// Columns: year (INTEGER, 1..), depreciation (REAL, the year's deduction), book_value (REAL, at
// the year's end), then the hidden inputs method, basis, salvage, life, rate,
// switch_to_straight_line, dispose_in_year, section_179, bonus, convention, quarter, which read
// back as given (NULL when left out).
// The method's arguments and their rules are in depreciation_arguments.h: for 'macrs', life is
// the recovery period (3, 5, 7, 10, 15, 20) and salvage must be 0 or NULL; rate and
// switch_to_straight_line are for 'declining_balance' only. Without dispose_in_year the rows
// run to the schedule's last year; with it, they stop at that year, which takes the disposal-year
// deduction (SPEC 6: half a year for MACRS before its last table year, a full year otherwise).
//
// Errors name the argument, e.g.
//   tenure_depreciation: 2nd argument (basis) is missing
//   tenure_depreciation: 4th argument (life) must be one of 3, 5, 7, 10, 15, 20
//   tenure_depreciation: unknown method 'linear' (expected one of straight_line, ...)
//
// The table is innocuous (SQLITE_VTAB_INNOCUOUS): a pure calculator, usable in views and
// triggers even when the schema is not trusted.
#include <array>
#include <memory>
#include <new>
#include <vector>

#include "plugin/depreciation_arguments.h"
#include "plugin/functions.h"

namespace tenure::plugin {
namespace {

// The columns: the rows' values, then the hidden inputs, in argument order.
enum Column : int { kYearColumn, kDepreciationColumn, kBookValueColumn, kFirstInputColumn };
constexpr int kInputCount = 11;

const Signature kDepreciation{"tenure_depreciation",
                              {"method", "basis", "salvage", "life", "rate",
                               "switch_to_straight_line", "dispose_in_year", "section_179",
                               "bonus", "convention", "quarter"},
                              kDepreciationAliases};

struct ValueFree {
  void operator()(sqlite3_value* value) const { sqlite3_value_free(value); }
};
using OwnedValue = std::unique_ptr<sqlite3_value, ValueFree>;

struct Cursor : sqlite3_vtab_cursor {
  std::vector<depreciation::ScheduleRow> rows;
  std::size_t at = 0;
  std::array<OwnedValue, kInputCount> inputs;  // copies of the arguments, for xColumn
};

int connect_table(sqlite3* db, void*, int, const char* const*, sqlite3_vtab** table, char**) {
  const int rc = sqlite3_declare_vtab(
      db,
      "CREATE TABLE x(year INTEGER, depreciation REAL, book_value REAL, method HIDDEN, "
      "basis HIDDEN, salvage HIDDEN, life HIDDEN, rate HIDDEN, "
      "switch_to_straight_line HIDDEN, dispose_in_year HIDDEN, section_179 HIDDEN, "
      "bonus HIDDEN, convention HIDDEN, quarter HIDDEN)");
  if (rc != SQLITE_OK) return rc;
  *table = new (std::nothrow) sqlite3_vtab{};
  if (*table == nullptr) return SQLITE_NOMEM;
  return sqlite3_vtab_config(db, SQLITE_VTAB_INNOCUOUS);
}

int disconnect_table(sqlite3_vtab* table) {
  delete table;
  return SQLITE_OK;
}

// The plan: every hidden input with a usable `=` constraint is passed to xFilter. idxNum has
// bit k set when input k (0 method, 1 basis, 2 salvage, 3 life, 4 rate,
// 5 switch_to_straight_line, 6 dispose_in_year, 7 section_179, 8 bonus, 9 convention,
// 10 quarter) is passed, and xFilter receives the passed
// inputs in that order (argvIndex 1, 2, ... in input order, skipping those not passed). A
// missing input is not refused here but in xFilter, which names it; an input whose constraint
// is not usable in this plan (its value comes from a table joined later) makes the plan
// SQLITE_CONSTRAINT, so SQLite picks an order where it is usable. The rows come in year order,
// so ORDER BY year needs no sort. Constraints on year, depreciation and book_value are left to
// SQLite.
int best_index(sqlite3_vtab*, sqlite3_index_info* info) {
  std::array<int, kInputCount> constraint_of;
  constraint_of.fill(-1);
  for (int c = 0; c < info->nConstraint; ++c) {
    const auto& constraint = info->aConstraint[c];
    const int input = constraint.iColumn - kFirstInputColumn;
    if (input < 0 || constraint.op != SQLITE_INDEX_CONSTRAINT_EQ) continue;
    if (!constraint.usable) return SQLITE_CONSTRAINT;
    constraint_of[static_cast<std::size_t>(input)] = c;
  }
  int passed = 0;
  int mask = 0;
  for (int input = 0; input < kInputCount; ++input) {
    const int c = constraint_of[static_cast<std::size_t>(input)];
    if (c < 0) continue;
    info->aConstraintUsage[c].argvIndex = ++passed;
    info->aConstraintUsage[c].omit = 1;
    mask |= 1 << input;
  }
  info->idxNum = mask;
  info->estimatedCost = 10;
  info->estimatedRows = 10;
  if (info->nOrderBy == 1 && info->aOrderBy[0].iColumn == kYearColumn && !info->aOrderBy[0].desc) {
    info->orderByConsumed = 1;
  }
  return SQLITE_OK;
}

int open_cursor(sqlite3_vtab*, sqlite3_vtab_cursor** cursor) {
  *cursor = new (std::nothrow) Cursor{};
  return *cursor == nullptr ? SQLITE_NOMEM : SQLITE_OK;
}

int close_cursor(sqlite3_vtab_cursor* cursor) {
  delete static_cast<Cursor*>(cursor);
  return SQLITE_OK;
}

// Sets the error of a failed xFilter on the table (SQLite reports zErrMsg as the statement's
// error) and returns its code.
int filter_error(sqlite3_vtab* table, const std::exception_ptr& error) noexcept {
  try {
    const std::string message = describe(kDepreciation, error);
    sqlite3_free(table->zErrMsg);
    table->zErrMsg = sqlite3_mprintf("%s", message.c_str());
    return table->zErrMsg == nullptr ? SQLITE_NOMEM : SQLITE_ERROR;
  } catch (...) {
    return SQLITE_NOMEM;
  }
}

int filter(sqlite3_vtab_cursor* base, int mask, const char*, int argc, sqlite3_value** argv) {
  auto* cursor = static_cast<Cursor*>(base);
  try {
    cursor->rows.clear();
    cursor->at = 0;
    Arguments args(kDepreciation);
    int next = 0;
    for (std::size_t input = 0; input < kInputCount; ++input) {
      cursor->inputs[input].reset();
      if ((mask & (1 << input)) == 0 || next >= argc) continue;
      sqlite3_value* value = argv[next++];
      cursor->inputs[input].reset(sqlite3_value_dup(value));
      if (!cursor->inputs[input]) throw std::bad_alloc();
      args.set(input, value);
    }
    const formats::FlatSchedule flat = schedule_from(args);
    cursor->rows = flat.schedule.rows(flat.disposal_year);
    return SQLITE_OK;
  } catch (...) {
    return filter_error(base->pVtab, std::current_exception());
  }
}

int next_row(sqlite3_vtab_cursor* cursor) {
  ++static_cast<Cursor*>(cursor)->at;
  return SQLITE_OK;
}

int at_end(sqlite3_vtab_cursor* base) {
  const auto* cursor = static_cast<Cursor*>(base);
  return cursor->at >= cursor->rows.size();
}

int column_value(sqlite3_vtab_cursor* base, sqlite3_context* context, int column) {
  const auto* cursor = static_cast<Cursor*>(base);
  const depreciation::ScheduleRow& row = cursor->rows[cursor->at];
  switch (column) {
    case kYearColumn: sqlite3_result_int64(context, row.year); break;
    case kDepreciationColumn: sqlite3_result_double(context, row.depreciation); break;
    case kBookValueColumn: sqlite3_result_double(context, row.book_value); break;
    default: {
      const auto input_index = static_cast<std::size_t>(column - kFirstInputColumn);
      const OwnedValue& input = cursor->inputs[input_index];
      if (input) sqlite3_result_value(context, input.get());
      break;  // left out: NULL
    }
  }
  return SQLITE_OK;
}

int row_id(sqlite3_vtab_cursor* base, sqlite3_int64* id) {
  const auto* cursor = static_cast<Cursor*>(base);
  *id = cursor->rows[cursor->at].year;
  return SQLITE_OK;
}

// xCreate stays null: the table is eponymous-only, it exists under its own name and cannot be
// created with CREATE VIRTUAL TABLE. Fields not set (those of later module versions too) are null.
sqlite3_module make_module() {
  sqlite3_module module{};
  module.iVersion = 0;
  module.xConnect = connect_table;
  module.xBestIndex = best_index;
  module.xDisconnect = disconnect_table;
  module.xOpen = open_cursor;
  module.xClose = close_cursor;
  module.xFilter = filter;
  module.xNext = next_row;
  module.xEof = at_end;
  module.xColumn = column_value;
  module.xRowid = row_id;
  return module;
}

const sqlite3_module kModule = make_module();

}  // namespace

const sqlite3_module& depreciation_module() { return kModule; }

}  // namespace tenure::plugin
