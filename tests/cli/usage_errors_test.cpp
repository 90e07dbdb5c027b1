// Usage errors in the house style, "tenure <command>: <where>: <rule>", exit 2, one line on
// stderr and nothing on stdout; `help`, -V and --version. Each message is pinned in full: the
// words are reworded from CLI11's (cli/usage_errors.cpp), so a CLI11 that words its errors
// differently fails here.
#include <gtest/gtest.h>

#include <initializer_list>
#include <string>

#include "core/version.h"
#include "run_tenure.h"

namespace tenure::cli {
namespace {

using testing::run_tenure;

void expect_usage_error(std::initializer_list<std::string> args, const std::string& message) {
  const testing::Run run = run_tenure(args);
  EXPECT_EQ(run.exit_code, 2) << message;
  EXPECT_EQ(run.out, "") << message;
  EXPECT_EQ(run.err, message + "\n");
}

TEST(UsageErrors, AnUnknownCommandIsNamedWithTheNearestOne) {
  expect_usage_error({"revew"},
                     "tenure: unknown command 'revew' (did you mean 'review'?) (see 'tenure "
                     "--help')");
  expect_usage_error({"frobnicate"},
                     "tenure: unknown command 'frobnicate' (the commands are case, schedule, demo, "
                     "review, policy, explain, report, due, repair, help) (see 'tenure --help')");
  expect_usage_error({"policy", "sett"},
                     "tenure policy: unknown command 'sett' (did you mean 'set'?) (see 'tenure "
                     "policy --help')");
  expect_usage_error({},
                     "tenure: a command is required: one of case, schedule, demo, review, policy, "
                     "explain, report, due, repair, help (see 'tenure --help')");
  expect_usage_error({"policy"},
                     "tenure policy: a command is required: one of check, set, show (see 'tenure "
                     "policy --help')");
}

TEST(UsageErrors, AnUnknownOptionIsNamedBeforeAMissingOne) {
  expect_usage_error({"--bogus"}, "tenure: --bogus: unknown option (see 'tenure --help')");
  expect_usage_error({"schedule", "--method", "none", "--basis", "5", "-q"},
                     "tenure schedule: -q: unknown option (see 'tenure schedule --help')");
  expect_usage_error({"schedule", "--method", "none", "--bassis", "5"},
                     "tenure schedule: --bassis: unknown option (did you mean --basis?) (see "
                     "'tenure schedule --help')");
  // CLI11 alone would report the missing --db first.
  expect_usage_error({"review", "--bogus=1"},
                     "tenure review: --bogus: unknown option (see 'tenure review --help')");
  expect_usage_error({"schedule", "--method", "none", "--basis", "5", "extra"},
                     "tenure schedule: unexpected argument 'extra' (see 'tenure schedule --help')");
}

TEST(UsageErrors, ValuesAreRefusedInTheHouseStyle) {
  expect_usage_error({"schedule", "--method", "none", "--basis", "52,000"},
                     "tenure schedule: --basis: must be a number, not '52,000' (see 'tenure "
                     "schedule --help')");
  expect_usage_error({"demo", "--db", "x.db", "--assets", "2.5"},
                     "tenure demo: --assets: must be a whole number, not '2.5' (see 'tenure demo "
                     "--help')");
  expect_usage_error({"schedule", "--method", "none", "--basis"},
                     "tenure schedule: --basis: needs a value (AMOUNT) (see 'tenure schedule "
                     "--help')");
  expect_usage_error({"schedule", "--basis", "5"},
                     "tenure schedule: --method: is required (see 'tenure schedule --help')");
  expect_usage_error({"schedule", "--method", "none", "--basis", "5", "--format", "xml"},
                     "tenure schedule: --format: must be one of text, json, not 'xml' (see "
                     "'tenure schedule --help')");
  expect_usage_error({"schedule", "--method", "none", "--basis", "5", "--switch", "--no-switch"},
                     "tenure schedule: --switch: cannot be given with --no-switch (see 'tenure "
                     "schedule --help')");
}

TEST(UsageErrors, HelpIsACommandAndVersionHasAShortFlag) {
  const testing::Run help = run_tenure({"help"});
  EXPECT_EQ(help.exit_code, 0);
  EXPECT_EQ(help.out, run_tenure({"--help"}).out);
  const testing::Run review = run_tenure({"help", "review"});
  EXPECT_EQ(review.exit_code, 0);
  EXPECT_EQ(review.out, run_tenure({"review", "--help"}).out);
  EXPECT_NE(review.out.find("Usage: tenure review [OPTIONS]"), std::string::npos);
  EXPECT_EQ(run_tenure({"help", "policy", "set"}).out, run_tenure({"policy", "set", "--help"}).out);
  const testing::Run unknown = run_tenure({"help", "revew"});
  EXPECT_EQ(unknown.exit_code, 2);
  EXPECT_EQ(unknown.err, "tenure help: unknown command 'revew' (did you mean 'review'?)\n");
  for (const char* flag : {"-V", "--version"}) {
    const testing::Run version = run_tenure({flag});
    EXPECT_EQ(version.exit_code, 0);
    EXPECT_EQ(version.out, std::string("tenure ") + kVersion + "\n");
  }
}

}  // namespace
}  // namespace tenure::cli
