// Schedule (see schedule.h). Everything is computed once in the constructor, so each query is a
// lookup.
#include "depreciation/schedule.h"

#include <algorithm>
#include <cmath>

#include "core/checks.h"
#include "core/errors.h"

namespace tenure::depreciation {

Schedule::Schedule(const Method& method, Money basis)
    : basis_(basis), pool_rate_(method.pool_rate()) {
  require_positive(basis_, "basis");
  deductions_ = method.deductions(basis_);
  sold_deductions_ = method.deductions_if_sold(basis_);
  book_values_.reserve(deductions_.size() + 1);
  book_values_.push_back(basis_);
  // Sums of rounded deductions can end a few ulps below the salvage (or below 0 for MACRS): the
  // year that would go below takes only what is left, so a book value is never below it.
  floor_ = method.salvage();
  const Money floor = floor_;
  Money deducted = 0;
  for (std::size_t k = 0; k < deductions_.size(); ++k) {
    deducted += deductions_[k];
    Money book_value = basis_ - deducted;
    if (book_value < floor) {
      deductions_[k] -= floor - book_value;
      deducted = basis_ - floor;
      book_value = floor;
    }
    book_values_.push_back(book_value);
    sold_deductions_[k] = std::min(sold_deductions_[k], deductions_[k]);
  }
}

Money Schedule::deduction(Years year) const {
  if (year < 1) return 0;
  if (year > years()) return pool_rate_ ? *pool_rate_ * book_value(year - 1) : 0;
  return deductions_[static_cast<std::size_t>(year - 1)];
}

Money Schedule::book_value(Years year) const {
  if (year < 0) throw InputError("year", "must be >= 0");
  if (year > years() && pool_rate_) {
    return book_values_.back() * std::pow(1 - *pool_rate_, year - years());
  }
  return book_values_[static_cast<std::size_t>(std::min(year, years()))];
}

Money Schedule::deduction_if_sold(Years year) const {
  if (year < 1) return 0;
  if (year > years()) return deduction(year);  // nothing, or a pool's full year
  return sold_deductions_[static_cast<std::size_t>(year - 1)];
}

Money Schedule::book_value_if_sold(Years year) const {
  if (year < 0) throw InputError("year", "must be >= 0");
  if (year == 0) return basis_;
  const auto index = static_cast<std::size_t>(year - 1);
  if (year > years() || sold_deductions_[index] == deductions_[index]) {
    return book_value(year);  // a full year's deduction: the same as kept
  }
  return std::max(floor_, book_value(year - 1) - deduction_if_sold(year));
}

std::vector<ScheduleRow> Schedule::rows(std::optional<Years> disposal_year) const {
  if (disposal_year && *disposal_year < 1) throw InputError("disposal_year", "must be >= 1");
  const Years last = disposal_year.value_or(years());
  std::vector<ScheduleRow> out;
  out.reserve(static_cast<std::size_t>(last));
  for (Years year = 1; year <= last; ++year) {
    if (year == disposal_year) {
      out.push_back({year, deduction_if_sold(year), book_value_if_sold(year)});
    } else {
      out.push_back({year, deduction(year), book_value(year)});
    }
  }
  return out;
}

}  // namespace tenure::depreciation
