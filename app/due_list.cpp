// The due list of a stored run (see due_list.h).
#include "app/due_list.h"

#include <algorithm>
#include <iterator>
#include <set>
#include <string>
#include <unordered_set>
#include <vector>

#include <fmt/format.h>

#include "core/errors.h"
#include "db/run_reader.h"

namespace tenure::app {
namespace {

constexpr std::size_t kClassesNamed = 10;  // an unknown class's message names at most these

// The run's classes: those of its class rows and of its asset rows, in order.
std::set<std::string> classes_of(db::Connection& db, std::int64_t run_id,
                                 const std::vector<results::AssetRow>& assets) {
  std::set<std::string> out;
  for (const results::ClassRow& c : db::read_class_results(db, run_id)) out.insert(c.asset_class);
  for (const results::AssetRow& a : assets) out.insert(a.asset_class);
  return out;
}

void check_class(const std::string& asset_class, std::int64_t run_id,
                 const std::set<std::string>& classes) {
  if (classes.contains(asset_class)) return;
  std::string known;
  if (classes.empty()) {
    known = "it has no classes";
  } else if (classes.size() <= kClassesNamed) {
    known = fmt::format("its classes are {}", fmt::join(classes, ", "));
  } else {
    const std::vector<std::string> first(classes.begin(),
                                         std::next(classes.begin(), kClassesNamed));
    known = fmt::format("it has {} classes, the first {}: {}", classes.size(), kClassesNamed,
                        fmt::join(first, ", "));
  }
  throw InputError("--class",
                   fmt::format("no class '{}' in run {}; {}", asset_class, run_id, known));
}

}  // namespace

formats::DueList read_due_list(db::Connection& db, std::optional<std::int64_t> run_id,
                               const formats::DueFilters& filters) {
  db::Transaction snapshot(db, db::Transaction::Kind::deferred);
  formats::DueList list{.run = db::read_run(db, run_id), .filters = filters, .assets = {}};
  const std::int64_t id = list.run.run_id;
  const std::vector<results::AssetRow> assets = db::read_asset_results(db, id);
  if (filters.asset_class) check_class(*filters.asset_class, id, classes_of(db, id, assets));
  const std::unordered_set<std::string> due_before = db::due_in_previous_run(db, id);
  snapshot.commit();

  for (const results::AssetRow& a : assets) {
    if (!a.due() || (filters.asset_class && a.asset_class != *filters.asset_class)) continue;
    const bool newly_due = !due_before.contains(a.asset_id);
    if (filters.newly && !newly_due) continue;
    list.assets.push_back({.row = a, .newly_due = newly_due});
  }
  std::sort(list.assets.begin(), list.assets.end(),
            [](const formats::DueAsset& a, const formats::DueAsset& b) {
              return results::more_urgent(a.row, b.row);
            });
  return list;
}

}  // namespace tenure::app
