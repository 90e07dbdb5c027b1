// Every sentence of the repair check (repair_check.h), in one place: the reason of a repair or
// replace verdict with its numbers (written by replacement/reason_text.h, as the verdicts of
// verdict_reasons.h are), what is said of an asset the run did not weigh, and the rule an
// unknown asset breaks.
//
//   repair_reason(weighing, 1500, Basis::after_tax);
//   // "Repair: the estimate of 1500.00 is within the repair limit of 2345.67 on an after-tax
//   //  basis; repaired, keeping it 3 years more and then replacing it is cheapest."
//   retired_reason("VAN-00031", "2025-04-30");
//   // "asset 'VAN-00031' was retired on 2025-04-30: there is nothing to repair"
#pragma once

#include <cstdint>
#include <string>
#include <string_view>

#include "review/repair_check.h"

namespace tenure::review {

// The reason of a repair or replace verdict (repair_check.h rules (1) to (3)).
std::string repair_reason(const RepairWeighing& weighing, Money estimate, replacement::Basis basis);

// An asset the run did not weigh, by NotWeighed.
std::string retired_reason(std::string_view asset_id, std::string_view retired_on);
std::string rejected_reason(std::string_view asset_id, std::int64_t run_id,
                            std::string_view rejection);
std::string not_yet_in_service_reason(std::string_view asset_id, std::string_view in_service_on,
                                      std::int64_t run_id, std::string_view as_of);
// `note` is the class model's: why it has no cost curve.
std::string cannot_weigh_repair_reason(std::string_view asset_id, std::string_view note);
std::string not_in_run_reason(std::string_view asset_id, std::int64_t run_id);

// The rule an asset id breaks that the asset relation does not hold.
std::string unknown_asset_rule(std::string_view asset_id);

}  // namespace tenure::review
