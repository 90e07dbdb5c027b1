// Break-evens in closed form (SPEC 11): the challenger price, and the factor on the defender's
// operating costs, at which replacing now and keeping cost the same. Each EUAC involved is affine
// in the figure that moves, so the break-even is read off lines, not searched for:
//
//   (1) Replacing now is cheapest exactly when C* <= D* (C*, D*: the least EUACs of challenger and
//       defender on the basis): T(0) = C*/i <= T(k) for every k reduces to C* <= EUAC_D(k).
//   (2) Price: the challenger's EUAC(n) = alpha_n P + beta_n for its price P, the same unit at
//       another price: its market values the same fractions of P (as the class value curve makes
//       them), its depreciation on P with any salvage the same fraction of P
//       (depreciation::Method::scaled), its operating costs as they are.
//       C*(P) <= D* exactly when P <= max over n of (D* - beta_n) / alpha_n: that is P_be.
//   (3) Cost factor: the defender's EUAC(k; f) = f a_k + b_k with its operating costs times f:
//       a_k = (1 - t) (sum of c_j (P/F, i, j), j <= k) (A/P, i, k), t the income tax rate after tax
//       and 0 before (operating costs are deductible, the firm has other income). C* <= D*(f)
//       exactly when f >= max over k of (C* - b_k) / a_k: that is f_be (none when some year with
//       no operating cost, a_k = 0, is cheaper than C* whatever f is).
//
//   auto lines = price_lines(challenger, rates, Basis::after_tax);
//   break_even_price(lines, defender_least_euac);   // P_be, or none outside (0, 1e15]
#pragma once

#include <optional>
#include <span>
#include <vector>

#include "core/types.h"
#include "replacement/case_analysis.h"
#include "replacement/ownership.h"
#include "tax/rates.h"

namespace tenure::replacement {

// y = slope x + intercept: an EUAC as a function of the figure that moves.
struct Line {
  double slope;
  double intercept;
};

// A break-even and the line it comes from (0-based: the life n - 1, or the years kept k - 1).
struct Crossing {
  double value;
  std::size_t line;
};

// Rule (2): the challenger's EUAC(n), n = 1..N, against its price. `analysed` is
// analyse_asset(challenger, rates).
std::vector<Line> price_lines(const Ownership& challenger, const AssetAnalysis& analysed,
                              const tax::Rates& rates, Basis basis);
// Rule (3): the defender's EUAC(k), k = 1..M, against the factor on its operating costs.
std::vector<Line> cost_factor_lines(const Ownership& defender, const AssetAnalysis& analysed,
                                    const tax::Rates& rates, Basis basis);

// P_be of rule (2); none when it does not lie in (0, kMaxAmount].
std::optional<Crossing> break_even_price(std::span<const Line> challenger,
                                         Money defender_least_euac);
// f_be of rule (3); none when it is not > 0 or no factor makes replacing now cheapest.
std::optional<Crossing> break_even_cost_factor(std::span<const Line> defender,
                                               Money challenger_least_euac);

}  // namespace tenure::replacement
