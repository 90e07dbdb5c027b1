// The stored rows of what the nightly review computed (review/fleet_review.h): one class's row
// and one asset's row, and the EUAC-curve and cash-flow rows of an analysed asset. The writer in
// db/ stores exactly these.
//
//   AssetRow row = asset_row(review, data.assets[review.asset]);
//   for (const CurveRow& point : curve_rows(vans.asset_class, std::nullopt, Role::challenger,
//                                           *vans.challenger)) ...
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "replacement/case_analysis.h"
#include "results/rows.h"
#include "review/asset_review.h"
#include "review/class_model.h"
#include "review/fleet_data.h"
#include "review/policy.h"

namespace tenure::results {

// The decision basis and the money terms of a run under `policy`.
replacement::Basis basis_of(const review::Policy& policy);
MoneyTerms money_of(const review::Policy& policy);

ClassRow class_row(const review::ClassModel& model);
AssetRow asset_row(const review::AssetReview& review, const review::AssetRecord& record);

// The EUAC curve points of an analysed asset, before tax then (when taxed) after tax.
std::vector<CurveRow> curve_rows(const std::string& asset_class,
                                 const std::optional<std::string>& asset_id, Role role,
                                 const replacement::AssetAnalysis& analysis);
// Its after-tax cash-flow table, a row per year kept.
std::vector<CashFlowRow> cash_flow_rows(const std::string& asset_class,
                                        const std::optional<std::string>& asset_id, Role role,
                                        const replacement::AfterTaxTable& table);

}  // namespace tenure::results
