-- tenure_version, tenure_factor and tenure_geometric_factor in the stock sqlite3 shell.
-- One check per line (sql_shell_test.cpp): a SELECT prints 1, or fails with the exact error.
-- Tolerance: half a unit in the last place the published table prints (5e-5 for 4 decimals,
-- 5e-6 for 5 decimals).

SELECT tenure_version() GLOB '[0-9]*.[0-9]*.[0-9]*';

-- i = 10%, n = 10, from memory of standard compound-interest tables.
SELECT abs(tenure_factor('P/F', 0.10, 10) - 0.3855) < 5e-5;
SELECT abs(tenure_factor('F/P', 0.10, 10) - 2.5937) < 5e-5;
SELECT abs(tenure_factor('A/P', 0.10, 10) - 0.16275) < 5e-6;
SELECT abs(tenure_factor('A/F', 0.10, 10) - 0.06275) < 5e-6;
SELECT abs(tenure_factor('P/A', 0.10, 10) - 6.1446) < 5e-5;
SELECT abs(tenure_factor('F/A', 0.10, 10) - 15.9374) < 5e-5;
SELECT abs(tenure_factor('A/G', 0.10, 10) - 3.7255) < 5e-5;
SELECT abs(tenure_factor('P/G', 0.10, 10) - 22.8913) < 5e-5;
-- i = 5%, n = 20, from memory of standard compound-interest tables.
SELECT abs(tenure_factor('P/F', 0.05, 20) - 0.3769) < 5e-5;
SELECT abs(tenure_factor('F/P', 0.05, 20) - 2.6533) < 5e-5;
SELECT abs(tenure_factor('A/P', 0.05, 20) - 0.08024) < 5e-6;
SELECT abs(tenure_factor('A/F', 0.05, 20) - 0.03024) < 5e-6;
SELECT abs(tenure_factor('P/A', 0.05, 20) - 12.4622) < 5e-5;
SELECT abs(tenure_factor('F/A', 0.05, 20) - 33.0660) < 5e-5;
SELECT abs(tenure_factor('A/G', 0.05, 20) - 7.9030) < 5e-5;
SELECT abs(tenure_factor('P/G', 0.05, 20) - 98.4884) < 5e-5;
-- i = 8%, n = 5, from memory of standard compound-interest tables.
SELECT abs(tenure_factor('P/F', 0.08, 5) - 0.6806) < 5e-5;
SELECT abs(tenure_factor('A/P', 0.08, 5) - 0.25046) < 5e-6;
SELECT abs(tenure_factor('P/A', 0.08, 5) - 3.9927) < 5e-5;
SELECT abs(tenure_factor('F/A', 0.08, 5) - 5.8666) < 5e-5;
SELECT abs(tenure_factor('A/G', 0.08, 5) - 1.8465) < 5e-5;
SELECT abs(tenure_factor('P/G', 0.08, 5) - 7.3724) < 5e-5;

-- Kind names: any letter case, with or without the slash.
SELECT tenure_factor('ap', 0.10, 10) = tenure_factor('A/P', 0.10, 10);
SELECT tenure_factor('p/f', 0.10, 10) = tenure_factor('P/F', 0.10, 10);
-- Numeric text is a number, as in SQLite's own functions.
SELECT tenure_factor('P/F', '0.10', '10') = tenure_factor('P/F', 0.10, 10);
-- The i -> 0 limits (closed form): P/A = F/A = n, A/P = 1/n, A/G = (n-1)/2, P/G = n(n-1)/2.
SELECT tenure_factor('P/A', 0, 10) = 10;
SELECT tenure_factor('F/A', 0, 10) = 10;
SELECT abs(tenure_factor('A/P', 0, 10) - 0.1) < 1e-12;
SELECT abs(tenure_factor('A/G', 0, 10) - 4.5) < 1e-9;
SELECT abs(tenure_factor('P/G', 0, 10) - 45) < 1e-9;
-- n = 0 where the factor allows it (closed form).
SELECT tenure_factor('P/F', 0.10, 0) = 1;
SELECT tenure_factor('P/A', 0.10, 0) = 0;
-- Identities (closed form): A/P = A/F + i, P/F * F/P = 1.
SELECT abs(tenure_factor('A/P', 0.07, 12) - tenure_factor('A/F', 0.07, 12) - 0.07) < 1e-12;
SELECT abs(tenure_factor('P/F', 0.07, 12) * tenure_factor('F/P', 0.07, 12) - 1) < 1e-12;

-- The geometric gradient (P/A1, g, i, n), closed form: [1 - ((1+g)/(1+i))^n] / (i - g), and
-- n / (1+i) when g = i; g = 0 is P/A.
SELECT abs(tenure_geometric_factor(0.10, 0.05, 10) - (1 - pow(1.05 / 1.10, 10)) / 0.05) < 1e-9;
SELECT abs(tenure_geometric_factor(0.10, 0.10, 10) - 10 / 1.10) < 1e-9;
SELECT abs(tenure_geometric_factor(0.10, 0, 10) - tenure_factor('P/A', 0.10, 10)) < 1e-12;

-- Pure calculators are innocuous: usable in a view even when the schema is not trusted.
PRAGMA trusted_schema = OFF;
CREATE VIEW capital_recovery AS SELECT tenure_factor('A/P', 0.10, 10) AS ap;
SELECT abs((SELECT ap FROM capital_recovery) - 0.16275) < 5e-6;
-- ... and deterministic: usable in a generated column.
CREATE TABLE loan(i REAL, n REAL, ap REAL AS (tenure_factor('A/P', i, n)));
INSERT INTO loan(i, n) VALUES (0.10, 10);
SELECT abs((SELECT ap FROM loan) - 0.16275) < 5e-6;

-- Bad arguments: NULL, text where a number belongs, n out of range, unknown kind.
SELECT tenure_factor('P/F', NULL, 10); -- error: tenure_factor: 2nd argument (i) must be a number
SELECT tenure_factor('P/F', 'ten', 10); -- error: tenure_factor: 2nd argument (i) must be a number
SELECT tenure_factor('P/F', 0.10, NULL); -- error: tenure_factor: 3rd argument (n) must be a number
SELECT tenure_factor('P/F', 0.10, X'00'); -- error: tenure_factor: 3rd argument (n) must be a number
SELECT tenure_factor(NULL, 0.10, 10); -- error: tenure_factor: 1st argument (kind) must be text
SELECT tenure_factor('P/F', 0.10, -1); -- error: tenure_factor: 3rd argument (n) must be >= 0
SELECT tenure_factor('A/P', 0.10, 0); -- error: tenure_factor: 3rd argument (n) must be > 0
SELECT tenure_factor('A/F', 0.10, -2); -- error: tenure_factor: 3rd argument (n) must be > 0
SELECT tenure_factor('A/G', 0.10, 0); -- error: tenure_factor: 3rd argument (n) must be > 0
SELECT tenure_factor('P/F', -1, 10); -- error: tenure_factor: 2nd argument (i) must be a rate greater than -1
SELECT tenure_factor('P/F', 1e999, 10); -- error: tenure_factor: 2nd argument (i) must be a finite number
SELECT tenure_factor('X/Y', 0.10, 10); -- error: tenure_factor: unknown kind 'X/Y' (expected one of P/F, F/P, A/P, A/F, P/A, F/A, A/G, P/G)
SELECT tenure_factor('P/F', 0.10); -- error: wrong number of arguments to function tenure_factor()
SELECT tenure_geometric_factor(0.10, NULL, 10); -- error: tenure_geometric_factor: 2nd argument (g) must be a number
SELECT tenure_geometric_factor(0.10, -1.5, 10); -- error: tenure_geometric_factor: 2nd argument (g) must be a rate greater than -1
SELECT tenure_geometric_factor(0.10, 0.05, -1); -- error: tenure_geometric_factor: 3rd argument (n) must be >= 0
