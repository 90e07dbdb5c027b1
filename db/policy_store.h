// The policy kept in the maintenance database (table tenure_policy), so the nightly run needs
// no file: `tenure policy set --db fleet.db policy.json` stores it, `tenure review --db fleet.db`
// uses the latest one stored.
//
//   sqlite> SELECT policy_id, stored_at FROM tenure_policy ORDER BY policy_id DESC LIMIT 1;
//   3|2026-11-30T02:00:00Z
#pragma once

#include <optional>
#include <string>
#include <string_view>

#include "db/connection.h"

namespace tenure::db {

// Creates tenure_policy when it is missing, in the caller's transaction.
void create_policy_table(Connection& db);

// Stores the JSON text as given (comments kept), in its own transaction; returns its policy_id.
// The caller checks the text first (formats/policy_json.h).
std::int64_t store_policy(Connection& db, std::string_view policy_json);

// One stored policy: its id, when it was stored (UTC, ISO 8601) and its text as given.
struct StoredPolicy {
  std::int64_t policy_id;
  std::string stored_at;
  std::string text;
};

// The latest stored policy, or nullopt when none is stored (or the table does not exist).
std::optional<StoredPolicy> latest_stored_policy(Connection& db);

// The latest stored policy's text, or nullopt when none is stored.
std::optional<std::string> latest_policy(Connection& db);

}  // namespace tenure::db
