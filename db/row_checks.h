// The row rules the readers of the input relations share (fleet_reader.cpp for assets and
// valuations, cost_rows.cpp for cost events), each worded once: how a value is shown in a
// rejection, what makes an amount or a date usable (fleet_reader.h rules 1 to 3), dates against
// the asset's service, and which accepted asset a row names.
//
//   shown("PU-0017");                         // "'PU-0017'", control bytes as '?', long text cut
//   valid_utf8("\xC3\x28");                    // false
//   amount_problem(SQLITE_TEXT, 0, "n/a", "amount");  // "amount 'n/a' is not a number"
//   magnitude_problem(2e15, "amount");        // "amount 2e+15 is larger in magnitude than 1e+15"
//   bad_date("occurred_on", false, "2023-02-29");
//   // "occurred_on '2023-02-29' is not a valid date (YYYY-MM-DD)"
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
#include "review/fleet_data.h"

namespace tenure::db {

// True when `s` is well-formed UTF-8 (RFC 3629: no overlong forms, no surrogates, nothing above
// U+10FFFF).
bool valid_utf8(std::string_view s);

// Text for a row reference or reason: quoted, cut after 64 characters, with control characters
// and bytes that are not UTF-8 shown as '?', so that the stored text is one line of valid UTF-8.
std::string shown(std::string_view s);

// The row reference of an asset row at scan `position`: "position 17 (asset_id 'PU-0017')", or
// "position 17" when its id is NULL; and the part after the position, which names the id.
std::string asset_row_ref(std::int64_t position, bool id_is_null, std::string_view id);
std::string asset_ref_keys(std::string_view id);

// "NULL" for a NULL value, else shown(text).
std::string shown_or_null(bool is_null, std::string_view text);

// What is wrong with an asset_id of storage class `type`, or nullopt: missing (NULL or empty), or
// a BLOB (which may hold a NUL or bytes that are no text).
std::optional<std::string> id_problem(int type, std::string_view id);

// An amount beyond kMaxAmount, or nullopt.
std::optional<std::string> magnitude_problem(double amount, const char* name);

// What is wrong with an amount column, or nullopt: `type` is its SQLite storage class, `value`
// its number and `text` its text. It must be stored as a number (text that SQLite could not
// convert stays text, and is refused rather than read as 0), finite, and within kMaxAmount.
std::optional<std::string> amount_problem(int type, double value, std::string_view text,
                                          const char* name);

// "<name> <value> is not a valid date (YYYY-MM-DD)", or "<name> is a BLOB, not a date ..." for a
// value stored as a BLOB; `type` is its SQLite storage class. A BLOB is refused alike in every
// column: never read as text that may look valid.
std::string bad_date(const char* name, int type, std::string_view text);

// A row of the asset's dated before it went into service, or after it retired.
std::string before_in_service(const char* name, const review::AssetRecord& asset);
std::string after_retirement(const char* name, const review::AssetRecord& asset);

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
  // in `reason` (fleet_reader.h rules 2 and 3); `type` is the id's SQLite storage class.
  std::uint32_t find(std::string_view id, int type, std::string& reason) const;
};

}  // namespace tenure::db
