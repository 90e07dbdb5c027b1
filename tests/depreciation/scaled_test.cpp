// depreciation::Method::scaled: the same method for a unit `f` times dearer deducts `f` times as
// much on `f` times the basis, for every method (the identity the break-even price of
// replacement/break_even.h rests on); invented parameters.
#include <gtest/gtest.h>

#include "depreciation/method.h"

namespace tenure::depreciation {
namespace {

TEST(Scaled, DeductsFTimesAsMuchOnFTimesTheBasis) {
  const Spec specs[] = {StraightLineSpec{8, 2000}, DecliningBalanceSpec{6, 2.0, 1500, true},
                        DecliningBalanceSpec{6, 1.5, 3000, false}, SumOfYearsDigitsSpec{5, 1000},
                        MacrsSpec{7}, NoDepreciationSpec{},
                        MacrsSpec{5, MacrsConvention::mid_quarter, 3, {}}, MacrsAdsSpec{9},
                        // The section 179 amount scales with the basis (us_allowances.h rule 5).
                        MacrsSpec{7, MacrsConvention::half_year, std::nullopt, {5000.0, 0.6}},
                        MacrsAdsSpec{5, {8000.0, std::nullopt}}};
  for (const Spec& spec : specs) {
    const auto method = make_method(spec);
    SCOPED_TRACE(std::string(method->name()));
    for (double f : {0.25, 1.0, 3.5}) {
      const auto scaled = method->scaled(f);
      EXPECT_EQ(scaled->name(), method->name());
      const auto base = method->deductions(20000);
      const auto bigger = scaled->deductions(20000 * f);
      ASSERT_EQ(bigger.size(), base.size());
      for (std::size_t k = 0; k < base.size(); ++k) {
        EXPECT_NEAR(bigger[k], f * base[k], 1e-9 * 20000 * f);
        EXPECT_EQ(scaled->disposal_year_fraction(static_cast<Years>(k + 1)),
                  method->disposal_year_fraction(static_cast<Years>(k + 1)));
      }
    }
  }
}

}  // namespace
}  // namespace tenure::depreciation
