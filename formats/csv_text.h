// CSV text as RFC 4180 (section 2) defines it, for outputs that spreadsheets and scripts read:
// fields separated by commas, records ended by CRLF, a field that holds a comma, a double quote,
// CR or LF enclosed in double quotes with each double quote inside doubled.
//
//   csv_record({"PMP-00031", "review", "says \"worn\", twice"});
//   // PMP-00031,review,"says ""worn"", twice"\r\n
#pragma once

#include <string>
#include <string_view>
#include <vector>

namespace tenure::formats {

// One field, quoted only when it must be (rules 6 and 7).
std::string csv_field(std::string_view text);
// The fields joined by commas and ended by CRLF (rules 1 and 4); every record of a file must
// have as many fields as its header (rule 4).
std::string csv_record(const std::vector<std::string>& fields);

}  // namespace tenure::formats
