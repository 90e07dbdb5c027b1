// The depreciation words of explain (explain/text_sections.h) come from the depreciation
// object written back (formats/depreciation_json.h), so a pool reads as its case file says it:
// the method, then each field in the object's key order. Expected words written by hand.
#include <gtest/gtest.h>

#include <optional>

#include "explain/text_sections.h"

namespace tenure::explain::text {
namespace {

TEST(DepreciationWords, APoolReadsAsItsObject) {
  EXPECT_EQ(depreciation_words(depreciation::PoolSpec{0.30, true, std::nullopt}),
            "pool, half_year_rule true, rate 0.3");
  EXPECT_EQ(depreciation_words(depreciation::PoolSpec{0.18, false, 0.4}),
            "pool, first_year_allowance 0.4, half_year_rule false, rate 0.18");
  EXPECT_EQ(depreciation_words(depreciation::MacrsSpec{7}), "macrs, recovery_years 7");
}

}  // namespace
}  // namespace tenure::explain::text
