// Section 179 and the special depreciation allowance around a US method (see us_allowances.h).
#include "depreciation/us_allowances.h"

#include <utility>

#include "core/checks.h"
#include "core/errors.h"

namespace tenure::depreciation {
namespace {

// Year 1 of `deductions` gains `amount`; a method that lists no year still deducts it in year 1.
std::vector<Money> with_year_one(std::vector<Money> deductions, Money amount) {
  if (deductions.empty()) deductions.push_back(0);
  deductions.front() += amount;
  return deductions;
}

}  // namespace

UsAllowancesFirst::UsAllowancesFirst(std::shared_ptr<const Method> method, UsAllowances allowances)
    : method_(std::move(method)),
      section_179_(allowances.section_179.value_or(0)),
      bonus_(allowances.bonus.value_or(0)) {
  require_finite(section_179_, "section_179");
  require_non_negative(section_179_, "section_179");
  require_finite(bonus_, "bonus");
  if (bonus_ < 0 || bonus_ > 1) throw InputError("bonus", "must be between 0 and 1");
}

Money UsAllowancesFirst::expensed(Money basis) const {
  if (section_179_ > basis) throw InputError("section_179", "must not exceed the basis");
  return section_179_ + bonus_ * (basis - section_179_);
}

std::vector<Money> UsAllowancesFirst::deductions(Money basis) const {
  const Money first = expensed(basis);
  return with_year_one(method_->deductions(basis - first), first);
}

std::vector<Money> UsAllowancesFirst::deductions_if_sold(Money basis) const {
  const Money first = expensed(basis);
  return with_year_one(method_->deductions_if_sold(basis - first), first);
}

std::shared_ptr<const Method> UsAllowancesFirst::scaled(double factor) const {
  return std::make_shared<UsAllowancesFirst>(method_->scaled(factor),
                                             UsAllowances{section_179_ * factor, bonus_});
}

}  // namespace tenure::depreciation
