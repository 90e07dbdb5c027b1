// The market value now of a nightly defender (SPEC 6 "Nightly defender", review/asset_review.h):
// one_year_before (29 February -> 28 February) and the window of defender_inputs: the latest
// valuation dated from one year before the as-of date up to the as-of date is the market value
// now ("valuation of YYYY-MM-DD"); without one, the class value curve at the asset's age times
// its first cost ("class value curve"). Dates by hand from the calendar; assets are invented.
#include <gtest/gtest.h>

#include <string>
#include <vector>

#include "review/asset_review.h"
#include "review/class_model.h"
#include "review_fixture.h"

namespace tenure::review {
namespace {

using testing::day;

struct YearBeforeRow {
  const char* comment;
  const char* as_of;
  const char* year_before;  // by hand
};

TEST(OneYearBefore, SameDayOfTheYearBefore) {
  const std::vector<YearBeforeRow> rows = {
      {"an ordinary day", "2025-06-30", "2024-06-30"},
      {"29 February falls on 28 February in the common year before", "2024-02-29", "2023-02-28"},
      {"also in a year divisible by 400", "2000-02-29", "1999-02-28"},
      {"28 February stays 28 February, though the year before is a leap year", "2025-02-28",
       "2024-02-28"},
      {"1 March after a leap day stays 1 March", "2025-03-01", "2024-03-01"},
      {"1 March of a leap year", "2024-03-01", "2023-03-01"},
      {"New Year's Day", "2025-01-01", "2024-01-01"},
      {"the last day of a leap year", "2024-12-31", "2023-12-31"},
      {"the last day of a common year", "2025-12-31", "2024-12-31"},
  };
  for (const YearBeforeRow& row : rows) {
    EXPECT_EQ(one_year_before(day(row.as_of)).to_iso(), row.year_before) << row.comment;
  }
}

struct WindowRow {
  const char* comment;
  const char* as_of;
  std::vector<Valuation> valuations;  // in reading order
  Money market_value_now;             // by hand
  std::string source;
};

// First cost 10,000 at age 3 on the policy curve of decline 0.2 (invented): the class value
// curve gives 10,000 x 0.8^3 = 5,120 (by hand).
constexpr Money kFirstCost = 10000;
constexpr Money kCurveValue = 5120;
const std::string kCurve = "class value curve";

const std::vector<WindowRow>& window_rows() {
  static const std::vector<WindowRow> rows = {
      {"no valuation at all: the class curve", "2025-06-30", {}, kCurveValue, kCurve},
      {"dated exactly one year before the as-of date: counts",
       "2025-06-30",
       {{day("2024-06-30"), 6000}},
       6000,
       "valuation of 2024-06-30"},
      {"a day older than that: does not count",
       "2025-06-30",
       {{day("2024-06-29"), 6000}},
       kCurveValue,
       kCurve},
      {"dated on the as-of date: counts",
       "2025-06-30",
       {{day("2025-06-30"), 7100}},
       7100,
       "valuation of 2025-06-30"},
      {"dated after the as-of date: does not count",
       "2025-06-30",
       {{day("2025-07-01"), 6000}},
       kCurveValue,
       kCurve},
      {"the latest of several within the window, whatever their order",
       "2025-06-30",
       {{day("2024-09-01"), 7000}, {day("2025-03-01"), 6500}, {day("2023-01-01"), 9000}},
       6500,
       "valuation of 2025-03-01"},
      {"the latest first in reading order",
       "2025-06-30",
       {{day("2025-03-01"), 6500}, {day("2024-09-01"), 7000}},
       6500,
       "valuation of 2025-03-01"},
      {"a newer one after the as-of date is passed over for one within the window",
       "2025-06-30",
       {{day("2025-01-15"), 6200}, {day("2025-07-01"), 9999}},
       6200,
       "valuation of 2025-01-15"},
      {"only older ones: the class curve",
       "2025-06-30",
       {{day("2023-06-30"), 8000}, {day("2024-06-29"), 7500}},
       kCurveValue,
       kCurve},
      {"as of 29 February, one dated 28 February of the year before counts",
       "2024-02-29",
       {{day("2023-02-28"), 6100}},
       6100,
       "valuation of 2023-02-28"},
      {"as of 29 February, one dated 27 February of the year before does not",
       "2024-02-29",
       {{day("2023-02-27"), 6100}},
       kCurveValue,
       kCurve},
      {"as of 28 February, one dated 28 February of the leap year before counts",
       "2025-02-28",
       {{day("2024-02-28"), 6300}},
       6300,
       "valuation of 2024-02-28"},
      {"as of 1 March, one dated 29 February of the year before is a day too old",
       "2025-03-01",
       {{day("2024-02-29"), 6300}},
       kCurveValue,
       kCurve},
  };
  return rows;
}

TEST(DefenderInputs, MarketValueNowFromTheValuationWindow) {
  const ClassPolicy class_policy{18500, 10, depreciation::StraightLineSpec{10, 0}, 0.2,
                                 fleet::CostModelChoice::linear};
  const tax::Rates rates = tax::Rates::make(0.10, 0.25);
  const fleet::CostCurve curve{fleet::CostModel::linear, 1000, 200, 0.9, 30, 0, 10, false};
  const ClassModel model = make_class_model("pump-duty", class_policy, 1, curve,
                                            fleet::policy_value_curve(0.2), rates, 0.02);
  for (const WindowRow& row : window_rows()) {
    SCOPED_TRACE(row.comment);
    const Date as_of = day(row.as_of);
    FleetData data(as_of, 0);
    // In service on 10 January three years before: age 3 on every as-of date above (by hand).
    const Date in_service = *Date::from_ymd(as_of.year() - 3, 1, 10);
    const std::size_t asset =
        testing::add_asset(data, "PU-0001", "pump-duty", in_service, kFirstCost, {});
    data.valuations[asset] = row.valuations;
    const DefenderInputs in = defender_inputs(asset, data, model);
    EXPECT_EQ(in.age_years, 3);
    EXPECT_DOUBLE_EQ(in.market_value_now, row.market_value_now);
    EXPECT_EQ(in.market_value_source, row.source);
    // The market value now is also the defender's value now in its ownership.
    EXPECT_EQ(in.ownership.value_now, in.market_value_now);
  }
}

TEST(DefenderInputs, CurveValueUsesTheAssetsOwnFirstCostAndAge) {
  // Policy curve of decline 0.25 (invented): at age 2, 0.75^2 = 0.5625 of first cost; 40,000
  // gives 22,500 (by hand).
  const ClassPolicy class_policy{52000, 12, depreciation::MacrsSpec{5}, 0.25,
                                 fleet::CostModelChoice::linear};
  const tax::Rates rates = tax::Rates::make(0.10, 0.25);
  const ClassModel model = make_class_model("van-delivery", class_policy, 1, std::nullopt,
                                            fleet::policy_value_curve(0.25), rates, 0.02);
  FleetData data(day("2025-06-30"), 0);
  const std::size_t asset =
      testing::add_asset(data, "VN-0001", "van-delivery", day("2023-06-30"), 40000, {});
  const DefenderInputs in = defender_inputs(asset, data, model);
  EXPECT_EQ(in.age_years, 2);  // by hand: second anniversary on the as-of date
  EXPECT_DOUBLE_EQ(in.market_value_now, 22500);
  EXPECT_EQ(in.market_value_source, "class value curve");
}

}  // namespace
}  // namespace tenure::review
