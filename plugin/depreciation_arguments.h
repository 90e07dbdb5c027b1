// The depreciation method of a SQL call, shared by tenure_depreciation and tenure_book_value: the
// arguments method, basis, salvage, life, rate, switch_to_straight_line (and dispose_in_year)
// become a depreciation schedule through formats/flat_depreciation.h, the reader `tenure
// schedule` uses too, so SQL accepts what a case file and the command line accept.
//
//   method                 straight_line, declining_balance, sum_of_years_digits, macrs,
//                          macrs_ads, none (pool: as a depreciation object, below)
//   basis                  > 0, always required
//   salvage                >= 0 and <= basis; required by the book methods; for macrs and none
//                          it must be 0 or NULL (MACRS recovers the whole basis)
//   life                   whole years >= 1; for macrs the recovery period (3, 5, 7, 10, 15, 20),
//                          for macrs_ads the ADS recovery period; must be NULL for none
//   rate                   declining_balance only: multiple of the straight-line rate (2 = double)
//   switch_to_straight_line  declining_balance only: 1 to switch when straight line deducts
//                          more, 0 never to switch
//   dispose_in_year        tenure_depreciation only: sold at the end of this year (whole, >= 1)
//   section_179, bonus     tenure_depreciation only; macrs and macrs_ads, optional (SPEC 13):
//                          the 179 amount (0..basis) and the special allowance (0..1) in year 1
//   convention, quarter    tenure_depreciation only; macrs, optional: 'half_year' (NULL) or
//                          'mid_quarter' with the quarter placed in service (1..4)
// An argument a method does not use must be NULL or left out ("... is not used by method macrs").
// The method may instead be a whole depreciation object as JSON text, as a case file writes it
// ('{"method": "macrs", "recovery_years": 5}'), for every key a case file accepts; then only
// basis (and dispose_in_year) may stand beside it, and its errors name JSON paths
// ("tenure_depreciation: $.recovery_years: must be one of 3, 5, 7, 10, 15, 20").
//
//   const Signature s{"tenure_book_value", {"method", "basis", ...}, kDepreciationAliases};
//   depreciation::Schedule schedule = schedule_from(Arguments(s, argc, argv)).schedule;
#pragma once

#include <string_view>
#include <utility>
#include <vector>

#include "formats/flat_depreciation.h"
#include "plugin/sql_arguments.h"

namespace tenure::plugin {

// Flat parameter names and the SQL arguments they are about.
inline const std::vector<std::pair<std::string_view, std::string_view>> kDepreciationAliases = {
    {"disposal_year", "dispose_in_year"}};

// The schedule the arguments describe, with its disposal year when the function has a
// dispose_in_year argument; throws InputError naming the argument and the rule.
formats::FlatSchedule schedule_from(const Arguments& args);

}  // namespace tenure::plugin
