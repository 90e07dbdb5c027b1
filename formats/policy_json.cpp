// Reading policy files (see policy_json.h).
#include "formats/policy_json.h"

#include <fmt/format.h>

#include "core/checks.h"
#include "core/errors.h"
#include "formats/depreciation_json.h"
#include "formats/json_path.h"
#include "formats/json_text.h"
#include "replacement/challengers.h"

namespace tenure::formats {
namespace {

using nlohmann::json;

constexpr Years kMaxLifeYears = 100;

std::string identifier(const JsonObject& sources, std::string_view key, std::string fallback) {
  if (!sources.has(key)) return fallback;
  std::string name = sources.string(key);
  if (!is_plain_identifier(name)) {
    throw InputError(sources.path_of(key),
                     "must be a plain SQL identifier (letters, digits and _, not starting with a "
                     "digit); map other names with a CREATE VIEW");
  }
  return name;
}

review::Sources read_sources(const JsonObject& sources) {
  sources.allow_only({"assets", "costs", "valuations"});
  review::Sources defaults;
  return {identifier(sources, "assets", defaults.assets),
          identifier(sources, "costs", defaults.costs),
          identifier(sources, "valuations", defaults.valuations)};
}

// A market_value object's annual_decline, in [0, 1).
Rate read_annual_decline(const JsonObject& value) {
  value.allow_only({"annual_decline"});
  const Rate decline = value.number("annual_decline");
  if (decline < 0 || decline >= 1) {
    throw InputError(value.path_of("annual_decline"), "must be in [0, 1)");
  }
  return decline;
}

Money read_price(const JsonObject& c, std::string_view key) {
  const Money price = c.number(key);
  require_positive(price, c.path_of(key));
  require_amount(price, c.path_of(key));
  return price;
}

// One of the several-challengers form (SPEC 14); its depreciation, when given, is checked on
// its own price.
review::ChallengerPolicy read_challenger(const JsonObject& c) {
  c.allow_only({"name", "first_cost", "cost_factor", "depreciation", "market_value"});
  review::ChallengerPolicy challenger{c.string("name"), read_price(c, "first_cost")};
  challenger.cost_factor = c.optional_number("cost_factor").value_or(1);
  require_positive(challenger.cost_factor, c.path_of("cost_factor"));
  if (const auto spec = c.optional_object("depreciation")) {
    challenger.depreciation = read_depreciation(*spec);
    make_checked_method(*challenger.depreciation, challenger.first_cost, spec->path());
  }
  if (const auto value = c.optional_object("market_value")) {
    challenger.annual_decline = read_annual_decline(*value);
  }
  return challenger;
}

std::vector<review::ChallengerPolicy> read_challengers(const JsonObject& c) {
  std::vector<review::ChallengerPolicy> challengers;
  std::vector<std::string> names;
  for (const JsonObject& challenger : c.objects("challengers")) {
    challengers.push_back(read_challenger(challenger));
    names.push_back(challengers.back().name);
  }
  replacement::validate_challenger_names(names, c.path_of("challengers"));
  return challengers;
}

review::ClassPolicy read_class(const JsonObject& c) {
  c.allow_only({"challenger_first_cost", "challengers", "improvement", "max_life_years",
                "depreciation", "market_value", "cost_model"});
  review::ClassPolicy policy{};
  if (c.has("challengers")) {
    if (c.has("challenger_first_cost")) {
      throw InputError(c.path_of("challengers"),
                       "give either challenger_first_cost or challengers, not both");
    }
    policy.challengers = read_challengers(c);
    policy.challenger_first_cost = policy.challengers.front().first_cost;
  } else {
    policy.challenger_first_cost = read_price(c, "challenger_first_cost");
  }
  policy.improvement = c.optional_number("improvement").value_or(0);
  replacement::validate_improvement(policy.improvement, c.path_of("improvement"));
  policy.max_life_years = c.whole_number("max_life_years", 1, kMaxLifeYears);
  policy.depreciation = read_depreciation(c.object("depreciation"));
  make_checked_method(policy.depreciation, policy.challenger_first_cost, c.path_of("depreciation"));
  policy.annual_decline = read_annual_decline(c.object("market_value"));
  policy.cost_model = fleet::CostModelChoice::automatic;
  if (c.has("cost_model")) {
    const std::string model = c.string("cost_model");
    const auto choice = fleet::cost_model_choice_from_name(model);
    if (!choice) {
      throw InputError(c.path_of("cost_model"),
                       fmt::format("unknown cost model '{}' (expected one of linear, geometric, "
                                   "auto)",
                                   model));
    }
    policy.cost_model = *choice;
  }
  return policy;
}

review::Detail read_detail(const JsonObject& root) {
  if (!root.has("detail")) return review::Detail::none;
  const std::string text = root.string("detail");
  if (text == "none") return review::Detail::none;
  if (text == "due") return review::Detail::due;
  if (text == "all") return review::Detail::all;
  throw InputError(root.path_of("detail"),
                   fmt::format("unknown detail '{}' (expected one of none, due, all)", text));
}

}  // namespace

review::Policy read_policy(std::string_view json_text) {
  const json document = parse_json_text(json_text);
  const JsonObject root(document, "$");
  root.allow_only({"marr", "income_tax_rate", "after_tax_marr", "capital_gains_tax_rate",
                   "cost_escalation", "lead_time_years", "review_margin", "esl_band", "sources",
                   "classes", "detail"});
  review::Policy policy{};
  const double marr = root.number("marr");
  const double tax_rate = root.number("income_tax_rate");
  policy.rates = tax::Rates::make(marr, tax_rate, root.optional_number("after_tax_marr"),
                                  root.optional_number("capital_gains_tax_rate"));
  policy.cost_escalation = root.optional_number("cost_escalation").value_or(0.0);
  if (policy.cost_escalation <= -1 || policy.cost_escalation >= 1) {
    throw InputError(root.path_of("cost_escalation"), "must be in (-1, 1)");
  }
  policy.lead_time_years =
      root.optional_whole_number("lead_time_years", 0, kMaxLifeYears).value_or(1);
  policy.review_margin = root.optional_number("review_margin").value_or(0.05);
  if (policy.review_margin < 0 || policy.review_margin >= 1) {
    throw InputError(root.path_of("review_margin"), "must be in [0, 1)");
  }
  policy.esl_band = root.optional_number("esl_band").value_or(0.02);
  if (policy.esl_band < 0 || policy.esl_band >= 1) {
    throw InputError(root.path_of("esl_band"), "must be in [0, 1)");
  }
  if (const auto sources = root.optional_object("sources")) policy.sources = read_sources(*sources);
  policy.detail = read_detail(root);
  const JsonObject classes = root.object("classes");
  const json& members = document.at("classes");
  if (members.empty()) throw InputError(classes.path(), "must name at least one asset class");
  for (const auto& [name, value] : members.items()) {
    if (name.empty()) throw InputError(classes.path(), "an asset class name must not be empty");
    policy.classes.emplace(name, read_class(JsonObject(value, key_path(classes.path(), name))));
  }
  return policy;
}

}  // namespace tenure::formats
