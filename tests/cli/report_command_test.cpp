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
  EXPECT_EQ(r.err, "tenure report: --out: cannot create '" + out +
                       ".partial': No such file or directory\n");
}

TEST_F(ReportCommand, WhatIsNotARegularFileIsNeverReplaced) {
  // A device (as root, /dev/null would become a regular file), a symbolic link, a directory.
  const std::string target = dir.write("target.html", "keep me");
  const std::string link = dir.path("link.html");
  std::filesystem::create_symlink(target, link);
  std::filesystem::create_directory(dir.path("folder"));
  const std::pair<std::string, std::string> refused[] = {
      {"/dev/null", "a device"}, {link, "a symbolic link"}, {dir.path("folder"), "a directory"}};
  for (const auto& [path, kind] : refused) {
    SCOPED_TRACE(path);
    const testing::Run r = run_tenure({"report", "--db", db, "--out", path});
    EXPECT_EQ(r.exit_code, 2);
    EXPECT_EQ(r.err, "tenure report: --out: '" + path + "' is " + kind +
                         ": it is not replaced; give the path of a regular file, or - for "
                         "standard output\n");
  }
  EXPECT_TRUE(std::filesystem::is_character_file("/dev/null"));
  EXPECT_TRUE(std::filesystem::is_symlink(link));
  EXPECT_EQ(slurp(target), "keep me");
  EXPECT_FALSE(std::filesystem::exists(link + ".partial"));
}

TEST_F(ReportCommand, DashWritesThePageToStandardOutput) {
  const testing::Run r = run_tenure({"report", "--db", db, "--out", "-"});
  EXPECT_EQ(r.exit_code, 0) << r.err;
  EXPECT_EQ(r.out.rfind("<!DOCTYPE html>", 0), 0u);
  EXPECT_NE(r.out.find("</html>"), std::string::npos);
  EXPECT_FALSE(std::filesystem::exists("-"));
}

TEST_F(ReportCommand, AFullDiskIsExitOneAndLeavesNothingBehind) {
  // ulimit -f caps the files the command may write at 2 x 512 bytes: the write fails with
  // EFBIG, as on a full disk (SIGXFSZ ignored so that the write returns the error).
  const std::string out = dir.path("full.html");
  const testing::Run r =
      run_tenure({"report", "--db", db, "--out", out}, "", "trap '' XFSZ; ulimit -f 2; ");
  EXPECT_EQ(r.exit_code, 1) << r.err;
  EXPECT_EQ(r.err.rfind("tenure report: --out: cannot write '" + out + "': ", 0), 0u) << r.err;
  EXPECT_FALSE(std::filesystem::exists(out));
  EXPECT_FALSE(std::filesystem::exists(out + ".partial"));
}

}  // namespace
}  // namespace tenure::cli
