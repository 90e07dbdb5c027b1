// The sentences of the repair check (see repair_reasons.h).
#include "review/repair_reasons.h"

#include <fmt/format.h>

#include "replacement/reason_text.h"

namespace tenure::review {

using replacement::reason_years;

std::string repair_reason(const RepairWeighing& w, Money estimate, replacement::Basis basis) {
  const char* on_basis =
      basis == replacement::Basis::after_tax ? "on an after-tax basis" : "on a before-tax basis";
  if (w.verdict == RepairVerdict::repair) {
    return fmt::format(
        "Repair: the estimate of {} is within the repair limit of {} {}; repaired, keeping it {} "
        "more and then replacing it is cheapest.",
        money(estimate), money(w.repair_limit), on_basis,
        reason_years(w.keep_years_if_repaired));
  }
  if (w.keep_years == 0) {
    return fmt::format(
        "Replace: even without a repair, replacing it now is cheapest {}, so its repair limit is "
        "0.00 and the estimate of {} is not worth paying.",
        on_basis, money(estimate));
  }
  return fmt::format(
      "Replace: the estimate of {} is above the repair limit of {} {}: paying it and keeping the "
      "unit costs more than replacing it now.",
      money(estimate), money(w.repair_limit), on_basis);
}

std::string retired_reason(std::string_view asset_id, std::string_view retired_on) {
  return fmt::format("asset '{}' was retired on {}: there is nothing to repair", asset_id,
                     retired_on);
}

std::string rejected_reason(std::string_view asset_id, std::int64_t run_id,
                            std::string_view rejection) {
  return fmt::format("asset '{}' was rejected by run {}: {}", asset_id, run_id, rejection);
}

std::string not_yet_in_service_reason(std::string_view asset_id, std::string_view in_service_on,
                                      std::int64_t run_id, std::string_view as_of) {
  return fmt::format(
      "asset '{}' goes into service on {}, after run {}'s as-of date {}: the run did not weigh it",
      asset_id, in_service_on, run_id, as_of);
}

std::string cannot_weigh_repair_reason(std::string_view asset_id, std::string_view note) {
  return fmt::format("asset '{}' cannot be weighed: {}", asset_id, note);
}

std::string not_in_run_reason(std::string_view asset_id, std::int64_t run_id) {
  return fmt::format(
      "asset '{}' is in the asset relation but not in run {}: it was most likely added after the "
      "run (run 'tenure review' to weigh it)",
      asset_id, run_id);
}

std::string unknown_asset_rule(std::string_view asset_id) {
  return fmt::format("no asset '{}' in the asset relation", asset_id);
}

}  // namespace tenure::review
