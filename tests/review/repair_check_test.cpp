// The repair check's rules (review/repair_check.h) and sentences (review/repair_reasons.h) on
// timing present worths T(k) small enough to work by hand, each worked beside its case: the limit
// is T(0) less the least T(k), k >= 1, over the deduction factor; repair up to it and at it,
// replace above it; k* after repairing; a unit due now has no repair worth making; the estimate's
// bounds. Invented numbers.
#include "review/repair_check.h"

#include <gtest/gtest.h>

#include <limits>

#include "core/errors.h"
#include "review/repair_reasons.h"

namespace tenure::review {
namespace {

// T(0..3) = 100, 90, 95, 97: keeping one year is cheapest (k* = 1); by hand the limit is
// (100 - 90) / factor.
const replacement::Timing kKeepOneYear{{100, 90, 95, 97}, 1};
// T(0..2) = 100, 105, 110: replacing now is cheapest (k* = 0).
const replacement::Timing kReplaceNow{{100, 105, 110}, 0};

TEST(WeighRepair, BelowTheLimitIsARepairKeptTheRunsYears) {
  // T after a repair of 4: 100, 94, 99, 101; the least is still at k = 1.
  const RepairWeighing w = weigh_repair(kKeepOneYear, 1.0, 4);
  EXPECT_EQ(w.verdict, RepairVerdict::repair);
  EXPECT_DOUBLE_EQ(w.repair_limit, 10);
  EXPECT_DOUBLE_EQ(w.net_cost, 4);
  EXPECT_EQ(w.keep_years, 1);
  EXPECT_EQ(w.keep_years_if_repaired, 1);
}

TEST(WeighRepair, AtTheLimitIsStillARepair) {
  // T after a repair of 10: 100, 100, 105, 107: T(0) and T(1) tie and the tie rule picks 0, but
  // SPEC 11 repairs when R <= limit (rule (1)), and repaired it is kept 1 year (rule (3)).
  const RepairWeighing w = weigh_repair(kKeepOneYear, 1.0, 10);
  EXPECT_EQ(w.verdict, RepairVerdict::repair);
  EXPECT_EQ(w.keep_years_if_repaired, 1);
}

TEST(WeighRepair, AboveTheLimitIsReplace) {
  // T after a repair of 10.5: 100, 100.5, 105.5, 107.5: replacing now is cheapest.
  const RepairWeighing w = weigh_repair(kKeepOneYear, 1.0, 10.5);
  EXPECT_EQ(w.verdict, RepairVerdict::replace);
  EXPECT_EQ(w.keep_years, 1);
  EXPECT_EQ(w.keep_years_if_repaired, 0);
}

TEST(WeighRepair, AfterTaxTheEstimateWeighsAtItsNetCost) {
  // Factor 0.8: the limit is 10 / 0.8 = 12.5. A repair of 12 costs 9.6 net: T = 100, 99.6, ...
  const RepairWeighing repair = weigh_repair(kKeepOneYear, 0.8, 12);
  EXPECT_DOUBLE_EQ(repair.repair_limit, 12.5);
  EXPECT_DOUBLE_EQ(repair.deduction_factor, 0.8);
  EXPECT_DOUBLE_EQ(repair.net_cost, 9.6);
  EXPECT_EQ(repair.verdict, RepairVerdict::repair);
  EXPECT_EQ(repair.keep_years_if_repaired, 1);
  // 13 costs 10.4 net: T(1) = 100.4 > T(0).
  const RepairWeighing replace = weigh_repair(kKeepOneYear, 0.8, 13);
  EXPECT_DOUBLE_EQ(replace.net_cost, 10.4);
  EXPECT_EQ(replace.verdict, RepairVerdict::replace);
  EXPECT_EQ(replace.keep_years_if_repaired, 0);
}

TEST(WeighRepair, AUnitDueNowHasNoRepairWorthMaking) {
  // Limit 0 (k* = 0); even a free repair leaves T = 100, 105, 110.
  const RepairWeighing w = weigh_repair(kReplaceNow, 1.0, 0);
  EXPECT_EQ(w.repair_limit, 0);
  EXPECT_EQ(w.verdict, RepairVerdict::replace);
  EXPECT_EQ(w.keep_years_if_repaired, 0);
}

TEST(RepairEstimate, IsAFiniteAmountFromZeroTo1e15) {
  EXPECT_NO_THROW(require_repair_estimate(0, "estimate"));
  EXPECT_NO_THROW(require_repair_estimate(1e15, "estimate"));
  for (const double bad :
       {-0.01, 1.0000000000000002e15, std::numeric_limits<double>::infinity(),
        -std::numeric_limits<double>::infinity(), std::numeric_limits<double>::quiet_NaN()}) {
    SCOPED_TRACE(bad);
    try {
      require_repair_estimate(bad, "--estimate");
      ADD_FAILURE() << "expected an InputError";
    } catch (const InputError& e) {
      EXPECT_EQ(std::string(e.what()), "--estimate: must be a finite amount >= 0 and at most 1e15");
    }
  }
}

TEST(RepairReason, EachVerdictSaysItsNumbers) {
  EXPECT_EQ(repair_reason(weigh_repair(kKeepOneYear, 1.0, 4), 4, replacement::Basis::before_tax),
            "Repair: the estimate of 4.00 is within the repair limit of 10.00 on a before-tax "
            "basis; repaired, keeping it 1 year more and then replacing it is cheapest.");
  EXPECT_EQ(repair_reason(weigh_repair(kKeepOneYear, 0.8, 13), 13, replacement::Basis::after_tax),
            "Replace: the estimate of 13.00 is above the repair limit of 12.50 on an after-tax "
            "basis: paying it and keeping the unit costs more than replacing it now.");
  EXPECT_EQ(repair_reason(weigh_repair(kReplaceNow, 1.0, 5), 5, replacement::Basis::before_tax),
            "Replace: even without a repair, replacing it now is cheapest on a before-tax basis, "
            "so its repair limit is 0.00 and the estimate of 5.00 is not worth paying.");
}

TEST(RepairReason, AssetsNotWeighedAndUnknownOnes) {
  EXPECT_EQ(retired_reason("VAN-7", "2025-04-30"),
            "asset 'VAN-7' was retired on 2025-04-30: there is nothing to repair");
  EXPECT_EQ(rejected_reason("VAN-8", 3, "first_cost 0 must be greater than 0"),
            "asset 'VAN-8' was rejected by run 3: first_cost 0 must be greater than 0");
  EXPECT_EQ(not_yet_in_service_reason("VAN-9", "2027-01-15", 3, "2026-11-30"),
            "asset 'VAN-9' goes into service on 2027-01-15, after run 3's as-of date 2026-11-30: "
            "the run did not weigh it");
  EXPECT_EQ(cannot_weigh_repair_reason("GEN-1", "no cost curve"),
            "asset 'GEN-1' cannot be weighed: no cost curve");
  EXPECT_EQ(unknown_asset_rule("NOPE"), "no asset 'NOPE' in the asset relation");
  EXPECT_EQ(std::string(to_string(NotWeighed::not_yet_in_service)), "not_yet_in_service");
  EXPECT_EQ(std::string(to_string(RepairVerdict::repair)), "repair");
}

}  // namespace
}  // namespace tenure::review
