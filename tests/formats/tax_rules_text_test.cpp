// The one-line account of the tax rules a run used (SPEC 13 cautions), for each kind of
// depreciation object; invented parameters.
#include "formats/tax_rules_text.h"

#include <gtest/gtest.h>

namespace tenure::formats {
namespace {

using namespace tenure::depreciation;

TEST(TaxRulesText, UsMethodsSayConventionSection179AndAllowance) {
  EXPECT_EQ(tax_rules_sentence(MacrsSpec{7, MacrsConvention::mid_quarter, 4, {20000.0, 0.4}}),
            "MACRS GDS 7-year, mid-quarter convention (placed in service in quarter 4), section "
            "179 20,000.00, special allowance 40.00% (IRS Publication 946 order)");
  EXPECT_EQ(tax_rules_sentence(MacrsSpec{5}),
            "MACRS GDS 5-year, half-year convention, no section 179 amount, no special allowance");
  EXPECT_EQ(tax_rules_sentence(MacrsAdsSpec{9, {std::nullopt, 1.0}}),
            "MACRS ADS 9-year straight line, half-year convention, section 179 0.00, special "
            "allowance 100.00% (IRS Publication 946 order)");
}

TEST(TaxRulesText, PoolsAndBookMethods) {
  EXPECT_EQ(tax_rules_sentence(PoolSpec{0.30, true, std::nullopt}),
            "a pool written down at 30.00% a year, half-year rule; a sale takes its proceeds off "
            "the pool");
  EXPECT_EQ(tax_rules_sentence(PoolSpec{0.18, false, 0.4}),
            "a pool written down at 18.00% a year, first-year allowance 40.00%; a sale takes its "
            "proceeds off the pool");
  EXPECT_EQ(tax_rules_sentence(StraightLineSpec{8, 0}),
            "straight line over 8 years to a salvage of 0.00 (a book method)");
  EXPECT_EQ(tax_rules_sentence(NoDepreciationSpec{}), "no depreciation");
}

TEST(TaxRulesText, CautionDefersToAProfessional) {
  EXPECT_NE(std::string(kTaxRulesCaution).find("change by year and jurisdiction"),
            std::string::npos);
  EXPECT_NE(std::string(kTaxRulesCaution).find("qualified professional"), std::string::npos);
}

}  // namespace
}  // namespace tenure::formats
