// `tenure demo` refuses counts out of range naming the option, a negative one included (it would
// wrap to the largest count and grow memory without bound).
#include <gtest/gtest.h>

#include <filesystem>

#include "tests/cli/run_tenure.h"

namespace tenure::cli {
namespace {

using testing::run_tenure;
using testing::TempDir;

TEST(DemoCommand, CountsOutOfRangeNameTheirOption) {
  const TempDir dir;
  const std::string db = dir.path("demo.db");
  const std::string events = "tenure demo: --events: must be a whole number from 1 to 1000000000\n";
  for (const testing::Run& r : {run_tenure({"demo", "--db", db, "--events", "-1"}),
                                run_tenure({"demo", "--db", db, "--events", "1000000001"})}) {
    EXPECT_EQ(r.exit_code, 2);
    EXPECT_EQ(r.err, events);
  }
  const testing::Run assets = run_tenure({"demo", "--db", db, "--assets", "-1"});
  EXPECT_EQ(assets.exit_code, 2);
  EXPECT_EQ(assets.err, "tenure demo: --assets: must be a whole number from 1 to 10000000\n");
  EXPECT_FALSE(std::filesystem::exists(db));
  const testing::Run empty = run_tenure({"demo", "--db", db, "--as-of", ""});
  EXPECT_EQ(empty.exit_code, 2);
  EXPECT_EQ(empty.err, "tenure demo: --as-of: '' is not a valid date (YYYY-MM-DD)\n");
}

}  // namespace
}  // namespace tenure::cli
