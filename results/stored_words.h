// The words each stored enum is written as in the tenure_ tables, for results/column.h: the
// engine's own names where it has them (review::to_string(Verdict), fleet::name(CostModel), ...),
// so a word is spelled in one place.
//
//   StoredWords<review::Verdict>::word(review::Verdict::keep);   // "keep"
#pragma once

#include <string_view>

#include "fleet/cost_curve.h"
#include "fleet/value_curve.h"
#include "replacement/case_analysis.h"
#include "results/column.h"
#include "results/rows.h"
#include "review/verdict_rule.h"

namespace tenure::results {

template <>
struct StoredWords<review::Verdict> {
  static constexpr review::Verdict values[] = {review::Verdict::keep, review::Verdict::review,
                                               review::Verdict::replace};
  static std::string_view word(review::Verdict v) { return review::to_string(v); }
};

template <>
struct StoredWords<replacement::Basis> {
  static constexpr replacement::Basis values[] = {replacement::Basis::before_tax,
                                                  replacement::Basis::after_tax};
  static std::string_view word(replacement::Basis b) { return replacement::to_string(b); }
};

template <>
struct StoredWords<fleet::CostModel> {
  static constexpr fleet::CostModel values[] = {fleet::CostModel::linear,
                                                fleet::CostModel::geometric};
  static std::string_view word(fleet::CostModel m) { return fleet::name(m); }
};

template <>
struct StoredWords<fleet::ValueModel> {
  static constexpr fleet::ValueModel values[] = {fleet::ValueModel::fitted,
                                                 fleet::ValueModel::policy};
  static std::string_view word(fleet::ValueModel m) { return fleet::name(m); }
};

template <>
struct StoredWords<MoneyTerms> {
  static constexpr MoneyTerms values[] = {MoneyTerms::real, MoneyTerms::nominal};
  static std::string_view word(MoneyTerms m) { return to_string(m); }
};

template <>
struct StoredWords<RunStatus> {
  static constexpr RunStatus values[] = {RunStatus::ok, RunStatus::failed};
  static std::string_view word(RunStatus s) { return to_string(s); }
};

template <>
struct StoredWords<Role> {
  static constexpr Role values[] = {Role::challenger, Role::defender};
  static std::string_view word(Role r) { return to_string(r); }
};

}  // namespace tenure::results
