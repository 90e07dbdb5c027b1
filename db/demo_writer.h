// Writes the invented demo fleet ("Larkmoor Water", an invented water utility; demo/) into a
// database as the three host relations of SPEC 3, then stores the demo policy, so that
// `tenure review --db FILE` has everything it needs.
//
//   Connection db = Connection::open("demo.db", true);
//   DemoWrite written = write_demo_fleet(db, demo::Options{});
//
//   sqlite> SELECT asset_class, count(*) FROM asset GROUP BY 1 ORDER BY 1;
//   forklift-electric|49
//   generator-standby|50
//   pump-centrifugal|102
//   van-service|121          -- pumps and vans each include one bad asset on purpose
//   sqlite> SELECT count(*) FROM cost_event;
//   59726
//
// Rules:
//   (1) Tables asset, cost_event and asset_valuation are created exactly as SPEC 3 declares them.
//       When one of the three names is already taken (a table or a view), the write is refused
//       with an InputError naming it, unless `existing` is replace: then those objects are
//       dropped first, in the same transaction.
//   (2) Rows are inserted in the order the generator emits them, with bound parameters, in one
//       transaction, so each relation's rowids are the generator's row numbers (BadRow).
//       Synchronous writes are off during the load and restored after it.
//   (3) The index cost_event_asset_day on cost_event(asset_id, occurred_on) is built after the
//       rows are in (one sort instead of ten million random inserts), before the commit.
//   (4) The demo policy (demo/demo_policy.h) is then stored with store_policy, and ANALYZE runs.
#pragma once

#include <cstdint>

#include "db/connection.h"
#include "demo/fleet_generator.h"

namespace tenure::db {

enum class ExistingDemoTables { refuse, replace };

struct DemoWrite {
  demo::Summary summary;   // rows written and the bad rows among them
  std::int64_t policy_id;  // of the stored demo policy
};

DemoWrite write_demo_fleet(Connection& db, const demo::Options& options,
                           ExistingDemoTables existing = ExistingDemoTables::refuse);

}  // namespace tenure::db
