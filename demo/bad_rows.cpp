// Names of the bad-row kinds (see bad_rows.h).
#include "demo/bad_rows.h"

namespace tenure::demo {

std::string_view name(BadRowKind kind) {
  switch (kind) {
    case BadRowKind::unparseable_date:
      return "unparseable_date";
    case BadRowKind::impossible_date:
      return "impossible_date";
    case BadRowKind::non_numeric_amount:
      return "non_numeric_amount";
    case BadRowKind::non_finite_amount:
      return "non_finite_amount";
    case BadRowKind::event_before_in_service:
      return "event_before_in_service";
    case BadRowKind::event_after_retirement:
      return "event_after_retirement";
    case BadRowKind::unknown_asset:
      return "unknown_asset";
    case BadRowKind::non_positive_first_cost:
      return "non_positive_first_cost";
    case BadRowKind::unparseable_in_service_on:
      return "unparseable_in_service_on";
    case BadRowKind::negative_valuation:
      return "negative_valuation";
  }
  return "unknown";
}

}  // namespace tenure::demo
