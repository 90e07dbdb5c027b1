// The manual page and the bash completion made from the command line (cli/reference_pages.h):
// the page names every command and option of `tenure --help`'s commands and ends with the
// caution; the completion script, run by bash as bash runs it on TAB, completes command names,
// policy's commands, options, --format's choices and file names.
#include "cli/reference_pages.h"

#include <gtest/gtest.h>

#include <set>
#include <sstream>
#include <string>
#include <vector>

#include "cli/commands.h"
#include "formats/caution.h"
#include "run_tenure.h"

namespace tenure::cli {
namespace {

using testing::TempDir;

class ReferencePages : public ::testing::Test {
 protected:
  ReferencePages() { add_commands(app, {in, out, out}); }
  std::istringstream in;
  std::ostringstream out;
  CLI::App app;
};

TEST_F(ReferencePages, TheManualPageHasEveryCommandAndOption) {
  const std::string page = man_page(app);
  EXPECT_EQ(page.rfind(".TH TENURE 1 ", 0), 0u);
  for (const char* command : {"case", "schedule", "demo", "review", "policy check", "policy set",
                              "policy show", "explain", "report", "due", "repair", "help"}) {
    EXPECT_NE(page.find(std::string(".SS \"tenure ") + command + "\""), std::string::npos)
        << command;
  }
  // Options as troff writes them: hyphens escaped.
  for (const char* option : {"\\fB\\-\\-db\\fR \\fIPATH\\fR", "\\fB\\-q\\fR, \\fB\\-\\-quiet\\fR",
                             "\\fB\\-\\-dispose\\-in\\-year\\fR \\fIYEAR\\fR",
                             "\\fB\\-\\-estimate\\fR \\fIAMOUNT\\fR"}) {
    EXPECT_NE(page.find(option), std::string::npos) << option;
  }
  EXPECT_NE(page.find("One of: text, line, json."), std::string::npos);
  EXPECT_NE(page.find(".SH ENVIRONMENT\n.TP\nTENURE_DB\n"), std::string::npos);
  // A line starting with a dot is one of the page's requests, never text troff would misread;
  // no line starts with a quote.
  const std::set<std::string> requests = {".TH", ".SH", ".SS", ".TP", ".PP", ".nf", ".fi", ".B",
                                          ".I"};
  std::istringstream lines(page);
  for (std::string line; std::getline(lines, line);) {
    if (line.starts_with('.')) {
      EXPECT_TRUE(requests.contains(line.substr(0, line.find(' ')))) << line;
    }
    EXPECT_FALSE(line.starts_with('\'')) << line;
  }
  EXPECT_NE(page.find("a regulator's retirement rule."), std::string::npos);
}

// What the completion offers for the words typed so far (the last one being completed), as
// bash gives it: COMP_WORDS, COMP_CWORD, then the function; one word per line.
std::string completions(const std::string& script_file, const std::vector<std::string>& words,
                        const std::string& in_dir) {
  std::string array;
  for (const std::string& word : words) array += " " + testing::quoted(word);
  const std::string command =
      "cd " + testing::quoted(in_dir) + " && bash -c " +
      testing::quoted("source " + testing::quoted(script_file) + "; COMP_WORDS=(tenure" + array +
                      "); COMP_CWORD=" + std::to_string(words.size()) +
                      "; _tenure; if (( ${#COMPREPLY[@]} )); then printf '%s\\n' "
                      "\"${COMPREPLY[@]}\"; fi");
  std::string out;
  if (FILE* pipe = ::popen(command.c_str(), "r")) {
    char buffer[256];
    while (std::fgets(buffer, sizeof buffer, pipe) != nullptr) out += buffer;
    ::pclose(pipe);
  }
  return out;
}

TEST_F(ReferencePages, TheCompletionCompletesCommandsOptionsChoicesAndFiles) {
  const TempDir dir;
  const std::string script = dir.write("tenure", bash_completion(app));
  dir.write("fleet.db", "");
  EXPECT_EQ(completions(script, {"rev"}, dir.path("")), "review\n");
  EXPECT_EQ(completions(script, {"re"}, dir.path("")), "review\nreport\nrepair\n");
  EXPECT_EQ(completions(script, {"policy", "s"}, dir.path("")), "set\nshow\n");
  EXPECT_EQ(completions(script, {"review", "--fo"}, dir.path("")), "--format\n");
  EXPECT_EQ(completions(script, {"review", "--format", ""}, dir.path("")), "text\nline\njson\n");
  EXPECT_EQ(completions(script, {"review", "--db", "fl"}, dir.path("")), "fleet.db\n");
  EXPECT_EQ(completions(script, {"case", "fl"}, dir.path("")), "fleet.db\n");
  EXPECT_EQ(completions(script, {"schedule", "--basis", ""}, dir.path("")), "");
  EXPECT_EQ(completions(script, {"policy", "set", "--d"}, dir.path("")), "--db\n");
}

}  // namespace
}  // namespace tenure::cli
