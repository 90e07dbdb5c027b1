// A fresh directory for one test's files, removed with the object; shared by the test helpers
// that run commands (tests/cli/run_tenure.h, tests/plugin/shell.h).
//
//   TempDir dir("tenure_cli_test");
//   std::string db = dir.path("fleet.db");
#pragma once

#include <unistd.h>

#include <atomic>
#include <filesystem>
#include <string>

namespace tenure::test_support {

class TempDir {
 public:
  explicit TempDir(const std::string& prefix) {
    static std::atomic<int> counter{0};
    path_ = std::filesystem::temp_directory_path() /
            (prefix + "_" + std::to_string(::getpid()) + "_" + std::to_string(counter++));
    std::filesystem::create_directories(path_);
  }
  ~TempDir() {
    std::error_code ignored;
    std::filesystem::remove_all(path_, ignored);
  }
  TempDir(const TempDir&) = delete;
  TempDir& operator=(const TempDir&) = delete;
  std::string path(const std::string& name) const { return (path_ / name).string(); }
  const std::filesystem::path& root() const { return path_; }

 private:
  std::filesystem::path path_;
};

}  // namespace tenure::test_support
