// libtenure.so exports exactly the extension's entry point and the C ABI of tenure.h
// (plugin/exports.map): nothing of tenure's C++ or of the C++ standard library it was built
// with can clash with a host's symbols.
#include <gtest/gtest.h>

#include <set>
#include <sstream>
#include <string>

#include "shell.h"

namespace tenure::plugin::testing {
namespace {

TEST(ExportsTest, OnlyTheEntryPointAndTheCAbi) {
  const Output r = run("nm -D --defined-only " + quoted(TENURE_EXTENSION_FILE));
  if (r.status == 127) GTEST_SKIP() << "nm (binutils) was not found";
  ASSERT_EQ(r.status, 0) << r.err;
  std::set<std::string> symbols;
  std::istringstream lines(r.out);
  for (std::string address, type, name; lines >> address >> type >> name;) symbols.insert(name);
  const std::set<std::string> expected = {"sqlite3_tenure_init", "tenure_abi_version",
                                          "tenure_library_version", "tenure_review_db",
                                          "tenure_case_json", "tenure_free"};
  EXPECT_EQ(symbols, expected);
}

}  // namespace
}  // namespace tenure::plugin::testing
