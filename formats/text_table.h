// Aligned plain-text tables and number formats for output a person reads and audits.
//
//   TextTable t({"year", "depreciation", "book value"});
//   t.add_row({"1", money(2000), money(8000)});
//   out << t.render();
//   //   year   depreciation   book value
//   //      1       2,000.00     8,000.00
//
//   TextTable wide({"year", "present worth\nat 7.50%"});   // a header of two lines
//   wide.wrap_last_column(kLineWidth);                    // long text in the last column wraps
//   wrap_words("a long sentence ...", kLineWidth, "  ", "    ");
#pragma once

#include <string>
#include <string_view>
#include <vector>

#include "core/money_text.h"
#include "core/types.h"

namespace tenure::formats {

// Two decimals with thousands separators: 12345.678 -> "12,345.68"; -0.001 -> "0.00". The one
// money format, shared with the reasons' sentences (core/money_text.h).
using tenure::money;
// A rate as a percentage with the decimals it needs, at least two: 0.075 -> "7.50%",
// 0.07125 -> "7.125%".
std::string percent(Rate rate);
// "1 year", "3 years".
std::string years(Years count);

// The widest line of text a person reads (explain, case): 100 columns.
inline constexpr std::size_t kLineWidth = 100;

// `text` broken at spaces into lines of at most `width` columns (a word longer than that stays
// whole on its own line): the first line starts with `first_indent`, the others with
// `rest_indent`; each line ends in '\n'.
std::string wrap_words(std::string_view text, std::size_t width, std::string_view first_indent,
                       std::string_view rest_indent);

// Columns are right-aligned so numbers line up, except the first `label_columns`, which are
// left-aligned text. Lines are indented by two spaces, columns separated by three. Every row
// must have as many cells as there are headers. A header with '\n' in it takes two or more lines;
// shorter headers sit on the last of them.
class TextTable {
 public:
  explicit TextTable(std::vector<std::string> headers, std::size_t label_columns = 0);
  void add_row(std::vector<std::string> cells);
  // Lines longer than `line_width` have their last column, a left-aligned text, wrapped at spaces
  // onto further lines under it (the other columns blank there).
  void wrap_last_column(std::size_t line_width);
  // The header line, then one line per row, each ending in '\n'.
  std::string render() const;

 private:
  std::vector<std::string> headers_;
  std::size_t label_columns_;
  std::size_t line_width_ = 0;  // 0: no wrapping
  std::vector<std::vector<std::string>> rows_;
};

}  // namespace tenure::formats
