// The sections of explain_text.h, one function each, shared by explain_text.cpp (the asset, its
// class and its verdict) and analysis_text.cpp (the year-by-year tables). Internal to explain/.
#pragma once

#include <optional>
#include <string>

#include "depreciation/method.h"
#include "explain/explanation.h"
#include "formats/analysis_tables.h"

namespace tenure::explain::text {

// "Title\n" + body: the form of every section.
std::string section(const std::string& title, const std::string& body);
// "macrs, recovery_years 7" from the depreciation object of the policy.
std::string depreciation_words(const depreciation::Spec& spec);
// basis_words ("after-tax") and marked (" *" on a curve's best point), from analysis_tables.h.
using formats::basis_words;
using formats::marked;

std::string inputs(const Explanation& e);
std::string rates_and_money(const Explanation& e);
std::string class_curves(const Explanation& e);
std::string own_costs(const Explanation& e);
std::string verdict_rule(const Explanation& e);
// What is at stake, each figure with its formula and the numbers put in it (stake_text.cpp).
std::string at_stake(const Explanation& e);

// The year-by-year tables (analysis_text.cpp); they need the recomputed defender analysis.
std::string defender_future(const Explanation& e);
std::string selling_now(const Explanation& e);
// The after-tax cost of each year kept, with its present worth at `rate`; a sale at each year's
// end.
std::string kept_flows(const std::string& who, const replacement::AfterTaxTable& table, Rate rate);
std::string sold_flows(const std::string& who, const replacement::AfterTaxTable& table);
// The sections a PW of cost is reconciled with: where the money at the start comes from, the
// years kept and the years sold.
struct PwCostSections {
  std::string start;  // "given up now (section 6)"
  std::string kept;   // "section 7"
  std::string sold;   // "section 8"
};
// The note under an EUAC table that ties its PW of cost to the cash-flow tables, with the numbers
// of n = 2 put in it.
std::string pw_cost_tie(const replacement::AssetAnalysis& a, const PwCostSections& from);
// The EUAC table, its formulas, and, when `tie` is given and the basis is after tax, the tie.
std::string euac_by_life(const std::string& title, const replacement::AssetAnalysis& a,
                         replacement::Basis basis, Years age,
                         const std::optional<PwCostSections>& tie);
std::string timing(const Explanation& e);

}  // namespace tenure::explain::text
