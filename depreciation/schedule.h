// One depreciation method applied to one basis: deductions, book values and the disposal-year
// rule, year by year. Years are 1-based; year 0's book value is the basis.
//
//   Schedule s(*make_method(MacrsSpec{5}), 10000);
//   s.deduction(2);             // 3200 (32.00% of basis, Pub 946 Table A-1)
//   s.book_value(2);            // 4800
//   s.deduction_if_sold(3);     // 960: half of year 3's 1920, MACRS disposal-year rule
//   s.book_value_if_sold(3);    // 3840
//   s.rows(3);                  // {1, 2000, 8000}, {2, 3200, 4800}, {3, 960, 3840}
//
// A pool (Method::pool_rate, pool.h) never stops deducting: past the years its method lists,
// its balance goes on falling by the pool's rate d, book_value(y) = book_value(y - 1) x (1 - d)
// and deduction(y) = d x book_value(y - 1), so any year has its deduction and book value.
#pragma once

#include <optional>
#include <vector>

#include "core/types.h"
#include "depreciation/method.h"

namespace tenure::depreciation {

// One year of a schedule as it is listed: the year's deduction and the book value at its end.
struct ScheduleRow {
  Years year;
  Money depreciation;
  Money book_value;
};

class Schedule {
 public:
  Schedule(const Method& method, Money basis);

  Money basis() const { return basis_; }
  // Years the method lists (the schedule's length); later years deduct nothing, except in a pool.
  Years years() const { return static_cast<Years>(deductions_.size()); }
  // The pool's write-down rate when the method is a pool (Method::pool_rate), else nullopt:
  // tax::sale_at reads it to apply the pool's sale rule.
  std::optional<Rate> pool_rate() const { return pool_rate_; }
  // Full-year deduction of `year` (0 before year 1, and after years() unless a pool).
  Money deduction(Years year) const;
  // Book value at the end of `year` after full-year deductions; book_value(0) is the basis.
  Money book_value(Years year) const;
  // Deduction taken in `year` when the asset is sold at its end (the disposal-year rule).
  Money deduction_if_sold(Years year) const;
  // Book value at a sale at the end of `year`: book_value(year - 1) - deduction_if_sold(year).
  Money book_value_if_sold(Years year) const;
  // The schedule year by year. Without a disposal year: years 1..years(), full-year deductions.
  // With one (>= 1, else InputError("disposal_year", ...)): years 1..disposal_year, which may
  // run past years() (with nothing more to deduct, or a pool's tail), and the disposal year takes
  // deduction_if_sold and book_value_if_sold (the disposal-year rule).
  std::vector<ScheduleRow> rows(std::optional<Years> disposal_year = std::nullopt) const;

 private:
  Money basis_;
  std::vector<Money> deductions_;
  std::vector<Money> sold_deductions_;      // per schedule year: deduction_if_sold
  std::vector<Money> book_values_;          // index = year, 0..years()
  Money floor_ = 0;                         // the method's salvage: no book value is below it
  std::optional<Rate> pool_rate_;           // a pool's rate: its tail past years()
};

}  // namespace tenure::depreciation
