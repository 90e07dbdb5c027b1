// A depreciation method is a strategy: given a basis it yields the full-year deductions of years
// 1..n and says what fraction of a year's deduction is taken in the year of disposal. Schedule
// (schedule.h) applies one method to one basis and answers book-value questions.
//
// Adding a method is one new file: a class deriving from Method, plus its line in make_method
// (factory.cpp) and in the case-file reader's method table (formats/depreciation_json.cpp).
//
//   auto sl = tenure::depreciation::make_method(tenure::depreciation::StraightLineSpec{5, 1000});
//   sl->deductions(11000);   // {2000, 2000, 2000, 2000, 2000}
#pragma once

#include <cstddef>
#include <memory>
#include <optional>
#include <string_view>
#include <variant>
#include <vector>

#include "core/types.h"

namespace tenure::depreciation {

class Method {
 public:
  virtual ~Method() = default;
  // The method's name as written in case files: "straight_line", "macrs", ...
  virtual std::string_view name() const = 0;
  // Full-year deductions for years 1..n on `basis`; years after the last one deduct nothing.
  virtual std::vector<Money> deductions(Money basis) const = 0;
  // Fraction of year `year`'s full deduction taken when the asset is sold at the end of that
  // year. Book methods take the full year (1.0); MACRS takes half before its last table year.
  virtual double disposal_year_fraction(Years year) const {
    (void)year;
    return 1.0;
  }
  // For each year k = 1..n of deductions(basis): the deduction taken in year k when the asset is
  // sold at its end. The rule of disposal_year_fraction, unless a method takes part of a year's
  // deduction whatever happens (first-year expensing, us_allowances.h).
  virtual std::vector<Money> deductions_if_sold(Money basis) const {
    std::vector<Money> result = deductions(basis);
    for (std::size_t k = 0; k < result.size(); ++k) {
      result[k] *= disposal_year_fraction(static_cast<Years>(k + 1));
    }
    return result;
  }
  // The book value its deductions never go below: a book method's salvage; 0 for MACRS and none.
  virtual Money salvage() const { return 0; }
  // The same method for a unit whose price is `factor` (> 0) times as large: every amount the
  // method holds (a salvage value) times `factor`, its lives and rates as they are. So the
  // deductions of scaled(f) on f x basis are f times those of this method on basis; the
  // break-even price (replacement/break_even.h) rests on it.
  virtual std::shared_ptr<const Method> scaled(double factor) const = 0;
  // A pooled method's write-down rate d (pool.h); nullopt for every other method. A pool's
  // deductions never end: Schedule carries its balance on at d past the years it lists, and
  // tax::sale_at applies the pool's sale rule (tax/pool_disposal.h) instead of recapture.
  virtual std::optional<Rate> pool_rate() const { return std::nullopt; }
};

// Parameters of each method, as in a case file's depreciation object (SPEC 5). Each method's
// constructor validates them and throws InputError naming the field ("life_years", ...).
struct StraightLineSpec {
  Years life_years;
  Money salvage;
};
struct DecliningBalanceSpec {
  Years life_years;
  double rate;  // multiple of the straight-line rate: 2.0 is double declining balance
  Money salvage;
  bool switch_to_straight_line;
};
struct SumOfYearsDigitsSpec {
  Years life_years;
  Money salvage;
};
// US first-year expensing on a US method (SPEC 13, IRS Publication 946 order): the section 179
// amount first, then the special depreciation allowance `bonus` (0..1) of the rest, both in
// year 1; the method depreciates what remains. Absent fields expense nothing.
struct UsAllowances {
  std::optional<Money> section_179 = std::nullopt;  // 0 <= amount <= basis
  std::optional<Rate> bonus = std::nullopt;         // 0 <= fraction <= 1
  bool any() const { return section_179.has_value() || bonus.has_value(); }
};
enum class MacrsConvention { half_year, mid_quarter };
struct MacrsSpec {
  Years recovery_years;  // 3, 5, 7, 10, 15 or 20 (GDS)
  MacrsConvention convention = MacrsConvention::half_year;
  std::optional<int> quarter = std::nullopt;  // 1..4, quarter placed in service: mid_quarter
  UsAllowances allowances = {};
};
struct MacrsAdsSpec {
  Years recovery_years;  // L >= 1: straight line over L years, half-year convention
  UsAllowances allowances = {};
};
struct NoDepreciationSpec {};
struct PoolSpec {
  Rate rate;            // d: the share of the pool's balance deducted each year, 0 < d <= 1
  bool half_year_rule;  // year 1 deducts d on half the addition
  std::optional<Rate> first_year_allowance;  // f, 0 < f <= 1: f of the addition in year 1
};

using Spec = std::variant<StraightLineSpec, DecliningBalanceSpec, SumOfYearsDigitsSpec, MacrsSpec,
                          NoDepreciationSpec, PoolSpec, MacrsAdsSpec>;

// The section 179 amount of a US spec (macrs, macrs_ads), nullopt when it has none.
std::optional<Money> section_179_of(const Spec& spec);

// Builds the method a spec describes, a US method's allowances around it (us_allowances.h);
// throws InputError for out-of-range parameters.
std::shared_ptr<const Method> make_method(const Spec& spec);

}  // namespace tenure::depreciation
