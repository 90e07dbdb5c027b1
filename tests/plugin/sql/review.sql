-- tenure_review in the stock sqlite3 shell, on an invented fleet built here: class "pump-sql",
-- eight pumps in service 1..8 years (and 10 days) before 2026-06-30, each costing exactly
-- 1000 + 400 (k - 1) in its age-year k, and one cost row with a bad date. One check per line
-- (sql_shell_test.cpp). plugin_cli_equivalence_test checks the views against `tenure review`.

CREATE TABLE asset(asset_id TEXT PRIMARY KEY, asset_class TEXT NOT NULL, in_service_on TEXT NOT NULL, first_cost REAL NOT NULL, retired_on TEXT);
CREATE TABLE cost_event(asset_id TEXT NOT NULL, occurred_on TEXT NOT NULL, amount REAL NOT NULL, kind TEXT);
CREATE TABLE asset_valuation(asset_id TEXT NOT NULL, valued_on TEXT NOT NULL, amount REAL NOT NULL, basis TEXT);
INSERT INTO asset WITH RECURSIVE k(n) AS (SELECT 1 UNION ALL SELECT n + 1 FROM k WHERE n < 8) SELECT 'P-' || n, 'pump-sql', date('2026-06-30', '-' || n || ' years', '-10 days'), 20000, NULL FROM k;
INSERT INTO cost_event WITH RECURSIVE y(k) AS (SELECT 1 UNION ALL SELECT k + 1 FROM y WHERE k < 8) SELECT asset_id, date(in_service_on, '+' || (k - 1) || ' years', '+6 months'), 1000 + 400 * (k - 1), 'repair' FROM asset, y WHERE k <= CAST(substr(asset_id, 3) AS INTEGER);
INSERT INTO cost_event VALUES ('P-1', 'not a date', 50, 'repair');
CREATE TABLE settings(policy TEXT);
INSERT INTO settings VALUES ('{"marr": 0.10, "income_tax_rate": 0.25, "classes": {"pump-sql": {"challenger_first_cost": 20000, "max_life_years": 12, "depreciation": {"method": "straight_line", "life_years": 8, "salvage": 0}, "market_value": {"annual_decline": 0.2}, "cost_model": "linear"}}}');

-- Autocommit: the review commits its own run, also while the calling SELECT (which reads the
-- settings table) is still running.
SELECT (SELECT tenure_review(policy, '2026-06-30') FROM settings) = 1;
SELECT (SELECT count(*) FROM tenure_run WHERE status = 'ok') = 1;
SELECT (SELECT count(*) FROM tenure_latest) = 8;
SELECT (SELECT count(*) FROM tenure_latest WHERE verdict IN ('keep', 'review', 'replace')) = 8;
SELECT (SELECT count(*) FROM tenure_due) = (SELECT count(*) FROM tenure_latest WHERE verdict IN ('review', 'replace'));
-- The fitted class curve is exact on noiseless costs (closed form): a = 1000, g = 400 over
-- 1 + 2 + ... + 8 = 36 complete asset-years.
SELECT (SELECT abs(cost_a - 1000) < 1e-6 AND abs(cost_g - 400) < 1e-6 AND asset_years = 36 FROM tenure_class_latest WHERE asset_class = 'pump-sql');
SELECT (SELECT count(*) FROM tenure_rejected WHERE run_id = 1 AND source = 'cost_event') = 1;
SELECT (SELECT group_concat(age_years, ',') FROM (SELECT age_years FROM tenure_latest ORDER BY asset_id)) = '1,2,3,4,5,6,7,8';

-- Inside the caller's transaction: the run joins it, so the caller's ROLLBACK removes it ...
BEGIN;
SELECT (SELECT tenure_review(policy, '2026-07-31') FROM settings) = 2;
SELECT (SELECT max(run_id) FROM tenure_latest) = 2;
ROLLBACK;
SELECT (SELECT count(*) FROM tenure_run) = 1;
SELECT (SELECT max(run_id) FROM tenure_latest) = 1;
-- ... and its COMMIT keeps it, with the caller's own writes before and after it.
CREATE TABLE note(text TEXT);
BEGIN;
INSERT INTO note VALUES ('before');
SELECT (SELECT tenure_review(policy, '2026-07-31') FROM settings) = 2;
INSERT INTO note VALUES ('after');
COMMIT;
SELECT (SELECT count(*) FROM tenure_run) = 2 AND (SELECT count(*) FROM note) = 2;
SELECT (SELECT as_of FROM tenure_run WHERE run_id = (SELECT max(run_id) FROM tenure_latest)) = '2026-07-31';
-- A failed review inside the caller's transaction leaves that transaction open and intact.
BEGIN;
INSERT INTO note VALUES ('kept');
SELECT tenure_review('{"marr": 0, "income_tax_rate": 0, "classes": {}}', '2026-08-31'); -- error: tenure_review: $.marr: must be > 0
COMMIT;
SELECT (SELECT count(*) FROM note) = 3 AND (SELECT count(*) FROM tenure_run) = 2;
-- Several calls in one autocommit statement: each commits its own run.
SELECT (SELECT group_concat(tenure_review(policy, as_of), ',') FROM settings, (SELECT '2026-08-31' AS as_of UNION ALL SELECT '2026-09-30')) = '3,4';
SELECT (SELECT count(*) FROM tenure_run) = 4;

-- A statement that writes cannot host a review; nothing is written.
INSERT INTO note SELECT tenure_review(policy, '2026-10-31') FROM settings; -- error: tenure_review: cannot run inside a statement that writes; call it from a SELECT
SELECT (SELECT count(*) FROM tenure_run) = 4 AND (SELECT count(*) FROM note) = 3;
-- Direct-only: it reads and writes tables, so a view (or trigger) may not call it.
CREATE VIEW nightly AS SELECT tenure_review(policy, '2026-10-31') FROM settings;
SELECT * FROM nightly; -- error: unsafe use of tenure_review()
SELECT (SELECT count(*) FROM tenure_run) = 4;

-- Bad arguments and policies.
SELECT tenure_review(NULL, '2026-06-30'); -- error: tenure_review: policy: no policy given and none stored in the database (store one with 'tenure policy set')
SELECT tenure_review((SELECT policy FROM settings), '30/06/2026'); -- error: tenure_review: 2nd argument (as_of) must be a date 'YYYY-MM-DD'
SELECT tenure_review((SELECT policy FROM settings), 20260630); -- error: tenure_review: 2nd argument (as_of) must be a date 'YYYY-MM-DD'
SELECT tenure_review((SELECT policy FROM settings), '2026-02-30'); -- error: tenure_review: 2nd argument (as_of) must be a date 'YYYY-MM-DD'
SELECT tenure_review(42); -- error: tenure_review: 1st argument (policy_json) must be text
SELECT tenure_review('{"marr": 0.10}'); -- error: tenure_review: $.income_tax_rate: required number is missing
SELECT tenure_review('{"marr": 0.10, "income_tax_rate": 0, "sources": {"assets": "machine"}, "classes": {"pump-sql": {"challenger_first_cost": 20000, "max_life_years": 12, "depreciation": {"method": "none"}, "market_value": {"annual_decline": 0.2}, "cost_model": "linear"}}}', '2026-06-30'); -- error: tenure_review: $.sources.assets: relation 'machine' does not exist in the database
SELECT tenure_review(); -- error: wrong number of arguments to function tenure_review()
SELECT (SELECT count(*) FROM tenure_run) = 4;

-- What-if runs: a third argument names the scenario. The nightly views ignore the run, even
-- dated after the latest baseline run; tenure_scenario_diff compares it with that run. With a
-- lead time of 3 years instead of 1 (SPEC 6, verdict rule (3)) exactly the assets kept with
-- 2 <= k* <= 3 become `review`, and k* itself does not move.
SELECT (SELECT tenure_review(replace(policy, '"marr": 0.10,', '"marr": 0.10, "lead_time_years": 3,'), '2026-12-31', 'lead-3') FROM settings) = 5;
SELECT (SELECT scenario FROM tenure_run WHERE run_id = 5) = 'lead-3' AND (SELECT count(*) FROM tenure_run WHERE scenario IS NULL) = 4;
SELECT (SELECT run_id FROM tenure_latest_run) = 4 AND (SELECT min(run_id) = 4 AND max(run_id) = 4 FROM tenure_latest) AND (SELECT max(run_id) FROM tenure_class_latest) = 4;
SELECT (SELECT count(*) FROM tenure_scenario_diff WHERE scenario = 'lead-3' AND baseline_run_id = 4 AND scenario_run_id = 5) = 8;
SELECT (SELECT count(*) FROM tenure_scenario_diff WHERE verdict_differs) = (SELECT count(*) FROM tenure_latest WHERE verdict = 'keep' AND replace_after_years BETWEEN 2 AND 3);
SELECT (SELECT count(*) FROM tenure_scenario_diff WHERE verdict_differs AND scenario_verdict = 'review') > 0;
SELECT (SELECT count(*) FROM tenure_scenario_diff WHERE scenario_replace_after_years IS NOT baseline_replace_after_years) = 0;
-- A NULL scenario is a baseline run; a back-dated baseline run (an earlier as_of, a higher
-- run_id) does not become latest, and is the run the latest is compared with.
SELECT (SELECT tenure_review(policy, '2026-10-31', NULL) FROM settings) = 6;
SELECT (SELECT run_id FROM tenure_latest_run) = 6 AND (SELECT max(run_id) FROM tenure_latest) = 6;
SELECT (SELECT tenure_review(policy, '2026-10-15') FROM settings) = 7;
SELECT (SELECT run_id FROM tenure_latest_run) = 6 AND (SELECT previous_run_id FROM tenure_latest_run) = 7;
-- Bad names, refused before anything is written.
SELECT tenure_review((SELECT policy FROM settings), '2026-06-30', 'next year'); -- error: tenure_review: 3rd argument (scenario) may hold only letters, digits, '-', '_' and '.' (character 5 is not one)
SELECT tenure_review((SELECT policy FROM settings), '2026-06-30', ''); -- error: tenure_review: 3rd argument (scenario) must not be empty (a name of letters, digits, '-', '_' and '.')
SELECT tenure_review((SELECT policy FROM settings), '2026-06-30', 7); -- error: tenure_review: 3rd argument (scenario) must be text
SELECT (SELECT count(*) FROM tenure_run) = 7;
