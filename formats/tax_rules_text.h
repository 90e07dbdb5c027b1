// The tax rules a run used, in one line for people (SPEC 13 cautions): `explain` and the HTML
// report print it for each depreciation object they weigh, so a reader sees which method,
// convention, section 179 amount, special allowance or pool rate stood behind an after-tax
// figure, and that those rules are the user's to confirm.
//
//   tax_rules_sentence(MacrsSpec{7, MacrsConvention::mid_quarter, 4, {20000.0, 0.4}});
//   // "MACRS GDS 7-year, mid-quarter convention (placed in service in quarter 4), section 179
//   //  20,000.00, special allowance 40.00% (IRS Publication 946 order)"
//   kTaxRulesCaution;   // "Tax rules change by year and jurisdiction: ..."
#pragma once

#include <string>
#include <string_view>

#include "depreciation/method.h"

namespace tenure::formats {

// The method and its tax parameters in words.
std::string tax_rules_sentence(const depreciation::Spec& spec);

// Said beside every tax_rules_sentence.
inline constexpr std::string_view kTaxRulesCaution =
    "tax rules change by year and jurisdiction; these are the rules as written in the policy or "
    "case, not checked against any law: consult a qualified professional";

}  // namespace tenure::formats
