// Plain-text tables and number formats (see text_table.h).
#include "formats/text_table.h"

#include <algorithm>
#include <cmath>
#include <stdexcept>

#include <fmt/format.h>

namespace tenure::formats {

std::string money(Money amount) {
  if (!std::isfinite(amount)) return fmt::format("{}", amount);
  // Half a cent rounds away from zero, as people round money (printf would round to even).
  const std::string digits = fmt::format("{:.2f}", std::round(std::abs(amount) * 100) / 100);
  // Rounds to zero: print no minus sign.
  std::string out = amount < 0 && digits != "0.00" ? "-" : "";
  const std::size_t whole = digits.size() - 3;  // digits before ".dd"
  for (std::size_t i = 0; i < whole; ++i) {
    if (i > 0 && (whole - i) % 3 == 0) out += ',';
    out += digits[i];
  }
  return out + digits.substr(whole);
}

std::string percent(Rate rate) {
  std::string text = fmt::format("{:.6f}", rate * 100);
  const std::size_t point = text.find('.');
  while (text.size() > point + 3 && text.back() == '0') text.pop_back();
  return text + "%";
}

std::string years(Years count) { return fmt::format("{} year{}", count, count == 1 ? "" : "s"); }

TextTable::TextTable(std::vector<std::string> headers, std::size_t label_columns)
    : headers_(std::move(headers)), label_columns_(label_columns) {}

void TextTable::add_row(std::vector<std::string> cells) {
  // A programming error, not bad input: every caller builds rows of a fixed shape.
  if (cells.size() != headers_.size()) throw std::logic_error("TextTable row of the wrong width");
  rows_.push_back(std::move(cells));
}

std::string TextTable::render() const {
  std::vector<std::size_t> widths;
  for (const std::string& header : headers_) widths.push_back(header.size());
  for (const auto& row : rows_) {
    for (std::size_t c = 0; c < row.size(); ++c) widths[c] = std::max(widths[c], row[c].size());
  }
  std::string out;
  auto line = [&](const std::vector<std::string>& cells) {
    out += "  ";
    for (std::size_t c = 0; c < cells.size(); ++c) {
      if (c > 0) out += "   ";
      if (c < label_columns_) {
        out += fmt::format("{:<{}}", cells[c], widths[c]);
      } else {
        out += fmt::format("{:>{}}", cells[c], widths[c]);
      }
    }
    while (out.ends_with(' ')) out.pop_back();
    out += '\n';
  };
  line(headers_);
  for (const auto& row : rows_) line(row);
  return out;
}

}  // namespace tenure::formats
