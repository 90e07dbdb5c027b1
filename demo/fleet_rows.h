// The rows the demo generator produces, one struct per host relation of SPEC 3, and the Sink that
// receives them. Text fields are views valid only during the Sink call that receives them.
//
// A few rows are bad on purpose (bad_rows.h): their text is kept as text, so a date column may
// hold "31/12/2024" and an amount may be the text "n/a" (SQLite keeps non-numeric text in a REAL
// column as text) or an infinite number.
#pragma once

#include <optional>
#include <string_view>
#include <variant>

#include "core/types.h"

namespace tenure::demo {

// A stored amount: a number (possibly infinite, in a bad row) or text (a bad row).
using StoredAmount = std::variant<double, std::string_view>;

struct AssetRow {
  std::string_view asset_id;
  std::string_view asset_class;
  std::string_view in_service_on;  // "YYYY-MM-DD"
  Money first_cost;
  std::optional<std::string_view> retired_on;
};

struct CostEventRow {
  std::string_view asset_id;
  std::string_view occurred_on;  // "YYYY-MM-DD"
  StoredAmount amount;
  std::string_view kind;  // one of kEventKinds (demo_classes.h)
};

struct ValuationRow {
  std::string_view asset_id;
  std::string_view valued_on;  // "YYYY-MM-DD"
  Money amount;
  std::string_view basis;  // "appraisal" or "trade-in quote"
};

// Receives the generated rows. Calls come in this order: every on_asset (sound assets by
// in-service date, then the bad ones), every on_valuation (by date), then every on_event in the
// order a live system appends them (by date across the whole fleet).
class Sink {
 public:
  virtual ~Sink() = default;
  virtual void on_asset(const AssetRow& row) = 0;
  virtual void on_valuation(const ValuationRow& row) = 0;
  virtual void on_event(const CostEventRow& row) = 0;
};

}  // namespace tenure::demo
