// The due list of a stored run, what `tenure due` shows: the run, the filters that made the list,
// and the run's assets whose verdict is review or replace (SPEC 6), with what is at stake for
// each (SPEC 11), in the order of the morning list (results::more_urgent). app/due_list.h reads
// it from a database; formats/due_list_output.h writes it as a table, CSV or JSON.
//
//   DueList list = app::read_due_list(db, std::nullopt, {.newly = true});
//   list.assets.front().row.delay_cost;   // the largest cost of waiting a year
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "results/rows.h"

namespace tenure::formats {

// Which of the run's due assets the list keeps.
struct DueFilters {
  bool newly = false;                      // only those not due in the run before
  std::optional<std::string> asset_class;  // only this class
};

struct DueAsset {
  results::AssetRow row;  // its verdict is review or replace
  bool newly_due = true;  // not due in the run before, as the view tenure_newly_due has it
};

struct DueList {
  results::RunRow run;
  DueFilters filters;
  std::vector<DueAsset> assets;  // the most urgent first (results::more_urgent)
};

}  // namespace tenure::formats
