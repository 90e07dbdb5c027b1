// The loadable extension's entry point: tenure inside the host's own SQLite connection. SQLite
// finds sqlite3_tenure_init from the file name (libtenure.so: "lib" dropped, letters up to the
// first dot), so the stock shell loads it with `.load ./libtenure` and a host with
// sqlite3_load_extension(db, "./libtenure", NULL, &error).
//
// Usage (the sqlite3 shell, in the build directory's plugin/ folder):
//   sqlite> .load ./libtenure
//   sqlite> SELECT tenure_version();
//   0.1.0
//   sqlite> SELECT round(tenure_factor('A/P', 0.10, 10), 5);
//   0.16275
//   sqlite> SELECT year, depreciation FROM tenure_depreciation('macrs', 10000, 0, 7) LIMIT 2;
//   1|1429.0
//   2|2449.0
//
// What it registers, one file each (functions.h lists them with their signatures):
//   tenure_version, tenure_factor, tenure_geometric_factor, tenure_present_worth, tenure_euac,
//   tenure_book_value, tenure_macrs_rate, tenure_case     pure calculators
//   tenure_depreciation                                   table-valued (eponymous virtual table)
//   tenure_review                                         the nightly review, direct SQL only
//   tenure_repair_check                                   repair or replace, direct SQL only
//
// How it works: one table of {name, argument count, flags, function} walked in a loop that stops
// at the first registration that fails and returns its code; then the virtual table module. The
// functions (and db/, which they use) call the SQLite API directly rather than through the host's
// API table: the entry point checks that the two are the same library (library_check.h) and
// refuses to load where they are not. Every function catches its own exceptions
// (sql_arguments.h, guarded): none crosses into SQLite.
#include <sqlite3ext.h>
SQLITE_EXTENSION_INIT1

#include "plugin/functions.h"
#include "plugin/library_check.h"
#include "plugin/tenure.h"

namespace tenure::plugin {
namespace {

struct FunctionEntry {
  const char* name;
  int arguments;  // the exact count; a name registered twice takes either count
  int flags;
  void (*function)(sqlite3_context*, int, sqlite3_value**);
};

// The result depends on the arguments only, and the function touches no table: usable in
// views, indexes, generated columns and CHECK constraints, even in a schema not trusted.
constexpr int kPure = SQLITE_UTF8 | SQLITE_DETERMINISTIC | SQLITE_INNOCUOUS;
// Reads the fleet relations and writes the tenure_* tables: only from SQL the application runs
// itself, never from a view or trigger that a database file could bring in.
constexpr int kReadsAndWritesTables = SQLITE_UTF8 | SQLITE_DIRECTONLY;
// Reads the fleet relations and the tenure_* tables: the same, for the same reason (a view could
// otherwise make whoever reads it run it).
constexpr int kReadsTables = SQLITE_UTF8 | SQLITE_DIRECTONLY;

constexpr FunctionEntry kFunctions[] = {
    {"tenure_version", 0, kPure, version_function},
    {"tenure_factor", 3, kPure, factor_function},
    {"tenure_geometric_factor", 3, kPure, geometric_factor_function},
    {"tenure_present_worth", 2, kPure, present_worth_function},
    {"tenure_euac", 2, kPure, euac_function},
    {"tenure_book_value", 5, kPure, book_value_function},
    {"tenure_book_value", 7, kPure, book_value_function},
    {"tenure_macrs_rate", 2, kPure, macrs_rate_function},
    {"tenure_case", 1, kPure, case_function},
    {"tenure_review", 1, kReadsAndWritesTables, review_function},
    {"tenure_review", 2, kReadsAndWritesTables, review_function},
    {"tenure_review", 3, kReadsAndWritesTables, review_function},
    {"tenure_repair_check", 2, kReadsTables, repair_check_function},
};

int register_all(sqlite3* db) {
  for (const FunctionEntry& f : kFunctions) {
    const int rc = sqlite3_create_function_v2(db, f.name, f.arguments, f.flags, nullptr,
                                              f.function, nullptr, nullptr, nullptr);
    if (rc != SQLITE_OK) return rc;
  }
  return sqlite3_create_module(db, "tenure_depreciation", &depreciation_module(), nullptr);
}

}  // namespace
}  // namespace tenure::plugin

extern "C" TENURE_API int sqlite3_tenure_init(sqlite3* db, char** error,
                                              const sqlite3_api_routines* api) {
  SQLITE_EXTENSION_INIT2(api);
  if (!tenure::plugin::is_linked_library(api->libversion_number)) {
    *error = sqlite3_mprintf(
        "tenure: this program's SQLite is not the shared libsqlite3 that libtenure uses; load "
        "tenure into a program linked with that library");
    return SQLITE_ERROR;
  }
  return tenure::plugin::register_all(db);
}
