// Test helper: runs tests/reference/spreadsheet_values.js under Node.js once per test program and
// hands its JSON to the tests, so the engine can be compared with an independent spreadsheet-
// function library (@formulajs/formulajs). Derive a fixture from SpreadsheetReference:
//
//   class Sln : public tenure::testing::SpreadsheetReference {};
//   TEST_F(Sln, Matches) { for (const auto& row : values()["depreciation"]) { ... } }
//
// When node or the installed library is missing, each test is skipped with the command that
// installs it, or fails when the environment variable CI is set (CI must run the comparison).
// A script that runs but fails, or prints something that is not JSON, always fails the test.
#pragma once

#include <gtest/gtest.h>
#include <sys/wait.h>

#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <optional>
#include <string>

#include <nlohmann/json.hpp>

namespace tenure::testing {

// Relative tolerance of every comparison with the reference library: both compute in doubles
// along the same formulas, so they agree to a few units in the last place.
inline constexpr double kReferenceRelative = 1e-9;
// Absolute floor for values that are zero on both sides (a deduction once salvage is reached),
// where one side may carry a residue of rounding: a billionth of a currency unit.
inline constexpr double kReferenceZeroFloor = 1e-9;

inline double reference_tolerance(double reference) {
  return kReferenceRelative * std::abs(reference) + kReferenceZeroFloor;
}

struct SpreadsheetRun {
  std::optional<nlohmann::json> values;  // present when the script ran
  std::string missing;                   // why it could not run (node or library missing)
  std::string failure;                   // why it ran but failed
};

inline SpreadsheetRun run_spreadsheet_values() {
  namespace fs = std::filesystem;
  const fs::path dir = fs::path(TENURE_SOURCE_DIR) / "tests" / "reference";
  SpreadsheetRun run;
  if (std::system("command -v node >/dev/null 2>&1") != 0) {
    run.missing = "node is not installed";
    return run;
  }
  if (!fs::exists(dir / "node_modules" / "@formulajs" / "formulajs" / "package.json")) {
    run.missing = "@formulajs/formulajs is not installed";
    return run;
  }
  const std::string command = "node '" + (dir / "spreadsheet_values.js").string() + "'";
  FILE* pipe = popen(command.c_str(), "r");
  if (pipe == nullptr) {
    run.failure = "cannot start: " + command;
    return run;
  }
  std::string output;
  char buffer[4096];
  for (std::size_t got; (got = std::fread(buffer, 1, sizeof buffer, pipe)) > 0;) {
    output.append(buffer, got);
  }
  const int status = pclose(pipe);
  if (!WIFEXITED(status) || WEXITSTATUS(status) != 0) {
    run.failure = command + " failed (its error is on standard error)";
    return run;
  }
  try {
    run.values = nlohmann::json::parse(output);
  } catch (const nlohmann::json::exception& error) {
    run.failure = command + " printed no valid JSON: " + error.what();
  }
  return run;
}

class SpreadsheetReference : public ::testing::Test {
 protected:
  void SetUp() override {
    const SpreadsheetRun& run = shared_run();
    if (!run.failure.empty()) FAIL() << run.failure;
    if (!run.missing.empty()) {
      const std::string how = "run `npm ci --prefix tests/reference` from the source root";
      if (std::getenv("CI") != nullptr) {
        FAIL() << run.missing << ", and CI must compare with the reference library: " << how;
      }
      GTEST_SKIP() << run.missing << "; to compare with the reference library, " << how;
    }
    RecordProperty("reference", run.values->at("library").get<std::string>() + " " +
                                    run.values->at("version").get<std::string>());
  }

  static const nlohmann::json& values() { return *shared_run().values; }

 private:
  static const SpreadsheetRun& shared_run() {
    static const SpreadsheetRun run = run_spreadsheet_values();
    return run;
  }
};

}  // namespace tenure::testing
