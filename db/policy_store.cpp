// The stored policy (see policy_store.h).
#include "db/policy_store.h"

namespace tenure::db {

namespace {
constexpr std::string_view kCreate =
    "CREATE TABLE IF NOT EXISTS main.tenure_policy("
    " policy_id INTEGER PRIMARY KEY,"
    " stored_at TEXT NOT NULL DEFAULT (strftime('%Y-%m-%dT%H:%M:%SZ','now')),"
    " policy_json TEXT NOT NULL)";
}  // namespace

void create_policy_table(Connection& db) { db.exec(kCreate); }

std::int64_t store_policy(Connection& db, std::string_view policy_json) {
  Transaction tx(db, Transaction::Kind::immediate);
  create_policy_table(db);
  Statement insert(db, "INSERT INTO main.tenure_policy(policy_json) VALUES (?1)");
  insert.bind(1, policy_json);
  insert.run();
  const std::int64_t id = sqlite3_last_insert_rowid(db.handle());
  tx.commit();
  return id;
}

std::optional<StoredPolicy> latest_stored_policy(Connection& db) {
  Statement exists(db, "SELECT 1 FROM sqlite_schema WHERE type = 'table' AND name = 'tenure_policy'");
  if (!exists.step()) return std::nullopt;
  Statement latest(db,
                   "SELECT policy_id, stored_at, policy_json FROM main.tenure_policy "
                   "ORDER BY policy_id DESC LIMIT 1");
  if (!latest.step()) return std::nullopt;
  return StoredPolicy{latest.integer(0), std::string(latest.text(1)), std::string(latest.text(2))};
}

std::optional<std::string> latest_policy(Connection& db) {
  std::optional<StoredPolicy> latest = latest_stored_policy(db);
  if (!latest) return std::nullopt;
  return std::move(latest->text);
}

}  // namespace tenure::db
