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
//
// Baseline and what-if runs. A run with tenure_run.scenario NULL is a baseline (nightly) run; a
// run of `tenure review --scenario NAME` (or tenure_review(policy, as_of, 'NAME')) is a what-if
// run, and the nightly views never show it. "Latest" is defined once, in tenure_run_order:
//   tenure_run_order      per successful run: run_id, as_of, scenario, recency (1 = the latest
//                         run of its scenario, ordered by as_of, then run_id, newest first) and
//                         previous_run_id (the run of the same scenario just before it)
//   tenure_latest_run     one row (none before the first baseline run): run_id, as_of and
//                         previous_run_id of the latest baseline run, so a back-dated run
//                         (earlier as_of, higher run_id) never becomes latest
// Views of the latest baseline run (db::read_run reads the same run by default):
//   tenure_latest, tenure_due, tenure_newly_due (due now, not due in its previous_run_id),
//   tenure_class_latest.
//
// tenure_scenario_diff: one row per asset of the latest baseline run and per scenario, the
// scenario taken at its latest run; its columns:
//   scenario                                       the what-if run's name
//   baseline_run_id, scenario_run_id               the two runs compared
//   asset_id, asset_class                          the asset, as the baseline run has it
//   baseline_verdict, scenario_verdict             'keep' | 'review' | 'replace'
//   baseline_replace_after_years, scenario_replace_after_years     k* of each run
//   baseline_delay_cost, scenario_delay_cost       what missing the best time by a year costs
//   verdict_differs                                1 when the verdicts differ, also when the
//                                                  scenario did not review the asset (its
//                                                  scenario_ columns are then NULL); else 0
//
// On the invented demo fleet (`tenure demo`, reviewed as of 2026-11-30), after a what-if run
// with every challenger price 20% higher (`tenure review --scenario price-up --policy ...`):
//   sqlite> SELECT scenario, asset_id, baseline_verdict, scenario_verdict,
//      ...>        baseline_replace_after_years, scenario_replace_after_years
//      ...>   FROM tenure_scenario_diff WHERE verdict_differs ORDER BY scenario, asset_id LIMIT 2;
//   price-up|FLT-00109|replace|review|0|1
//   price-up|FLT-00115|review|keep|1|2
//   sqlite> SELECT scenario, sum(verdict_differs) FROM tenure_scenario_diff GROUP BY scenario;
//   price-up|52
//   sqlite> SELECT run_id, as_of, previous_run_id FROM tenure_latest_run;
//   1|2026-11-30|
#pragma once

#include "db/connection.h"

namespace tenure::db {

// The schema version this build writes.
int current_schema_version();

// Creates or upgrades the results schema. Must be called inside a write transaction.
void migrate(Connection& db);

}  // namespace tenure::db
