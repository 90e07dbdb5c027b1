// Depreciation schedules as JSON and as a table, with and without a disposal year.
#include <gtest/gtest.h>

#include "formats/caution.h"
#include "formats/schedule_json.h"

namespace tenure::formats {
namespace {

using namespace tenure::depreciation;

constexpr double kTol = 1e-9;

TEST(ScheduleJson, MacrsRowsFollowTheTable) {
  const Spec spec = MacrsSpec{5};
  const Schedule schedule(*make_method(spec), 10000);
  const nlohmann::json out = schedule_to_json(spec, schedule);
  EXPECT_EQ(out["method"], "macrs");
  EXPECT_EQ(out["recovery_years"], 5);
  EXPECT_EQ(out["basis"], 10000.0);
  EXPECT_FALSE(out.contains("disposal_year"));
  // IRS Publication 946, Table A-1, 5-year property: 20.00, 32.00, 19.20, 11.52, 11.52, 5.76 %.
  const std::vector<double> percent = {20.00, 32.00, 19.20, 11.52, 11.52, 5.76};
  ASSERT_EQ(out["rows"].size(), percent.size());
  double book = 10000;
  for (std::size_t k = 0; k < percent.size(); ++k) {
    book -= percent[k] * 100;
    EXPECT_EQ(out["rows"][k]["year"], k + 1);
    EXPECT_NEAR(out["rows"][k]["depreciation"].get<double>(), percent[k] * 100, kTol);
    EXPECT_NEAR(out["rows"][k]["book_value"].get<double>(), book, 1e-6);
  }
}

TEST(ScheduleJson, DisposalYearTakesTheDisposalRule) {
  // SPEC 6: MACRS takes half of year 3's 19.20% when sold at its end (Pub 946 half-year rule).
  const Spec spec = MacrsSpec{5};
  const Schedule schedule(*make_method(spec), 10000);
  const nlohmann::json out = schedule_to_json(spec, schedule, 3);
  EXPECT_EQ(out["disposal_year"], 3);
  ASSERT_EQ(out["rows"].size(), 3u);
  EXPECT_NEAR(out["rows"][2]["depreciation"].get<double>(), 960, kTol);
  EXPECT_NEAR(out["rows"][2]["book_value"].get<double>(), 3840, kTol);
  // Book methods take the full year (closed form: (10000 - 0) / 5 = 2000 a year).
  const Spec sl = StraightLineSpec{5, 0};
  const nlohmann::json book = schedule_to_json(sl, Schedule(*make_method(sl), 10000), 2);
  EXPECT_NEAR(book["rows"][1]["depreciation"].get<double>(), 2000, kTol);
  EXPECT_NEAR(book["rows"][1]["book_value"].get<double>(), 6000, kTol);
}

TEST(ScheduleJson, DisposalAfterTheLastYearDeductsNothingMore) {
  const Spec spec = StraightLineSpec{2, 0};
  const nlohmann::json out = schedule_to_json(spec, Schedule(*make_method(spec), 1000), 4);
  ASSERT_EQ(out["rows"].size(), 4u);
  EXPECT_EQ(out["rows"][3]["depreciation"].get<double>(), 0);
  EXPECT_EQ(out["rows"][3]["book_value"].get<double>(), 0);
}

TEST(ScheduleTable, ShowsParametersRowsAndTheCaution) {
  const Spec spec = DecliningBalanceSpec{5, 2.0, 0, true};
  const std::string text = schedule_to_table(spec, Schedule(*make_method(spec), 10000), 3);
  EXPECT_NE(text.find("declining_balance"), std::string::npos);
  EXPECT_NE(text.find("switch_to_straight_line true"), std::string::npos);
  EXPECT_NE(text.find("basis 10,000.00"), std::string::npos);
  // Double declining balance on 10000 over 5 years: 4000, 2400, 1440 (closed form, 40% a year).
  EXPECT_NE(text.find("     1       4,000.00     6,000.00\n"), std::string::npos) << text;
  EXPECT_NE(text.find("     3       1,440.00     2,160.00\n"), std::string::npos) << text;
  EXPECT_EQ(text.find("     4 "), std::string::npos) << text;
  EXPECT_NE(text.find("Sold at the end of year 3"), std::string::npos);
  EXPECT_NE(text.find(kCaution), std::string::npos);
}

}  // namespace
}  // namespace tenure::formats
