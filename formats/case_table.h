// A case result as text tables a person can audit line by line (`tenure case --format table`):
// the rates used; the challenger's EUAC and marginal cost by years kept, before and after tax,
// with its economic service life marked; its after-tax cash flows; the same for the defender
// with its opportunity cost; the replacement timing; the decision and its reason; the study
// period; and the caution of SPEC 10 at the end.
//
//   std::string text = case_result_to_table(c, replacement::analyse(c));
#pragma once

#include <string>

#include "replacement/case_analysis.h"
#include "tax/rates.h"

namespace tenure::formats {

// `result` is replacement::analyse(input).
std::string case_result_to_table(const replacement::Case& input,
                                 const replacement::CaseResult& result);

}  // namespace tenure::formats
