// The capital-recovery factor against an independent library of spreadsheet functions,
// @formulajs/formulajs (pinned in tests/reference/package.json), run for real under Node.js by
// tests/reference/spreadsheet_values.js: PMT(rate, nper, pv) = -pv * (A/P, rate, nper), on a grid
// of invented loans with negative, zero and ordinary rates. Tolerance: 1e-9 relative
// (kReferenceRelative). Skipped without node or the installed library (`npm ci --prefix
// tests/reference`), failed instead when CI is set.
#include <gtest/gtest.h>

#include <string>

#include "interest/factors.h"
#include "tests/reference/spreadsheet_values.h"

namespace tenure::interest {
namespace {

class SpreadsheetPmt : public tenure::testing::SpreadsheetReference {};

TEST_F(SpreadsheetPmt, PmtIsMinusPresentValueTimesCapitalRecovery) {
  const nlohmann::json& loans = values().at("pmt");
  ASSERT_FALSE(loans.empty());
  for (const nlohmann::json& row : loans) {
    const double rate = row.at("rate").get<double>();
    const double nper = row.at("nper").get<double>();
    const double pv = row.at("pv").get<double>();
    const double expected = row.at("pmt").get<double>();
    SCOPED_TRACE("rate=" + std::to_string(rate) + " nper=" + std::to_string(nper) +
                 " pv=" + std::to_string(pv));
    EXPECT_NEAR(-pv * ap(rate, nper), expected, tenure::testing::reference_tolerance(expected));
  }
}

}  // namespace
}  // namespace tenure::interest
