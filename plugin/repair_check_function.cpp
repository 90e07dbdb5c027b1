// tenure_repair_check(asset_id, estimate): at the counter (SPEC 11), repair or replace one asset
// for a repair estimate paid now, from the latest successful run's stored inputs as `tenure
// explain` rebuilds them (app/repair_check.h). Returns the JSON text `tenure repair --format
// json` prints: verdict "repair" when the estimate is within the asset's repair limit (with
// replace_after_years_if_repaired, k* after repairing), "replace" above it, "not_weighed" (and
// not_weighed saying why) for an asset the run did not weigh.
//
// Usage (on the invented demo fleet of `tenure demo --db demo.db`, reviewed with
// SELECT tenure_review(NULL, '2026-11-30')):
//   SELECT json_extract(tenure_repair_check('FLT-00137', 2500),
//                       '$.verdict', '$.replace_after_years_if_repaired');
//     -- ["repair",3]
//   SELECT json_extract(tenure_repair_check('FLT-00137', 5000), '$.verdict');   -- replace
//   SELECT round(json_extract(tenure_repair_check('FLT-00137', 0), '$.repair_limit'), 2);
//     -- 3742.65, as tenure_latest.repair_limit
//   SELECT json_extract(tenure_repair_check('VAN-00080', 300), '$.reason');
//     -- asset 'VAN-00080' was retired on 2025-03-23: there is nothing to repair
//   -- Every asset of the latest run, against one estimate:
//   SELECT asset_id, json_extract(tenure_repair_check(asset_id, 1000), '$.verdict')
//     FROM tenure_latest ORDER BY asset_id LIMIT 2;
//
// Errors name the argument and the rule:
//   tenure_repair_check: 2nd argument (estimate) must be a finite amount >= 0 and at most 1e15
//   tenure_repair_check: 2nd argument (estimate) must be a number
//   tenure_repair_check: 1st argument (asset_id) must be text
//   tenure_repair_check: no asset 'NOPE' in the asset relation
//   tenure_repair_check: no review run in this database (run 'tenure review' first)
// To nest the result inside json_object(), wrap it in json(): it is returned as plain text.
//
// SQLITE_DIRECTONLY: it reads tables (the tenure_ results and the asset relation), so it may run
// only from top-level SQL, never from a view, a trigger or a schema someone else wrote.
#include "app/repair_check.h"
#include "db/connection.h"
#include "formats/json_text.h"
#include "formats/repair_output.h"
#include "plugin/functions.h"
#include "plugin/sql_arguments.h"

namespace tenure::plugin {
namespace {

const Signature kRepairCheck{"tenure_repair_check", {"asset_id", "estimate"}};

app::RepairCheck checked(sqlite3_context* context, const Arguments& args) {
  const std::string asset_id = args.text("asset_id");
  const double estimate = args.number("estimate");
  db::Connection db = db::Connection::borrow(sqlite3_context_db_handle(context));
  try {
    return app::check_repair(db, asset_id, estimate, std::nullopt);
  } catch (const InputError& error) {
    // The asset's and the database's errors are about the call as a whole, not an option.
    if (error.where() != "ASSET" && error.where() != "--db") throw;
    throw InputError("", error.rule());
  }
}

}  // namespace

void repair_check_function(sqlite3_context* context, int argc, sqlite3_value** argv) {
  guarded(context, kRepairCheck, [&] {
    const Arguments args(kRepairCheck, argc, argv);
    const std::string json =
        formats::json_output(formats::repair_check_to_json(checked(context, args)), -1);
    sqlite3_result_text(context, json.data(), static_cast<int>(json.size()), SQLITE_TRANSIENT);
  });
}

}  // namespace tenure::plugin
