// tenure_book_value(method, basis, salvage, life, year[, rate, switch_to_straight_line]) and
// tenure_macrs_rate(recovery_years, year): one cell of a depreciation schedule, for a report that
// needs the book value of each asset at its age without joining a whole schedule.
//
// tenure_book_value is the book value at the end of `year` after that year's full deduction
// (year 0 is the basis; after the last year of the schedule it stays where the schedule ends).
// Its method arguments are those of tenure_depreciation (depreciation_arguments.h); rate and
// switch_to_straight_line are given for declining_balance only.
// tenure_macrs_rate is the IRS Publication 946 Table A-1 percentage (GDS, half-year convention)
// of `year` for a recovery period of 3, 5, 7, 10, 15 or 20 years; 0 after the table's last
// year, R + 1.
//
// Usage:
//   SELECT tenure_book_value('straight_line', 12000, 2000, 5, 3);           -- 6000.0
//   SELECT tenure_book_value('declining_balance', 10000, 0, 5, 2, 2, 1);    -- 3600.0
//   SELECT round(tenure_book_value('macrs', 52000, 0, 5, 2), 2);           -- 24960.0
//   SELECT tenure_macrs_rate(7, 1), tenure_macrs_rate(7, 8);                -- 14.29|4.46
//   -- Each asset's book value at its completed age (a table asset(first_cost, age)):
//   SELECT asset_id, tenure_book_value('macrs', first_cost, 0, 7, age) FROM asset;
//
// Errors name the argument and the rule, e.g.
//   tenure_book_value: 5th argument (year) must be >= 0
//   tenure_book_value: 6th argument (rate) is missing      (declining_balance with 5 arguments)
//   tenure_macrs_rate: 1st argument (recovery_years) must be one of 3, 5, 7, 10, 15, 20
//
// Both are deterministic and innocuous.
#include "depreciation/macrs.h"
#include "formats/json_path.h"
#include "plugin/depreciation_arguments.h"
#include "plugin/functions.h"

namespace tenure::plugin {
namespace {

const Signature kBookValue{
    "tenure_book_value",
    {"method", "basis", "salvage", "life", "year", "rate", "switch_to_straight_line"},
    kDepreciationAliases};
const Signature kMacrsRate{"tenure_macrs_rate", {"recovery_years", "year"}};

}  // namespace

void book_value_function(sqlite3_context* context, int argc, sqlite3_value** argv) {
  guarded(context, kBookValue, [&] {
    const Arguments args(kBookValue, argc, argv);
    const depreciation::Schedule schedule = schedule_from(args).schedule;
    const Years year = formats::whole_years(args.number("year"), "year", 0);
    sqlite3_result_double(context, schedule.book_value(year));
  });
}

void macrs_rate_function(sqlite3_context* context, int argc, sqlite3_value** argv) {
  guarded(context, kMacrsRate, [&] {
    const Arguments args(kMacrsRate, argc, argv);
    const Years recovery =
        formats::whole_years(args.number("recovery_years"), "recovery_years", 1);
    const std::vector<double> table = depreciation::macrs_percentages(recovery);
    const Years year = formats::whole_years(args.number("year"), "year", 1);
    const auto k = static_cast<std::size_t>(year);
    sqlite3_result_double(context, k <= table.size() ? table[k - 1] : 0.0);
  });
}

}  // namespace tenure::plugin
