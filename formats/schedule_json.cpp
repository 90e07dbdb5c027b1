// Depreciation schedules as JSON and as a table (see schedule_json.h).
#include "formats/schedule_json.h"

#include <vector>

#include <fmt/format.h>

#include "formats/caution.h"
#include "formats/depreciation_json.h"
#include "formats/text_table.h"

namespace tenure::formats {
nlohmann::json schedule_to_json(const depreciation::Spec& spec,
                                const depreciation::Schedule& schedule,
                                std::optional<Years> disposal_year) {
  nlohmann::json out = depreciation_to_json(spec);
  out["basis"] = schedule.basis();
  if (disposal_year) out["disposal_year"] = *disposal_year;
  nlohmann::json rows = nlohmann::json::array();
  for (const depreciation::ScheduleRow& row : schedule.rows(disposal_year)) {
    rows.push_back(
        {{"year", row.year}, {"depreciation", row.depreciation}, {"book_value", row.book_value}});
  }
  out["rows"] = std::move(rows);
  return out;
}

std::string schedule_to_table(const depreciation::Spec& spec,
                              const depreciation::Schedule& schedule,
                              std::optional<Years> disposal_year) {
  const nlohmann::json parameters = depreciation_to_json(spec);
  std::vector<std::string> described;
  for (const auto& item : parameters.items()) {
    if (item.key() != "method") described.push_back(item.key() + " " + item.value().dump());
  }
  std::string out =
      fmt::format("Depreciation schedule: {}", parameters["method"].get<std::string>());
  if (!described.empty()) out += fmt::format(" ({})", fmt::join(described, ", "));
  out += fmt::format(", basis {}\n", money(schedule.basis()));
  TextTable table({"year", "depreciation", "book value"});
  for (const depreciation::ScheduleRow& row : schedule.rows(disposal_year)) {
    table.add_row({std::to_string(row.year), money(row.depreciation), money(row.book_value)});
  }
  out += table.render();
  if (disposal_year) {
    out +=
        fmt::format("  Sold at the end of year {}: that year takes the disposal-year deduction.\n",
                    *disposal_year);
  }
  return out + "\n" + std::string(kCaution) + "\n";
}

}  // namespace tenure::formats
