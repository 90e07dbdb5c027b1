// Rebuilding a stored analysis (see rebuild.h).
#include "explain/rebuild.h"

#include <cctype>

#include <type_traits>

#include <fmt/format.h>

#include "core/errors.h"

namespace tenure::explain {
namespace {

// A figure as people read it and to the last bit, so a difference in the 17th digit shows.
template <class T>
std::string shown(const std::optional<T>& value) {
  if (!value) return "none";
  if constexpr (std::is_floating_point_v<T>) return fmt::format("{:.17g}", *value);
  else if constexpr (std::is_enum_v<T>) return to_string(*value);
  else return fmt::format("{}", *value);
}

template <class T>
void compare(std::vector<std::string>& out, const char* name, const std::optional<T>& stored,
             const std::optional<T>& again) {
  if (stored != again) {
    out.push_back(fmt::format("{}: stored {}, recomputed {}", name, shown(stored), shown(again)));
  }
}

}  // namespace

review::ClassModel rebuild_class_model(const results::ClassRow& stored,
                                       const review::Policy& policy) {
  const auto class_policy = policy.classes.find(stored.asset_class);
  if (class_policy == policy.classes.end()) {
    throw RuntimeFailure("the run's policy has no class '" + stored.asset_class + "'");
  }
  std::optional<fleet::CostCurve> cost_curve;
  if (stored.cost_model) {
    // Only the model, a and g enter predict(); the rest is carried for display.
    cost_curve = fleet::CostCurve{*stored.cost_model,
                                  stored.cost_a.value_or(0),
                                  stored.cost_g.value_or(0),
                                  stored.cost_r2.value_or(0),
                                  static_cast<std::size_t>(stored.asset_years),
                                  0,
                                  static_cast<std::size_t>(stored.assets),
                                  false};
  }
  const fleet::ValueCurve value_curve{stored.value_model, stored.value_start,
                                      stored.value_decline,
                                      static_cast<std::size_t>(stored.valuations_used)};
  review::ClassModel model = review::make_class_model(stored.asset_class, class_policy->second,
                                  static_cast<std::size_t>(stored.assets), std::move(cost_curve),
                                  value_curve, policy.rates, policy.esl_band);
  // Without a cost curve the run's own words say why (there may be years of no usable cost).
  if (!model.cost_curve && stored.note) model.note = *stored.note;
  return model;
}

review::DefenderInputs rebuild_defender_inputs(const results::AssetRow& stored,
                                               const review::ClassModel& model) {
  review::DefenderInputs in;
  in.age_years = stored.age_years;
  in.market_value_now = stored.market_value_now;
  in.market_value_source = stored.market_value_source;
  const int m = stored.cost_years;
  // The row keeps m, r and the factor; z follows from m (fleet/credibility.h rule 3), and the
  // ratio was measured unless rule (5) reported it as exactly 1 with factor 1.
  in.credibility = fleet::Credibility{
      m, stored.cost_ratio, static_cast<double>(m) / (m + fleet::kCredibilityYears),
      stored.credibility_factor,
      m > 0 && !(stored.cost_ratio == 1.0 && stored.credibility_factor == 1.0)};
  in.ownership = review::defender_ownership(model, stored.first_cost, stored.age_years,
                                            stored.market_value_now, stored.credibility_factor);
  return in;
}

review::AssetReview recompute(const results::AssetRow& stored, const review::ClassModel& model,
                              const review::Policy& policy) {
  return review::judge(0, rebuild_defender_inputs(stored, model), model, policy);
}

namespace {

// "9,560.65" -> "9560.65": a run stored before the reasons wrote money with thousands separators
// (as the tables do) gave the same reason.
std::string without_thousands_separators(const std::string& reason) {
  std::string out;
  for (std::size_t i = 0; i < reason.size(); ++i) {
    const bool separator = reason[i] == ',' && i > 0 && i + 1 < reason.size() &&
                           std::isdigit(static_cast<unsigned char>(reason[i - 1])) &&
                           std::isdigit(static_cast<unsigned char>(reason[i + 1]));
    if (!separator) out += reason[i];
  }
  return out;
}

}  // namespace

std::vector<std::string> differences(const results::AssetRow& stored,
                                     const review::AssetReview& again) {
  std::vector<std::string> out;
  const replacement::Decision* d = again.decision ? &*again.decision : nullptr;
  compare(out, "defender_euac", stored.defender_euac,
          d ? std::optional<Money>(d->defender_euac) : std::nullopt);
  compare(out, "challenger_euac", stored.challenger_euac,
          d ? std::optional<Money>(d->challenger_euac) : std::nullopt);
  compare(out, "marginal_cost_next_year", stored.marginal_cost_next_year,
          again.marginal_cost_next_year);
  compare(out, "replace_after_years", stored.replace_after_years,
          d ? std::optional<Years>(d->timing.keep_years) : std::nullopt);
  compare(out, "verdict", std::optional(stored.verdict), std::optional(again.finding.verdict));
  if (without_thousands_separators(stored.reason) !=
      without_thousands_separators(again.finding.reason)) {
    compare(out, "reason", std::optional(stored.reason), std::optional(again.finding.reason));
  }
  compare(out, "basis", std::optional(stored.basis), std::optional(again.basis));
  compare(out, "book_value_now", std::optional<Money>(stored.book_value_now),
          std::optional<Money>(again.book_value_now));
  compare(out, "class_esl_years", stored.class_esl_years, again.class_esl_years);
  compare(out, "defender_best_years", stored.defender_best_years,
          d ? std::optional<Years>(d->defender_best_years) : std::nullopt);
  compare(out, "defender_euac_before_tax", stored.defender_euac_before_tax,
          again.defender_euac_before_tax);
  compare(out, "defender_euac_after_tax", stored.defender_euac_after_tax,
          again.defender_euac_after_tax);
  const review::AtStake* s = again.at_stake ? &*again.at_stake : nullptr;
  compare(out, "delay_cost", stored.delay_cost, s ? s->delay_cost : std::nullopt);
  compare(out, "early_cost", stored.early_cost, s ? std::optional(s->early_cost) : std::nullopt);
  compare(out, "repair_limit", stored.repair_limit,
          s ? std::optional(s->repair_limit) : std::nullopt);
  compare(out, "break_even_price", stored.break_even_price,
          s ? s->break_even_price : std::nullopt);
  compare(out, "break_even_cost_factor", stored.break_even_cost_factor,
          s ? s->break_even_cost_factor : std::nullopt);
  compare(out, "close_call", stored.close_call, s ? std::optional(s->close_call) : std::nullopt);
  return out;
}

std::vector<std::string> class_differences(const results::ClassRow& stored,
                                           const review::ClassModel& again) {
  std::vector<std::string> out;
  const review::EslBand* band = again.band ? &*again.band : nullptr;
  if (stored.esl_band_low) {
    compare(out, "esl_band_low", stored.esl_band_low,
            band ? std::optional(band->low) : std::nullopt);
  }
  if (stored.esl_band_high) {
    compare(out, "esl_band_high", stored.esl_band_high,
            band ? std::optional(band->high) : std::nullopt);
  }
  return out;
}

}  // namespace tenure::explain
