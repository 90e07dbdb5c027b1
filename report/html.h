// Text into HTML and SVG: every string that comes from the database (asset ids, classes,
// reasons, rejected-row references) goes through escape() before it is written into the page,
// so an asset id such as "<script>" shows as text and never runs.
//
//   out += "<td>" + escape(asset.asset_id) + "</td>";
//   escape("a<b & \"c\"");   // "a&lt;b &amp; &quot;c&quot;"
#pragma once

#include <string>
#include <string_view>

namespace tenure::report {

// Escapes & < > " ' for element content and quoted attribute values alike.
std::string escape(std::string_view text);

// A number with thousands separators and `decimals` decimals: 12345.6 -> "12,346" (0 decimals).
std::string grouped(double value, int decimals);

}  // namespace tenure::report
