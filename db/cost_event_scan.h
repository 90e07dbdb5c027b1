// Reads the cost-event relation on a second thread (SPEC 9): one thread steps SQLite through
// the sequential scan and copies each row's three columns into batches; the caller's thread
// takes the batches and does the parsing, lookups and sums. The two overlap, so the night's
// cost is close to the scan alone. No row is held beyond its batch; a few batches are in flight.
//
//   CostEventScan scan(db, "cost_event");
//   while (const EventBatch* batch = scan.next()) {
//     for (const RawEvent& e : batch->rows) use(batch->id(e), batch->date(e), e.amount);
//     scan.release(batch);
//   }
#pragma once

#include <condition_variable>
#include <cstdint>
#include <deque>
#include <exception>
#include <memory>
#include <mutex>
#include <string>
#include <string_view>
#include <thread>
#include <vector>

#include "db/connection.h"

namespace tenure::db {

// One row as read: where its text is kept, SQLITE_TEXT or SQLITE_NULL for the id and the date,
// and the amount's storage class (SQLITE_INTEGER, SQLITE_FLOAT, ...).
struct RawEvent {
  std::uint32_t id_offset;
  std::uint32_t id_length;
  std::uint32_t date_offset;
  std::uint32_t date_length;
  std::uint32_t amount_text_offset;  // the amount's text, kept only when it is not a number
  std::uint32_t amount_text_length;
  double amount;
  std::uint8_t id_type;
  std::uint8_t date_type;
  std::uint8_t amount_type;
};

struct EventBatch {
  std::int64_t first_row = 0;  // 1-based position in the scan of rows[0]
  std::vector<RawEvent> rows;
  std::string text;  // ids, dates and non-numeric amounts, back to back

  std::string_view id(const RawEvent& e) const { return {text.data() + e.id_offset, e.id_length}; }
  std::string_view date(const RawEvent& e) const {
    return {text.data() + e.date_offset, e.date_length};
  }
  std::string_view amount_text(const RawEvent& e) const {
    return {text.data() + e.amount_text_offset, e.amount_text_length};
  }
};

class CostEventScan {
 public:
  // Starts the scan of `relation` (a checked plain identifier) on its own thread. The connection
  // must not be used by the caller until the scan has ended (next() returned null).
  CostEventScan(Connection& db, const std::string& relation);
  ~CostEventScan();
  CostEventScan(const CostEventScan&) = delete;
  CostEventScan& operator=(const CostEventScan&) = delete;

  // The next batch in scan order, or null at the end. Rethrows a failure of the scan.
  const EventBatch* next();
  // Hands a batch back for reuse once the caller is done with it.
  void release(const EventBatch* batch);

 private:
  static constexpr std::size_t kBatchRows = 8192;
  static constexpr std::size_t kBatches = 4;

  void produce();
  std::unique_ptr<EventBatch> take_free();

  Statement statement_;
  std::mutex mutex_;
  std::condition_variable changed_;
  std::deque<std::unique_ptr<EventBatch>> ready_;
  std::vector<std::unique_ptr<EventBatch>> free_;
  std::unique_ptr<EventBatch> in_use_;
  bool done_ = false;
  bool stop_ = false;
  std::exception_ptr failure_;
  std::thread thread_;
};

}  // namespace tenure::db
