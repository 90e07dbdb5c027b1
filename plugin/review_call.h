// The nightly review on a connection the caller owns, shared by the SQL function tenure_review
// and the C ABI's tenure_review_db: app::run_review on a borrowed connection, after the checks
// that make it safe to run from inside the caller's own SQL.
//
// Transactions (db/connection.h, Transaction): in autocommit mode the review commits its own
// short transactions, also when it is called from a SELECT that is still running (SQLite lets a
// connection commit while its read-only statements are active), so each call of a statement that
// calls it on several rows commits its own run. Inside the caller's transaction
// it works in a SAVEPOINT: its run is committed or rolled back with the caller's transaction, and
// a failed review rolls back only its own part. A statement that writes (INSERT ... SELECT
// tenure_review(...)) cannot hold a savepoint or a commit of another statement, so the review
// refuses to run inside one, before reading anything.
//
//   // The stored policy, a baseline run:
//   std::int64_t run_id = review_on(db, std::nullopt, "2026-06-30", std::nullopt);
#pragma once

#include <sqlite3.h>

#include <cstdint>
#include <optional>
#include <string>

namespace tenure::plugin {

// Runs the review and returns the new run's id. policy_json: nullopt for the latest policy stored
// in the database; as_of: 'YYYY-MM-DD', nullopt for today (the local date); scenario: nullopt for a
// baseline run, else the what-if run's name (app/review_run.h). Throws InputError naming "as_of"
// for a bad date, InputError("", ...) inside a writing statement, and what run_review throws
// (InputError for a bad policy, a missing relation or a bad scenario name, naming "scenario";
// RuntimeFailure for the database).
std::int64_t review_on(sqlite3* db, const std::optional<std::string>& policy_json,
                       const std::optional<std::string>& as_of,
                       const std::optional<std::string>& scenario);

}  // namespace tenure::plugin
