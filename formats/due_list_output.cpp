// The due list as a table, CSV and JSON (see due_list_output.h).
#include "formats/due_list_output.h"

#include <cctype>
#include <cstdint>
#include <type_traits>
#include <variant>
#include <vector>

#include <fmt/format.h>

#include "formats/at_stake_output.h"
#include "formats/caution.h"
#include "formats/csv_text.h"
#include "formats/text_table.h"
#include "replacement/case_analysis.h"

namespace tenure::formats {
namespace {

// One value of a CSV or JSON column: none, a whole number, a real number, a flag or text.
using Cell = std::variant<std::monostate, std::int64_t, double, bool, std::string>;

Cell whole(const std::optional<Years>& v) { return v ? Cell(std::int64_t{*v}) : Cell(); }
Cell real(const std::optional<double>& v) { return v ? Cell(*v) : Cell(); }
Cell flag(const std::optional<bool>& v) { return v ? Cell(*v) : Cell(); }

struct Column {
  const char* name;
  Cell (*value)(const DueAsset& a);
};

// The one column list of the CSV header and records and of the JSON rows.
const Column kColumns[] = {
    {"asset_id", [](const DueAsset& a) { return Cell(a.row.asset_id); }},
    {"asset_class", [](const DueAsset& a) { return Cell(a.row.asset_class); }},
    {"verdict",
     [](const DueAsset& a) { return Cell(std::string(review::to_string(a.row.verdict))); }},
    {"age_years", [](const DueAsset& a) { return Cell(std::int64_t{a.row.age_years}); }},
    {"replace_after_years", [](const DueAsset& a) { return whole(a.row.replace_after_years); }},
    {"delay_cost", [](const DueAsset& a) { return real(a.row.delay_cost); }},
    {"early_cost", [](const DueAsset& a) { return real(a.row.early_cost); }},
    {"repair_limit", [](const DueAsset& a) { return real(a.row.repair_limit); }},
    {"break_even_price", [](const DueAsset& a) { return real(a.row.break_even_price); }},
    {"close_call", [](const DueAsset& a) { return flag(a.row.close_call); }},
    {"newly_due", [](const DueAsset& a) { return Cell(a.newly_due); }},
    {"reason", [](const DueAsset& a) { return Cell(a.row.reason); }},
};

std::string csv_text(const Cell& cell) {
  struct Text {
    std::string operator()(std::monostate) const { return ""; }
    std::string operator()(std::int64_t v) const { return fmt::format("{}", v); }
    std::string operator()(double v) const { return fmt::format("{}", v); }  // shortest round trip
    std::string operator()(bool v) const { return v ? "1" : "0"; }
    std::string operator()(const std::string& v) const { return v; }
  };
  return std::visit(Text{}, cell);
}

nlohmann::ordered_json json_value(const Cell& cell) {
  return std::visit(
      [](const auto& v) -> nlohmann::ordered_json {
        if constexpr (std::is_same_v<std::decay_t<decltype(v)>, std::monostate>) {
          return nullptr;
        } else {
          return v;
        }
      },
      cell);
}

std::string basis_words(replacement::Basis basis) {
  return basis == replacement::Basis::after_tax ? "after-tax" : "before-tax";
}

// "due", "newly due in class van-service", ...
std::string which(const DueFilters& f) {
  std::string out = f.newly ? "newly due" : "due";
  if (f.asset_class) out += " in class " + *f.asset_class;
  return out;
}

std::string yes_no(bool v) { return v ? "yes" : "no"; }

// A table cell of stored text, with any line break made a space so that a row stays one line.
std::string one_line(std::string text) {
  for (char& c : text) {
    if (c == '\n' || c == '\r') c = ' ';
  }
  return text;
}

// `text` as lines of at most `width` columns, each indented by `indent` spaces, broken at
// whitespace (a line break in the text is whitespace too); a longer word stands on its own line.
std::string wrapped(const std::string& text, std::size_t indent, std::size_t width) {
  std::string out, line;
  auto flush = [&] {
    if (!line.empty()) out += std::string(indent, ' ') + line + '\n';
    line.clear();
  };
  std::size_t at = 0;
  while (at < text.size()) {
    while (at < text.size() && std::isspace(static_cast<unsigned char>(text[at]))) ++at;
    std::size_t end = at;
    while (end < text.size() && !std::isspace(static_cast<unsigned char>(text[end]))) ++end;
    if (end == at) break;
    const std::string_view word(text.data() + at, end - at);
    if (!line.empty() && indent + line.size() + 1 + word.size() > width) flush();
    if (!line.empty()) line += ' ';
    line += word;
    at = end;
  }
  flush();
  return out;
}

std::string legend(const DueList& list) {
  TextTable t({"column", "meaning"}, 2);
  t.add_row({"replace after", "years to keep it before replacing (0: now)"});
  t.add_row({"delay cost", "what replacing it one year after the best time costs"});
  t.add_row({"early cost", "what replacing it now instead of at the best time costs"});
  t.add_row(
      {"repair limit", "the largest one-time repair now still worth making rather than replacing"});
  t.add_row({"break-even price",
             "the new unit's price at which replacing now and keeping cost the same"});
  t.add_row(
      {"close call", "yes when the break-even price is within the review margin of the price"});
  t.add_row({"newly due", "yes when it was not due in the run before"});
  return fmt::format(
      "Money: present worth at {} on the {} basis, positive for cost; \"-\": there is none.\n"
      "{}",
      list.run.as_of, basis_words(list.run.basis), t.render());
}

}  // namespace

std::string due_list_table(const DueList& list) {
  std::string out = fmt::format("tenure due: run {} as of {}, {} basis\n", list.run.run_id,
                                list.run.as_of, basis_words(list.run.basis));
  const std::size_t n = list.assets.size();
  if (n == 0) {
    return out + fmt::format("No asset is {} (review or replace).\n\n{}\n", which(list.filters),
                             kCaution);
  }
  out += fmt::format(
      "{} asset{} {}.\n"
      "Most urgent first: largest delay cost first (none last), then replace before review, then "
      "asset_id.\n\n",
      n, n == 1 ? "" : "s", which(list.filters));
  TextTable t({"asset", "class", "verdict", "age", "replace after", "delay cost", "early cost",
               "repair limit", "break-even price", "close call", "newly due"},
              3);
  for (const DueAsset& a : list.assets) {
    const results::AssetRow& r = a.row;
    t.add_row({one_line(r.asset_id), one_line(r.asset_class), review::to_string(r.verdict),
               std::to_string(r.age_years),
               r.replace_after_years ? std::to_string(*r.replace_after_years) : "-",
               money_or_dash(r.delay_cost), money_or_dash(r.early_cost),
               money_or_dash(r.repair_limit), money_or_dash(r.break_even_price),
               r.close_call ? yes_no(*r.close_call) : "-", yes_no(a.newly_due)});
  }
  // TextTable renders the header line, then one line per row: each reason goes under its row.
  const std::string table = t.render();
  std::size_t line_end = table.find('\n') + 1;
  out += table.substr(0, line_end);
  for (const DueAsset& a : list.assets) {
    const std::size_t start = line_end;
    line_end = table.find('\n', start) + 1;
    out += table.substr(start, line_end - start) + wrapped(a.row.reason, 6, 100);
  }
  return out + "\n" + legend(list) + "\n" + std::string(kCaution) + "\n";
}

std::string due_list_csv(const DueList& list) {
  std::vector<std::string> fields;
  for (const Column& c : kColumns) fields.emplace_back(c.name);
  std::string out = csv_record(fields);
  for (const DueAsset& a : list.assets) {
    fields.clear();
    for (const Column& c : kColumns) fields.push_back(csv_text(c.value(a)));
    out += csv_record(fields);
  }
  return out;
}

nlohmann::ordered_json due_list_json(const DueList& list) {
  nlohmann::ordered_json rows = nlohmann::ordered_json::array();
  for (const DueAsset& a : list.assets) {
    nlohmann::ordered_json row = nlohmann::ordered_json::object();
    for (const Column& c : kColumns) row[c.name] = json_value(c.value(a));
    rows.push_back(std::move(row));
  }
  nlohmann::ordered_json out;
  out["run_id"] = list.run.run_id;
  out["as_of"] = list.run.as_of;
  out["basis"] = replacement::to_string(list.run.basis);
  out["filters"] = {
      {"newly", list.filters.newly},
      {"asset_class", list.filters.asset_class ? nlohmann::ordered_json(*list.filters.asset_class)
                                               : nlohmann::ordered_json(nullptr)}};
  out["rows"] = std::move(rows);
  out["caution"] = kCaution;
  return out;
}

}  // namespace tenure::formats
