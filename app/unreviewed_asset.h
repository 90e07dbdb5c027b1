// Why a stored run has no row for an asset, read from the asset relation and the run's rejected
// rows: retired on or before the as-of date, not yet in service then, rejected (with the row's
// reason), or none of these (most likely added after the run). `tenure repair` and `tenure
// explain` say it in their own words.
//
//   Unreviewed u = why_not_reviewed(db, policy, run, "VAN-00080");
//   u.why;          // NotWeighed::retired
//   u.retired_on;   // "2025-03-23"
//   explain_refusal(u, run);
//   // "asset 'VAN-00080' was retired on 2025-03-23, on or before run 2's as-of date 2026-11-30:
//   //  a retired unit's costs feed its class's curves, but it gets no verdict"
#pragma once

#include <optional>
#include <string>
#include <string_view>

#include "db/connection.h"
#include "results/rows.h"
#include "review/policy.h"
#include "review/repair_check.h"

namespace tenure::app {

struct Unreviewed {
  std::string asset_id;
  review::NotWeighed why;       // never cannot_weigh: such an asset has a row in the run
  std::string retired_on;       // retired: its retired_on
  std::string in_service_on;    // not_yet_in_service: its in_service_on
  std::string rejection;        // rejected: the reason stored in tenure_rejected
};

// Throws InputError("ASSET", "no asset 'X' in the asset relation") when the relation has no
// such row, and RuntimeFailure when the run has no as-of date.
Unreviewed why_not_reviewed(db::Connection& db, const review::Policy& policy,
                            const results::RunRow& run, std::string_view asset_id);

// explain's words for it, the rule of its InputError at "ASSET".
std::string explain_refusal(const Unreviewed& u, const results::RunRow& run);

}  // namespace tenure::app
