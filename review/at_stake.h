// What is at stake for one defender against its challenger (SPEC 11), on the verdict's basis:
// the costs of waiting a year or replacing early and the largest repair still worth making
// (replacement/stakes.h), the break-even price and cost factor (replacement/break_even.h), and
// whether the verdict is a close call. The nightly review, explain, the report and `tenure case`
// all read it from here.
//
//   AtStake s = at_stake(decision, defender_analysis, defender, vans.price_lines,
//                        vans.policy->challenger_first_cost, policy.rates, policy.review_margin);
//   s.close_call;   // the price at which the verdict flips is within the margin of the price
//
// Rule (cited by the code):
//   (1) close_call: the break-even price lies within review_margin of the challenger's price,
//       |P_be / P - 1| <= review_margin; false when there is no break-even price.
//   (2) With improving challengers (SPEC 14: the decision weighs C*_k by year) there is no
//       break-even price or cost factor: their exact lines assume the challenger bought at any
//       time is today's (k* = 0 exactly when C* <= D* holds only then). The stakes of the timing
//       (delay, early, repair limit) read T(k) and stand.
#pragma once

#include <optional>
#include <span>

#include "core/types.h"
#include "replacement/break_even.h"
#include "replacement/case_analysis.h"
#include "replacement/stakes.h"
#include "tax/rates.h"

namespace tenure::review {

struct AtStake {
  std::optional<Money> delay_cost;
  Money early_cost = 0;
  Money repair_limit = 0;
  std::optional<Money> break_even_price;
  std::optional<double> break_even_cost_factor;
  bool close_call = false;  // rule (1)
  bool improving = false;   // rule (2): the challengers improve, so no break-evens are given
  // Where the break-evens come from, for explain: the challenger life n and the years kept k
  // whose lines give them (replacement/break_even.h).
  std::optional<Years> break_even_price_life;
  std::optional<Years> break_even_factor_years;
};

// `challenger_price_lines` are replacement::price_lines of the challenger on the decision's
// basis, `challenger_price` its first cost; `defender` is what `defender_analysis` analysed.
AtStake at_stake(const replacement::Decision& decision,
                 const replacement::AssetAnalysis& defender_analysis,
                 const replacement::Ownership& defender,
                 std::span<const replacement::Line> challenger_price_lines, Money challenger_price,
                 const tax::Rates& rates, double review_margin);

}  // namespace tenure::review
