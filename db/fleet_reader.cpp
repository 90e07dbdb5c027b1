// Reading the input relations with validation and rejected rows (see fleet_reader.h).
#include "db/fleet_reader.h"

#include <cmath>
#include <string_view>
#include <unordered_map>
#include <unordered_set>

#include <fmt/format.h>

#include "core/checks.h"
#include "core/errors.h"
#include "db/cost_event_scan.h"
#include "fleet/asset_index.h"

namespace tenure::db {
namespace {

using review::FleetData;

constexpr std::size_t kMaxIdBytes = 256;

struct RequiredColumns {
  const char* key;  // in $.sources
  const std::string* relation;
  std::vector<const char*> columns;
};

// Transparent hashing so a column's text is looked up without building a std::string.
struct IdHash {
  using is_transparent = void;
  std::size_t operator()(std::string_view s) const noexcept {
    return std::hash<std::string_view>{}(s);
  }
};
using IdSet = std::unordered_set<std::string, IdHash, std::equal_to<>>;

// Cost events arrive in date order, so most rows repeat the previous row's date text: parse it
// once per distinct text.
class DateMemo {
 public:
  std::optional<Date> parse(std::string_view text) {
    if (text.size() > sizeof(text_)) return parse_iso_date(text);  // never valid; not kept
    if (text != std::string_view(text_, length_)) {
      length_ = text.copy(text_, sizeof(text_));
      date_ = parse_iso_date(text);
    }
    return date_;
  }

 private:
  char text_[16] = {};
  std::size_t length_ = 0;
  std::optional<Date> date_;
};

bool valid_utf8(std::string_view s) {
  std::size_t i = 0;
  while (i < s.size()) {
    const auto c = static_cast<unsigned char>(s[i]);
    std::size_t len = c < 0x80 ? 1 : (c >> 5) == 0x6 ? 2 : (c >> 4) == 0xE ? 3 : (c >> 3) == 0x1E ? 4 : 0;
    if (len == 0 || i + len > s.size()) return false;
    for (std::size_t k = 1; k < len; ++k) {
      if ((static_cast<unsigned char>(s[i + k]) >> 6) != 0x2) return false;
    }
    i += len;
  }
  return true;
}

// Text for a row reference or reason: quoted, shortened, with control bytes shown safely.
std::string shown(std::string_view s) {
  std::string out = "'";
  for (std::size_t i = 0; i < s.size() && i < 64; ++i) {
    const auto c = static_cast<unsigned char>(s[i]);
    out += c < 0x20 || c == 0x7F ? '?' : static_cast<char>(c);
  }
  if (s.size() > 64) out += "...";
  return out + "'";
}

// A column's value as text for messages, whatever its storage class.
std::string shown_value(const Statement& q, int column) {
  if (q.is_null(column)) return "NULL";
  return shown(q.text(column));
}

// An amount of rules (1)-(3) beyond kMaxAmount, or nullopt.
std::optional<std::string> magnitude_problem(double amount, const char* name) {
  if (std::abs(amount) <= kMaxAmount) return std::nullopt;
  return fmt::format("{} {} is larger in magnitude than {:g}", name, amount, kMaxAmount);
}

// Rule (1)-(3) amounts: stored as a number (text that SQLite could not convert stays text, and
// is refused rather than read as 0), finite and within kMaxAmount.
std::optional<std::string> number_problem(const Statement& q, int column, const char* name) {
  const int type = q.column_type(column);
  if (type == SQLITE_NULL) return fmt::format("{} is missing", name);
  if (type != SQLITE_INTEGER && type != SQLITE_FLOAT) {
    return fmt::format("{} {} is not a number", name, shown_value(q, column));
  }
  if (!std::isfinite(q.real(column))) return fmt::format("{} is not a finite number", name);
  return magnitude_problem(q.real(column), name);
}

std::optional<Date> date_column(const Statement& q, int column) {
  if (q.column_type(column) != SQLITE_TEXT) return std::nullopt;
  return parse_iso_date(q.text(column));
}

std::string bad_date(const Statement& q, int column, const char* name) {
  return fmt::format("{} {} is not a valid date (YYYY-MM-DD)", name, shown_value(q, column));
}

class Reader {
 public:
  Reader(Connection& db, const review::Policy& policy, FleetData& data)
      : db_(db), policy_(policy), data_(data) {}

  ReadReport run() {
    read_assets();
    read_costs();
    read_valuations();
    return std::move(report_);
  }

 private:
  void reject(const std::string& source, std::string row_ref, std::string reason) {
    report_.rejected.push_back({source, std::move(row_ref), std::move(reason)});
  }

  void read_assets() {
    const std::string& source = policy_.sources.assets;
    Statement q(db_, fmt::format("SELECT asset_id, asset_class, in_service_on, first_cost, "
                                 "retired_on FROM {}",
                                 quoted(source)));
    std::int64_t row = 0;
    while (q.step()) {
      ++row;
      ++report_.rows_read;
      const std::string_view id = q.text(0);
      const std::string ref = q.is_null(0) ? fmt::format("row {}", row)
                                           : fmt::format("row {} (asset_id {})", row, shown(id));
      const auto fail = [&](std::string reason) {
        if (!q.is_null(0) && !id.empty()) rejected_ids_.emplace(id);
        reject(source, ref, std::move(reason));
      };
      // Rule (1).
      if (q.is_null(0) || id.empty()) { fail("asset_id is missing"); continue; }
      if (!valid_utf8(id)) { fail("asset_id is not valid UTF-8"); continue; }
      if (id.size() > kMaxIdBytes) { fail(fmt::format("asset_id is longer than {} bytes", kMaxIdBytes)); continue; }
      if (index_.contains(id)) {
        reject(source, ref, fmt::format("duplicate asset_id {}: the first row with it is used", shown(id)));
        continue;
      }
      const std::string_view asset_class = q.text(1);
      if (q.is_null(1) || asset_class.empty()) { fail("asset_class is missing"); continue; }
      if (!policy_.classes.contains(asset_class)) {
        fail(fmt::format("asset_class {} is not among the policy's classes", shown(asset_class)));
        continue;
      }
      const auto in_service = date_column(q, 2);
      if (!in_service) { fail(bad_date(q, 2, "in_service_on")); continue; }
      if (auto problem = number_problem(q, 3, "first_cost")) { fail(*problem); continue; }
      if (q.real(3) <= 0) { fail(fmt::format("first_cost {} must be greater than 0", q.real(3))); continue; }
      std::optional<Date> retired;
      if (!q.is_null(4)) {
        retired = date_column(q, 4);
        if (!retired) { fail(bad_date(q, 4, "retired_on")); continue; }
        if (*retired < *in_service) { fail("retired_on is before in_service_on"); continue; }
      }
      const auto index = data_.add_asset(
          {std::string(id), std::string(asset_class), *in_service, q.real(3), retired});
      index_.insert(id, index);
    }
  }

  // The accepted asset an event or valuation names, or a rejection reason (rules 2 and 3).
  std::optional<std::uint32_t> find_asset(std::string_view id, bool is_null, std::string& reason) const {
    if (is_null || id.empty()) {
      reason = "asset_id is missing";
      return std::nullopt;
    }
    if (const auto index = index_.find(id); index != fleet::AssetIndex::npos) return index;
    reason = rejected_ids_.contains(id)
                 ? fmt::format("asset {} was rejected (see its row in the asset relation)", shown(id))
                 : fmt::format("asset_id {} is not in the asset relation", shown(id));
    return std::nullopt;
  }

  // Rule (2), on batches of the scan (cost_event_scan.h).
  void read_costs() {
    const std::string& source = policy_.sources.costs;
    scan_cost_events(db_, source, [&](const EventBatch& batch) { read_cost_batch(source, batch); });
  }

  void read_cost_batch(const std::string& source, const EventBatch& batch) {
    // Passes over the whole batch so the scattered memory reads of neighbouring rows overlap:
    // hash every id and prefetch its index slot; look every id up and prefetch its cost history;
    // parse every date and prefetch the year total it adds to; then read the rows in order.
    const std::size_t n = batch.rows.size();
    hashes_.resize(n);
    assets_.resize(n);
    days_.resize(n);
    for (std::size_t i = 0; i < n; ++i) {
      hashes_[i] = fleet::AssetIndex::hash(batch.id(batch.rows[i]));
      index_.prefetch(hashes_[i]);
    }
    for (std::size_t i = 0; i < n; ++i) {
      assets_[i] = index_.find(batch.id(batch.rows[i]), hashes_[i]);
      data_.costs.prefetch(assets_[i]);
    }
    for (std::size_t i = 0; i < n; ++i) {
      const RawEvent& e = batch.rows[i];
      days_[i] = e.date_type == SQLITE_TEXT ? dates_.parse(batch.date(e)) : std::nullopt;
      if (days_[i]) data_.costs.prefetch(assets_[i], *days_[i]);
    }
    std::string reason;
    std::int64_t row = batch.first_row - 1;
    for (std::size_t i = 0; i < n; ++i) {
      const RawEvent& e = batch.rows[i];
      ++row;
      ++report_.rows_read;
      const auto shown_or_null = [](std::uint8_t type, std::string_view text) {
        return type == SQLITE_NULL ? std::string("NULL") : shown(text);
      };
      const auto ref = [&] {
        return fmt::format("row {} (asset_id {}, occurred_on {})", row,
                           shown_or_null(e.id_type, batch.id(e)),
                           shown_or_null(e.date_type, batch.date(e)));
      };
      const auto asset = e.id_type != SQLITE_NULL && assets_[i] != fleet::AssetIndex::npos
                             ? std::optional<std::uint32_t>(assets_[i])
                             : find_asset(batch.id(e), e.id_type == SQLITE_NULL, reason);
      if (!asset) { reject(source, ref(), reason); continue; }
      const std::optional<Date>& occurred = days_[i];
      if (!occurred) {
        reject(source, ref(), fmt::format("occurred_on {} is not a valid date (YYYY-MM-DD)",
                                          shown_or_null(e.date_type, batch.date(e))));
        continue;
      }
      if (e.amount_type == SQLITE_NULL) { reject(source, ref(), "amount is missing"); continue; }
      if (e.amount_type != SQLITE_INTEGER && e.amount_type != SQLITE_FLOAT) {
        reject(source, ref(), fmt::format("amount {} is not a number", shown(batch.amount_text(e))));
        continue;
      }
      if (std::isfinite(e.amount)) {
        if (auto problem = magnitude_problem(e.amount, "amount")) {
          reject(source, ref(), *problem);
          continue;
        }
      }
      if (*occurred > data_.as_of) {  // rule (4)
        ++report_.rows_after_as_of;
        continue;
      }
      switch (data_.costs.add_event(*asset, *occurred, e.amount)) {
        case fleet::EventFate::counted:
        case fleet::EventFate::outside_complete_years:
          break;
        case fleet::EventFate::before_in_service:
          reject(source, ref(), fmt::format("occurred_on is before the asset's in_service_on {}",
                                            data_.assets[*asset].in_service.to_iso()));
          break;
        case fleet::EventFate::after_retirement:
          reject(source, ref(), fmt::format("occurred_on is after the asset's retired_on {}",
                                            data_.assets[*asset].retired_on->to_iso()));
          break;
        case fleet::EventFate::non_finite_amount:
          reject(source, ref(), "amount is not a finite number");
          break;
      }
    }
  }

  void read_valuations() {
    const std::string& source = policy_.sources.valuations;
    Statement q(db_, fmt::format("SELECT asset_id, valued_on, amount FROM {}", quoted(source)));
    std::int64_t row = 0;
    std::string reason;
    while (q.step()) {
      ++row;
      ++report_.rows_read;
      const auto ref = [&] {
        return fmt::format("row {} (asset_id {}, valued_on {})", row, shown_value(q, 0),
                           shown_value(q, 1));
      };
      const auto asset = find_asset(q.text(0), q.is_null(0), reason);
      if (!asset) { reject(source, ref(), reason); continue; }
      const review::AssetRecord& record = data_.assets[*asset];
      const auto valued = date_column(q, 1);
      if (!valued) { reject(source, ref(), bad_date(q, 1, "valued_on")); continue; }
      if (auto problem = number_problem(q, 2, "amount")) { reject(source, ref(), *problem); continue; }
      if (q.real(2) < 0) { reject(source, ref(), "amount must not be negative"); continue; }
      if (*valued < record.in_service) {
        reject(source, ref(), fmt::format("valued_on is before the asset's in_service_on {}",
                                          record.in_service.to_iso()));
        continue;
      }
      if (record.retired_on && *valued > *record.retired_on) {
        reject(source, ref(), fmt::format("valued_on is after the asset's retired_on {}",
                                          record.retired_on->to_iso()));
        continue;
      }
      if (*valued > data_.as_of) {  // rule (4)
        ++report_.rows_after_as_of;
        continue;
      }
      data_.valuations[*asset].push_back({*valued, q.real(2)});
    }
  }

  Connection& db_;
  const review::Policy& policy_;
  FleetData& data_;
  ReadReport report_;
  fleet::AssetIndex index_;
  DateMemo dates_;
  std::vector<std::uint64_t> hashes_;  // per row of the batch being read
  std::vector<std::uint32_t> assets_;
  std::vector<std::optional<Date>> days_;
  IdSet rejected_ids_;
};

}  // namespace

void check_sources(Connection& db, const review::Sources& sources) {
  const std::vector<RequiredColumns> required = {
      {"assets", &sources.assets,
       {"asset_id", "asset_class", "in_service_on", "first_cost", "retired_on"}},
      {"costs", &sources.costs, {"asset_id", "occurred_on", "amount"}},
      {"valuations", &sources.valuations, {"asset_id", "valued_on", "amount"}}};
  Statement columns(db, "SELECT name FROM pragma_table_info(?1)");
  for (const auto& relation : required) {
    const std::string where = std::string("$.sources.") + relation.key;
    if (!is_plain_identifier(*relation.relation)) {
      throw InputError(where, "must be a plain SQL identifier");
    }
    columns.bind(1, *relation.relation);
    std::unordered_set<std::string> present;
    while (columns.step()) present.emplace(columns.text(0));
    columns.reset();
    if (present.empty()) {
      throw InputError(where, fmt::format("relation '{}' does not exist in the database",
                                          *relation.relation));
    }
    for (const char* column : relation.columns) {
      if (!present.contains(column)) {
        throw InputError(where, fmt::format("relation '{}' has no column '{}'",
                                            *relation.relation, column));
      }
    }
  }
}

ReadReport read_fleet(Connection& db, const review::Policy& policy, FleetData& data) {
  return Reader(db, policy, data).run();
}

}  // namespace tenure::db
