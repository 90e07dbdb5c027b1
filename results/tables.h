// The stored tables of a review run (SPEC 7) as lists of columns (results/column.h): for each
// tenure_ table, every column's name, SQL type and the row field it holds, in table order. db/
// generates the CREATE TABLE, the INSERT and the SELECT of each from these lists, so adding a
// stored figure is one line in tables.cpp (with `since` the schema version that adds it; see
// DEVELOPERS.md).
//
//   for (const Column<AssetRow>& c : asset_table().columns) c.name;   // "asset_id", ...
#pragma once

#include <span>
#include <string_view>

#include "results/column.h"
#include "results/rows.h"

namespace tenure::results {

struct Index {
  std::string_view name;
  std::string_view columns;  // "(run_id, asset_class, asset_id)"
};

template <class Row>
struct Table {
  std::string_view name;
  // True for the tables of one run's rows: their first column is run_id, a reference to
  // tenure_run, which the writer binds and the readers select by (rows.h).
  bool of_run;
  std::span<const Column<Row>> columns;
  std::string_view constraints;  // after the columns in CREATE TABLE, or empty
  std::span<const Index> indexes;
};

const Table<RunRow>& run_table();             // tenure_run
const Table<ClassRow>& class_table();         // tenure_class_result
const Table<AssetRow>& asset_table();         // tenure_asset_result
const Table<CurveRow>& curve_table();         // tenure_euac_curve
const Table<CashFlowRow>& cash_flow_table();  // tenure_cash_flow
const Table<RejectedRow>& rejected_table();   // tenure_rejected

// The newest schema version any column names (ColumnOptions::since).
int newest_column_version();

}  // namespace tenure::results
