// Reading a stored run back (see run_reader.h).
#include "db/run_reader.h"

#include <fmt/format.h>

#include "core/checks.h"
#include "core/errors.h"

namespace tenure::db {
namespace {

constexpr const char* kAssetColumns =
    "asset_id, asset_class, age_years, first_cost, book_value_now, market_value_now, "
    "market_value_source, cost_years, cost_ratio, credibility_factor, class_esl_years, "
    "defender_best_years, defender_euac, challenger_euac, defender_euac_before_tax, "
    "defender_euac_after_tax, marginal_cost_next_year, replace_after_years, verdict, reason, "
    "basis";

constexpr const char* kClassColumns =
    "asset_class, assets, challenger_first_cost, max_life_years, esl_years_before_tax, "
    "euac_before_tax, esl_years_after_tax, euac_after_tax, cost_model, cost_a, cost_g, cost_r2, "
    "asset_years, value_model, value_start, value_decline, valuations_used, note";

std::string text(const Statement& q, int column) { return std::string(q.text(column)); }

std::optional<double> optional_real(const Statement& q, int column) {
  if (q.is_null(column)) return std::nullopt;
  return q.real(column);
}

std::optional<int> optional_int(const Statement& q, int column) {
  if (q.is_null(column)) return std::nullopt;
  return static_cast<int>(q.integer(column));
}

explain::StoredAsset asset_row(const Statement& q) {
  explain::StoredAsset a;
  a.asset_id = text(q, 0);
  a.asset_class = text(q, 1);
  a.age_years = static_cast<Years>(q.integer(2));
  a.first_cost = q.real(3);
  a.book_value_now = q.real(4);
  a.market_value_now = q.real(5);
  a.market_value_source = text(q, 6);
  a.cost_years = static_cast<int>(q.integer(7));
  a.cost_ratio = q.real(8);
  a.credibility_factor = q.real(9);
  a.class_esl_years = optional_int(q, 10);
  a.defender_best_years = optional_int(q, 11);
  a.defender_euac = optional_real(q, 12);
  a.challenger_euac = optional_real(q, 13);
  a.defender_euac_before_tax = optional_real(q, 14);
  a.defender_euac_after_tax = optional_real(q, 15);
  a.marginal_cost_next_year = optional_real(q, 16);
  a.replace_after_years = optional_int(q, 17);
  a.verdict = text(q, 18);
  a.reason = text(q, 19);
  a.basis = text(q, 20);
  return a;
}

explain::StoredClass class_row(const Statement& q) {
  explain::StoredClass c;
  c.asset_class = text(q, 0);
  c.assets = q.integer(1);
  c.challenger_first_cost = q.real(2);
  c.max_life_years = static_cast<Years>(q.integer(3));
  c.esl_years_before_tax = optional_int(q, 4);
  c.euac_before_tax = optional_real(q, 5);
  c.esl_years_after_tax = optional_int(q, 6);
  c.euac_after_tax = optional_real(q, 7);
  if (!q.is_null(8)) c.cost_model = text(q, 8);
  c.cost_a = optional_real(q, 9);
  c.cost_g = optional_real(q, 10);
  c.cost_r2 = optional_real(q, 11);
  c.asset_years = q.integer(12);
  c.value_model = text(q, 13);
  c.value_start = q.real(14);
  c.value_decline = q.real(15);
  c.valuations_used = q.integer(16);
  if (!q.is_null(17)) c.note = text(q, 17);
  return c;
}

bool has_results_schema(Connection& db) {
  Statement q(db, "SELECT 1 FROM sqlite_schema WHERE type = 'table' AND name = 'tenure_run'");
  return q.step();
}

std::string relation(const std::string& name, const char* key) {
  if (!is_plain_identifier(name)) {
    throw InputError(std::string("$.sources.") + key, "must be a plain SQL identifier");
  }
  return quoted(name);
}

}  // namespace

explain::StoredRun read_run(Connection& db, std::optional<std::int64_t> run_id) {
  if (!has_results_schema(db)) {
    throw InputError("--db", "no review run in this database (run 'tenure review' first)");
  }
  Statement q(db,
              "SELECT run_id, as_of, started_at, coalesce(finished_at, ''), policy_json, "
              "policy_sha256, rows_read, rows_rejected, basis, money, assets_reviewed, "
              "assets_retired, assets_not_yet_in_service, rows_after_as_of, tenure_version "
              "FROM tenure_run WHERE status = 'ok' AND run_id = coalesce(?1, "
              "(SELECT max(run_id) FROM tenure_run WHERE status = 'ok'))");
  q.bind(1, run_id);
  if (!q.step()) {
    if (run_id) throw InputError("--run", fmt::format("no successful run {}", *run_id));
    throw InputError("--db", "no successful review run in this database (run 'tenure review' "
                             "first)");
  }
  explain::StoredRun r;
  r.run_id = q.integer(0);
  r.as_of = text(q, 1);
  r.started_at = text(q, 2);
  r.finished_at = text(q, 3);
  r.policy_json = text(q, 4);
  r.policy_sha256 = text(q, 5);
  r.rows_read = q.integer(6);
  r.rows_rejected = q.integer(7);
  r.basis = text(q, 8);
  r.money = text(q, 9);
  r.assets_reviewed = q.integer(10);
  r.assets_retired = q.integer(11);
  r.assets_not_yet_in_service = q.integer(12);
  r.rows_after_as_of = q.integer(13);
  r.tenure_version = text(q, 14);
  return r;
}

std::optional<explain::StoredAsset> read_asset_result(Connection& db, std::int64_t run_id,
                                                      std::string_view asset_id) {
  Statement q(db, fmt::format("SELECT {} FROM tenure_asset_result WHERE run_id = ?1 AND "
                              "asset_id = ?2",
                              kAssetColumns));
  q.bind(1, run_id);
  q.bind(2, asset_id);
  if (!q.step()) return std::nullopt;
  return asset_row(q);
}

std::vector<explain::StoredAsset> read_asset_results(Connection& db, std::int64_t run_id) {
  Statement q(db, fmt::format("SELECT {} FROM tenure_asset_result WHERE run_id = ?1 "
                              "ORDER BY asset_id",
                              kAssetColumns));
  q.bind(1, run_id);
  std::vector<explain::StoredAsset> out;
  while (q.step()) out.push_back(asset_row(q));
  return out;
}

std::optional<explain::StoredClass> read_class_result(Connection& db, std::int64_t run_id,
                                                      std::string_view asset_class) {
  Statement q(db, fmt::format("SELECT {} FROM tenure_class_result WHERE run_id = ?1 AND "
                              "asset_class = ?2",
                              kClassColumns));
  q.bind(1, run_id);
  q.bind(2, asset_class);
  if (!q.step()) return std::nullopt;
  return class_row(q);
}

std::vector<explain::StoredClass> read_class_results(Connection& db, std::int64_t run_id) {
  Statement q(db, fmt::format("SELECT {} FROM tenure_class_result WHERE run_id = ?1 "
                              "ORDER BY asset_class",
                              kClassColumns));
  q.bind(1, run_id);
  std::vector<explain::StoredClass> out;
  while (q.step()) out.push_back(class_row(q));
  return out;
}

std::vector<explain::CurvePoint> read_challenger_curves(Connection& db, std::int64_t run_id) {
  Statement q(db,
              "SELECT asset_class, basis, years, euac, marginal_cost FROM tenure_euac_curve "
              "WHERE run_id = ?1 AND role = 'challenger' AND asset_id IS NULL "
              "ORDER BY asset_class, basis, years");
  q.bind(1, run_id);
  std::vector<explain::CurvePoint> out;
  while (q.step()) {
    out.push_back({text(q, 0), text(q, 1), static_cast<Years>(q.integer(2)), q.real(3),
                   q.real(4)});
  }
  return out;
}

std::vector<explain::RejectedRow> read_rejected(Connection& db, std::int64_t run_id,
                                                std::size_t limit) {
  Statement q(db, "SELECT source, row_ref, reason FROM tenure_rejected WHERE run_id = ?1 "
                  "ORDER BY rowid LIMIT ?2");
  q.bind(1, run_id);
  q.bind(2, static_cast<std::int64_t>(limit));
  std::vector<explain::RejectedRow> out;
  while (q.step()) out.push_back({text(q, 0), text(q, 1), text(q, 2)});
  return out;
}

std::unordered_set<std::string> due_in_previous_run(Connection& db, std::int64_t run_id) {
  Statement q(db,
              "SELECT asset_id FROM tenure_asset_result WHERE verdict IN ('review', 'replace') "
              "AND run_id = (SELECT max(run_id) FROM tenure_run WHERE status = 'ok' AND "
              "run_id < ?1)");
  q.bind(1, run_id);
  std::unordered_set<std::string> out;
  while (q.step()) out.insert(text(q, 0));
  return out;
}

std::optional<explain::InputAsset> read_input_asset(Connection& db, const review::Sources& sources,
                                                    std::string_view asset_id) {
  Statement asset(db, fmt::format("SELECT in_service_on, retired_on, first_cost FROM {} WHERE "
                                  "asset_id = ?1",
                                  relation(sources.assets, "assets")));
  asset.bind(1, asset_id);
  if (!asset.step()) return std::nullopt;
  explain::InputAsset out;
  out.in_service_on = text(asset, 0);
  if (!asset.is_null(1)) out.retired_on = text(asset, 1);
  out.first_cost = asset.real(2);
  Statement events(db, fmt::format("SELECT occurred_on, amount FROM {} WHERE asset_id = ?1",
                                   relation(sources.costs, "costs")));
  events.bind(1, asset_id);
  while (events.step()) {
    const int type = events.column_type(1);
    if (events.column_type(0) != SQLITE_TEXT || (type != SQLITE_INTEGER && type != SQLITE_FLOAT)) {
      ++out.events_unreadable;
      continue;
    }
    out.events.push_back({text(events, 0), events.real(1)});
  }
  return out;
}

}  // namespace tenure::db
