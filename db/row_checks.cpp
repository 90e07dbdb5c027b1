// What the readers of the input relations share (see row_checks.h).
#include "db/row_checks.h"

#include <sqlite3.h>

#include <cmath>

#include <fmt/format.h>

namespace tenure::db {

namespace {

// The length of the well-formed UTF-8 sequence at the start of `s`, or 0 (RFC 3629, table 3-7
// of the Unicode standard: the second byte's range depends on the first).
std::size_t sequence_length(std::string_view s) {
  const auto byte = [&](std::size_t k) { return static_cast<unsigned char>(s[k]); };
  const unsigned char c = byte(0);
  if (c < 0x80) return 1;
  std::size_t length = 0;
  unsigned char low = 0x80, high = 0xBF;  // the second byte's range
  if (c >= 0xC2 && c <= 0xDF) {
    length = 2;
  } else if (c >= 0xE0 && c <= 0xEF) {
    length = 3;
    if (c == 0xE0) low = 0xA0;   // no overlong forms
    if (c == 0xED) high = 0x9F;  // no surrogates
  } else if (c >= 0xF0 && c <= 0xF4) {
    length = 4;
    if (c == 0xF0) low = 0x90;
    if (c == 0xF4) high = 0x8F;  // nothing above U+10FFFF
  } else {
    return 0;
  }
  if (s.size() < length || byte(1) < low || byte(1) > high) return 0;
  for (std::size_t k = 2; k < length; ++k) {
    if ((byte(k) & 0xC0) != 0x80) return 0;
  }
  return length;
}

}  // namespace

bool valid_utf8(std::string_view s) {
  for (std::size_t i = 0; i < s.size();) {
    const std::size_t length = sequence_length(s.substr(i));
    if (length == 0) return false;
    i += length;
  }
  return true;
}

std::string shown(std::string_view s) {
  constexpr std::size_t kMaxCharacters = 64;
  std::string out = "'";
  std::size_t i = 0;
  for (std::size_t characters = 0; i < s.size() && characters < kMaxCharacters; ++characters) {
    const std::size_t length = sequence_length(s.substr(i));
    const auto c = static_cast<unsigned char>(s[i]);
    if (length == 0 || c < 0x20 || c == 0x7F) {
      out += '?';
      ++i;
    } else {
      out.append(s.substr(i, length));
      i += length;
    }
  }
  if (i < s.size()) out += "...";
  return out + "'";
}

std::string asset_ref_keys(std::string_view id) {
  return fmt::format(" (asset_id {})", shown(id));
}

std::string asset_row_ref(std::int64_t position, bool id_is_null, std::string_view id) {
  const std::string at = fmt::format("position {}", position);
  return id_is_null ? at : at + asset_ref_keys(id);
}

std::string shown_or_null(bool is_null, std::string_view text) {
  return is_null ? std::string("NULL") : shown(text);
}

std::optional<std::string> id_problem(int type, std::string_view id) {
  if (type == SQLITE_NULL || id.empty()) return std::string("asset_id is missing");
  if (type == SQLITE_BLOB) return std::string("asset_id is a BLOB, not text");
  return std::nullopt;
}

std::optional<std::string> amount_problem(int type, double value, std::string_view text,
                                          const char* name) {
  if (type == SQLITE_NULL) return fmt::format("{} is missing", name);
  if (type == SQLITE_BLOB) return fmt::format("{} is a BLOB, not a number", name);
  if (type != SQLITE_INTEGER && type != SQLITE_FLOAT) {
    return fmt::format("{} {} is not a number", name, shown(text));
  }
  if (!std::isfinite(value)) return fmt::format("{} is not a finite number", name);
  return magnitude_problem(value, name);
}

std::string bad_date(const char* name, int type, std::string_view text) {
  if (type == SQLITE_BLOB) return fmt::format("{} is a BLOB, not a date (YYYY-MM-DD)", name);
  return fmt::format("{} {} is not a valid date (YYYY-MM-DD)", name,
                     shown_or_null(type == SQLITE_NULL, text));
}

std::string before_in_service(const char* name, const review::AssetRecord& asset) {
  return fmt::format("{} is before the asset's in_service_on {}", name, asset.in_service.to_iso());
}

std::string after_retirement(const char* name, const review::AssetRecord& asset) {
  return fmt::format("{} is after the asset's retired_on {}", name, asset.retired_on->to_iso());
}

std::optional<std::string> magnitude_problem(double amount, const char* name) {
  if (std::abs(amount) <= kMaxAmount) return std::nullopt;
  return fmt::format("{} {} is larger in magnitude than {:g}", name, amount, kMaxAmount);
}

std::uint32_t AcceptedAssets::find(std::string_view id, int type, std::string& reason) const {
  if (auto problem = id_problem(type, id)) {
    reason = std::move(*problem);
    return fleet::AssetIndex::npos;
  }
  if (const auto found = index.find(id); found != fleet::AssetIndex::npos) return found;
  reason = rejected_ids.contains(id)
               ? fmt::format("asset {} was rejected (see its row in the asset relation)", shown(id))
               : fmt::format("asset_id {} is not in the asset relation", shown(id));
  return fleet::AssetIndex::npos;
}

}  // namespace tenure::db
