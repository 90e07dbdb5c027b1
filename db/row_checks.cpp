// What the readers of the input relations share (see row_checks.h).
#include "db/row_checks.h"

#include <cmath>

#include <fmt/format.h>

namespace tenure::db {

std::string shown(std::string_view s) {
  std::string out = "'";
  for (std::size_t i = 0; i < s.size() && i < 64; ++i) {
    const auto c = static_cast<unsigned char>(s[i]);
    out += c < 0x20 || c == 0x7F ? '?' : static_cast<char>(c);
  }
  if (s.size() > 64) out += "...";
  return out + "'";
}

std::optional<std::string> magnitude_problem(double amount, const char* name) {
  if (std::abs(amount) <= kMaxAmount) return std::nullopt;
  return fmt::format("{} {} is larger in magnitude than {:g}", name, amount, kMaxAmount);
}

std::uint32_t AcceptedAssets::find(std::string_view id, bool is_null, std::string& reason) const {
  if (is_null || id.empty()) {
    reason = "asset_id is missing";
    return fleet::AssetIndex::npos;
  }
  if (const auto found = index.find(id); found != fleet::AssetIndex::npos) return found;
  reason = rejected_ids.contains(id)
               ? fmt::format("asset {} was rejected (see its row in the asset relation)", shown(id))
               : fmt::format("asset_id {} is not in the asset relation", shown(id));
  return fleet::AssetIndex::npos;
}

}  // namespace tenure::db
