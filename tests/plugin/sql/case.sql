-- tenure_case in the stock sqlite3 shell (run from the source directory, so readfile() finds
-- the invented fixtures). One check per line (sql_shell_test.cpp). plugin_cli_equivalence_test
-- checks the whole document against `tenure case`.

SELECT json_valid(tenure_case(readfile('fixtures/cases/delivery_van.json')));
SELECT json_extract(tenure_case(readfile('fixtures/cases/delivery_van.json')), '$.decision.verdict') IN ('keep', 'review', 'replace');
SELECT json_extract(tenure_case(readfile('fixtures/cases/delivery_van.json')), '$.challenger.after_tax.esl_years') BETWEEN 1 AND 6;
-- Several challengers (SPEC 14): the chosen one is named, and it has the least after-tax EUAC.
SELECT json_extract(tenure_case(readfile('fixtures/cases/delivery_van_choices.json')), '$.chosen_challenger') = 'electric';
SELECT (SELECT min(json_extract(value, '$.after_tax.euac')) FROM json_each(json_extract(tenure_case(readfile('fixtures/cases/delivery_van_choices.json')), '$.challengers'))) = json_extract(tenure_case(readfile('fixtures/cases/delivery_van_choices.json')), '$.decision.challenger_euac');
SELECT tenure_case('{"marr": 0.10, "income_tax_rate": 0, "challengers": []}'); -- error: tenure_case: $.challengers: must list at least one challenger
-- Closed form: no tax, no depreciation, costs 1000 a year, worthless when sold: EUAC(n) =
-- 10000 (A/P, 10%, n) + 1000 falls with n, so the economic service life is the longest, 3.
CREATE TABLE cases(name TEXT, body TEXT);
INSERT INTO cases VALUES ('flat', '{"marr": 0.10, "income_tax_rate": 0, "challenger": {"first_cost": 10000, "operating_costs": [1000, 1000, 1000], "market_values": [0, 0, 0], "depreciation": {"method": "none"}}}');
SELECT (SELECT json_extract(tenure_case(body), '$.challenger.before_tax.esl_years') FROM cases) = 3;
SELECT (SELECT abs(json_extract(tenure_case(body), '$.challenger.before_tax.euac') - (10000 * tenure_factor('A/P', 0.10, 3) + 1000)) < 1e-6 FROM cases);
SELECT (SELECT json_extract(tenure_case(body), '$.challenger.after_tax') FROM cases) IS NULL;
-- The curve as rows, through json_each.
SELECT (SELECT count(*) FROM cases, json_each(tenure_case(cases.body), '$.challenger.before_tax.curve')) = 3;
-- Deterministic and innocuous: usable in a view when the schema is not trusted.
PRAGMA trusted_schema = OFF;
CREATE VIEW case_results AS SELECT name, tenure_case(body) AS result FROM cases;
SELECT (SELECT json_extract(result, '$.challenger.before_tax.esl_years') FROM case_results) = 3;
PRAGMA trusted_schema = ON;

SELECT tenure_case(NULL); -- error: tenure_case: 1st argument (case_json) must be text
SELECT tenure_case(42); -- error: tenure_case: 1st argument (case_json) must be text
SELECT tenure_case('{"marr": 0.10}'); -- error: tenure_case: $.income_tax_rate: required number is missing
SELECT tenure_case('{"marr": 0.10, "income_tax_rate": 0, "challenger": {"first_cost": -5, "operating_costs": [1], "market_values": [0], "depreciation": {"method": "none"}}}'); -- error: tenure_case: $.challenger.first_cost: must be > 0
SELECT tenure_case('{"marr": 0.10, "income_tax_rate": 0, "colour": "red"}'); -- error: tenure_case: $.colour: unknown key (expected one of marr, income_tax_rate, after_tax_marr, capital_gains_tax_rate, lead_time_years, review_margin, challenger, challengers, improvement, defender, study_period_years)
SELECT tenure_case('{'); -- error: tenure_case: $: invalid JSON at line 1, column 2: syntax error while parsing object key - unexpected end of input; expected string literal
