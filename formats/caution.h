// The caution every human-facing output ends with (SPEC 10): the case and schedule tables,
// `explain`, the HTML report and the README all print this one text.
//
//   out << kCaution << '\n';
#pragma once

#include <string_view>

namespace tenure::formats {

inline constexpr std::string_view kCaution =
    "Caution: this is decision support, not tax, accounting or legal advice. Depreciation and tax\n"
    "rules vary by jurisdiction and by year: confirm methods, rates and results with a qualified\n"
    "professional and your local codes before acting on them. An economic verdict never overrides\n"
    "a safety inspection, a manufacturer's limit or a regulator's retirement rule.";

}  // namespace tenure::formats
