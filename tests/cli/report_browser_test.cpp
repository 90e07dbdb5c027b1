// The report in a real browser: the demo fleet is reviewed, its report written, and Debian's
// Chromium loads the page headless through tests/browser/check_report.mjs (playwright-core over
// the DevTools protocol, a new empty profile, background networking off). The page must draw
// every chart, log no console or page error, make no request beyond the file itself, open
// shorter than 12,000 pixels, and its screenshot must not be blank.
//
// Without /usr/bin/chromium (or TENURE_CHROMIUM), node, or `npm ci --prefix tests/browser`, the
// test is skipped with the command that installs what is missing; when the environment variable
// CI is set it fails instead, since CI must render the report.
#include <gtest/gtest.h>
#include <sys/wait.h>

#include <cstdio>
#include <cstdlib>
#include <filesystem>

#include <nlohmann/json.hpp>

#include "run_tenure.h"

namespace tenure::cli {
namespace {

namespace fs = std::filesystem;
using testing::run_tenure;
using testing::TempDir;

std::string chromium_path() {
  const char* given = std::getenv("TENURE_CHROMIUM");
  return given != nullptr ? given : "/usr/bin/chromium";
}

// Why the browser check cannot run here, or "" when it can.
std::string missing_tool() {
  const fs::path browser_dir = fs::path(TENURE_SOURCE_DIR) / "tests" / "browser";
  if (!fs::exists(chromium_path())) {
    return chromium_path() + " is missing; install Debian's package: apt-get install chromium";
  }
  if (std::system("command -v node >/dev/null 2>&1") != 0) {
    return "node is missing; install it: apt-get install nodejs npm";
  }
  if (!fs::exists(browser_dir / "node_modules" / "playwright-core" / "package.json")) {
    return "playwright-core is missing; run `npm ci --prefix tests/browser` from the source root";
  }
  return "";
}

// Runs the check script; its JSON on success, nullopt (with the failure recorded) otherwise.
std::optional<nlohmann::json> check_in_browser(const std::string& page, const std::string& shot) {
  const fs::path script = fs::path(TENURE_SOURCE_DIR) / "tests" / "browser" / "check_report.mjs";
  const std::string command = testing::quoted("node") + " " + testing::quoted(script.string()) +
                              " " + testing::quoted(page) + " " + testing::quoted(shot);
  FILE* pipe = popen(command.c_str(), "r");
  if (pipe == nullptr) {
    ADD_FAILURE() << "cannot start: " << command;
    return std::nullopt;
  }
  std::string output;
  char buffer[4096];
  for (std::size_t got; (got = std::fread(buffer, 1, sizeof buffer, pipe)) > 0;) output.append(buffer, got);
  const int status = pclose(pipe);
  if (!WIFEXITED(status) || WEXITSTATUS(status) != 0) {
    ADD_FAILURE() << command << " failed (its error is on standard error)";
    return std::nullopt;
  }
  return nlohmann::json::parse(output);
}

TEST(ReportInBrowser, RendersEveryChartWithoutErrorsOrRequests) {
  if (const std::string missing = missing_tool(); !missing.empty()) {
    if (std::getenv("CI") != nullptr) FAIL() << missing << ", and CI must render the report";
    GTEST_SKIP() << missing;
  }
  const TempDir dir;
  const std::string db = dir.path("demo.db");
  ASSERT_EQ(run_tenure({"demo", "--db", db}).exit_code, 0);
  const testing::Run review =
      run_tenure({"review", "--db", db, "--as-of", "2026-11-30", "--format", "json"});
  ASSERT_EQ(review.exit_code, 0) << review.err;
  const auto due = nlohmann::json::parse(review.out).at("due").get<std::size_t>();
  const std::string page = dir.path("report.html");
  ASSERT_EQ(run_tenure({"report", "--db", db, "--out", page}).exit_code, 0);

  const std::string shot = dir.path("report.png");
  const auto result = check_in_browser(page, shot);
  ASSERT_TRUE(result);
  const nlohmann::json& r = *result;
  EXPECT_EQ(r.at("console_errors"), nlohmann::json::array());
  EXPECT_EQ(r.at("page_errors"), nlohmann::json::array());
  // One request: the page itself, from the file system.
  ASSERT_EQ(r.at("requests").size(), 1u) << r.at("requests").dump();
  EXPECT_EQ(r.at("requests")[0], "file://" + fs::canonical(page).string());
  EXPECT_EQ(r.at("charts").get<std::size_t>(), 2 * 4 + due);  // 4 demo classes, 2 charts each
  EXPECT_EQ(r.at("blank_charts"), 0);
  EXPECT_EQ(r.at("scripts"), 0);
  EXPECT_EQ(r.at("caution"), true);
  EXPECT_EQ(r.at("title"), "Equipment replacement review, run 1 as of 2026-11-30");
  // The page opens short (issue 16): the demo's 313 units with 90 due gave a page 27,181 pixels
  // tall before the cards were folded behind a table of contents, 10,130 after (README).
  EXPECT_LT(r.at("page_height").get<int>(), 12000);
  // The screenshot exists and shows a page, not a blank: many colours, neither empty nor full.
  ASSERT_TRUE(fs::exists(shot));
  EXPECT_GT(fs::file_size(shot), 10000u);
  const nlohmann::json& png = r.at("screenshot");
  EXPECT_EQ(png.at("width"), 1280);
  EXPECT_GT(png.at("colours").get<int>(), 50);
  EXPECT_GT(png.at("non_white").get<double>(), 0.05);
  EXPECT_LT(png.at("non_white").get<double>(), 0.95);
}

}  // namespace
}  // namespace tenure::cli
