// Several challengers for one defender (SPEC 14): each analysed on both bases, the best on a
// basis (least EUAC, the first listed on ties within kTieTolerance), and the least EUACs C*_k of
// the best one bought k years from now when technology improves by g a year.
//
//   std::vector<AssetAnalysis> analysed = {analyse_asset(diesel, rates), analyse_asset(ev, rates)};
//   std::size_t best = best_challenger(analysed, Basis::after_tax);   // 1 if the electric van wins
//   auto c_star = improved_least_euacs(ev, rates, Basis::after_tax, 0.02, 10);   // k = 0..10
//
// Rules (cited by the code):
//   (1) The best challenger has the least least-EUAC on the basis; ties go to the first listed.
//   (2) A unit bought k years from now is today's unit with every amount scaled by (1 - g)^k:
//       price, operating costs, market values (a fraction of the price, as the class value curve
//       is) and the depreciation method's own amounts (salvage); its economic life is found anew.
#pragma once

#include <cstddef>
#include <span>
#include <string>
#include <vector>

#include "core/types.h"
#include "replacement/case_analysis.h"
#include "replacement/ownership.h"
#include "tax/rates.h"

namespace tenure::replacement {

// Rule (1). `analysed` must not be empty.
std::size_t best_challenger(std::span<const AssetAnalysis> analysed, Basis basis);

// Rule (2): the unit bought `years_from_now` years later; g in [0, 1).
Ownership improved(const Ownership& challenger, double improvement, Years years_from_now);

// The least EUACs on `basis` of the unit bought k = 0..years years from now (rule (2)), and the
// economic life of each.
struct ImprovedChallengers {
  std::vector<Money> least_euac;  // [k] = C*_k
  std::vector<Years> esl_years;   // [k] = its economic life
};
ImprovedChallengers improved_least_euacs(const Ownership& challenger, const tax::Rates& rates,
                                         Basis basis, double improvement, Years years);

// Checks a list of challenger names: not empty, each unique; `where` is the list's JSON path
// ("$.challengers"), errors name the element ("$.challengers[1].name").
void validate_challenger_names(std::span<const std::string> names, const std::string& where);

// Checks g in [0, 1) (`where` names it: "$.improvement").
void validate_improvement(double improvement, const std::string& where);

}  // namespace tenure::replacement
