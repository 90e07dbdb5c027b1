// The due list written out (formats/due_list_output.h) for an invented list typed in here: the
// CSV byte for byte against RFC 4180 (header row, commas, CRLF line ends, a reason holding a
// comma, a double quote and a line break quoted with its quote doubled, empty fields for none,
// full precision), the JSON's keys in column order with numbers as numbers and null for none,
// the table with money as formats::money writes it, "-" for none, each reason under its row
// wrapped at 100 columns (a line break in stored text never splits a row) and the caution at
// the end, and an empty list in each format.
#include <gtest/gtest.h>

#include <string>

#include "formats/caution.h"
#include "formats/due_list_output.h"

namespace tenure::formats {
namespace {

using review::Verdict;

DueAsset asset(std::string id, std::string asset_class, Verdict verdict, Years age,
               std::string reason, bool newly_due) {
  DueAsset a;
  a.row.asset_id = std::move(id);
  a.row.asset_class = std::move(asset_class);
  a.row.verdict = verdict;
  a.row.age_years = age;
  a.row.reason = std::move(reason);
  a.newly_due = newly_due;
  return a;
}

// Invented: a replace with every figure, a review with every figure, a review of a class that
// could not be weighed (no figures at all).
DueList invented_list() {
  DueList list;
  list.run.run_id = 3;
  list.run.as_of = "2026-11-30";
  list.run.basis = replacement::Basis::after_tax;
  DueAsset px2 =
      asset("PX-2", "pump-x", Verdict::replace, 14, "Replace: worn, \"tired\"\nand old", true);
  px2.row.replace_after_years = 0;
  px2.row.delay_cost = 1234.5;
  px2.row.early_cost = 0;
  px2.row.repair_limit = 0;
  px2.row.break_even_price = 25000.125;
  px2.row.close_call = false;
  DueAsset px5 = asset("PX-5", "pump-x", Verdict::review, 15,
                       "Review: at 15 years it is at or past a new unit's economic life of 13 "
                       "years; replacing after 2 years more is cheapest (after-tax EUAC 3355.00 "
                       "against the challenger's 3611.90).",
                       false);
  px5.row.replace_after_years = 2;
  px5.row.delay_cost = 0.1 + 0.2;  // the double 0.30000000000000004 (IEEE 754 binary64)
  px5.row.early_cost = 355.47;
  px5.row.repair_limit = 1466.21;
  px5.row.break_even_price = 21004.04;
  px5.row.close_call = true;
  DueAsset vx4 = asset("VX-4", "van-x", Verdict::review, 6, "Review: invented.", false);
  list.assets = {px2, px5, vx4};
  return list;
}

TEST(DueListCsv, IsRfc4180ByteForByte) {
  // Typed by hand from RFC 4180 section 2: CRLF ends every record (rules 1, 2), the header has
  // the same form (rule 3), the reason holding a comma, quotes and an LF is enclosed in quotes
  // (rule 6) with each quote doubled (rule 7), a reason without them is not (rule 5); none is
  // an empty field. 0.1 + 0.2 is written as the shortest text that reads back as the same
  // double: 0.30000000000000004.
  EXPECT_EQ(due_list_csv(invented_list()),
            "asset_id,asset_class,verdict,age_years,replace_after_years,delay_cost,early_cost,"
            "repair_limit,break_even_price,close_call,newly_due,reason\r\n"
            "PX-2,pump-x,replace,14,0,1234.5,0,0,25000.125,0,1,"
            "\"Replace: worn, \"\"tired\"\"\nand old\"\r\n"
            "PX-5,pump-x,review,15,2,0.30000000000000004,355.47,1466.21,21004.04,1,0,"
            "Review: at 15 years it is at or past a new unit's economic life of 13 years; "
            "replacing after 2 years more is cheapest (after-tax EUAC 3355.00 against the "
            "challenger's 3611.90).\r\n"
            "VX-4,van-x,review,6,,,,,,,0,Review: invented.\r\n");
}

TEST(DueListCsv, AnEmptyListIsTheHeaderAlone) {
  DueList list = invented_list();
  list.assets.clear();
  EXPECT_EQ(due_list_csv(list),
            "asset_id,asset_class,verdict,age_years,replace_after_years,delay_cost,early_cost,"
            "repair_limit,break_even_price,close_call,newly_due,reason\r\n");
}

TEST(DueListJson, KeysInColumnOrderNumbersAsNumbersNullForNone) {
  DueList list = invented_list();
  list.filters = {.newly = true, .asset_class = "pump-x"};
  list.assets.erase(list.assets.begin() + 1);
  // Typed by hand (RFC 8259); compared as ordered JSON, so the order of keys counts too.
  const nlohmann::ordered_json expected = nlohmann::ordered_json::parse(R"({
    "run_id": 3, "as_of": "2026-11-30", "basis": "after_tax",
    "filters": {"newly": true, "asset_class": "pump-x"},
    "rows": [
      {"asset_id": "PX-2", "asset_class": "pump-x", "verdict": "replace", "age_years": 14,
       "replace_after_years": 0, "delay_cost": 1234.5, "early_cost": 0, "repair_limit": 0,
       "break_even_price": 25000.125, "close_call": false, "newly_due": true,
       "reason": "Replace: worn, \"tired\"\nand old"},
      {"asset_id": "VX-4", "asset_class": "van-x", "verdict": "review", "age_years": 6,
       "replace_after_years": null, "delay_cost": null, "early_cost": null,
       "repair_limit": null, "break_even_price": null, "close_call": null, "newly_due": false,
       "reason": "Review: invented."}
    ]})");
  nlohmann::ordered_json out = due_list_json(list);
  EXPECT_EQ(out.at("caution"), std::string(kCaution));
  out.erase("caution");
  EXPECT_EQ(out, expected);
  // Numbers are numbers, not text, and reading the text back gives the same doubles.
  const auto again = nlohmann::ordered_json::parse(due_list_json(invented_list()).dump());
  EXPECT_EQ(again["rows"][1]["delay_cost"].get<double>(), 0.1 + 0.2);
  EXPECT_TRUE(again["filters"]["asset_class"].is_null());
}

TEST(DueListJson, AnEmptyListHasNoRows) {
  DueList list = invented_list();
  list.assets.clear();
  const nlohmann::ordered_json out = due_list_json(list);
  EXPECT_TRUE(out.at("rows").is_array());
  EXPECT_TRUE(out.at("rows").empty());
}

TEST(DueListTable, ReasonsUnderTheirRowsAndTheCautionLast) {
  // Typed by hand: TextTable's layout (two spaces in, three between columns, the first three
  // left-aligned, the rest right-aligned); formats::money rounds 25000.125 away from zero; the
  // second reason breaks where its first line reaches exactly 100 columns.
  const std::string expected_start =
      "tenure due: run 3 as of 2026-11-30, after-tax basis\n"
      "3 assets due.\n"
      "Most urgent first: largest delay cost first (none last), then replace before review, then "
      "asset_id.\n"
      "\n"
      "  asset   class    verdict   age   replace after   delay cost   early cost   repair limit"
      "   break-even price   close call   newly due\n"
      "  PX-2    pump-x   replace    14               0     1,234.50         0.00           0.00"
      "          25,000.13           no         yes\n"
      "      Replace: worn, \"tired\" and old\n"
      "  PX-5    pump-x   review     15               2         0.30       355.47       1,466.21"
      "          21,004.04          yes          no\n"
      "      Review: at 15 years it is at or past a new unit's economic life of 13 years; "
      "replacing after 2\n"
      "      years more is cheapest (after-tax EUAC 3355.00 against the challenger's 3611.90).\n"
      "  VX-4    van-x    review      6               -            -            -              -"
      "                  -            -          no\n"
      "      Review: invented.\n"
      "\n"
      "Money: present worth at 2026-11-30 on the after-tax basis, positive for cost; \"-\": there "
      "is none.\n";
  const std::string table = due_list_table(invented_list());
  EXPECT_EQ(table.substr(0, expected_start.size()), expected_start);
  EXPECT_TRUE(table.ends_with("\n\n" + std::string(kCaution) + "\n"));
  std::size_t start = 0;
  for (std::size_t end = table.find('\n'); end != std::string::npos;
       start = end + 1, end = table.find('\n', start)) {
    if (table.compare(start, 6, "      ") == 0) {  // a reason line
      EXPECT_LE(end - start, 100u);
    }
  }
}

TEST(DueListTable, ALineBreakInStoredTextKeepsEachRowOnOneLine) {
  DueList list = invented_list();
  list.assets.resize(1);
  list.assets[0].row.asset_id = "PX\r\n2";
  const std::string table = due_list_table(list);
  EXPECT_NE(table.find("\n  PX  2   pump-x   replace    14 "), std::string::npos) << table;
  EXPECT_NE(table.find(" yes\n      Replace: worn, \"tired\" and old\n\n"), std::string::npos);
}

TEST(DueListTable, AnEmptyListSaysSoInOneLine) {
  DueList list = invented_list();
  list.assets.clear();
  list.run.basis = replacement::Basis::before_tax;
  list.filters = {.newly = true, .asset_class = "pump-x"};
  EXPECT_EQ(due_list_table(list),
            "tenure due: run 3 as of 2026-11-30, before-tax basis\n"
            "No asset is newly due in class pump-x (review or replace).\n\n" +
                std::string(kCaution) + "\n");
}

}  // namespace
}  // namespace tenure::formats
