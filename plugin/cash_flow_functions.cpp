// tenure_present_worth(i, cash_flows) and tenure_euac(i, cash_flows): the present worth and the
// equivalent uniform annual amount of a list of end-of-year amounts, for report writers who hold
// a cash-flow series in a table. cash_flows is a JSON array of numbers: the amounts at t = 0, 1,
// ..., n, in that order (SQLite's json_group_array builds one from rows).
//
//   tenure_present_worth(i, [a0, ..., an]) = sum of a_t (P/F, i, t)
//   tenure_euac(i, [a0, ..., an])          = tenure_present_worth(i, ...) * (A/P, i, n), n >= 1
//
// The first amount is at t = 0, undiscounted. A spreadsheet's NPV(rate, v1, ..., vn) discounts
// its first value one period (t = 1); NPV(i, a1, ..., an) + a0 is
// tenure_present_worth(i, [a0, a1, ..., an]), and NPV(i, v1, ..., vn) alone is
// tenure_present_worth(i, [0, v1, ..., vn]).
//
// The amounts keep the sign you give them. For an equivalent uniform annual cost (EUAC) give
// costs positive and money received (a resale) negative, as tenure does everywhere.
//
// Usage:
//   SELECT round(tenure_present_worth(0.10, '[-1000, 500, 500, 500]'), 2);   -- 243.43
//   -- Buy at 60000, run it for 3 years, sell it for 29000 at the end of year 3:
//   SELECT round(tenure_euac(0.10, '[60000, 4000, 5500, -22000]'), 2);   -- 20770.39
//   -- From rows (year, amount) of a table:
//   SELECT round(tenure_euac(0.10, json_group_array(amount)), 2)
//     FROM (SELECT amount FROM van_costs ORDER BY year);
//
// Errors name the rule:
//   tenure_present_worth: 2nd argument (cash_flows) must be a JSON array of numbers
//   tenure_present_worth: 2nd argument (cash_flows) must be a JSON array of numbers ([1] is not)
//   tenure_euac: 2nd argument (cash_flows) must hold at least 2 amounts (t = 0 and t = 1)
//   tenure_euac: 1st argument (i) must be a rate greater than -1
//
// Both are deterministic and innocuous.
#include <cmath>
#include <string>
#include <vector>

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "interest/factors.h"
#include "plugin/functions.h"
#include "plugin/sql_arguments.h"

namespace tenure::plugin {
namespace {

const Signature kPresentWorth{"tenure_present_worth", {"i", "cash_flows"}};
const Signature kEuac{"tenure_euac", {"i", "cash_flows"}};

constexpr const char* kArrayRule = "must be a JSON array of numbers";

std::vector<Money> amounts(const Arguments& args) {
  const nlohmann::json list =
      nlohmann::json::parse(args.text("cash_flows"), nullptr, /*allow_exceptions=*/false);
  if (!list.is_array() || list.empty()) throw InputError("cash_flows", kArrayRule);
  std::vector<Money> out;
  out.reserve(list.size());
  for (const nlohmann::json& item : list) {
    if (!item.is_number() || !std::isfinite(item.get<double>())) {
      throw InputError("cash_flows", fmt::format("{} ([{}] is not)", kArrayRule, out.size()));
    }
    out.push_back(item.get<double>());
  }
  return out;
}

Money present_worth(Rate i, const std::vector<Money>& flows) {
  Money sum = 0;
  for (std::size_t t = 0; t < flows.size(); ++t) {
    sum += flows[t] * interest::pf(i, static_cast<double>(t));
  }
  return sum;
}

}  // namespace

void present_worth_function(sqlite3_context* context, int argc, sqlite3_value** argv) {
  guarded(context, kPresentWorth, [&] {
    const Arguments args(kPresentWorth, argc, argv);
    const Rate i = args.number("i");
    sqlite3_result_double(context, present_worth(i, amounts(args)));
  });
}

void euac_function(sqlite3_context* context, int argc, sqlite3_value** argv) {
  guarded(context, kEuac, [&] {
    const Arguments args(kEuac, argc, argv);
    const Rate i = args.number("i");
    const std::vector<Money> flows = amounts(args);
    if (flows.size() < 2) {
      throw InputError("cash_flows", "must hold at least 2 amounts (t = 0 and t = 1)");
    }
    const double n = static_cast<double>(flows.size() - 1);
    sqlite3_result_double(context, present_worth(i, flows) * interest::ap(i, n));
  });
}

}  // namespace tenure::plugin
