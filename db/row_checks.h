// What the readers of the input relations share (fleet_reader.cpp for assets and valuations,
// cost_rows.cpp for cost events): how a value is shown in a rejection, the amount bound of
// fleet_reader.h (core/checks.h), and which accepted asset a row names.
//
//   shown("PU-0017");                         // "'PU-0017'", control bytes as '?', long text cut
//   valid_utf8("\xC3\x28");                    // false
//   magnitude_problem(2e15, "amount");        // "amount 2e+15 is larger in magnitude than 1e+15"
//   AcceptedAssets assets;  assets.index.insert("PU-0017", 0);
//   assets.find("PU-9", false, reason);       // npos; reason "asset_id 'PU-9' is not in ..."
#pragma once

#include <cstdint>
#include <functional>
#include <optional>
#include <string>
#include <string_view>
#include <unordered_set>

#include "core/checks.h"  // kMaxAmount
#include "fleet/asset_index.h"

namespace tenure::db {

// True when `s` is well-formed UTF-8 (RFC 3629: no overlong forms, no surrogates, nothing above
// U+10FFFF).
bool valid_utf8(std::string_view s);

// Text for a row reference or reason: quoted, cut after 64 characters, with control characters
// and bytes that are not UTF-8 shown as '?', so that the stored text is one line of valid UTF-8.
std::string shown(std::string_view s);

// An amount beyond kMaxAmount, or nullopt.
std::optional<std::string> magnitude_problem(double amount, const char* name);

// The asset rows read so far: the accepted ones by id, and the ids of rejected ones (so that a
// cost event of a rejected asset says so). Read-only once the asset relation is read, so any
// number of threads may look ids up.
struct AcceptedAssets {
  // Transparent hashing so a column's text is looked up without building a std::string.
  struct IdHash {
    using is_transparent = void;
    std::size_t operator()(std::string_view s) const noexcept {
      return std::hash<std::string_view>{}(s);
    }
  };

  fleet::AssetIndex index;
  std::unordered_set<std::string, IdHash, std::equal_to<>> rejected_ids;

  // The accepted asset an event or valuation names, or AssetIndex::npos with the rejection reason
  // in `reason` (fleet_reader.h rules 2 and 3).
  std::uint32_t find(std::string_view id, bool is_null, std::string& reason) const;
};

}  // namespace tenure::db
