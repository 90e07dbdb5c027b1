// The cost-event scan (db/cost_event_scan.h): every row of the relation arrives once, in scan
// order and with its storage class, on a connection tenure opened (a second thread scans) and on
// a serialized connection (the caller's thread scans); a view with its own filter is read as it
// is; failures stop the scan and come back to the caller; the row function cannot be used from
// SQL, and a foreign function of its name is detected.
#include <gtest/gtest.h>
#include <sqlite3.h>

#include <stdexcept>
#include <string>
#include <vector>

#include "core/errors.h"
#include "db/cost_event_scan.h"
#include "db_test_support.h"

namespace tenure::db {
namespace {

using testing_support::scalar;
using testing_support::TempDatabase;

// More rows than one batch holds, with NULLs, a numeric id, a text amount and a real amount.
void add_events(Connection& db, int rows) {
  db.exec("CREATE TABLE cost_event(asset_id, occurred_on, amount)");
  Transaction tx(db, Transaction::Kind::immediate);
  Statement insert(db, "INSERT INTO cost_event VALUES (?1, ?2, ?3)");
  for (int i = 0; i < rows; ++i) {
    if (i % 1000 == 7) {
      insert.bind_null(1);
    } else if (i % 1000 == 8) {
      insert.bind(1, std::int64_t{4711});
    } else {
      insert.bind(1, std::string("PU-").append(std::to_string(i % 97)));
    }
    if (i % 1000 == 9) {
      insert.bind_null(2);
    } else {
      insert.bind(2, std::string("2024-05-").append(std::to_string(10 + i % 19)));
    }
    if (i % 1000 == 10) {
      insert.bind(3, "twelve");
    } else if (i % 1000 == 11) {
      insert.bind(3, 0.25 * i);
    } else {
      insert.bind(3, std::int64_t{i});
    }
    insert.run();
  }
  tx.commit();
}

// One row as the scan delivered it, in a form a plain SELECT can be compared with.
std::string described(const EventBatch& batch, const RawEvent& e) {
  std::string text(e.id_type == SQLITE_NULL ? std::string_view("NULL") : batch.id(e));
  text.append("|").append(e.date_type == SQLITE_NULL ? std::string_view("NULL") : batch.date(e));
  text.append("|").append(std::to_string(e.amount_type)).append("|");
  if (e.amount_type == SQLITE_INTEGER || e.amount_type == SQLITE_FLOAT) {
    text.append(std::to_string(e.amount));
  } else {
    text.append(batch.amount_text(e));
  }
  return text;
}

std::vector<std::string> scanned(Connection& db, const std::string& relation) {
  std::vector<std::string> rows;
  scan_cost_events(db, relation, {}, [&](const EventBatch& batch) {
    EXPECT_EQ(batch.first_row, static_cast<std::int64_t>(rows.size()) + 1);
    for (const RawEvent& e : batch.rows) rows.push_back(described(batch, e));
  });
  return rows;
}

std::vector<std::string> selected(Connection& db, const std::string& relation) {
  Statement q(db, "SELECT asset_id, occurred_on, typeof(amount), amount FROM " + relation);
  std::vector<std::string> rows;
  while (q.step()) {
    std::string text(q.is_null(0) ? std::string_view("NULL") : q.text(0));
    text.append("|").append(q.is_null(1) ? std::string_view("NULL") : q.text(1)).append("|");
    const std::string type(q.text(2));
    text.append(std::to_string(type == "integer" ? SQLITE_INTEGER
                               : type == "real"  ? SQLITE_FLOAT
                                                 : SQLITE_TEXT));
    text.append("|").append(type == "text" ? std::string(q.text(3)) : std::to_string(q.real(3)));
    rows.push_back(text);
  }
  return rows;
}

// A serialized connection (SQLITE_OPEN_FULLMUTEX), as a host may open one.
struct SerializedConnection {
  explicit SerializedConnection(const std::string& path) {
    EXPECT_EQ(sqlite3_open_v2(path.c_str(), &handle,
                              SQLITE_OPEN_READWRITE | SQLITE_OPEN_FULLMUTEX, nullptr),
              SQLITE_OK);
  }
  ~SerializedConnection() { sqlite3_close(handle); }
  sqlite3* handle = nullptr;
};

TEST(CostEventScan, EveryRowArrivesOnceInOrderOnTenuresOwnConnection) {
  TempDatabase file;
  Connection db = file.open();
  add_events(db, 20000);
  ASSERT_EQ(sqlite3_db_mutex(db.handle()), nullptr) << "tenure opens connections without a mutex";
  const std::vector<std::string> rows = scanned(db, "cost_event");
  EXPECT_EQ(rows.size(), 20000u);
  EXPECT_EQ(rows, selected(db, "cost_event"));
}

TEST(CostEventScan, ASerializedConnectionIsScannedOnTheCallersThread) {
  TempDatabase file;
  {
    Connection db = file.open();
    add_events(db, 20000);
  }
  SerializedConnection host(file.path());
  ASSERT_NE(sqlite3_db_mutex(host.handle), nullptr);
  Connection db = Connection::borrow(host.handle);
  EXPECT_EQ(scanned(db, "cost_event"), selected(db, "cost_event"));
}

TEST(CostEventScan, AViewIsReadAfterItsOwnFilter) {
  TempDatabase file;
  Connection db = file.open();
  add_events(db, 3000);
  db.exec("CREATE VIEW pump_cost AS SELECT * FROM cost_event WHERE asset_id LIKE 'PU-1%'");
  const std::vector<std::string> rows = scanned(db, "pump_cost");
  EXPECT_EQ(rows, selected(db, "pump_cost"));
  EXPECT_LT(rows.size(), 3000u);
}

TEST(CostEventScan, AFailureWhileConsumingStopsTheScanAndReachesTheCaller) {
  TempDatabase file;
  {
    Connection db = file.open();
    add_events(db, 50000);
  }
  SerializedConnection host(file.path());
  Connection serialized = Connection::borrow(host.handle);
  Connection own = file.open();
  for (Connection* db : {&own, &serialized}) {
    int batches = 0;
    EXPECT_THROW(scan_cost_events(*db, "cost_event", {},
                                  [&](const EventBatch&) {
                                    if (++batches == 2) throw std::runtime_error("consumer gave up");
                                  }),
                 std::runtime_error);
    EXPECT_EQ(batches, 2) << "no batch is delivered after the failure";
    // The connection is usable again.
    EXPECT_EQ(scalar(*db, "SELECT count(*) FROM cost_event"), 50000);
  }
}

TEST(CostEventScan, TheRowFunctionRefusesACallFromSql) {
  TempDatabase file;
  Connection db = file.open();
  add_events(db, 10);
  scanned(db, "cost_event");
  try {
    scalar(db, "SELECT tenure_cost_event_sink(1, 'PU-1', '2024-01-01', 5)");
    FAIL() << "the row function ran without a scan";
  } catch (const RuntimeFailure& e) {
    EXPECT_STREQ(e.what(), "tenure_cost_event_sink is internal to tenure's review");
  }
}

void foreign_sink(sqlite3_context* context, int, sqlite3_value**) { sqlite3_result_int(context, 1); }

TEST(CostEventScan, AForeignFunctionOfTheSameNameIsDetected) {
  TempDatabase file;
  Connection db = file.open();
  add_events(db, 10);
  ASSERT_EQ(sqlite3_create_function_v2(db.handle(), "tenure_cost_event_sink", 4, SQLITE_UTF8,
                                       nullptr, &foreign_sink, nullptr, nullptr, nullptr),
            SQLITE_OK);
  // While a statement runs SQLite will not replace a function, so the foreign one stays.
  Statement running(db, "SELECT 1 UNION ALL SELECT 2");
  ASSERT_TRUE(running.step());
  try {
    scanned(db, "cost_event");
    FAIL() << "a foreign row function went unnoticed";
  } catch (const RuntimeFailure& e) {
    EXPECT_STREQ(e.what(),
                 "the SQL function tenure_cost_event_sink on this connection is not tenure's (it "
                 "saw 0 of 10 rows)");
  }
}

}  // namespace
}  // namespace tenure::db
