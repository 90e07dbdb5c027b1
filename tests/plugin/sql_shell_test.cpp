// Runs every tests/plugin/sql/*.sql file through the stock sqlite3 shell with libtenure loaded
// (`.load` of the built library, as a user would) and checks it line by line. The format of a
// .sql file, one statement per line:
//
//   -- a comment, or a blank line              ignored
//   SELECT <expression>;                       must print exactly 1
//   <statement>; -- error: <message>           must fail with exactly <message>, printing nothing
//   any other statement or .command            must print nothing and not fail
//
// One shell session runs the whole file (tables made on one line are there on the next), from
// the source directory (so readfile('fixtures/...') works), with `.echo on`: stdout is each input
// line echoed, then what it printed; stderr holds "Runtime error near line N: <message>" or
// "Parse error near line N: <message>" (the latter followed by indented lines quoting the SQL).
#include <gtest/gtest.h>

#include <algorithm>
#include <filesystem>
#include <map>
#include <optional>
#include <regex>
#include <sstream>
#include <string>
#include <vector>

#include "shell.h"

namespace tenure::plugin::testing {
namespace {

const std::string kErrorMarker = " -- error: ";

struct Line {
  int number;  // 1-based
  std::string text;
  std::optional<std::string> expected_error;
  bool prints_one;  // a SELECT without an expected error
  bool checked;     // not a comment or blank
};

std::vector<std::string> lines_of(const std::string& text) {
  std::vector<std::string> lines;
  std::istringstream in(text);
  for (std::string line; std::getline(in, line);) lines.push_back(line);
  return lines;
}

std::vector<Line> parse(const std::string& text) {
  std::vector<Line> lines;
  int number = 0;
  for (const std::string& raw : lines_of(text)) {
    Line line{++number, raw, std::nullopt, false, false};
    const bool blank = raw.find_first_not_of(" \t") == std::string::npos;
    line.checked = !blank && !raw.starts_with("--");
    if (const auto at = raw.find(kErrorMarker); line.checked && at != std::string::npos) {
      line.expected_error = raw.substr(at + kErrorMarker.size());
    }
    line.prints_one = line.checked && !line.expected_error && raw.starts_with("SELECT ");
    lines.push_back(line);
  }
  return lines;
}

// Errors by line number; lines of stderr that name no line go under 0.
std::map<int, std::string> errors_by_line(const std::string& err) {
  static const std::regex kError(R"(^(?:Runtime|Parse) error near line (\d+): (.*)$)");
  std::map<int, std::string> errors;
  for (const std::string& line : lines_of(err)) {
    std::smatch match;
    if (std::regex_match(line, match, kError)) {
      errors[std::stoi(match[1])] = match[2];
    } else if (!line.starts_with("  ")) {  // not a parse error's quoted SQL
      errors[0] += line + "\n";
    }
  }
  return errors;
}

// What each file line printed, from the echoed stdout. Fails the test when the echo is out of
// step with the file.
std::map<int, std::vector<std::string>> output_by_line(const std::vector<Line>& lines,
                                                       const std::string& out) {
  const std::vector<std::string> printed = lines_of(out);
  std::map<int, std::vector<std::string>> outputs;
  std::size_t at = 0;
  for (std::size_t k = 0; k < lines.size(); ++k) {
    if (at >= printed.size() || printed[at] != lines[k].text) {
      ADD_FAILURE() << "line " << lines[k].number << " was not echoed: the shell stopped early";
      return outputs;
    }
    ++at;
    const std::string* next = k + 1 < lines.size() ? &lines[k + 1].text : nullptr;
    while (at < printed.size() && (next == nullptr || printed[at] != *next)) {
      outputs[lines[k].number].push_back(printed[at++]);
    }
  }
  return outputs;
}

std::string joined(const std::vector<std::string>& lines) {
  std::string text;
  for (const std::string& line : lines) text += (text.empty() ? "" : " | ") + line;
  return text;
}

std::vector<std::string> sql_files() {
  std::vector<std::string> names;
  for (const auto& entry :
       std::filesystem::directory_iterator(std::string(TENURE_SOURCE_DIR) + "/tests/plugin/sql")) {
    if (entry.path().extension() == ".sql") names.push_back(entry.path().stem().string());
  }
  std::sort(names.begin(), names.end());
  return names;
}

class SqlShellTest : public ::testing::TestWithParam<std::string> {};

TEST_P(SqlShellTest, EveryLinePrintsOneOrItsExactError) {
  if (!have_sqlite3_shell()) GTEST_SKIP() << "the sqlite3 shell was not found";
  const std::string file =
      std::string(TENURE_SOURCE_DIR) + "/tests/plugin/sql/" + GetParam() + ".sql";
  const std::vector<Line> lines = parse(read_text(file));
  ASSERT_FALSE(lines.empty()) << file;

  const Output r = run("cd " + quoted(TENURE_SOURCE_DIR) + " && " + sqlite_with_tenure(":memory:") +
                       " -cmd '.echo on' < " + quoted(file));
  std::map<int, std::string> errors = errors_by_line(r.err);
  std::map<int, std::vector<std::string>> outputs = output_by_line(lines, r.out);
  EXPECT_EQ(errors[0], "") << "errors that name no line (did .load fail?)";

  int checks = 0;
  for (const Line& line : lines) {
    if (!line.checked) continue;
    ++checks;
    const std::string where = GetParam() + ".sql:" + std::to_string(line.number) + ": " + line.text;
    const auto error = errors.find(line.number);
    const std::vector<std::string>& printed = outputs[line.number];
    if (line.expected_error) {
      EXPECT_TRUE(error != errors.end()) << where << "\n  did not fail";
      if (error != errors.end()) {
        EXPECT_EQ(error->second, *line.expected_error) << where;
      }
      EXPECT_TRUE(printed.empty()) << where << "\n  printed: " << joined(printed);
      continue;
    }
    EXPECT_TRUE(error == errors.end()) << where << "\n  failed: " << error->second;
    if (line.prints_one) {
      EXPECT_EQ(joined(printed), "1") << where;
    } else {
      EXPECT_TRUE(printed.empty()) << where << "\n  printed: " << joined(printed);
    }
  }
  EXPECT_GT(checks, 0);
}

std::string file_name(const ::testing::TestParamInfo<std::string>& file) { return file.param; }

INSTANTIATE_TEST_SUITE_P(Files, SqlShellTest, ::testing::ValuesIn(sql_files()), file_name);

}  // namespace
}  // namespace tenure::plugin::testing
