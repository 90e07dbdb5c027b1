// The demo fleet writer (see demo_writer.h).
#include "db/demo_writer.h"

#include <string>
#include <utility>
#include <variant>
#include <vector>

#include "core/errors.h"
#include "db/policy_store.h"
#include "demo/demo_policy.h"

namespace tenure::db {

namespace {

constexpr std::string_view kCreateTables =
    "CREATE TABLE asset(asset_id TEXT PRIMARY KEY, asset_class TEXT NOT NULL,"
    " in_service_on TEXT NOT NULL, first_cost REAL NOT NULL, retired_on TEXT);"
    "CREATE TABLE cost_event(asset_id TEXT NOT NULL, occurred_on TEXT NOT NULL,"
    " amount REAL NOT NULL, kind TEXT);"
    "CREATE TABLE asset_valuation(asset_id TEXT NOT NULL, valued_on TEXT NOT NULL,"
    " amount REAL NOT NULL, basis TEXT);";

constexpr std::string_view kCreateIndex =
    "CREATE INDEX cost_event_asset_day ON cost_event(asset_id, occurred_on)";

// Rule (1): the objects already named asset, cost_event or asset_valuation, as (type, name).
std::vector<std::pair<std::string, std::string>> existing_demo_objects(Connection& db) {
  Statement query(db,
                  "SELECT type, name FROM sqlite_schema WHERE type IN ('table', 'view')"
                  " AND lower(name) IN ('asset', 'cost_event', 'asset_valuation') ORDER BY name");
  std::vector<std::pair<std::string, std::string>> found;
  while (query.step()) found.emplace_back(query.text(0), query.text(1));
  return found;
}

void clear_the_way(Connection& db, ExistingDemoTables existing) {
  for (const auto& [type, name] : existing_demo_objects(db)) {
    if (existing == ExistingDemoTables::refuse) {
      throw InputError(name, type +
                                 " already exists; the demo replaces its tables only when forced"
                                 " (tenure demo --force)");
    }
    db.exec((type == "view" ? "DROP VIEW " : "DROP TABLE ") + quoted(name));
  }
}

// Rule (2): synchronous off while it lives, the previous setting restored after.
class RelaxedSync {
 public:
  explicit RelaxedSync(Connection& db) : db_(db) {
    Statement current(db_, "PRAGMA synchronous");
    previous_ = current.step() ? current.integer(0) : 2;
    db_.exec("PRAGMA synchronous = OFF");
  }
  RelaxedSync(const RelaxedSync&) = delete;
  RelaxedSync& operator=(const RelaxedSync&) = delete;
  ~RelaxedSync() {
    const std::string restore = "PRAGMA synchronous = " + std::to_string(previous_);
    sqlite3_exec(db_.handle(), restore.c_str(), nullptr, nullptr, nullptr);
  }

 private:
  Connection& db_;
  std::int64_t previous_ = 2;
};

// Inserts each generated row with its prepared statement.
class TableSink : public demo::Sink {
 public:
  explicit TableSink(Connection& db)
      : asset_(db, "INSERT INTO asset VALUES (?1, ?2, ?3, ?4, ?5)"),
        event_(db, "INSERT INTO cost_event VALUES (?1, ?2, ?3, ?4)"),
        valuation_(db, "INSERT INTO asset_valuation VALUES (?1, ?2, ?3, ?4)") {}

  void on_asset(const demo::AssetRow& row) override {
    asset_.bind(1, row.asset_id);
    asset_.bind(2, row.asset_class);
    asset_.bind(3, row.in_service_on);
    asset_.bind(4, row.first_cost);
    asset_.bind(5, row.retired_on);
    asset_.run();
  }

  void on_valuation(const demo::ValuationRow& row) override {
    valuation_.bind(1, row.asset_id);
    valuation_.bind(2, row.valued_on);
    valuation_.bind(3, row.amount);
    valuation_.bind(4, row.basis);
    valuation_.run();
  }

  void on_event(const demo::CostEventRow& row) override {
    event_.bind(1, row.asset_id);
    event_.bind(2, row.occurred_on);
    // A text amount stays text in the REAL column (a bad row on purpose); +inf is stored as Inf.
    std::visit([this](auto amount) { event_.bind(3, amount); }, row.amount);
    event_.bind(4, row.kind);
    event_.run();
  }

 private:
  Statement asset_;
  Statement event_;
  Statement valuation_;
};

}  // namespace

DemoWrite write_demo_fleet(Connection& db, const demo::Options& options,
                           ExistingDemoTables existing) {
  demo::Summary summary;
  {
    RelaxedSync relaxed(db);
    Transaction tx(db, Transaction::Kind::immediate);
    clear_the_way(db, existing);
    db.exec(kCreateTables);
    TableSink sink(db);
    summary = demo::generate(options, sink);
    db.exec(kCreateIndex);
    tx.commit();
  }
  const std::int64_t policy_id = store_policy(db, demo::demo_policy_json());
  db.exec("ANALYZE");
  return {std::move(summary), policy_id};
}

}  // namespace tenure::db
