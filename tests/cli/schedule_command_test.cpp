// `tenure schedule` run as a process: schedules as tables and JSON, each method's parameters
// required and no others accepted, errors named by option with exit code 2.
#include <gtest/gtest.h>

#include <nlohmann/json.hpp>

#include "run_tenure.h"

namespace tenure::cli {
namespace {

using testing::run_tenure;

TEST(ScheduleCommand, MacrsAsJson) {
  const testing::Run run = run_tenure(
      {"schedule", "--method", "macrs", "--life", "5", "--basis", "10000", "--format", "json"});
  ASSERT_EQ(run.exit_code, 0) << run.err;
  const nlohmann::json out = nlohmann::json::parse(run.out);
  EXPECT_EQ(out["method"], "macrs");
  EXPECT_EQ(out["recovery_years"], 5);
  // IRS Publication 946, Table A-1, 5-year property: 20.00, 32.00, 19.20, 11.52, 11.52, 5.76 %.
  const std::vector<double> percent = {20.00, 32.00, 19.20, 11.52, 11.52, 5.76};
  ASSERT_EQ(out["rows"].size(), percent.size());
  for (std::size_t k = 0; k < percent.size(); ++k) {
    EXPECT_NEAR(out["rows"][k]["depreciation"].get<double>(), percent[k] * 100, 1e-9);
  }
}

TEST(ScheduleCommand, DecliningBalanceWithDisposalAsTable) {
  const testing::Run run =
      run_tenure({"schedule", "--method", "declining_balance", "--life", "5", "--rate", "2",
                  "--salvage", "0", "--switch", "--basis", "10000", "--dispose-in-year", "3"});
  ASSERT_EQ(run.exit_code, 0) << run.err;
  // Double declining balance, 40% a year on 10000 (closed form): 4000, 2400, 1440.
  EXPECT_NE(run.out.find("     3       1,440.00     2,160.00\n"), std::string::npos) << run.out;
  EXPECT_NE(run.out.find("Caution: "), std::string::npos);
}

TEST(ScheduleCommand, StraightLineAndSumOfYearsDigits) {
  // Closed form: (12000 - 2000) / 5 = 2000 a year; SYD 5/15 of 15000 = 5000 in year 1.
  const testing::Run sl = run_tenure({"schedule", "--method", "straight_line", "--life", "5",
                                      "--salvage", "2000", "--basis", "12000", "--format", "json"});
  ASSERT_EQ(sl.exit_code, 0) << sl.err;
  EXPECT_EQ(nlohmann::json::parse(sl.out)["rows"][4]["book_value"].get<double>(), 2000);
  const testing::Run syd = run_tenure({"schedule", "--method", "sum_of_years_digits", "--life", "5",
                                       "--salvage", "0", "--basis", "15000", "--format", "json"});
  ASSERT_EQ(syd.exit_code, 0) << syd.err;
  EXPECT_NEAR(nlohmann::json::parse(syd.out)["rows"][0]["depreciation"].get<double>(), 5000, 1e-9);
}

TEST(ScheduleCommand, MacrsTakesAZeroSalvageAsSqlDoes) {
  // MACRS recovers the whole basis: a salvage of 0 says nothing, any other is refused.
  const testing::Run zero = run_tenure({"schedule", "--method", "macrs", "--life", "5", "--salvage",
                                        "0", "--basis", "10000", "--format", "json"});
  ASSERT_EQ(zero.exit_code, 0) << zero.err;
  EXPECT_EQ(nlohmann::json::parse(zero.out)["rows"].size(), 6u);
  const testing::Run some = run_tenure(
      {"schedule", "--method", "macrs", "--life", "5", "--salvage", "500", "--basis", "10000"});
  EXPECT_EQ(some.exit_code, 2);
  EXPECT_EQ(some.err, "tenure schedule: --salvage: not used by method macrs (it takes --life, "
            "--convention, --quarter, --section-179, --bonus)\n");
}

// Bad arguments: exit 2, nothing on stdout, exactly `message` on stderr.
void expect_bad(std::initializer_list<std::string> args, const std::string& message) {
  const testing::Run run = run_tenure(args);
  EXPECT_EQ(run.exit_code, 2) << message;
  EXPECT_EQ(run.out, "") << message;
  EXPECT_EQ(run.err, message + "\n");
}

// SPEC 13 options: IRS Publication 946 Table A-5 (quarter 4), 5-year column, on 4500 left after
// a section 179 amount of 1000 and a 50% special allowance on 9000: year 1 is 5500 + 5% of 4500.
TEST(ScheduleCommand, UsOptions) {
  const testing::Run run = run_tenure({"schedule", "--method", "macrs", "--life", "5",
                                       "--convention", "mid_quarter", "--quarter", "4",
                                       "--section-179", "1000", "--bonus", "0.5", "--basis",
                                       "10000", "--format", "json"});
  ASSERT_EQ(run.exit_code, 0) << run.err;
  const nlohmann::json out = nlohmann::json::parse(run.out);
  const std::vector<double> percent = {5.00, 38.00, 22.80, 13.68, 10.94, 9.58};
  ASSERT_EQ(out["rows"].size(), percent.size());
  for (std::size_t k = 0; k < percent.size(); ++k) {
    const double expensed = k == 0 ? 5500 : 0;
    EXPECT_NEAR(out["rows"][k]["depreciation"].get<double>(), expensed + percent[k] * 45, 1e-9);
  }
  EXPECT_EQ(out["quarter"], 4);
  EXPECT_EQ(out["bonus"], 0.5);
}

TEST(ScheduleCommand, UsOptionsAreCheckedByOption) {
  expect_bad({"schedule", "--method", "macrs", "--life", "5", "--basis", "100", "--bonus", "1.2"},
             "tenure schedule: --bonus: must be between 0 and 1");
  expect_bad({"schedule", "--method", "macrs", "--life", "5", "--basis", "100", "--bonus", "-0.1"},
             "tenure schedule: --bonus: must be between 0 and 1");
  expect_bad(
      {"schedule", "--method", "macrs", "--life", "5", "--basis", "100", "--section-179", "-5"},
      "tenure schedule: --section-179: must be >= 0");
  expect_bad(
      {"schedule", "--method", "macrs", "--life", "5", "--basis", "100", "--section-179", "101"},
      "tenure schedule: --section-179: must not exceed the basis");
  expect_bad({"schedule", "--method", "macrs", "--life", "5", "--basis", "100", "--convention",
              "mid_quarter", "--quarter", "5"},
             "tenure schedule: --quarter: must be <= 4");
  expect_bad({"schedule", "--method", "macrs", "--life", "5", "--basis", "100", "--convention",
              "mid_quarter"},
             "tenure schedule: --quarter: is required with the mid_quarter convention");
  expect_bad({"schedule", "--method", "macrs", "--life", "5", "--basis", "100", "--quarter", "2"},
             "tenure schedule: --quarter: applies only to the mid_quarter convention");
  expect_bad({"schedule", "--method", "macrs", "--life", "5", "--basis", "100", "--convention",
              "mid_month"},
             "tenure schedule: --convention: unknown convention 'mid_month' (expected half_year "
             "or mid_quarter)");
  expect_bad({"schedule", "--method", "straight_line", "--life", "5", "--salvage", "0", "--basis",
              "100", "--bonus", "0.5"},
             "tenure schedule: --bonus: not used by method straight_line (it takes --life, "
             "--salvage)");
  expect_bad({"schedule", "--method", "macrs_ads", "--life", "5", "--basis", "100", "--quarter",
              "1"},
             "tenure schedule: --quarter: not used by method macrs_ads (it takes --life, "
             "--section-179, --bonus)");
}

TEST(ScheduleCommand, ParametersAreRequiredAndCheckedByOption) {
  expect_bad({"schedule", "--method", "straight_line", "--life", "5", "--basis", "1000"},
             "tenure schedule: --salvage: required by method straight_line");
  expect_bad({"schedule", "--method", "declining_balance", "--life", "5", "--rate", "2",
              "--salvage", "0", "--basis", "1000"},
             "tenure schedule: --switch/--no-switch: required by method declining_balance");
  expect_bad({"schedule", "--method", "straight_line", "--life", "5", "--salvage", "0", "--rate",
              "2", "--basis", "1000"},
             "tenure schedule: --rate: not used by method straight_line (it takes --life, "
             "--salvage)");
  expect_bad({"schedule", "--method", "none", "--life", "5", "--basis", "1000"},
             "tenure schedule: --life: not used by method none (it takes no parameters)");
  expect_bad({"schedule", "--method", "macrs", "--life", "5.5", "--basis", "1000"},
             "tenure schedule: --life: must be a whole number, not 5.5");
  expect_bad({"schedule", "--method", "macrs", "--life", "4", "--basis", "1000"},
             "tenure schedule: --life: must be one of 3, 5, 7, 10, 15, 20");
  expect_bad({"schedule", "--method", "straight_line", "--life", "-2", "--salvage", "0", "--basis",
              "1000"},
             "tenure schedule: --life: must be >= 1");
  expect_bad({"schedule", "--method", "straight_line", "--life", "5", "--salvage", "5000",
              "--basis", "1000"},
             "tenure schedule: --salvage: must not exceed the basis");
  expect_bad({"schedule", "--method", "none", "--basis", "-1"},
             "tenure schedule: --basis: must be > 0");
  // The bound of every amount (core/checks.h); 1e308 printed infinities.
  expect_bad({"schedule", "--method", "macrs", "--life", "5", "--basis", "1e308"},
             "tenure schedule: --basis: must be at most 1e15 in magnitude (no equipment costs more)");
  expect_bad({"schedule", "--method", "straight_line", "--life", "5", "--salvage", "2e15",
              "--basis", "3e15"},
             "tenure schedule: --basis: must be at most 1e15 in magnitude (no equipment costs more)");
  expect_bad({"schedule", "--method", "none", "--basis", "100", "--dispose-in-year", "0"},
             "tenure schedule: --dispose-in-year: must be >= 1");
  expect_bad({"schedule", "--method", "double", "--basis", "100"},
             "tenure schedule: --method: unknown method 'double' (expected one of "
             "straight_line, declining_balance, sum_of_years_digits, macrs, macrs_ads, none, "
             "pool)");
}

TEST(ScheduleCommand, UsageErrorsExitWithTwo) {
  expect_bad({"schedule", "--method", "none"},
             "tenure schedule: --basis: is required (see 'tenure schedule --help')");
  const testing::Run both =
      run_tenure({"schedule", "--method", "declining_balance", "--life", "5", "--rate", "2",
                  "--salvage", "0", "--switch", "--no-switch", "--basis", "1000"});
  EXPECT_EQ(both.exit_code, 2);
  EXPECT_EQ(both.err.find('\n'), both.err.size() - 1) << both.err;
}

TEST(ScheduleCommand, HelpMentionsEveryOption) {
  const testing::Run help = run_tenure({"schedule", "--help"});
  EXPECT_EQ(help.exit_code, 0);
  for (const char* part : {"Usage: tenure schedule", "--method", "--basis", "--salvage", "--life",
                           "--rate", "--switch", "--no-switch", "--dispose-in-year", "--format",
                           "Examples:", "recovery period"}) {
    EXPECT_NE(help.out.find(part), std::string::npos) << part << "\n" << help.out;
  }
}

}  // namespace
}  // namespace tenure::cli
