// Plain-text tables and number formats (see text_table.h).
#include "formats/text_table.h"

#include <algorithm>
#include <cmath>
#include <stdexcept>

#include <fmt/format.h>

namespace tenure::formats {

std::string percent(Rate rate) {
  std::string text = fmt::format("{:.6f}", rate * 100);
  const std::size_t point = text.find('.');
  while (text.size() > point + 3 && text.back() == '0') text.pop_back();
  return text + "%";
}

std::string years(Years count) { return fmt::format("{} year{}", count, count == 1 ? "" : "s"); }

std::string wrap_words(std::string_view text, std::size_t width, std::string_view first_indent,
                       std::string_view rest_indent) {
  std::string out;
  std::string line(first_indent);
  bool line_has_word = false;
  std::size_t at = 0;
  while (at < text.size()) {
    const std::size_t space = text.find(' ', at);
    const std::size_t end = space == std::string_view::npos ? text.size() : space;
    const std::string_view word = text.substr(at, end - at);
    at = end == text.size() ? end : end + 1;
    if (word.empty()) continue;
    if (line_has_word && line.size() + 1 + word.size() > width) {
      out += line + '\n';
      line = rest_indent;
      line_has_word = false;
    }
    if (line_has_word) line += ' ';
    line += word;
    line_has_word = true;
  }
  return out + line + '\n';
}

namespace {

std::vector<std::string> split_lines(const std::string& text) {
  std::vector<std::string> lines;
  std::size_t at = 0;
  for (std::size_t nl; (nl = text.find('\n', at)) != std::string::npos; at = nl + 1) {
    lines.push_back(text.substr(at, nl - at));
  }
  lines.push_back(text.substr(at));
  return lines;
}

}  // namespace

TextTable::TextTable(std::vector<std::string> headers, std::size_t label_columns)
    : headers_(std::move(headers)), label_columns_(label_columns) {}

void TextTable::add_row(std::vector<std::string> cells) {
  // A programming error, not bad input: every caller builds rows of a fixed shape.
  if (cells.size() != headers_.size()) throw std::logic_error("TextTable row of the wrong width");
  rows_.push_back(std::move(cells));
}

void TextTable::wrap_last_column(std::size_t line_width) { line_width_ = line_width; }

std::string TextTable::render() const {
  std::vector<std::vector<std::string>> header_lines;
  std::size_t header_height = 1;
  for (const std::string& header : headers_) {
    header_lines.push_back(split_lines(header));
    header_height = std::max(header_height, header_lines.back().size());
  }
  std::vector<std::size_t> widths(headers_.size(), 0);
  for (std::size_t c = 0; c < headers_.size(); ++c) {
    for (const std::string& l : header_lines[c]) widths[c] = std::max(widths[c], l.size());
  }
  for (const auto& row : rows_) {
    for (std::size_t c = 0; c < row.size(); ++c) widths[c] = std::max(widths[c], row[c].size());
  }
  // The room the last column has when lines may be at most line_width_ long.
  const std::size_t last = headers_.size() - 1;
  std::size_t before_last = 2;
  for (std::size_t c = 0; c < last; ++c) before_last += widths[c] + 3;
  const bool wraps = line_width_ > 0 && last < label_columns_ && before_last < line_width_ &&
                     before_last + widths[last] > line_width_;
  if (wraps) widths[last] = line_width_ - before_last;
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
  for (std::size_t h = 0; h < header_height; ++h) {
    std::vector<std::string> cells;
    for (const auto& lines : header_lines) {
      const std::size_t blank = header_height - lines.size();  // shorter headers sit low
      cells.push_back(h < blank ? "" : lines[h - blank]);
    }
    line(cells);
  }
  for (const auto& row : rows_) {
    if (!wraps || row[last].size() <= widths[last]) {
      line(row);
      continue;
    }
    std::vector<std::string> cells = row;
    const std::vector<std::string> parts = split_lines(wrap_words(row[last], widths[last], "", ""));
    for (std::size_t p = 0; p + 1 < parts.size(); ++p) {  // the last part is after the final '\n'
      cells[last] = parts[p];
      line(cells);
      std::fill(cells.begin(), cells.end() - 1, "");
    }
  }
  return out;
}

}  // namespace tenure::formats
