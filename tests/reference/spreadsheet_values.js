// Prints, as JSON on standard output, what an independent library of spreadsheet functions
// (@formulajs/formulajs, pinned in package.json) computes for SLN, SYD, DDB, DB and PMT on a
// fixed grid of inputs. tenure's reference tests (tests/depreciation/spreadsheet_reference_test.cpp,
// tests/interest/spreadsheet_pmt_test.cpp) run it and compare the engine with every value.
//
//   npm ci --prefix tests/reference && node tests/reference/spreadsheet_values.js
//   // {"library":"@formulajs/formulajs","version":"4.6.1","depreciation":[...],"pmt":[...]}
//
// VDB is deliberately absent: formulajs's VDB is known to be wrong, so declining balance with the
// switch to straight line is checked against Microsoft's documented VDB examples instead
// (tests/depreciation/vdb_examples_test.cpp).
'use strict';

const fs = require('fs');
const path = require('path');
const formulajs = require('@formulajs/formulajs');

const library = '@formulajs/formulajs';
const installed = JSON.parse(
  fs.readFileSync(path.join(__dirname, 'node_modules', library, 'package.json'), 'utf8'));

// Invented inputs: cost, salvage, life in whole periods. They include a life of 1, a salvage of 0
// and a salvage close to the cost. DB's rate, 1 - (salvage / cost)^(1 / life) rounded to three
// decimals, must not round to 0 here (DB would deduct nothing, a case tenure has no method for).
const assets = [
  [2400, 300, 10],
  [10000, 1000, 5],
  [52000, 4000, 7],
  [1000000, 100000, 20],
  [30000, 0, 4],
  [5000, 500, 1],
  [1500, 1400, 3],
  [87500, 12345.67, 12],
];

// Invented loans: rate per period (negative, zero and ordinary), number of periods, present value.
// No rate is tiny: the library's (1 + rate)^nper - 1 loses digits there (tenure's own limits at
// i -> 0 are checked in tests/interest/factors_test.cpp).
const loans = [
  [0.10, 10, 1000],
  [0.05, 20, 250000],
  [0.08, 5, 60000],
  [0.0075, 360, 200000],
  [0.001, 12, 5000],
  [0, 12, 1200],
  [-0.02, 8, 10000],
  [0.25, 3, 1],
  [1.0, 1, 500],
];

function periods(life, each) {
  const values = [];
  for (let period = 1; period <= life; period++) values.push(each(period));
  return values;
}

function checked(name, value) {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new Error(`${name} returned ${String(value)}`);
  }
  return value;
}

const depreciation = assets.map(([cost, salvage, life]) => ({
  cost,
  salvage,
  life,
  sln: checked('SLN', formulajs.SLN(cost, salvage, life)),
  syd: periods(life, (p) => checked('SYD', formulajs.SYD(cost, salvage, life, p))),
  ddb_2: periods(life, (p) => checked('DDB', formulajs.DDB(cost, salvage, life, p, 2))),
  ddb_1_5: periods(life, (p) => checked('DDB', formulajs.DDB(cost, salvage, life, p, 1.5))),
  db: periods(life, (p) => checked('DB', formulajs.DB(cost, salvage, life, p, 12))),
}));

const pmt = loans.map(([rate, nper, pv]) => ({
  rate,
  nper,
  pv,
  pmt: checked('PMT', formulajs.PMT(rate, nper, pv)),
}));

process.stdout.write(JSON.stringify({ library, version: installed.version, depreciation, pmt }));
process.stdout.write('\n');
