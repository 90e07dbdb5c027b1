// `tenure explain` on the invented demo fleet, one unit of each class and verdict: its text has
// sections numbered 1, 2, 3... in order with none repeated or lettered, no line wider than 100
// columns, and present worths that tie: each "PW of cost" of the EUAC tables is what is given up
// (or paid) now plus the present worths of the years kept before it plus the year sold, from the
// cash-flow tables' own printed figures; its JSON has no float noise (issue 16).
#include <gtest/gtest.h>

#include <cmath>
#include <regex>
#include <sstream>
#include <string>
#include <vector>

#include <nlohmann/json.hpp>

#include "db/connection.h"
#include "run_tenure.h"

namespace tenure::cli {
namespace {

using testing::run_tenure;
using testing::TempDir;

class ExplainLayout : public ::testing::Test {
 protected:
  static void SetUpTestSuite() {
    dir_ = new TempDir;
    path_ = dir_->path("demo.db");
    ASSERT_EQ(run_tenure({"demo", "--db", path_}).exit_code, 0);
    ASSERT_EQ(run_tenure({"review", "--db", path_, "--as-of", "2026-11-30"}).exit_code, 0);
    db::Connection db = db::Connection::open(path_);
    db::Statement q(db,
                    "SELECT min(asset_id) FROM tenure_latest GROUP BY asset_class, verdict "
                    "ORDER BY 1");
    while (q.step()) assets_.emplace_back(q.text(0));
  }
  static void TearDownTestSuite() { delete dir_; }
  static std::string explain(const std::string& asset, const char* format = "text") {
    const testing::Run r = run_tenure({"explain", "--db", path_, asset, "--format", format});
    EXPECT_EQ(r.exit_code, 0) << asset << ": " << r.err;
    return r.out;
  }
  static TempDir* dir_;
  static std::string path_;
  static std::vector<std::string> assets_;
};

TempDir* ExplainLayout::dir_ = nullptr;
std::string ExplainLayout::path_;
std::vector<std::string> ExplainLayout::assets_;

std::vector<std::string> lines_of(const std::string& text) {
  std::vector<std::string> lines;
  std::istringstream in(text);
  for (std::string line; std::getline(in, line);) lines.push_back(line);
  return lines;
}

// The lines of section `number` after its title, up to the blank line that ends it.
std::vector<std::string> section(const std::string& text, int number) {
  std::string title = "\n";
  title.append(std::to_string(number)).append(". ");
  const std::size_t at = text.find(title);
  if (at == std::string::npos) return {};
  const std::size_t end = text.find("\n\n", at + 1);
  return lines_of(text.substr(at + 1, end - at - 1));
}

// "12,345.67" -> 12345.67; a "*" mark is not a figure.
std::vector<double> figures(const std::string& line) {
  std::vector<double> out;
  std::istringstream in(line);
  for (std::string word; in >> word;) {
    if (word == "*") continue;
    std::erase(word, ',');
    out.push_back(std::stod(word));
  }
  return out;
}

// The rows of a table: the lines whose first word is a whole number (the year, n).
std::vector<std::vector<double>> rows(const std::vector<std::string>& lines) {
  std::vector<std::vector<double>> out;
  static const std::regex row("^ +[0-9]+ +-?[0-9].*");
  for (const std::string& line : lines) {
    if (std::regex_match(line, row)) out.push_back(figures(line));
  }
  return out;
}

// The one figure after `label` in the lines of a section.
double figure_after(const std::vector<std::string>& lines, const std::string& label) {
  for (const std::string& line : lines) {
    const std::size_t at = line.find(label);
    if (at != std::string::npos) {
      std::string rest = line.substr(at + label.size());
      std::erase(rest, ',');
      return std::stod(rest);
    }
  }
  ADD_FAILURE() << "no line with '" << label << "'";
  return NAN;
}

TEST_F(ExplainLayout, TheDemoHasAUnitOfEachVerdict) {
  EXPECT_GE(assets_.size(), 9u);  // four classes; keep, review and replace among them
}

TEST_F(ExplainLayout, SectionsAreNumberedInOrderWithoutRepeats) {
  static const std::regex numbered("^([0-9]+)([a-z]*)\\. .*");
  for (const std::string& asset : assets_) {
    SCOPED_TRACE(asset);
    std::vector<int> numbers;
    for (const std::string& line : lines_of(explain(asset))) {
      std::smatch m;
      if (std::regex_match(line, m, numbered)) {
        EXPECT_EQ(m[2].str(), "") << line;  // no "8b."
        numbers.push_back(std::stoi(m[1]));
      }
    }
    std::vector<int> expected(15);
    for (int n = 0; n < 15; ++n) expected[n] = n + 1;
    EXPECT_EQ(numbers, expected);
  }
}

TEST_F(ExplainLayout, NoLineIsWiderThan100Columns) {
  for (const std::string& asset : assets_) {
    const std::string text = explain(asset);
    ASSERT_FALSE(text.empty()) << asset;
    for (const std::string& line : lines_of(text)) {
      EXPECT_LE(line.size(), 100u) << asset << ": " << line;
    }
  }
}

// PW of cost(n) = start - sum_{t<n} ATCF_t (P/F,i,t) - (ATCF'_n + net sale_n)(P/F,i,n)
// (replacement/keeping_costs.cpp; money positive for cost in the tables, so each present worth
// of section 7 adds). Every printed figure is rounded to the cent, so the tie holds to half a
// cent per figure summed.
void expect_tie(double start, const std::vector<std::vector<double>>& kept,
                const std::vector<std::vector<double>>& sold,
                const std::vector<std::vector<double>>& curve, std::size_t pw_column, double i) {
  ASSERT_EQ(kept.size(), sold.size());
  ASSERT_EQ(kept.size(), curve.size());
  double kept_before = 0;
  for (std::size_t n = 1; n <= kept.size(); ++n) {
    const std::vector<double>& s = sold[n - 1];
    const double pw = start + kept_before + (s[7] - s[6]) / std::pow(1 + i, n);
    EXPECT_NEAR(curve[n - 1][pw_column], pw, 0.005 * (n + 3)) << "n = " << n;
    kept_before += kept[n - 1].back();
  }
}

TEST_F(ExplainLayout, PresentWorthsTieToThePwOfCost) {
  for (const std::string& asset : assets_) {
    SCOPED_TRACE(asset);
    const std::string text = explain(asset);
    ASSERT_NE(text.find(", after-tax basis\n"), std::string::npos);
    const double i = figure_after(section(text, 2), "after-tax MARR") / 100;
    // The defender: what keeping gives up now (section 6), its years kept (7) and sold (8),
    // its PW of cost (9, the third column).
    expect_tie(figure_after(section(text, 6), "given up by keeping (after tax)"),
               rows(section(text, 7)), rows(section(text, 8)), rows(section(text, 9)), 2, i);
    // The challenger: its price (section 3), 11, 12, and 10 (the second column).
    expect_tie(figure_after(section(text, 3), "a new unit at"), rows(section(text, 11)),
               rows(section(text, 12)), rows(section(text, 10)), 1, i);
    // The note that says so, under the defender's EUAC table.
    EXPECT_NE(text.find("  PW of cost(n) = given up now (section 6) + the PWs of years 1 to n-1 "
                        "kept (section 7) + (after-tax\n  cost - net proceeds) of year n sold "
                        "(section 8) x (P/F, i, n); for n = 2:\n"),
              std::string::npos);
  }
}

TEST_F(ExplainLayout, JsonHasNoFloatNoise) {
  // A run of six 0s or 9s inside a number's digits is float noise (0.052500000000000005). The
  // equivalent case, last, is written to the last bit (tenure case gives explain's figures).
  static const std::regex noise("[0-9]\\.[0-9]*(000000|999999)[0-9]");
  for (const std::string& asset : assets_) {
    SCOPED_TRACE(asset);
    const std::string json = explain(asset, "json");
    // The demo policy's after-tax MARR: 0.07 x (1 - 0.25) (SPEC 4's default).
    EXPECT_NE(json.find("\"after_tax_marr\": 0.0525,"), std::string::npos);
    nlohmann::json doc = nlohmann::json::parse(json);
    doc.erase("equivalent_case");
    EXPECT_FALSE(std::regex_search(doc.dump(), noise));  // each number as it was printed
  }
}

}  // namespace
}  // namespace tenure::cli
