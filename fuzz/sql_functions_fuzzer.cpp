// libFuzzer target: the extension's SQL functions (plugin/) called from SQL the way a user can
// call them, with argument combinations drawn from the input: NULLs, integers, reals (NaN,
// infinities, -0, huge and tiny ones), texts (method and factor names, JSON arrays and case
// documents, raw bytes) and blobs. Errors are expected (each is an SQL error with a message);
// a crash, a sanitizer report, an exception crossing into SQLite or an error without a message
// is a bug.
//
// The extension registers itself through its real entry point, sqlite3_tenure_init (compiled
// into this program, see CMakeLists.txt), as an automatic extension of an in-memory database.
//
//   build-fuzz/fuzz/sql_functions_fuzzer -max_total_time=60 build-fuzz/corpus/sql_functions \
//     fixtures/fuzz/sql_functions
#include <sqlite3.h>

#include <fuzzer/FuzzedDataProvider.h>

#include <cmath>
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <limits>
#include <string>
#include <vector>

extern "C" int sqlite3_tenure_init(sqlite3* db, char** error, const sqlite3_api_routines* api);

namespace {

struct Call {
  const char* sql;
  int arguments;
};

// Every pure function and both forms of the table-valued one (arguments in the call, and as
// constraints on the hidden columns in another order).
const Call kCalls[] = {
    {"SELECT tenure_factor(?1, ?2, ?3)", 3},
    {"SELECT tenure_geometric_factor(?1, ?2, ?3)", 3},
    {"SELECT tenure_present_worth(?1, ?2)", 2},
    {"SELECT tenure_euac(?1, ?2)", 2},
    {"SELECT tenure_book_value(?1, ?2, ?3, ?4, ?5)", 5},
    {"SELECT tenure_book_value(?1, ?2, ?3, ?4, ?5, ?6, ?7)", 7},
    {"SELECT tenure_macrs_rate(?1, ?2)", 2},
    {"SELECT tenure_case(?1)", 1},
    {"SELECT year, depreciation, book_value FROM tenure_depreciation(?1, ?2, ?3, ?4)", 4},
    {"SELECT * FROM tenure_depreciation(?1, ?2, ?3, ?4, ?5, ?6, ?7)", 7},
    {"SELECT year, book_value FROM tenure_depreciation WHERE life = ?4 AND salvage = ?3 AND "
     "basis = ?2 AND method = ?1 AND dispose_in_year = ?5",
     5},
    {"SELECT tenure_version()", 0},
};
constexpr std::size_t kCallCount = sizeof kCalls / sizeof kCalls[0];
constexpr int kMaxRows = 2000;  // rows stepped per call, so a long schedule cannot time out

const char* const kWords[] = {
    "P/F", "F/P", "A/P", "A/F", "P/A", "F/A", "A/G", "P/G", "ap", "pf", "X/Y", "",
    "straight_line", "declining_balance", "sum_of_years_digits", "macrs", "none", "MACRS",
    "[]", "[1]", "[-1000, 500, 500, 500]", "[60000, 4000, 5500, -22000]", "[1e308, 1e308]",
    "[1, \"a\"]", "{\"a\": 1}", "[null]", "[1e999]", "0.10", "1e308", "-1", "nan", "inf",
    R"({"marr": 0.10, "income_tax_rate": 0.25, "challenger": {"first_cost": 60000,
        "operating_costs": [4000, 5500, 7000], "market_values": [45000, 36000, 29000],
        "depreciation": {"method": "macrs", "recovery_years": 3}}})",
    R"({"marr": 0.10, "income_tax_rate": 0, "challenger": {"first_cost": 1,
        "operating_costs": [0], "market_values": [0], "depreciation": {"method": "none"}},
        "defender": {"first_cost": 1, "age_years": 0, "market_value_now": 0,
        "operating_costs": [0], "market_values": [0], "depreciation": {"method": "none"}},
        "study_period_years": 1})",
};

double interesting_real(FuzzedDataProvider& in) {
  static const double kReals[] = {0.0, -0.0, 0.1, -0.1, 1.0, -1.0, -0.999999, 2.0, 3, 5, 7, 10, 15,
                                  20, 100, 1000, 1e6, 1e15, 1e300, -1e300, 1e308, 4.9e-324,
                                  std::numeric_limits<double>::infinity(),
                                  -std::numeric_limits<double>::infinity(),
                                  std::numeric_limits<double>::quiet_NaN(),
                                  std::numeric_limits<double>::max(),
                                  std::numeric_limits<double>::lowest()};
  if (in.ConsumeBool()) return in.PickValueInArray(kReals);
  return in.ConsumeFloatingPoint<double>();
}

void bind_one(sqlite3_stmt* statement, int index, FuzzedDataProvider& in) {
  switch (in.ConsumeIntegralInRange(0, 6)) {
    case 0: sqlite3_bind_null(statement, index); break;
    case 1: sqlite3_bind_int64(statement, index, in.ConsumeIntegralInRange<std::int64_t>(-3, 1100)); break;
    case 2: sqlite3_bind_int64(statement, index, in.ConsumeIntegral<std::int64_t>()); break;
    case 3: sqlite3_bind_double(statement, index, interesting_real(in)); break;
    case 4: sqlite3_bind_text(statement, index, in.PickValueInArray(kWords), -1, SQLITE_STATIC); break;
    case 5: {
      const std::string text = in.ConsumeRandomLengthString(256);
      sqlite3_bind_text(statement, index, text.data(), static_cast<int>(text.size()), SQLITE_TRANSIENT);
      break;
    }
    default: {
      const std::vector<std::uint8_t> bytes = in.ConsumeBytes<std::uint8_t>(in.ConsumeIntegralInRange(0, 16));
      sqlite3_bind_blob(statement, index, bytes.data(), static_cast<int>(bytes.size()), SQLITE_TRANSIENT);
    }
  }
}

struct Database {
  sqlite3* db = nullptr;
  std::vector<sqlite3_stmt*> statements;

  Database() {
    if (sqlite3_auto_extension(reinterpret_cast<void (*)()>(sqlite3_tenure_init)) != SQLITE_OK ||
        sqlite3_open(":memory:", &db) != SQLITE_OK) {
      std::abort();
    }
    for (const Call& call : kCalls) {
      sqlite3_stmt* statement = nullptr;
      if (sqlite3_prepare_v2(db, call.sql, -1, &statement, nullptr) != SQLITE_OK) {
        std::fprintf(stderr, "cannot prepare %s: %s\n", call.sql, sqlite3_errmsg(db));
        std::abort();
      }
      statements.push_back(statement);
    }
  }
};

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  static Database database;
  FuzzedDataProvider in(data, size);
  for (int calls = 0; calls < 8 && in.remaining_bytes() > 0; ++calls) {
    const std::size_t which = in.ConsumeIntegralInRange<std::size_t>(0, kCallCount - 1);
    sqlite3_stmt* statement = database.statements[which];
    for (int k = 1; k <= kCalls[which].arguments; ++k) bind_one(statement, k, in);
    int rc = SQLITE_ROW;
    for (int rows = 0; rows < kMaxRows && (rc = sqlite3_step(statement)) == SQLITE_ROW; ++rows) {
      for (int c = 0; c < sqlite3_column_count(statement); ++c) {
        if (sqlite3_column_type(statement, c) == SQLITE_TEXT) {
          (void)sqlite3_column_text(statement, c);
        }
      }
    }
    if (rc != SQLITE_ROW && rc != SQLITE_DONE) {
      const char* message = sqlite3_errmsg(database.db);
      if (message == nullptr || message[0] == '\0' || std::string(message) == "not an error") {
        std::fprintf(stderr, "%s failed without a message (rc %d)\n", kCalls[which].sql, rc);
        std::abort();
      }
    }
    sqlite3_reset(statement);
    sqlite3_clear_bindings(statement);
  }
  return 0;
}
