// The case file of `tenure case` (SPEC 5): JSON text in, a replacement::Case out; and a
// CaseResult written as JSON with money positive for cost, at full double precision.
//
//   replacement::Case c = read_case(text_of_a_case_file);
//   nlohmann::json out = case_result_to_json(c, replacement::analyse(c));
//   out["challenger"]["before_tax"]["esl_years"];
//
// Case keys: marr, income_tax_rate (required), after_tax_marr, capital_gains_tax_rate
// (optional), challenger (required), defender (optional), study_period_years (optional, whole,
// >= 1), lead_time_years (optional, whole, 0..100, default 1) and review_margin (optional, in
// [0, 1), default 0.05) as in a policy. Challenger: first_cost (> 0), operating_costs (non-empty, >= 0), market_values (as many,
// >= 0), depreciation. Defender: the same plus age_years (whole, >= 0) and market_value_now (>= 0).
// Several challengers (SPEC 14), instead of challenger: challengers, a non-empty list of the same
// objects plus name (unique, not empty) and cost_factor (> 0, default 1; scales its
// operating_costs); improvement (optional, in [0, 1), default 0).
// Unknown keys, wrong types and missing fields are InputErrors naming the JSON path.
#pragma once

#include <string_view>

#include <nlohmann/json.hpp>

#include "replacement/case_analysis.h"
#include "review/case_verdict.h"
#include "tax/rates.h"

namespace tenure::formats {

replacement::Case read_case(std::string_view json_text);

// The result document of `result` = replacement::analyse(input). Keys: basis, rates, challenger
// {before_tax, after_tax (when taxed), cash_flows}, defender {before_tax, after_tax,
// opportunity_cost, cash_flows} and decision (with a defender: verdict, reason, k* and what is at
// stake, review/case_verdict.h; with improvement > 0 challenger_by_year), study_period (when
// asked); with several challengers, challengers (each one's least EUAC and economic life) and
// chosen_challenger (its name; "challenger" is then its full analysis); improvement when > 0.
nlohmann::json case_result_to_json(const replacement::Case& input,
                                   const replacement::CaseResult& result);

}  // namespace tenure::formats
