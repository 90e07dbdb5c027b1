// Every SQL function and the table-valued function the extension registers (extension.cpp holds
// the registration table). Each is documented, with runnable SQL, at the top of its file:
//
//   factor_functions.cpp      tenure_version(), tenure_factor(kind, i, n),
//                             tenure_geometric_factor(i, g, n)
//   cash_flow_functions.cpp   tenure_present_worth(i, cash_flows), tenure_euac(i, cash_flows)
//   book_value_functions.cpp  tenure_book_value(method, basis, salvage, life, year[, rate,
//                             switch_to_straight_line]), tenure_macrs_rate(recovery_years, year)
//   depreciation_table.cpp    tenure_depreciation(method, basis, salvage, life[, rate,
//                             switch_to_straight_line, dispose_in_year])  (table-valued)
//   case_function.cpp         tenure_case(case_json)
//   review_function.cpp       tenure_review(policy_json[, as_of[, scenario]])
//   repair_check_function.cpp tenure_repair_check(asset_id, estimate)
#pragma once

#include <sqlite3.h>

namespace tenure::plugin {

void version_function(sqlite3_context* context, int argc, sqlite3_value** argv);
void factor_function(sqlite3_context* context, int argc, sqlite3_value** argv);
void geometric_factor_function(sqlite3_context* context, int argc, sqlite3_value** argv);
void present_worth_function(sqlite3_context* context, int argc, sqlite3_value** argv);
void euac_function(sqlite3_context* context, int argc, sqlite3_value** argv);
void book_value_function(sqlite3_context* context, int argc, sqlite3_value** argv);
void macrs_rate_function(sqlite3_context* context, int argc, sqlite3_value** argv);
void case_function(sqlite3_context* context, int argc, sqlite3_value** argv);
void review_function(sqlite3_context* context, int argc, sqlite3_value** argv);
void repair_check_function(sqlite3_context* context, int argc, sqlite3_value** argv);

// The eponymous-only virtual table module behind tenure_depreciation.
const sqlite3_module& depreciation_module();

}  // namespace tenure::plugin
