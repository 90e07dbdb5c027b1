// An invented one-year case, analysed, for the tests of one asset's tables and JSON objects
// (analysis_tables_test.cpp, analysis_json_test.cpp). Worked by hand at 10% MARR and 25% tax,
// so 7.5% after tax: the challenger costs 1000, runs a year for 100 and sells for 800; the
// defender, 3 years old on a basis of 500 and not depreciated, is worth 200 now, runs a year
// for 150 and sells for 100.
//
//   const replacement::CaseResult result = testing::one_year_case();
#pragma once

#include "formats/case_json.h"

namespace tenure::formats::testing {

inline replacement::CaseResult one_year_case() {
  return replacement::analyse(read_case(R"({
    "marr": 0.10, "income_tax_rate": 0.25,
    "challenger": {"first_cost": 1000, "operating_costs": [100], "market_values": [800],
                   "depreciation": {"method": "straight_line", "life_years": 1, "salvage": 0}},
    "defender": {"first_cost": 500, "age_years": 3, "market_value_now": 200,
                 "operating_costs": [150], "market_values": [100],
                 "depreciation": {"method": "none"}}})"));
}

}  // namespace tenure::formats::testing
