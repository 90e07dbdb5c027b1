// `tenure case` run as a process: the fixtures analyse with exit code 0 and print exactly what
// the library computes; bad files and bad usage exit with 2 and one line on stderr naming the
// path and the rule; --help and --version exit with 0.
#include <gtest/gtest.h>

#include <nlohmann/json.hpp>
#include <sstream>
#include <string>

#include "cli/input_file.h"
#include "formats/case_json.h"
#include "formats/case_table.h"
#include "formats/json_text.h"
#include "run_tenure.h"

namespace tenure::cli {
namespace {

using testing::fixture;
using testing::run_tenure;
using testing::TempDir;

const char* const kFixtures[] = {"delivery_van.json", "standby_generator.json",
                                 "forklift_before_tax.json", "haul_truck_cca.json",
                                 "delivery_van_choices.json"};

// What the library makes of the file, written as every command writes JSON, to compare the
// process's output with.
nlohmann::json expected_json(const std::string& file) {
  const replacement::Case input = formats::read_case(testing::slurp(file));
  return nlohmann::json::parse(
      formats::json_output(formats::case_result_to_json(input, replacement::analyse(input))));
}

TEST(CaseCommand, FixturesPrintTheLibrarysJson) {
  for (const char* name : kFixtures) {
    const testing::Run run = run_tenure({"case", fixture(name), "--format", "json"});
    EXPECT_EQ(run.exit_code, 0) << name << ": " << run.err;
    EXPECT_EQ(run.err, "") << name;
    const nlohmann::json printed = nlohmann::json::parse(run.out);
    EXPECT_EQ(printed, expected_json(fixture(name))) << name;
    // Pretty-printed with two-space indents.
    EXPECT_EQ(run.out.rfind("{\n  \"", 0), 0u) << name;
  }
}

TEST(CaseCommand, FixturesCoverTheirDesign) {
  // delivery_van: defender on MACRS, challenger straight line, study period;
  // standby_generator: declining balance with the switch on both; forklift: before tax only.
  const nlohmann::json van = expected_json(fixture("delivery_van.json"));
  EXPECT_TRUE(van.contains("defender") && van.contains("study_period"));
  const nlohmann::json generator = expected_json(fixture("standby_generator.json"));
  EXPECT_TRUE(generator.contains("decision"));
  const nlohmann::json forklift = expected_json(fixture("forklift_before_tax.json"));
  EXPECT_EQ(forklift["basis"], "before_tax");
  EXPECT_FALSE(forklift["challenger"].contains("after_tax"));
  // haul_truck_cca: both units in one pool under the half-year rule (SPEC 13), after tax.
  const nlohmann::json truck = expected_json(fixture("haul_truck_cca.json"));
  EXPECT_EQ(truck["basis"], "after_tax");
  EXPECT_TRUE(truck.contains("defender") && truck.contains("study_period"));
  const replacement::Case pooled =
      formats::read_case(testing::slurp(fixture("haul_truck_cca.json")));
  EXPECT_EQ(pooled.challenger.depreciation->name(), "pool");
  EXPECT_EQ(pooled.defender->depreciation->name(), "pool");
  // delivery_van_choices: three challengers (SPEC 14), the dearer electric van cheapest to own
  // (the figures are this file's own, invented), technology improving 2% a year.
  const nlohmann::json choices = expected_json(fixture("delivery_van_choices.json"));
  EXPECT_EQ(choices["challengers"].size(), 3u);
  EXPECT_EQ(choices["chosen_challenger"], "electric");
  EXPECT_EQ(choices["decision"]["challenger_by_year"].size(), 5u);
  for (const char* name : kFixtures) {
    EXPECT_EQ(
        testing::slurp(fixture(name)).rfind("// Invented example for tenure; not real data.\n", 0),
        0u)
        << name;
  }
}

TEST(CaseCommand, TextIsTheDefaultAndEndsWithTheCaution) {
  const testing::Run run = run_tenure({"case", fixture("delivery_van.json")});
  EXPECT_EQ(run.exit_code, 0) << run.err;
  const replacement::Case input = formats::read_case(testing::slurp(fixture("delivery_van.json")));
  EXPECT_EQ(run.out, formats::case_result_to_table(input, replacement::analyse(input)));
  EXPECT_NE(run.out.find("Caution: "), std::string::npos);
}

// Text is read in a terminal or a log: no line of any fixture's text is wider than 100 columns
// (the tables wrap their last text column, sentences wrap at spaces).
TEST(CaseCommand, TextLinesAreAtMostOneHundredColumns) {
  for (const char* name : kFixtures) {
    const testing::Run run = run_tenure({"case", fixture(name)});
    ASSERT_EQ(run.exit_code, 0) << name << ": " << run.err;
    std::istringstream lines(run.out);
    for (std::string line; std::getline(lines, line);) {
      EXPECT_LE(line.size(), 100u) << name << ": " << line;
    }
  }
}

TEST(CaseCommand, DashReadsStandardInput) {
  const testing::Run run =
      run_tenure({"case", "-", "--format", "json"}, testing::slurp(fixture("forklift_before_tax.json")));
  EXPECT_EQ(run.exit_code, 0) << run.err;
  EXPECT_EQ(nlohmann::json::parse(run.out), expected_json(fixture("forklift_before_tax.json")));
}

// A bad case file: exit 2, nothing on stdout, exactly `message` and a newline on stderr.
void expect_bad_file(const std::string& text, const std::string& message) {
  const TempDir dir;
  const testing::Run run = run_tenure({"case", dir.write("bad.json", text)});
  EXPECT_EQ(run.exit_code, 2) << text;
  EXPECT_EQ(run.out, "");
  EXPECT_EQ(run.err, message + "\n");
}

const std::string kChallenger =
    R"("challenger": {"first_cost": 1000, "operating_costs": [100, 200],
       "market_values": [800, 600],
       "depreciation": {"method": "straight_line", "life_years": 2, "salvage": 0}})";

TEST(CaseCommand, BadFilesExitWithTwoAndOneLine) {
  expect_bad_file(R"({"marr": 0.1, "income_tax_rate": 0.25, "colour": 1, )" + kChallenger + "}",
                  "tenure case: $.colour: unknown key (expected one of marr, income_tax_rate, "
                  "after_tax_marr, capital_gains_tax_rate, lead_time_years, review_margin, "
                  "challenger, challengers, improvement, defender, study_period_years)");
  expect_bad_file(R"({"marr": 0.1, "income_tax_rate": 1.0, )" + kChallenger + "}",
                  "tenure case: $.income_tax_rate: must be in [0, 0.99]");
  expect_bad_file(R"({"marr": 1e999, "income_tax_rate": 0, )" + kChallenger + "}",
                  "tenure case: $.marr: must be a finite number (this one overflows a double)");
  expect_bad_file(R"({"marr": 0.1, "income_tax_rate": 0})",
                  "tenure case: $.challenger: required object is missing");
  expect_bad_file(R"({"marr": 0.1, "income_tax_rate": 0, "challenger": {"first_cost": 1000,
                      "operating_costs": [100], "market_values": [800],
                      "depreciation": {"method": "straight_line", "life_years": 5.5,
                                       "salvage": 0}}})",
                  "tenure case: $.challenger.depreciation.life_years: must be a whole number, "
                  "not 5.5");
}

TEST(CaseCommand, MalformedJsonNamesLineAndColumn) {
  const TempDir dir;
  const testing::Run run = run_tenure({"case", dir.write("bad.json", "{\"marr\": 0.1,\n}")});
  EXPECT_EQ(run.exit_code, 2);
  EXPECT_EQ(run.err.rfind("tenure case: $: invalid JSON at line 2, column 1: ", 0), 0u) << run.err;
  EXPECT_EQ(run.err.find('\n'), run.err.size() - 1) << "one line";
}

// A file above 16 MiB is refused, from a file or standard input, without reading all of it.
TEST(CaseCommand, AFileTooLargeIsBadInputNamingIt) {
  const TempDir dir;
  const std::string large = dir.write("large.json", "{}" + std::string(std::size_t{17} << 20, ' '));
  const std::string rule =
      ": is larger than 16777216 bytes (16 MiB), the most a case or policy file may be\n";
  const testing::Run file = run_tenure({"case", large});
  EXPECT_EQ(file.exit_code, 2);
  EXPECT_EQ(file.err, "tenure case: " + large + rule);
  const testing::Run piped = run_tenure({"policy", "check", "-"}, testing::slurp(large));
  EXPECT_EQ(piped.exit_code, 2);
  EXPECT_EQ(piped.err, "tenure policy check: -" + rule);
}

TEST(CaseCommand, MissingOrUnreadableFileIsBadInputNamingIt) {
  const TempDir dir;
  const std::string missing = dir.path("no_such_case.json");
  const testing::Run run = run_tenure({"case", missing});
  EXPECT_EQ(run.exit_code, 2);
  EXPECT_EQ(run.err,
            "tenure case: " + missing + ": cannot read the file: No such file or directory\n");
  const testing::Run directory = run_tenure({"case", dir.path("")});
  EXPECT_EQ(directory.exit_code, 2);
  EXPECT_NE(directory.err.find("is a directory, not a file"), std::string::npos) << directory.err;
}

TEST(CaseCommand, UsageErrorsExitWithTwoAndOneLine) {
  for (const std::initializer_list<std::string>& args :
       {std::initializer_list<std::string>{"case"},
        std::initializer_list<std::string>{"case", fixture("delivery_van.json"), "--format", "xml"},
        std::initializer_list<std::string>{"case", "a.json", "b.json"},
        std::initializer_list<std::string>{"frobnicate"}, std::initializer_list<std::string>{}}) {
    const testing::Run run = run_tenure(args);
    EXPECT_EQ(run.exit_code, 2) << run.err;
    EXPECT_EQ(run.err.rfind("tenure", 0), 0u) << run.err;
    EXPECT_EQ(run.err.find('\n'), run.err.size() - 1) << "one line: " << run.err;
  }
  EXPECT_EQ(run_tenure({"case"}).err, "tenure case: FILE: is required (see 'tenure case --help')\n");
}

TEST(CaseCommand, HelpAndVersionExitWithZero) {
  const testing::Run help = run_tenure({"case", "--help"});
  EXPECT_EQ(help.exit_code, 0);
  for (const char* part : {"Usage: tenure case", "FILE", "--format",
                           "Examples:", "tenure case fixtures/cases/delivery_van.json"}) {
    EXPECT_NE(help.out.find(part), std::string::npos) << part << "\n" << help.out;
  }
  const testing::Run top = run_tenure({"--help"});
  EXPECT_EQ(top.exit_code, 0);
  EXPECT_NE(top.out.find("case"), std::string::npos);
  EXPECT_NE(top.out.find("schedule"), std::string::npos);
  const testing::Run version = run_tenure({"--version"});
  EXPECT_EQ(version.exit_code, 0);
  EXPECT_EQ(version.out.rfind("tenure ", 0), 0u) << version.out;
}

}  // namespace
}  // namespace tenure::cli
