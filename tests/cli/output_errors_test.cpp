// Output that cannot be written is a failure, never a silent success: every command that prints,
// with its standard output on /dev/full (a device that refuses every write with ENOSPC, as a full
// disk does), exits 1 with one line saying so.
#include <gtest/gtest.h>

#include <string>

#include "tests/cli/run_tenure.h"

namespace tenure::cli {
namespace {

using testing::fixture;
using testing::run_tenure;
using testing::TempDir;

constexpr const char* kFull = "/dev/full";

void expect_write_failure(const testing::Run& r, const std::string& command) {
  EXPECT_EQ(r.exit_code, 1) << r.err;
  EXPECT_EQ(r.err, command + ": cannot write the output: No space left on device\n");
}

TEST(OutputErrors, EveryPrintingCommandFailsOnAFullDisk) {
  const TempDir dir;
  const std::string db = dir.path("demo.db");
  ASSERT_EQ(run_tenure({"demo", "--db", db}).exit_code, 0);
  expect_write_failure(run_tenure({"case", fixture("delivery_van.json")}, "", "", kFull),
                       "tenure case");
  expect_write_failure(
      run_tenure({"schedule", "--method", "macrs", "--life", "5", "--basis", "1000"}, "", "", kFull),
      "tenure schedule");
  expect_write_failure(
      run_tenure({"review", "--db", db, "--as-of", "2026-11-30"}, "", "", kFull), "tenure review");
  expect_write_failure(run_tenure({"policy", "show", "--db", db}, "", "", kFull), "tenure policy show");
  expect_write_failure(run_tenure({"explain", "--db", db, "VAN-00154"}, "", "", kFull),
                       "tenure explain");
  expect_write_failure(run_tenure({"--help"}, "", "", kFull), "tenure");
}

}  // namespace
}  // namespace tenure::cli
