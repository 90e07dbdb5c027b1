// `tenure report` as a user runs it on the demo fleet: the page is written and holds a chart per
// class pair and per due asset, the due count the review printed, and the caution; it names a
// run that does not exist or an output it cannot write with exit code 2.
#include <gtest/gtest.h>

#include <nlohmann/json.hpp>

#include "run_tenure.h"

namespace tenure::cli {
namespace {

using testing::run_tenure;
using testing::slurp;
using testing::TempDir;

std::size_t count(const std::string& text, const std::string& what) {
  std::size_t n = 0;
  for (std::size_t at = text.find(what); at != std::string::npos; at = text.find(what, at + 1)) ++n;
  return n;
}

class ReportCommand : public ::testing::Test {
 protected:
  void SetUp() override {
    ASSERT_EQ(run_tenure({"demo", "--db", db, "--assets", "160", "--events", "16000"}).exit_code, 0);
    const testing::Run r = run_tenure({"review", "--db", db, "--as-of", "2026-11-30", "--format", "json"});
    ASSERT_EQ(r.exit_code, 0) << r.err;
    summary = nlohmann::json::parse(r.out);
  }
  TempDir dir;
  std::string db = dir.path("fleet.db");
  nlohmann::json summary;
};

TEST_F(ReportCommand, WritesTheWholePage) {
  const std::string out = dir.path("review.html");
  const testing::Run r = run_tenure({"report", "--db", db, "--out", out});
  ASSERT_EQ(r.exit_code, 0) << r.err;
  EXPECT_NE(r.out.find("tenure report: written"), std::string::npos);
  const std::string html = slurp(out);
  const auto due = summary.at("due").get<std::size_t>();
  ASSERT_GT(due, 0u);
  EXPECT_NE(html.find("Due: " + std::to_string(due) + " assets to review or replace"), std::string::npos);
  EXPECT_EQ(count(html, "<svg "), 2 * 4 + due);  // four demo classes, two charts each
  EXPECT_NE(html.find("decision support, not tax, accounting or legal advice"), std::string::npos);
  EXPECT_EQ(html.find("<script"), std::string::npos);
  EXPECT_FALSE(std::filesystem::exists(out + ".partial"));
}

TEST_F(ReportCommand, UnknownRunIsExitTwo) {
  const testing::Run r = run_tenure({"report", "--db", db, "--out", dir.path("x.html"), "--run", "9"});
  EXPECT_EQ(r.exit_code, 2);
  EXPECT_EQ(r.err, "tenure report: --run: no successful run 9\n");
  EXPECT_FALSE(std::filesystem::exists(dir.path("x.html")));
}

TEST_F(ReportCommand, UnwritableOutputIsExitTwo) {
  const std::string out = dir.path("no/such/dir/x.html");
  const testing::Run r = run_tenure({"report", "--db", db, "--out", out});
  EXPECT_EQ(r.exit_code, 2);
  EXPECT_EQ(r.err, "tenure report: --out: cannot write the file '" + out + ".partial'\n");
}

}  // namespace
}  // namespace tenure::cli
