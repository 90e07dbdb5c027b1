-- tenure_depreciation (table-valued), tenure_book_value and tenure_macrs_rate in the stock
-- sqlite3 shell. One check per line (sql_shell_test.cpp).

-- MACRS GDS half-year percentages, IRS Publication 946, Table A-1, to the table's printed
-- decimals: each row's deduction on a basis of 10000 (100000 for 20-year) as a percentage.
SELECT (SELECT group_concat(printf('%.2f', depreciation / 100), ',') FROM tenure_depreciation('macrs', 10000, 0, 3)) = '33.33,44.45,14.81,7.41';
SELECT (SELECT group_concat(printf('%.2f', depreciation / 100), ',') FROM tenure_depreciation('macrs', 10000, 0, 5)) = '20.00,32.00,19.20,11.52,11.52,5.76';
SELECT (SELECT group_concat(printf('%.2f', depreciation / 100), ',') FROM tenure_depreciation('macrs', 10000, 0, 7)) = '14.29,24.49,17.49,12.49,8.93,8.92,8.93,4.46';
SELECT (SELECT group_concat(printf('%.2f', depreciation / 100), ',') FROM tenure_depreciation('macrs', 10000, 0, 10)) = '10.00,18.00,14.40,11.52,9.22,7.37,6.55,6.55,6.56,6.55,3.28';
SELECT (SELECT group_concat(printf('%.2f', depreciation / 100), ',') FROM tenure_depreciation('macrs', 10000, 0, 15)) = '5.00,9.50,8.55,7.70,6.93,6.23,5.90,5.90,5.91,5.90,5.91,5.90,5.91,5.90,5.91,2.95';
SELECT (SELECT group_concat(printf('%.3f', depreciation / 1000), ',') FROM tenure_depreciation('macrs', 100000, 0, 20)) = '3.750,7.219,6.677,6.177,5.713,5.285,4.888,4.522,4.462,4.461,4.462,4.461,4.462,4.461,4.462,4.461,4.462,4.461,4.462,4.461,2.231';
-- The same table through tenure_macrs_rate (IRS Publication 946, Table A-1); 0 after year R + 1.
SELECT (SELECT group_concat(printf('%.2f', tenure_macrs_rate(7, value)), ',') FROM json_each('[1,2,3,4,5,6,7,8,9]')) = '14.29,24.49,17.49,12.49,8.93,8.92,8.93,4.46,0.00';
SELECT tenure_macrs_rate(3, 2) = 44.45;
-- MACRS recovers the whole basis (closed form): the last book value is 0, the sum is the basis.
SELECT (SELECT abs(sum(depreciation) - 52000) < 1e-6 AND abs(min(book_value)) < 1e-6 FROM tenure_depreciation('macrs', 52000, 0, 5));
-- Salvage is NULL or 0 for MACRS.
SELECT (SELECT count(*) FROM tenure_depreciation('macrs', 10000, NULL, 5)) = 6;

-- Book methods (closed form, worked by hand).
SELECT (SELECT group_concat(depreciation || '/' || book_value, ',') FROM tenure_depreciation('straight_line', 12000, 2000, 5)) = '2000.0/10000.0,2000.0/8000.0,2000.0/6000.0,2000.0/4000.0,2000.0/2000.0';
SELECT (SELECT group_concat(depreciation, ',') FROM tenure_depreciation('sum_of_years_digits', 15000, 0, 5)) = '5000.0,4000.0,3000.0,2000.0,1000.0';
-- Double declining balance switching to straight line: 40% of 10000, 6000, 3600, then 2160 / 2.
SELECT (SELECT group_concat(depreciation, ',') FROM tenure_depreciation('declining_balance', 10000, 0, 5, 2, 1)) = '4000.0,2400.0,1440.0,1080.0,1080.0';
-- Without the switch, never below salvage: year 5 takes 1296 - 1000, not 40% of 1296.
SELECT (SELECT group_concat(round(depreciation, 6), ',') FROM tenure_depreciation('declining_balance', 10000, 1000, 5, 2, 0)) = '4000.0,2400.0,1440.0,864.0,296.0';
SELECT (SELECT count(*) FROM tenure_depreciation('none', 10000)) = 0;

-- The disposal year (SPEC 6): MACRS takes half of that year's deduction before its last table
-- year (year 3 of 5-year: 1920 / 2); book methods take the full year.
SELECT (SELECT group_concat(year || ':' || depreciation || '/' || book_value, ',') FROM tenure_depreciation('macrs', 10000, 0, 5, NULL, NULL, 3)) = '1:2000.0/8000.0,2:3200.0/4800.0,3:960.0/3840.0';
SELECT (SELECT depreciation FROM tenure_depreciation('macrs', 10000, 0, 5, NULL, NULL, 6) WHERE year = 6) = 576;
SELECT (SELECT depreciation FROM tenure_depreciation('straight_line', 12000, 2000, 5, NULL, NULL, 3) WHERE year = 3) = 2000;
SELECT (SELECT count(*) FROM tenure_depreciation('straight_line', 12000, 2000, 5, NULL, NULL, 3)) = 3;
-- The method as a whole depreciation object, as a case file writes it; only basis and
-- dispose_in_year beside it.
SELECT (SELECT group_concat(depreciation, ',') FROM tenure_depreciation('{"method": "macrs", "recovery_years": 5}', 10000)) = '2000.0,3200.0,1920.0,1152.0,1152.0,576.0';
SELECT (SELECT group_concat(depreciation, ',') FROM tenure_depreciation('{"method": "straight_line", "life_years": 5, "salvage": 2000}', 12000, NULL, NULL, NULL, NULL, 2)) = '2000.0,2000.0';
SELECT tenure_book_value('{"method": "sum_of_years_digits", "life_years": 5, "salvage": 0}', 15000, NULL, NULL, 2) = 6000;

-- Hidden columns: the inputs read back as given, NULL when left out; constraints on them in a
-- WHERE clause are the same as arguments.
SELECT (SELECT count(*) FROM tenure_depreciation('macrs', 10000, 0, 5) WHERE method = 'macrs' AND basis = 10000 AND salvage = 0 AND life = 5 AND rate IS NULL AND switch_to_straight_line IS NULL AND dispose_in_year IS NULL) = 6;
SELECT (SELECT count(*) FROM tenure_depreciation WHERE method = 'straight_line' AND basis = 12000 AND salvage = 2000 AND life = 5) = 5;
SELECT (SELECT group_concat(year, ',') FROM (SELECT year FROM tenure_depreciation('macrs', 10000, 0, 5) ORDER BY year DESC)) = '6,5,4,3,2,1';
SELECT (SELECT group_concat(year, ',') FROM (SELECT year FROM tenure_depreciation('macrs', 10000, 0, 5) ORDER BY year)) = '1,2,3,4,5,6';
-- Joins: arguments from another table, whichever side of the join it is written on.
CREATE TABLE fleet(asset_id TEXT, first_cost REAL, life INTEGER);
INSERT INTO fleet VALUES ('van-1', 10000, 5), ('van-2', 20000, 5), ('pump-1', 10000, 7);
SELECT (SELECT sum(d.depreciation) FROM fleet AS f, tenure_depreciation('macrs', f.first_cost, 0, f.life) AS d) = 40000;
SELECT (SELECT count(*) FROM tenure_depreciation('macrs', f.first_cost, 0, f.life) AS d JOIN fleet AS f) = 20;
SELECT (SELECT d.depreciation FROM fleet AS f JOIN tenure_depreciation('macrs', f.first_cost, 0, f.life) AS d WHERE f.asset_id = 'pump-1' AND d.year = 1) = 1429;
-- Innocuous: usable in a view when the schema is not trusted.
PRAGMA trusted_schema = OFF;
CREATE VIEW macrs_7 AS SELECT * FROM tenure_depreciation('macrs', 1000, 0, 7);
SELECT (SELECT count(*) FROM macrs_7) = 8;
PRAGMA trusted_schema = ON;

-- tenure_book_value: the end-of-year book value after full-year deductions (closed form).
SELECT tenure_book_value('straight_line', 12000, 2000, 5, 0) = 12000;
SELECT tenure_book_value('straight_line', 12000, 2000, 5, 3) = 6000;
SELECT tenure_book_value('straight_line', 12000, 2000, 5, 9) = 2000;
SELECT tenure_book_value('declining_balance', 10000, 0, 5, 2, 2, 1) = 3600;
SELECT abs(tenure_book_value('macrs', 52000, 0, 5, 2) - 52000 * 0.48) < 1e-6;
SELECT (SELECT count(*) FROM tenure_depreciation('sum_of_years_digits', 15000, 0, 5) AS d WHERE d.book_value = tenure_book_value('sum_of_years_digits', 15000, 0, 5, d.year)) = 5;

-- Bad arguments: missing, NULL, text where a number belongs, out of range, unknown method.
SELECT * FROM tenure_depreciation; -- error: tenure_depreciation: 1st argument (method) is missing
SELECT * FROM tenure_depreciation('macrs'); -- error: tenure_depreciation: 2nd argument (basis) is missing
SELECT * FROM tenure_depreciation('straight_line', 1000); -- error: tenure_depreciation: 3rd argument (salvage) is missing
SELECT * FROM tenure_depreciation('straight_line', 1000, 0); -- error: tenure_depreciation: 4th argument (life) is missing
SELECT * FROM tenure_depreciation('declining_balance', 1000, 0, 5); -- error: tenure_depreciation: 5th argument (rate) is missing
SELECT * FROM tenure_depreciation('declining_balance', 1000, 0, 5, 2); -- error: tenure_depreciation: 6th argument (switch_to_straight_line) is missing
SELECT * FROM tenure_depreciation('declining_balance', 1000, 0, 5, 2, 3); -- error: tenure_depreciation: 6th argument (switch_to_straight_line) must be 0 or 1
SELECT * FROM tenure_depreciation('declining_balance', 1000, 0, 5, 0, 1); -- error: tenure_depreciation: 5th argument (rate) must be > 0
SELECT * FROM tenure_depreciation('macrs', NULL, 0, 5); -- error: tenure_depreciation: 2nd argument (basis) must be a number
SELECT * FROM tenure_depreciation('macrs', 'lots', 0, 5); -- error: tenure_depreciation: 2nd argument (basis) must be a number
SELECT * FROM tenure_depreciation('macrs', 0, 0, 5); -- error: tenure_depreciation: 2nd argument (basis) must be > 0
SELECT * FROM tenure_depreciation('macrs', 10000, 0, 4); -- error: tenure_depreciation: 4th argument (life) must be one of 3, 5, 7, 10, 15, 20
SELECT * FROM tenure_depreciation('macrs', 10000, 500, 5); -- error: tenure_depreciation: 3rd argument (salvage) must be 0 or NULL for method macrs
SELECT * FROM tenure_depreciation('macrs', 10000, 0, 5, 2); -- error: tenure_depreciation: 5th argument (rate) is not used by method macrs
SELECT * FROM tenure_depreciation('straight_line', 10000, NULL, 5); -- error: tenure_depreciation: 3rd argument (salvage) must be a number
SELECT * FROM tenure_depreciation('straight_line', 10000, 12000, 5); -- error: tenure_depreciation: 3rd argument (salvage) must not exceed the basis
SELECT * FROM tenure_depreciation('straight_line', 10000, -1, 5); -- error: tenure_depreciation: 3rd argument (salvage) must be >= 0
SELECT * FROM tenure_depreciation('straight_line', 10000, 0, 0); -- error: tenure_depreciation: 4th argument (life) must be >= 1
SELECT * FROM tenure_depreciation('straight_line', 10000, 0, 5.5); -- error: tenure_depreciation: 4th argument (life) must be a whole number, not 5.5
SELECT * FROM tenure_depreciation('straight_line', 10000, 0, 5, NULL, NULL, 0); -- error: tenure_depreciation: 7th argument (dispose_in_year) must be >= 1
SELECT * FROM tenure_depreciation('none', 10000, 0, 5); -- error: tenure_depreciation: 4th argument (life) is not used by method none
SELECT * FROM tenure_depreciation('linear', 10000, 0, 5); -- error: tenure_depreciation: unknown method 'linear' (expected one of straight_line, declining_balance, sum_of_years_digits, macrs, macrs_ads, none, pool)
SELECT * FROM tenure_depreciation(NULL, 10000, 0, 5); -- error: tenure_depreciation: 1st argument (method) must be text
SELECT * FROM tenure_depreciation('{"method": "macrs", "recovery_years": 4}', 10000); -- error: tenure_depreciation: $.recovery_years: must be one of 3, 5, 7, 10, 15, 20
SELECT * FROM tenure_depreciation('{"method": "macrs"}', 10000); -- error: tenure_depreciation: $.recovery_years: required whole number is missing
SELECT * FROM tenure_depreciation('{"method": "macrs", "recovery_years": 5}', 10000, NULL, 5); -- error: tenure_depreciation: 4th argument (life) must not be given when the method is a depreciation object (put it in the object)
SELECT * FROM tenure_depreciation('{"method": "macrs", "recovery_years": 5}'); -- error: tenure_depreciation: 2nd argument (basis) is missing
SELECT * FROM tenure_depreciation('{"method": ', 10000); -- error: tenure_depreciation: $: invalid JSON at line 1, column 12: syntax error while parsing value - unexpected end of input; expected '[', '{', or a literal
SELECT tenure_book_value('straight_line', 10000, 0, 5, -1); -- error: tenure_book_value: 5th argument (year) must be >= 0
SELECT tenure_book_value('straight_line', 10000, 0, 5, NULL); -- error: tenure_book_value: 5th argument (year) must be a number
SELECT tenure_book_value('declining_balance', 10000, 0, 5, 2); -- error: tenure_book_value: 6th argument (rate) is missing
SELECT tenure_book_value('macrs', 10000, 0, 6, 1); -- error: tenure_book_value: 4th argument (life) must be one of 3, 5, 7, 10, 15, 20
SELECT tenure_book_value('straight_line', 10000, 0, 5, 1, 2); -- error: wrong number of arguments to function tenure_book_value()
SELECT tenure_macrs_rate(4, 1); -- error: tenure_macrs_rate: 1st argument (recovery_years) must be one of 3, 5, 7, 10, 15, 20
SELECT tenure_macrs_rate(5, 0); -- error: tenure_macrs_rate: 2nd argument (year) must be >= 1
SELECT tenure_macrs_rate(NULL, 1); -- error: tenure_macrs_rate: 1st argument (recovery_years) must be a number
SELECT * FROM tenure_depreciation('macrs', 1e307, 0, 5); -- error: tenure_depreciation: 2nd argument (basis) must be at most 1e15 in magnitude (no equipment costs more)
SELECT tenure_book_value('straight_line', 1e308, 0, 5, 1); -- error: tenure_book_value: 2nd argument (basis) must be at most 1e15 in magnitude (no equipment costs more)
SELECT tenure_book_value('straight_line', 1e15, 0, 5, 5) = 0;
-- US fields (SPEC 13) as the hidden arguments section_179, bonus, convention, quarter.
-- IRS Publication 946 Table A-5 (quarter 4), 5-year column: 5.00 38.00 22.80 13.68 10.94 9.58.
SELECT (SELECT group_concat(depreciation, ',') FROM tenure_depreciation('macrs', 10000, 0, 5, NULL, NULL, NULL, NULL, NULL, 'mid_quarter', 4)) = '500.0,3800.0,2280.0,1368.0,1094.0,958.0';
-- Section 179 of 1000, then 50% of 9000, then Table A-1 on 4500: 1000 + 4500 + 900 in year 1.
SELECT (SELECT group_concat(depreciation, ',') FROM tenure_depreciation('macrs', 10000, 0, 5, NULL, NULL, NULL, 1000, 0.5)) = '6400.0,1440.0,864.0,518.4,518.4,259.2';
-- ADS, 5 years, half-year convention (Pub 946 Table A-8 shape): 10, 20, 20, 20, 20, 10 percent.
SELECT (SELECT group_concat(depreciation, ',') FROM tenure_depreciation('macrs_ads', 10000, 0, 5)) = '1000.0,2000.0,2000.0,2000.0,2000.0,1000.0';
-- Sold in year 3 after a quarter-4 placing: (4 - 0.5) / 4 of 2280.
SELECT (SELECT depreciation FROM tenure_depreciation('macrs', 10000, 0, 5, NULL, NULL, 3, NULL, NULL, 'mid_quarter', 4) WHERE year = 3) = 1995;
SELECT * FROM tenure_depreciation('macrs', 10000, 0, 5, NULL, NULL, NULL, NULL, 1.5); -- error: tenure_depreciation: 9th argument (bonus) must be between 0 and 1
SELECT * FROM tenure_depreciation('macrs', 10000, 0, 5, NULL, NULL, NULL, 20000); -- error: tenure_depreciation: 8th argument (section_179) must not exceed the basis
SELECT * FROM tenure_depreciation('macrs', 10000, 0, 5, NULL, NULL, NULL, -1); -- error: tenure_depreciation: 8th argument (section_179) must be >= 0
SELECT * FROM tenure_depreciation('straight_line', 10000, 0, 5, NULL, NULL, NULL, 5); -- error: tenure_depreciation: 8th argument (section_179) is not used by method straight_line
SELECT * FROM tenure_depreciation('macrs', 10000, 0, 5, NULL, NULL, NULL, NULL, NULL, 'mid_quarter', 5); -- error: tenure_depreciation: 11th argument (quarter) must be <= 4
SELECT * FROM tenure_depreciation('macrs', 10000, 0, 5, NULL, NULL, NULL, NULL, NULL, 'mid_quarter'); -- error: tenure_depreciation: 11th argument (quarter) is required with the mid_quarter convention
SELECT * FROM tenure_depreciation('macrs', 10000, 0, 5, NULL, NULL, NULL, NULL, NULL, NULL, 2); -- error: tenure_depreciation: 11th argument (quarter) applies only to the mid_quarter convention
SELECT * FROM tenure_depreciation('macrs', 10000, 0, 5, NULL, NULL, NULL, NULL, NULL, 'mid_month'); -- error: tenure_depreciation: 10th argument (convention) unknown convention 'mid_month' (expected half_year or mid_quarter)
SELECT * FROM tenure_depreciation('macrs_ads', 10000, 0, 5, NULL, NULL, NULL, NULL, NULL, 'mid_quarter', 1); -- error: tenure_depreciation: 10th argument (convention) is not used by method macrs_ads
SELECT * FROM tenure_depreciation('{"method": "straight_line", "life_years": 5, "salvage": 0, "bonus": 0.5}', 10000); -- error: tenure_depreciation: 9th argument (bonus) applies only to the US methods macrs and macrs_ads, not straight_line
