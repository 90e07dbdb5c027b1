// The verdict on a case file's defender and what is at stake (SPEC 6 and 11), by the same rules
// and words as the nightly review: its own age against the challenger's economic life, the case's
// lead time (default 1 year) and review margin (default 0.05).
//
//   replacement::Case c = formats::read_case(text);
//   CaseVerdict v = case_verdict(c, replacement::analyse(c));
//   v.finding.verdict;        // Verdict::review
//   v.at_stake.delay_cost;    // what waiting a year past k* costs
#pragma once

#include "replacement/case_analysis.h"
#include "review/at_stake.h"
#include "review/verdict_rule.h"

namespace tenure::review {

struct CaseVerdict {
  VerdictFinding finding;
  AtStake at_stake;
};

// `result` is replacement::analyse(input); it must have a decision (the case has a defender).
CaseVerdict case_verdict(const replacement::Case& input, const replacement::CaseResult& result);

}  // namespace tenure::review
