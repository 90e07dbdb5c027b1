// One stored asset explained (see explain_run.h).
#include "app/explain_run.h"

#include <fmt/format.h>

#include "core/errors.h"
#include "app/unreviewed_asset.h"
#include "db/run_reader.h"

namespace tenure::app {

explain::Explanation explain_stored_asset(db::Connection& db, std::string_view asset_id,
                                          std::optional<std::int64_t> run_id) {
  db::Transaction snapshot(db, db::Transaction::Kind::deferred);
  results::RunRow run = db::read_run(db, run_id);
  auto asset = db::read_asset_result(db, run.run_id, asset_id);
  if (!asset) {
    const auto policy = explain::run_policy(run);
    throw InputError("ASSET", explain_refusal(why_not_reviewed(db, *policy, run, asset_id), run));
  }
  auto stored_class = db::read_class_result(db, run.run_id, asset->asset_class);
  if (!stored_class) {
    throw RuntimeFailure(
        fmt::format("run {} has no row for class '{}'", run.run_id, asset->asset_class));
  }
  auto policy = explain::run_policy(run);
  auto input = db::read_input_asset(db, policy->sources, asset_id);
  snapshot.commit();
  return explain::explain_asset(std::move(run), std::move(policy), std::move(*stored_class),
                                std::move(*asset), std::move(input));
}

}  // namespace tenure::app
