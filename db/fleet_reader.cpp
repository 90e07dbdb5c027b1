// Reading the input relations with validation and rejected rows (see fleet_reader.h).
#include "db/fleet_reader.h"

#include <array>
#include <exception>
#include <optional>
#include <string_view>
#include <thread>
#include <unordered_set>

#include <fmt/format.h>

#include "core/checks.h"
#include "core/errors.h"
#include "db/cost_event_scan.h"
#include "db/cost_ranges.h"
#include "db/cost_rows.h"
#include "db/row_checks.h"
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

// The storage class of each column of the current row, read before any value: reading a value as
// text or as a number converts it, after which SQLite no longer says what it was stored as.
template <std::size_t N>
std::array<int, N> storage_classes(const Statement& q) {
  std::array<int, N> types{};
  for (std::size_t c = 0; c < N; ++c) types[c] = q.column_type(static_cast<int>(c));
  return types;
}

// A column's value as text for messages, whatever its storage class.
std::string shown_value(const Statement& q, int column, int type) {
  return shown_or_null(type == SQLITE_NULL, q.text(column));
}

// Rules (1) to (3) for an amount column (row_checks.h).
std::optional<std::string> number_problem(const Statement& q, int column, int type,
                                          const char* name) {
  const double value = q.real(column);
  return amount_problem(type, value, q.text(column), name);
}

std::optional<Date> date_column(const Statement& q, int column, int type) {
  if (type != SQLITE_TEXT) return std::nullopt;
  return parse_iso_date(q.text(column));
}

std::string ascii_lower(std::string_view text) {
  std::string out(text);
  for (char& c : out) {
    if (c >= 'A' && c <= 'Z') c = static_cast<char>(c - 'A' + 'a');
  }
  return out;
}

std::string bad_date(const Statement& q, int column, int type, const char* name) {
  return db::bad_date(name, type, q.text(column));
}

class Reader {
 public:
  Reader(Connection& db, const review::Policy& policy, FleetData& data, std::int64_t split_min_rows)
      : db_(db), policy_(policy), data_(data), split_min_rows_(split_min_rows) {}

  ReadReport run() {
    reading(policy_.sources.assets, [this] { read_assets(); });
    reading(policy_.sources.costs, [this] { read_costs(); });
    reading(policy_.sources.valuations, [this] { read_valuations(); });
    return std::move(report_);
  }

 private:
  // Runs `read`; a failure of the database while it runs (a view that raises an error mid-scan,
  // say) names the relation: "relation 'v_costs': malformed JSON".
  template <class Read>
  static void reading(const std::string& relation, Read&& read) {
    try {
      read();
    } catch (const RuntimeFailure& e) {
      throw RuntimeFailure(fmt::format("relation '{}': {}", relation, e.what()));
    }
  }

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
      const auto type = storage_classes<5>(q);
      const std::string_view id = q.text(0);
      const std::string ref = asset_row_ref(row, type[0] == SQLITE_NULL, id);
      const auto fail = [&](std::string reason) {
        if (type[0] != SQLITE_NULL && !id.empty()) accepted_.rejected_ids.emplace(id);
        reject(source, ref, std::move(reason));
      };
      // Rule (1).
      if (auto problem = id_problem(type[0], id)) {
        reject(source, ref, std::move(*problem));
        continue;
      }
      if (!valid_utf8(id)) { fail("asset_id is not valid UTF-8"); continue; }
      if (id.size() > kMaxIdBytes) { fail(fmt::format("asset_id is longer than {} bytes", kMaxIdBytes)); continue; }
      if (accepted_.index.contains(id)) {
        reject(source, ref, fmt::format("duplicate asset_id {}: the first row with it is used", shown(id)));
        continue;
      }
      const std::string_view asset_class = q.text(1);
      if (type[1] == SQLITE_NULL || asset_class.empty()) { fail("asset_class is missing"); continue; }
      if (type[1] == SQLITE_BLOB) { fail("asset_class is a BLOB, not text"); continue; }
      if (!policy_.classes.contains(asset_class)) {
        fail(fmt::format("asset_class {} is not among the policy's classes", shown(asset_class)));
        continue;
      }
      const auto in_service = date_column(q, 2, type[2]);
      if (!in_service) { fail(bad_date(q, 2, type[2], "in_service_on")); continue; }
      if (auto problem = number_problem(q, 3, type[3], "first_cost")) { fail(*problem); continue; }
      if (q.real(3) <= 0) { fail(fmt::format("first_cost {} must be greater than 0", q.real(3))); continue; }
      std::optional<Date> retired;
      if (type[4] != SQLITE_NULL) {
        retired = date_column(q, 4, type[4]);
        if (!retired) { fail(bad_date(q, 4, type[4], "retired_on")); continue; }
        if (*retired < *in_service) { fail("retired_on is before in_service_on"); continue; }
      }
      const auto index = data_.add_asset(
          {std::string(id), std::string(asset_class), *in_service, q.real(3), retired});
      accepted_.index.insert(id, index);
    }
  }

  // Rule (2), in one pass or in two halves at once (cost_ranges.h).
  void read_costs() {
    const std::string& source = policy_.sources.costs;
    const auto split = plan_split(db_, source, split_min_rows_);
    if (!split) {
      CostRows rows(source, accepted_, data_, data_.costs);
      scan_cost_events(db_, source, {}, [&](const EventBatch& batch) { rows.read(batch); });
      std::move(rows).finish(report_, 0);
      return;
    }
    fleet::CostHistory second_totals = data_.costs.empty_copy();
    CostRows first(source, accepted_, data_, data_.costs);
    CostRows second(source, accepted_, data_, second_totals);
    const auto read_half = [&](Connection& db, const ScanOptions& half, CostRows& rows) {
      scan_cost_events(db, source, half, [&](const EventBatch& batch) { rows.read(batch); });
    };
    bool second_read = false;
    std::exception_ptr second_failure;
    {
      std::jthread helper([&] {
        try {
          if (std::optional<Connection> reader = open_second_reader(*split)) {
            read_half(*reader, split->second_half(), second);
            second_read = true;
          }
        } catch (...) {
          second_failure = std::current_exception();
        }
      });
      read_half(db_, split->first_half(), first);
    }
    if (second_failure) std::rethrow_exception(second_failure);
    if (!second_read) read_half(db_, split->second_half(), second);
    data_.costs.merge(second_totals);
    const std::int64_t first_rows = first.rows();
    std::move(first).finish(report_, 0);
    std::move(second).finish(report_, first_rows);
  }

  void read_valuations() {
    const std::string& source = policy_.sources.valuations;
    Statement q(db_, fmt::format("SELECT asset_id, valued_on, amount FROM {}", quoted(source)));
    std::int64_t row = 0;
    std::string reason;
    while (q.step()) {
      ++row;
      ++report_.rows_read;
      const auto type = storage_classes<3>(q);
      const auto ref = [&] {
        return fmt::format("position {} (asset_id {}, valued_on {})", row,
                           shown_value(q, 0, type[0]), shown_value(q, 1, type[1]));
      };
      const std::uint32_t asset = accepted_.find(q.text(0), type[0], reason);
      if (asset == fleet::AssetIndex::npos) { reject(source, ref(), reason); continue; }
      const review::AssetRecord& record = data_.assets[asset];
      const auto valued = date_column(q, 1, type[1]);
      if (!valued) {
        const std::string why = bad_date(q, 1, type[1], "valued_on");
        reject(source, ref(), why);
        continue;
      }
      if (auto problem = number_problem(q, 2, type[2], "amount")) {
        reject(source, ref(), *problem);
        continue;
      }
      if (q.real(2) < 0) { reject(source, ref(), "amount must not be negative"); continue; }
      if (*valued < record.in_service) {
        reject(source, ref(), before_in_service("valued_on", record));
        continue;
      }
      if (record.retired_on && *valued > *record.retired_on) {
        reject(source, ref(), after_retirement("valued_on", record));
        continue;
      }
      if (*valued > data_.as_of) {  // rule (4)
        ++report_.rows_after_as_of;
        continue;
      }
      data_.valuations[asset].push_back({*valued, q.real(2)});
    }
  }

  Connection& db_;
  const review::Policy& policy_;
  FleetData& data_;
  std::int64_t split_min_rows_;
  ReadReport report_;
  AcceptedAssets accepted_;
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
    // SQLite resolves column names without regard to ASCII case ("Asset_Id" is asset_id).
    std::unordered_set<std::string> present;
    while (columns.step()) present.emplace(ascii_lower(columns.text(0)));
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

ReadReport read_fleet(Connection& db, const review::Policy& policy, FleetData& data,
                      std::int64_t split_min_rows) {
  return Reader(db, policy, data, split_min_rows).run();
}

}  // namespace tenure::db
