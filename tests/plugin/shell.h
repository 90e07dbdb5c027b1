// Helpers of the plugin tests: running a command line (the stock sqlite3 shell with libtenure
// loaded, the tenure command) with its output captured, in a temporary directory of their own.
// Paths come from tests/plugin/CMakeLists.txt: TENURE_SQLITE3_SHELL ("" when the machine has no
// sqlite3 shell: tests skip), TENURE_EXTENSION (the library without its suffix, as `.load` takes
// it), TENURE_EXECUTABLE.
//
//   Output r = run(sqlite_with_tenure(":memory:") + " " + quoted("SELECT tenure_version()"));
//   EXPECT_EQ(r.out, "0.1.0\n");
#pragma once

#include <unistd.h>

#include <atomic>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>

#include "../support/temp_dir.h"

namespace tenure::plugin::testing {

struct Output {
  int status;  // the exit status, or -1 when the command did not exit normally
  std::string out;
  std::string err;
};

// A fresh directory for one test's files, removed with the object.
class TempDir : public test_support::TempDir {
 public:
  TempDir() : test_support::TempDir("tenure_plugin_test") {}
};

inline std::string read_text(const std::string& path) {
  std::ifstream in(path, std::ios::binary);
  std::ostringstream text;
  text << in.rdbuf();
  return text.str();
}

// 'arg' for /bin/sh.
inline std::string quoted(const std::string& arg) {
  std::string out = "'";
  for (char c : arg) out.append(c == '\'' ? "'\\''" : std::string(1, c));
  return out.append("'");
}

// Runs `command` through /bin/sh, capturing stdout and stderr.
inline Output run(const std::string& command) {
  const TempDir dir;
  const std::string out = dir.path("out"), err = dir.path("err");
  const int status = std::system((command + " >" + quoted(out) + " 2>" + quoted(err)).c_str());
  return {WIFEXITED(status) ? WEXITSTATUS(status) : -1, read_text(out), read_text(err)};
}

inline bool have_sqlite3_shell() { return std::string(TENURE_SQLITE3_SHELL).size() > 0; }

// The sqlite3 shell on `database` with libtenure loaded, ready for more arguments.
inline std::string sqlite_with_tenure(const std::string& database) {
  return std::string(TENURE_SQLITE3_SHELL) + " -batch -cmd " +
         quoted(std::string(".load ") + TENURE_EXTENSION) + " " + quoted(database);
}

inline std::string tenure_command() { return quoted(TENURE_EXECUTABLE); }

}  // namespace tenure::plugin::testing
