// Why a run has no row for an asset (see unreviewed_asset.h).
#include "app/unreviewed_asset.h"

#include <fmt/format.h>

#include "core/errors.h"
#include "db/run_reader.h"
#include "fleet/date.h"
#include "review/repair_reasons.h"

namespace tenure::app {
namespace {

// A date column as the asset relation holds it, when it reads as a date.
std::optional<Date> date_of(const std::optional<std::string>& text) {
  return text ? parse_iso_date(*text) : std::nullopt;
}

}  // namespace

Unreviewed why_not_reviewed(db::Connection& db, const review::Policy& policy,
                            const results::RunRow& run, std::string_view asset_id) {
  const auto input = db::read_input_row(db, policy.sources, asset_id);
  if (!input) throw InputError("ASSET", review::unknown_asset_rule(asset_id));
  const auto as_of = parse_iso_date(run.as_of);
  if (!as_of) throw RuntimeFailure(fmt::format("run {} has no as-of date", run.run_id));
  Unreviewed u{.asset_id = std::string(asset_id),
               .why = review::NotWeighed::not_in_run,
               .retired_on = {},
               .in_service_on = {},
               .rejection = {}};
  if (const auto retired = date_of(input->retired_on); retired && *retired <= *as_of) {
    u.why = review::NotWeighed::retired;
    u.retired_on = *input->retired_on;
  } else if (const auto in_service = date_of(input->in_service_on);
             in_service && *in_service > *as_of) {
    u.why = review::NotWeighed::not_yet_in_service;
    u.in_service_on = input->in_service_on;
  } else if (const auto rejected =
                 db::read_rejected_asset(db, run.run_id, policy.sources.assets, asset_id)) {
    u.why = review::NotWeighed::rejected;
    u.rejection = rejected->reason;
  }
  return u;
}

std::string explain_refusal(const Unreviewed& u, const results::RunRow& run) {
  switch (u.why) {
    case review::NotWeighed::retired:
      return fmt::format(
          "asset '{}' was retired on {}, on or before run {}'s as-of date {}: a retired unit's "
          "costs feed its class's curves, but it gets no verdict",
          u.asset_id, u.retired_on, run.run_id, run.as_of);
    case review::NotWeighed::not_yet_in_service:
      return review::not_yet_in_service_reason(u.asset_id, u.in_service_on, run.run_id,
                                               run.as_of);
    case review::NotWeighed::rejected:
      return fmt::format("{} (its row in tenure_rejected)",
                         review::rejected_reason(u.asset_id, run.run_id, u.rejection));
    case review::NotWeighed::cannot_weigh:
    case review::NotWeighed::not_in_run:
      break;
  }
  return review::not_in_run_reason(u.asset_id, run.run_id);
}

}  // namespace tenure::app
