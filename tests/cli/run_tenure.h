// Runs the built `tenure` executable (path from TENURE_EXECUTABLE, set in tests/CMakeLists.txt)
// through the shell and captures its exit code, stdout and stderr.
//
//   Run r = run_tenure({"case", fixture("delivery_van.json")});
//   EXPECT_EQ(r.exit_code, 0);
#pragma once

#include <sys/wait.h>
#include <unistd.h>

#include <atomic>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <initializer_list>
#include <sstream>
#include <string>

#include "../support/temp_dir.h"

namespace tenure::cli::testing {

struct Run {
  int exit_code;
  std::string out;
  std::string err;
};

// A temporary directory that can also write a file into itself.
class TempDir : public test_support::TempDir {
 public:
  TempDir() : test_support::TempDir("tenure_cli_test") {}
  // Writes `text` to a file called `name` here and returns its path.
  std::string write(const std::string& name, const std::string& text) const {
    const std::string file = path(name);
    std::ofstream(file, std::ios::binary) << text;
    return file;
  }
};

inline std::string quoted(const std::string& arg) {
  std::string out = "'";
  for (char c : arg) out.append(c == '\'' ? "'\\''" : std::string(1, c));
  return out.append("'");
}

inline std::string slurp(const std::string& file) {
  std::ifstream in(file, std::ios::binary);
  std::ostringstream text;
  text << in.rdbuf();
  return text.str();
}

// Runs tenure with `args`; `standard_input` is fed to its stdin. `shell_setup` runs in the same
// shell first (e.g. "ulimit -f 2; " to make the disk look full to it); `standard_output` is where
// its stdout goes instead of being captured (e.g. /dev/full).
inline Run run_tenure(std::initializer_list<std::string> args,
                      const std::string& standard_input = "", const std::string& shell_setup = "",
                      const std::string& standard_output = "") {
  const TempDir dir;
  std::string command = shell_setup + "exec " + quoted(TENURE_EXECUTABLE);
  // Appends one piece at a time: g++ 12 warns falsely (-Wrestrict) on "literal" + string.
  for (const std::string& arg : args) command.append(" ").append(quoted(arg));
  command.append(" < ").append(quoted(dir.write("stdin", standard_input)));
  command.append(" > ").append(
      quoted(standard_output.empty() ? dir.path("stdout") : standard_output));
  command.append(" 2> ").append(quoted(dir.path("stderr")));
  const int status = std::system(command.c_str());
  const int exit_code = status != -1 && WIFEXITED(status) ? WEXITSTATUS(status) : -1;
  return {exit_code, slurp(dir.path("stdout")), slurp(dir.path("stderr"))};
}

inline std::string fixture(const std::string& name) {
  return std::string(TENURE_SOURCE_DIR) + "/fixtures/cases/" + name;
}

}  // namespace tenure::cli::testing
