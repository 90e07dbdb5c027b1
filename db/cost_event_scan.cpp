// The cost-event scan through a row function (see cost_event_scan.h).
#include "db/cost_event_scan.h"

#include <condition_variable>
#include <deque>
#include <exception>
#include <memory>
#include <mutex>
#include <thread>

#include <fmt/format.h>

#include "core/errors.h"

namespace tenure::db {
namespace {

constexpr const char* kSinkName = "tenure_cost_event_sink";
constexpr const char* kPointerType = "tenure.cost_event_scan";
constexpr std::size_t kBatchRows = 8192;
constexpr std::size_t kBatches = 4;  // in flight between the two threads

// Appends a value's text (SQLite's text form of any storage class) to the batch arena; false for
// NULL (sqlite3_value_text returns a null pointer only then, memory permitting).
bool copy_text(sqlite3_value* value, std::string& arena, std::uint32_t& offset,
               std::uint32_t& length) {
  const auto* p = reinterpret_cast<const char*>(sqlite3_value_text(value));
  offset = static_cast<std::uint32_t>(arena.size());
  length = 0;
  if (!p) return false;
  const auto n = static_cast<std::size_t>(sqlite3_value_bytes(value));
  length = static_cast<std::uint32_t>(n);
  arena.append(p, n);
  return true;
}

void append_row(EventBatch& batch, sqlite3_value** values) {
  RawEvent e{};
  // Ids and dates are read as text whatever their storage class (an id stored as a number is its
  // text; a date stored as a number never parses); their storage class is kept, so that a NULL
  // is missing and a BLOB refused (db/row_checks.h).
  e.id_type = static_cast<std::uint8_t>(sqlite3_value_type(values[0]));
  copy_text(values[0], batch.text, e.id_offset, e.id_length);
  e.date_type = static_cast<std::uint8_t>(sqlite3_value_type(values[1]));
  copy_text(values[1], batch.text, e.date_offset, e.date_length);
  e.amount_type = static_cast<std::uint8_t>(sqlite3_value_type(values[2]));
  if (e.amount_type == SQLITE_INTEGER || e.amount_type == SQLITE_FLOAT) {
    e.amount = sqlite3_value_double(values[2]);
  } else {
    copy_text(values[2], batch.text, e.amount_text_offset, e.amount_text_length);
  }
  batch.rows.push_back(e);
}

// One pass: the batch being filled by the row function, and (when threaded) the batches handed
// between the scanning thread and the consuming one.
class EventScan {
 public:
  using Consume = std::function<void(const EventBatch&)>;

  EventScan(const Consume& consume, bool threaded) : consume_(consume), threaded_(threaded) {
    for (std::size_t i = 0; i < (threaded ? kBatches : 1); ++i) {
      auto batch = std::make_unique<EventBatch>();
      batch->rows.reserve(kBatchRows);
      free_.push_back(std::move(batch));
    }
  }

  // Called by the row function for every row; false (with the failure kept) stops the scan.
  bool add_row(sqlite3_value** values) noexcept {
    try {
      if (!filling_ && !(filling_ = take_free())) return false;
      append_row(*filling_, values);
      ++rows_;
      if (filling_->rows.size() == kBatchRows) hand_over();
      return true;
    } catch (...) {
      keep_failure(std::current_exception());
      return false;
    }
  }

  // After the statement: hands over the last partial batch and checks that every row the
  // statement counted came through the row function.
  void finish(std::int64_t rows_counted) {
    if (filling_ && !filling_->rows.empty()) hand_over();
    if (rows_counted != rows_) {
      throw RuntimeFailure(fmt::format(
          "the SQL function {} on this connection is not tenure's (it saw {} of {} rows)",
          kSinkName, rows_, rows_counted));
    }
  }

  // The scanning thread's end, with its failure if any.
  void end(std::exception_ptr failure) {
    if (failure) keep_failure(failure);
    std::lock_guard lock(mutex_);
    done_ = true;
    changed_.notify_all();
  }

  // Threaded: the consuming thread's loop, until the scan ends or `consume` fails.
  void consume_all() {
    for (;;) {
      std::unique_ptr<EventBatch> batch;
      {
        std::unique_lock lock(mutex_);
        changed_.wait(lock, [this] { return !ready_.empty() || done_; });
        if (ready_.empty()) return;
        batch = std::move(ready_.front());
        ready_.pop_front();
      }
      try {
        consume_(*batch);
      } catch (...) {
        keep_failure(std::current_exception());
        stop();
        return;
      }
      std::lock_guard lock(mutex_);
      free_.push_back(std::move(batch));
      changed_.notify_all();
    }
  }

  // Makes the scanning thread's next wait for a free batch end the scan.
  void stop() {
    std::lock_guard lock(mutex_);
    stopped_ = true;
    changed_.notify_all();
  }

  std::exception_ptr failure() {
    std::lock_guard lock(mutex_);
    return failure_;
  }

 private:
  void keep_failure(std::exception_ptr failure) {
    std::lock_guard lock(mutex_);
    if (!failure_) failure_ = failure;
  }

  std::unique_ptr<EventBatch> take_free() {
    std::unique_lock lock(mutex_);
    changed_.wait(lock, [this] { return !free_.empty() || stopped_; });
    if (stopped_) return nullptr;
    auto batch = std::move(free_.back());
    free_.pop_back();
    batch->rows.clear();
    batch->text.clear();
    batch->first_row = rows_ + 1;
    return batch;
  }

  void hand_over() {
    if (!threaded_) {
      consume_(*filling_);
      std::lock_guard lock(mutex_);
      free_.push_back(std::move(filling_));
      return;
    }
    std::lock_guard lock(mutex_);
    ready_.push_back(std::move(filling_));
    changed_.notify_all();
  }

  const Consume& consume_;
  const bool threaded_;
  std::int64_t rows_ = 0;  // rows delivered to the row function so far
  std::unique_ptr<EventBatch> filling_;
  std::mutex mutex_;
  std::condition_variable changed_;
  std::deque<std::unique_ptr<EventBatch>> ready_;
  std::vector<std::unique_ptr<EventBatch>> free_;
  bool done_ = false;
  bool stopped_ = false;
  std::exception_ptr failure_;
};

// The row function: tenure_cost_event_sink(scan pointer, asset_id, occurred_on, amount) = 1.
void sink(sqlite3_context* context, int, sqlite3_value** values) {
  auto* scan = static_cast<EventScan*>(sqlite3_value_pointer(values[0], kPointerType));
  if (!scan) {
    sqlite3_result_error(context, "tenure_cost_event_sink is internal to tenure's review", -1);
    return;
  }
  if (!scan->add_row(values + 1)) {
    sqlite3_result_error(context, "tenure's cost-event scan stopped", -1);
    return;
  }
  sqlite3_result_int(context, 1);
}

// Registers the row function. SQLITE_BUSY means it is already registered on this connection by
// an earlier scan and a statement is running (SQLite refuses to replace a function then): the
// row count check of EventScan::finish catches a foreign function of the same name.
void register_sink(Connection& db) {
  const int rc = sqlite3_create_function_v2(db.handle(), kSinkName, 4,
                                            SQLITE_UTF8 | SQLITE_DIRECTONLY, nullptr, &sink,
                                            nullptr, nullptr, nullptr);
  if (rc != SQLITE_OK && rc != SQLITE_BUSY) {
    throw RuntimeFailure(fmt::format("cannot register {}: {}", kSinkName, sqlite3_errstr(rc)));
  }
}

// Runs the statement to its one row and returns the count.
std::int64_t run_pass(Statement& pass) {
  pass.step();
  const std::int64_t counted = pass.integer(0);
  pass.reset();
  return counted;
}

}  // namespace

void scan_cost_events(Connection& db, const std::string& relation, const ScanOptions& options,
                      const std::function<void(const EventBatch&)>& consume) {
  register_sink(db);
  std::string sql = fmt::format("SELECT count({}(?1, asset_id, occurred_on, amount)) FROM {}",
                                kSinkName, quoted(relation));
  std::vector<std::string> bounds;
  if (!options.rowid_name.empty()) {
    const std::string rowid = quoted(options.rowid_name);
    if (options.after) bounds.push_back(rowid + " > ?2");
    if (options.through) bounds.push_back(rowid + " <= ?3");
  }
  for (std::size_t i = 0; i < bounds.size(); ++i) sql.append(i == 0 ? " WHERE " : " AND ").append(bounds[i]);
  Statement pass(db, sql);
  if (options.after && !options.rowid_name.empty()) pass.bind(2, *options.after);
  if (options.through && !options.rowid_name.empty()) pass.bind(3, *options.through);
  const bool threaded = options.overlap && sqlite3_db_mutex(db.handle()) == nullptr;
  EventScan scan(consume, threaded);
  if (sqlite3_bind_pointer(pass.handle(), 1, &scan, kPointerType, nullptr) != SQLITE_OK) {
    throw RuntimeFailure(fmt::format("cannot bind the scan to {}", kSinkName));
  }
  if (!threaded) {
    try {
      scan.finish(run_pass(pass));
    } catch (...) {
      if (auto failure = scan.failure()) std::rethrow_exception(failure);
      throw;
    }
    return;
  }
  std::thread scanner([&] {
    std::exception_ptr failure;
    try {
      scan.finish(run_pass(pass));
    } catch (...) {
      failure = std::current_exception();
    }
    scan.end(failure);
  });
  scan.consume_all();
  scanner.join();
  if (auto failure = scan.failure()) std::rethrow_exception(failure);
}

}  // namespace tenure::db
