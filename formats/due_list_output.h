// The due list (formats/due_list.h) written out three ways, for `tenure due`: a table a person
// reads in the morning, CSV for spreadsheets (RFC 4180) and JSON for tools. The columns, in
// order: asset_id, asset_class, verdict, age_years, replace_after_years, delay_cost,
// early_cost, repair_limit, break_even_price, close_call, newly_due, reason; money is present
// worth at the run's as-of date on the run's basis, positive for cost (SPEC 11).
//
//   std::cout << due_list_table(list);
//   //   tenure due: run 2 as of 2026-11-30, after-tax basis
//   //   2 assets due.
//   //   Most urgent first: largest delay cost first (none last), then replace before review, ...
//   //
//   //     asset       class         verdict   age   replace after   delay cost   ...
//   //     VAN-00087   van-service   replace    11               0     5,388.40   ...
//   //         Replace: keeping it any longer costs more than a new unit; its least after-tax
//   //         EUAC is 14332.90 against the challenger's 8661.61, and next year's ...
//   due_list_csv(list);    // "asset_id,asset_class,...,reason\r\nVAN-00087,van-service,..."
//   due_list_json(list);   // {"run_id": 2, "as_of": ..., "filters": ..., "rows": [...], ...}
#pragma once

#include <string>

#include <nlohmann/json.hpp>

#include "formats/due_list.h"

namespace tenure::formats {

// A heading naming the run, its basis and the filters; the assets as an aligned table, money as
// formats::money writes it and "-" for a figure there is none of, each asset's reason on the
// lines under its row (wrapped at 100 columns; a line break in stored text is a space here);
// what the figures mean; then the caution (SPEC 10). An empty list is one line saying no asset
// is due, then the caution.
std::string due_list_table(const DueList& list);

// RFC 4180: a header row of the column names, then a record per asset; fields separated by
// commas, CRLF line ends, a field holding a comma, double quote, CR or LF quoted with its
// double quotes doubled. Numbers in full precision (the shortest text that reads back as the
// same double), close_call and newly_due as 1 or 0, an empty field where there is none. An
// empty list is the header row alone. No caution: the file is data.
std::string due_list_csv(const DueList& list);

// {"run_id", "as_of", "basis": "after_tax" | "before_tax", "filters": {"newly", "asset_class"
// (null when not given)}, "rows": [{the columns, numbers as numbers, close_call and newly_due
// as booleans, null where there is none}], "caution"}, keys in that order.
nlohmann::ordered_json due_list_json(const DueList& list);

}  // namespace tenure::formats
