-- tenure_present_worth and tenure_euac in the stock sqlite3 shell. One check per line
-- (sql_shell_test.cpp). Expected values are closed forms worked by hand or through
-- tenure_factor, whose published values factors.sql checks.

SELECT abs(tenure_present_worth(0.10, '[-1000, 500, 500, 500]') - (-1000 + 500 / 1.1 + 500 / 1.21 + 500 / 1.331)) < 1e-9;
SELECT tenure_present_worth(0.10, '[250]') = 250;
SELECT tenure_present_worth(0, '[1, 2, 3]') = 6;
-- A uniform series is its own EUAC: 0 now, then 1000 a year for 5 years.
SELECT abs(tenure_euac(0.08, '[0, 1000, 1000, 1000, 1000, 1000]') - 1000) < 1e-9;
-- 60000 now, 4000 and 5500 to run, sold for 29000 at the end of year 3 (net -22000).
SELECT abs(tenure_euac(0.10, '[60000, 4000, 5500, -22000]') - (60000 + 4000 / 1.1 + 5500 / 1.21 - 22000 / 1.331) * tenure_factor('A/P', 0.10, 3)) < 1e-9;
-- From rows of a table, through json_group_array.
CREATE TABLE van_cost(year INTEGER, amount REAL);
INSERT INTO van_cost VALUES (0, 60000), (1, 4000), (2, 5500), (3, -22000);
SELECT (SELECT tenure_euac(0.10, json_group_array(amount)) FROM (SELECT amount FROM van_cost ORDER BY year)) = tenure_euac(0.10, '[60000, 4000, 5500, -22000]');
-- A BLOB holding the JSON text is read as text.
SELECT tenure_present_worth(0, CAST('[1, 2]' AS BLOB)) = 3;

SELECT tenure_present_worth(0.10, 'not json'); -- error: tenure_present_worth: 2nd argument (cash_flows) must be a JSON array of numbers
SELECT tenure_present_worth(0.10, '{"a": 1}'); -- error: tenure_present_worth: 2nd argument (cash_flows) must be a JSON array of numbers
SELECT tenure_present_worth(0.10, '[]'); -- error: tenure_present_worth: 2nd argument (cash_flows) must be a JSON array of numbers
SELECT tenure_present_worth(0.10, '[1, "2"]'); -- error: tenure_present_worth: 2nd argument (cash_flows) must be a JSON array of numbers ([1] is not)
SELECT tenure_present_worth(0.10, '[1, null]'); -- error: tenure_present_worth: 2nd argument (cash_flows) must be a JSON array of numbers ([1] is not)
SELECT tenure_present_worth(0.10, NULL); -- error: tenure_present_worth: 2nd argument (cash_flows) must be text
SELECT tenure_present_worth(NULL, '[1]'); -- error: tenure_present_worth: 1st argument (i) must be a number
SELECT tenure_present_worth(-1.5, '[1]'); -- error: tenure_present_worth: 1st argument (i) must be a rate greater than -1
SELECT tenure_euac(0.10, '[1000]'); -- error: tenure_euac: 2nd argument (cash_flows) must hold at least 2 amounts (t = 0 and t = 1)
SELECT tenure_euac('ten percent', '[1000, 1]'); -- error: tenure_euac: 1st argument (i) must be a number
