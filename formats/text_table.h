// Aligned plain-text tables and number formats for output a person reads and audits.
//
//   TextTable t({"year", "depreciation", "book value"});
//   t.add_row({"1", money(2000), money(8000)});
//   out << t.render();
//   //   year   depreciation   book value
//   //      1       2,000.00     8,000.00
#pragma once

#include <string>
#include <vector>

#include "core/types.h"

namespace tenure::formats {

// Two decimals with thousands separators: 12345.678 -> "12,345.68"; -0.001 -> "0.00".
std::string money(Money amount);
// A rate as a percentage with the decimals it needs, at least two: 0.075 -> "7.50%",
// 0.07125 -> "7.125%".
std::string percent(Rate rate);
// "1 year", "3 years".
std::string years(Years count);

// Columns are right-aligned so numbers line up, except the first `label_columns`, which are
// left-aligned text. Lines are indented by two spaces, columns separated by three. Every row
// must have as many cells as there are headers.
class TextTable {
 public:
  explicit TextTable(std::vector<std::string> headers, std::size_t label_columns = 0);
  void add_row(std::vector<std::string> cells);
  // The header line, then one line per row, each ending in '\n'.
  std::string render() const;

 private:
  std::vector<std::string> headers_;
  std::size_t label_columns_;
  std::vector<std::vector<std::string>> rows_;
};

}  // namespace tenure::formats
