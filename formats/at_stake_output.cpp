// What is at stake, written out (see at_stake_output.h).
#include "formats/at_stake_output.h"

#include <algorithm>
#include <string>
#include <vector>

#include <fmt/format.h>

#include "formats/text_table.h"

namespace tenure::formats {

std::string money_or_dash(const std::optional<Money>& amount) {
  return amount ? money(*amount) : "-";
}

nlohmann::json at_stake_to_json(const review::AtStake& s) {
  const auto or_null = [](const auto& value) {
    return value ? nlohmann::json(*value) : nlohmann::json(nullptr);
  };
  return {{"delay_cost", or_null(s.delay_cost)},
          {"early_cost", s.early_cost},
          {"repair_limit", s.repair_limit},
          {"break_even_price", or_null(s.break_even_price)},
          {"break_even_cost_factor", or_null(s.break_even_cost_factor)},
          {"close_call", s.close_call}};
}

std::string at_stake_table(const review::AtStake& s) {
  std::vector<std::vector<std::string>> rows;
  rows.push_back({"cost of waiting a year", money_or_dash(s.delay_cost),
             s.delay_cost ? "replacing one year after the best time costs this much more"
                          : "none: the best time is the last year weighed"});
  rows.push_back({"cost of replacing now", money(s.early_cost),
             "replacing now instead of at the best time costs this much more"});
  rows.push_back({"repair limit", money(s.repair_limit),
             "the largest one-time repair now still worth making rather than replacing"});
  rows.push_back({"break-even price", money_or_dash(s.break_even_price),
             s.break_even_price ? "at this challenger price, replacing now and keeping cost the same"
             : s.improving      ? "not given: new units improve, so no one price decides"
                                : "none: no challenger price up to 1e15 makes replacing now pay"});
  rows.push_back({"break-even cost factor",
             s.break_even_cost_factor ? fmt::format("{:.4f}", *s.break_even_cost_factor) : "-",
             s.break_even_cost_factor
                 ? "its operating costs times this make replacing now and keeping cost the same"
             : s.improving ? "not given: new units improve, so no one factor decides"
                 : "none: no positive factor on its operating costs makes replacing now pay"});
  rows.push_back({"close call", s.close_call ? "yes" : "no",
                  "yes when the break-even price is within the review margin of the price"});
  // The values right-aligned among themselves, the meanings a left-aligned text wrapped at the
  // line width.
  std::size_t value_width = 0;
  for (const auto& row : rows) value_width = std::max(value_width, row[1].size());
  TextTable t({"figure", "value", "meaning"}, 3);
  t.wrap_last_column(kLineWidth);
  for (auto& row : rows) {
    row[1] = fmt::format("{:>{}}", row[1], value_width);
    t.add_row(std::move(row));
  }
  return t.render();
}

}  // namespace tenure::formats
