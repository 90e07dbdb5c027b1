// One asset in service in the nightly review (SPEC 6 "Nightly defender" and "Nightly verdict"):
// its age, market value now, credibility-weighted future costs, its defender analysis against
// the class challenger, the optimal replacement timing and a keep / review / replace verdict
// (verdict_rule.h).
//
//   AssetReview r = review_asset(index, data, vans, policy);
//   r.finding.verdict;   // Verdict::review
//   r.finding.reason;    // "Review: at 9 years it is at or past the class's economic life of ..."
#pragma once

#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "fleet/credibility.h"
#include "replacement/case_analysis.h"
#include "review/at_stake.h"
#include "review/class_model.h"
#include "review/fleet_data.h"
#include "review/policy.h"
#include "review/verdict_rule.h"

namespace tenure::review {

// The defender as the engine sees it, and where its numbers came from.
struct DefenderInputs {
  Years age_years;
  Money market_value_now;
  std::string market_value_source;  // "valuation of 2026-05-14" or "class value curve"
  fleet::Credibility credibility;
  replacement::Ownership ownership;  // empty series when the class has no cost curve
};

struct AssetReview {
  std::size_t asset;  // index in FleetData::assets
  DefenderInputs inputs;
  VerdictFinding finding;  // the verdict, each test's figures and the reason
  replacement::Basis basis;
  Money book_value_now;  // basis less the full deductions of its completed years
  // Summary figures, kept when the full analysis below is dropped (policy detail).
  std::optional<Money> defender_euac_before_tax;
  std::optional<Money> defender_euac_after_tax;
  std::optional<Money> marginal_cost_next_year;  // on the basis
  // Present when the class could be analysed (it has a cost curve) and the detail is kept; held
  // by pointer so a fleet's summaries stay small.
  std::unique_ptr<replacement::AssetAnalysis> defender;
  std::optional<replacement::Decision> decision;
  std::optional<AtStake> at_stake;       // present with a decision
  std::optional<Years> class_esl_years;  // the class challenger's ESL on the basis
  std::string challenger;  // the several-challengers form: the chosen one's name; else empty

  bool due() const { return finding.due(); }
};

// The date one year before `as_of` (29 February -> 28 February; 1400-01-01, the first date there
// is, for an as-of date in 1400): valuations dated from it to the as-of date count as the market
// value now.
Date one_year_before(Date as_of);

// The defender's future (SPEC 6, nightly defender): costs on the class curve at ages a+1, a+2,
// ... times its credibility factor, market values on the class value curve times its own first
// cost, weighed for 1..max(1, max_life_years - a) more years; empty series without a cost curve.
replacement::Ownership defender_ownership(const ClassModel& model, Money first_cost, Years age,
                                          Money market_value_now, double credibility_factor);

DefenderInputs defender_inputs(std::size_t asset, const FleetData& data, const ClassModel& model);

// The verdict on a defender described by `inputs` (also how `tenure explain` recomputes a stored
// asset). `asset` is only carried into the result.
AssetReview judge(std::size_t asset, DefenderInputs inputs, const ClassModel& model,
                  const Policy& policy);

AssetReview review_asset(std::size_t asset, const FleetData& data, const ClassModel& model,
                         const Policy& policy);

}  // namespace tenure::review
