// The cost-event scan on its own thread (see cost_event_scan.h).
#include "db/cost_event_scan.h"

#include <fmt/format.h>

namespace tenure::db {
namespace {

// Appends a column's text (SQLite's text form of any storage class) to the batch arena; false
// for NULL (sqlite3_column_text returns a null pointer only then, memory permitting).
bool copy_text(sqlite3_stmt* s, int column, std::string& arena, std::uint32_t& offset,
               std::uint32_t& length) {
  const auto* p = reinterpret_cast<const char*>(sqlite3_column_text(s, column));
  offset = static_cast<std::uint32_t>(arena.size());
  length = 0;
  if (!p) return false;
  const auto n = static_cast<std::size_t>(sqlite3_column_bytes(s, column));
  length = static_cast<std::uint32_t>(n);
  arena.append(p, n);
  return true;
}

}  // namespace

CostEventScan::CostEventScan(Connection& db, const std::string& relation)
    : statement_(db, fmt::format("SELECT asset_id, occurred_on, amount FROM {}", quoted(relation))) {
  for (std::size_t i = 0; i < kBatches; ++i) {
    auto batch = std::make_unique<EventBatch>();
    batch->rows.reserve(kBatchRows);
    free_.push_back(std::move(batch));
  }
  thread_ = std::thread([this] { produce(); });
}

CostEventScan::~CostEventScan() {
  {
    std::lock_guard lock(mutex_);
    stop_ = true;
  }
  changed_.notify_all();
  thread_.join();
}

std::unique_ptr<EventBatch> CostEventScan::take_free() {
  std::unique_lock lock(mutex_);
  changed_.wait(lock, [this] { return !free_.empty() || stop_; });
  if (stop_) return nullptr;
  auto batch = std::move(free_.back());
  free_.pop_back();
  return batch;
}

void CostEventScan::produce() {
  try {
    sqlite3_stmt* s = statement_.handle();
    std::int64_t row = 0;
    bool more = true;
    while (more) {
      auto batch = take_free();
      if (!batch) return;
      batch->rows.clear();
      batch->text.clear();
      batch->first_row = row + 1;
      while (batch->rows.size() < kBatchRows && (more = statement_.step())) {
        ++row;
        RawEvent e{};
        // Ids and dates are read as text whatever their storage class (an id stored as a number
        // is its text; a date stored as a number never parses), so only NULL matters for them.
        e.id_type = copy_text(s, 0, batch->text, e.id_offset, e.id_length) ? SQLITE_TEXT : SQLITE_NULL;
        e.date_type =
            copy_text(s, 1, batch->text, e.date_offset, e.date_length) ? SQLITE_TEXT : SQLITE_NULL;
        e.amount_type = static_cast<std::uint8_t>(sqlite3_column_type(s, 2));
        if (e.amount_type == SQLITE_INTEGER || e.amount_type == SQLITE_FLOAT) {
          e.amount = sqlite3_column_double(s, 2);
        } else {
          copy_text(s, 2, batch->text, e.amount_text_offset, e.amount_text_length);
        }
        batch->rows.push_back(e);
      }
      std::lock_guard lock(mutex_);
      if (!batch->rows.empty()) {
        ready_.push_back(std::move(batch));
      } else {
        free_.push_back(std::move(batch));
      }
      if (!more) done_ = true;
      changed_.notify_all();
    }
  } catch (...) {
    std::lock_guard lock(mutex_);
    failure_ = std::current_exception();
    done_ = true;
    changed_.notify_all();
  }
}

const EventBatch* CostEventScan::next() {
  std::unique_lock lock(mutex_);
  changed_.wait(lock, [this] { return !ready_.empty() || done_; });
  if (!ready_.empty()) {
    in_use_ = std::move(ready_.front());
    ready_.pop_front();
    return in_use_.get();
  }
  if (failure_) std::rethrow_exception(failure_);
  return nullptr;
}

void CostEventScan::release(const EventBatch* batch) {
  std::lock_guard lock(mutex_);
  if (in_use_ && in_use_.get() == batch) free_.push_back(std::move(in_use_));
  changed_.notify_all();
}

}  // namespace tenure::db
