// The results schema tenure keeps beside the host's tables (SPEC 7). Every object's name starts
// with tenure_. The tables are generated from their column lists (results/tables.h); a schema
// version is the columns some `since` names, applied inside the caller's transaction (a new
// database gets every column at once, an older one ALTER TABLE ... ADD COLUMN for the newer ones,
// then its views made again), and tenure_schema_version records each version, so a newer tenure
// upgrades an older database in place.
//
//   sqlite> SELECT asset_id, verdict, reason FROM tenure_due LIMIT 1;
//   PU-0042|review|Review: at 12 years it is at or past the class's economic life of 10 years; ...
//   sqlite> SELECT asset_class, esl_years_after_tax, euac_after_tax FROM tenure_class_latest;
//   van-service|6|14210.55
//
// Tables: tenure_schema_version, tenure_run, tenure_asset_result, tenure_class_result,
// tenure_euac_curve, tenure_cash_flow, tenure_rejected, tenure_policy (policy_store.h).
// Views, all about the latest successful run: tenure_latest, tenure_due, tenure_newly_due,
// tenure_class_latest.
#pragma once

#include "db/connection.h"

namespace tenure::db {

// The schema version this build writes.
int current_schema_version();

// Creates or upgrades the results schema. Must be called inside a write transaction.
void migrate(Connection& db);

}  // namespace tenure::db
