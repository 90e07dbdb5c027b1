-- tenure_repair_check in the stock sqlite3 shell, on an invented fleet built here: class
-- "pump-sql", fourteen pumps in service 1..14 years (and 10 days) before 2026-06-30, each costing
-- exactly 1000 + 400 (k - 1) in its age-year k; one retired pump, one with a first cost of 0 (a
-- rejected row) and one not yet in service. One check per line (sql_shell_test.cpp). The limits
-- are the run's stored repair_limit, which tests/db/review_run_test.cpp checks against the case
-- analysis; plugin_repair_check_equivalence_test checks the document against `tenure repair`.

CREATE TABLE asset(asset_id TEXT PRIMARY KEY, asset_class TEXT NOT NULL, in_service_on TEXT NOT NULL, first_cost REAL NOT NULL, retired_on TEXT);
CREATE TABLE cost_event(asset_id TEXT NOT NULL, occurred_on TEXT NOT NULL, amount REAL NOT NULL, kind TEXT);
CREATE TABLE asset_valuation(asset_id TEXT NOT NULL, valued_on TEXT NOT NULL, amount REAL NOT NULL, basis TEXT);
INSERT INTO asset WITH RECURSIVE k(n) AS (SELECT 1 UNION ALL SELECT n + 1 FROM k WHERE n < 14) SELECT 'P-' || n, 'pump-sql', date('2026-06-30', '-' || n || ' years', '-10 days'), 20000, NULL FROM k;
INSERT INTO cost_event WITH RECURSIVE y(k) AS (SELECT 1 UNION ALL SELECT k + 1 FROM y WHERE k < 14) SELECT asset_id, date(in_service_on, '+' || (k - 1) || ' years', '+6 months'), 1000 + 400 * (k - 1), 'repair' FROM asset, y WHERE k <= CAST(substr(asset_id, 3) AS INTEGER);
INSERT INTO asset VALUES ('P-RETIRED', 'pump-sql', '2024-03-01', 20000, '2025-04-30'), ('P-ZERO', 'pump-sql', '2019-05-01', 0, NULL), ('P-NEW', 'pump-sql', '2026-09-01', 20000, NULL);
INSERT INTO cost_event VALUES ('P-RETIRED', '2024-09-01', 1000, 'repair');

-- Before any review there is nothing to answer from.
SELECT tenure_repair_check('P-3', 100); -- error: tenure_repair_check: no review run in this database (run 'tenure review' first)
SELECT tenure_review('{"marr": 0.10, "income_tax_rate": 0.25, "classes": {"pump-sql": {"challenger_first_cost": 20000, "max_life_years": 12, "depreciation": {"method": "straight_line", "life_years": 8, "salvage": 0}, "market_value": {"annual_decline": 0.2}, "cost_model": "linear"}}}', '2026-06-30') = 1;
-- The fleet has both kinds: units worth repairing (k* >= 1) and units due now (k* = 0).
SELECT (SELECT count(*) FROM tenure_latest WHERE replace_after_years > 0) > 0 AND (SELECT count(*) FROM tenure_latest WHERE replace_after_years = 0) > 0;

-- The limit is the run's stored repair_limit, exactly, for every asset.
SELECT (SELECT count(*) FROM tenure_latest WHERE json_extract(tenure_repair_check(asset_id, 0), '$.repair_limit') = repair_limit) = 14;
-- Repair at the limit (R <= limit) and at half of it, kept the run's k* years after repairing (a
-- repair adds one constant to every T(k), k >= 1, so their least stays where it was).
SELECT (SELECT count(*) FROM tenure_latest WHERE replace_after_years > 0 AND json_extract(tenure_repair_check(asset_id, repair_limit), '$.verdict') = 'repair' AND json_extract(tenure_repair_check(asset_id, repair_limit / 2), '$.replace_after_years_if_repaired') = replace_after_years) = (SELECT count(*) FROM tenure_latest WHERE replace_after_years > 0);
-- Replace a cent above it, and for a unit due now even a free repair is no answer.
SELECT (SELECT count(*) FROM tenure_latest WHERE json_extract(tenure_repair_check(asset_id, repair_limit + 0.01), '$.verdict') = 'replace' AND json_extract(tenure_repair_check(asset_id, repair_limit + 0.01), '$.replace_after_years_if_repaired') = 0) = 14;
SELECT (SELECT count(*) FROM tenure_latest WHERE replace_after_years = 0 AND json_extract(tenure_repair_check(asset_id, 0), '$.verdict') = 'replace') = (SELECT count(*) FROM tenure_latest WHERE replace_after_years = 0);
-- After tax the repair costs its amount less the present worth of its deduction at the end of
-- year 1, by hand at the after-tax MARR 0.10 x 0.75 = 0.075: 1000 x (1 - 0.25 / 1.075).
SELECT abs(json_extract(tenure_repair_check('P-3', 1000), '$.estimate_net_cost') - 1000 * (1 - 0.25 / 1.075)) < 1e-9;
SELECT json_extract(tenure_repair_check('P-3', 1000), '$.basis') = 'after_tax' AND json_extract(tenure_repair_check('P-3', 1000), '$.run_id') = 1 AND json_extract(tenure_repair_check('P-3', 1000), '$.as_of') = '2026-06-30';
-- Its keys.
SELECT (SELECT group_concat(key, ',') FROM (SELECT key FROM json_each(tenure_repair_check('P-3', 100)) ORDER BY key)) = 'as_of,asset_class,asset_id,basis,caution,estimate,estimate_net_cost,not_weighed,reason,repair_deduction_factor,repair_limit,replace_after_years,replace_after_years_if_repaired,run_id,verdict';

-- Assets the run did not weigh are answers that say why.
SELECT json_extract(tenure_repair_check('P-RETIRED', 300), '$.reason') = 'asset ''P-RETIRED'' was retired on 2025-04-30: there is nothing to repair';
SELECT json_extract(tenure_repair_check('P-RETIRED', 300), '$.verdict') = 'not_weighed' AND json_extract(tenure_repair_check('P-RETIRED', 300), '$.not_weighed') = 'retired';
SELECT json_extract(tenure_repair_check('P-ZERO', 300), '$.reason') = 'asset ''P-ZERO'' was rejected by run 1: first_cost 0 must be greater than 0';
SELECT json_extract(tenure_repair_check('P-NEW', 300), '$.reason') = 'asset ''P-NEW'' goes into service on 2026-09-01, after run 1''s as-of date 2026-06-30: the run did not weigh it';
SELECT json_type(tenure_repair_check('P-NEW', 300), '$.repair_limit') = 'null';

-- Errors name the argument and the rule.
SELECT tenure_repair_check('P-NONE', 300); -- error: tenure_repair_check: no asset 'P-NONE' in the asset relation
SELECT tenure_repair_check('P-3', -1); -- error: tenure_repair_check: 2nd argument (estimate) must be a finite amount >= 0 and at most 1e15
SELECT tenure_repair_check('P-3', 1e16); -- error: tenure_repair_check: 2nd argument (estimate) must be a finite amount >= 0 and at most 1e15
SELECT tenure_repair_check('P-3', 1e999); -- error: tenure_repair_check: 2nd argument (estimate) must be a finite amount >= 0 and at most 1e15
SELECT tenure_repair_check('P-3', NULL); -- error: tenure_repair_check: 2nd argument (estimate) must be a number
SELECT tenure_repair_check('P-3', 'a lot'); -- error: tenure_repair_check: 2nd argument (estimate) must be a number
SELECT tenure_repair_check(NULL, 300); -- error: tenure_repair_check: 1st argument (asset_id) must be text
SELECT tenure_repair_check('P-3'); -- error: wrong number of arguments to function tenure_repair_check()
-- A number given as text is read as the number.
SELECT json_extract(tenure_repair_check('P-3', '250'), '$.estimate') = 250;

-- SQLITE_DIRECTONLY: it reads tables, so a view in the schema may not call it.
CREATE VIEW repair_view AS SELECT tenure_repair_check('P-3', 100) AS answer;
SELECT answer FROM repair_view; -- error: unsafe use of tenure_repair_check()
-- Called from a statement that writes, it still answers (and from inside a transaction).
CREATE TABLE quote(asset_id TEXT, answer TEXT);
INSERT INTO quote SELECT asset_id, tenure_repair_check(asset_id, 500) FROM tenure_latest;
BEGIN;
INSERT INTO quote SELECT 'P-3', tenure_repair_check('P-3', 500);
SELECT json_extract(tenure_repair_check('P-3', 500), '$.run_id') = 1;
COMMIT;
SELECT (SELECT count(*) FROM quote WHERE json_valid(answer)) = 15;

-- A later review is the one answered from.
SELECT tenure_review('{"marr": 0.10, "income_tax_rate": 0.25, "classes": {"pump-sql": {"challenger_first_cost": 20000, "max_life_years": 12, "depreciation": {"method": "straight_line", "life_years": 8, "salvage": 0}, "market_value": {"annual_decline": 0.2}, "cost_model": "linear"}}}', '2026-12-31') = 2;
SELECT json_extract(tenure_repair_check('P-NEW', 300), '$.run_id') = 2 AND json_extract(tenure_repair_check('P-NEW', 300), '$.not_weighed') IS NULL;
