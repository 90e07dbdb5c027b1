// `tenure due` as a use case: the due list of a stored run (formats/due_list.h), read from a
// database connection in one snapshot: the run, its asset rows and the assets due in the run
// before, then filtered and put in the order of the morning list. Pure data out;
// formats/due_list_output.h writes it.
//
//   formats::DueList list = read_due_list(db, std::nullopt, {.asset_class = "van-service"});
//   std::cout << formats::due_list_table(list);
#pragma once

#include <cstdint>
#include <optional>

#include "db/connection.h"
#include "formats/due_list.h"

namespace tenure::app {

// Run `run_id` (default: the latest successful run, as db::read_run has it): its assets whose
// verdict is review or replace, each marked newly due when it was not due in the run before
// (db::due_in_previous_run), kept by `filters`, ordered by results::more_urgent. Throws
// InputError naming "--class" when the run has no class `filters.asset_class` (the message
// lists the run's classes, at most the first 10), and what db::read_run throws.
formats::DueList read_due_list(db::Connection& db, std::optional<std::int64_t> run_id,
                               const formats::DueFilters& filters);

}  // namespace tenure::app
