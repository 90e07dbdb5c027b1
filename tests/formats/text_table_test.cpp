// Number formats and aligned tables of the human-readable outputs.
#include <gtest/gtest.h>

#include "formats/text_table.h"

namespace tenure::formats {
namespace {

TEST(TextFormats, MoneyHasTwoDecimalsAndThousandsSeparators) {
  EXPECT_EQ(money(0), "0.00");
  EXPECT_EQ(money(999.994), "999.99");
  EXPECT_EQ(money(1000), "1,000.00");
  EXPECT_EQ(money(12345.678), "12,345.68");
  EXPECT_EQ(money(1234567.5), "1,234,567.50");
  EXPECT_EQ(money(-16000), "-16,000.00");
  EXPECT_EQ(money(-0.001), "0.00");     // no "-0.00"
  EXPECT_EQ(money(208.125), "208.13");  // exactly half a cent: away from zero
  EXPECT_EQ(money(-0.125), "-0.13");
}

TEST(TextFormats, PercentKeepsTheDecimalsItNeeds) {
  EXPECT_EQ(percent(0.10), "10.00%");
  EXPECT_EQ(percent(0.075), "7.50%");
  EXPECT_EQ(percent(0.07125), "7.125%");
  EXPECT_EQ(percent(0), "0.00%");
}

TEST(TextFormats, YearsPluralises) {
  EXPECT_EQ(years(1), "1 year");
  EXPECT_EQ(years(3), "3 years");
}

TEST(TextTable, AlignsNumbersRightAndLabelsLeft) {
  TextTable table({"item", "amount"}, 1);
  table.add_row({"a", "1.00"});
  table.add_row({"longer", "1,000.00"});
  EXPECT_EQ(table.render(),
            "  item       amount\n"
            "  a            1.00\n"
            "  longer   1,000.00\n");
}

TEST(TextTable, AHeaderOfTwoLinesSitsOverItsColumn) {
  TextTable table({"year", "present worth\nat 7.50%"});
  table.add_row({"1", "104.65"});
  EXPECT_EQ(table.render(),
            "         present worth\n"
            "  year        at 7.50%\n"
            "     1          104.65\n");
}

TEST(TextTable, TheLastColumnWrapsAtTheLineWidth) {
  TextTable table({"item", "meaning"}, 2);
  table.add_row({"rate", "one two three four five six"});
  table.wrap_last_column(20);  // "  rate   " leaves 11 columns
  EXPECT_EQ(table.render(),
            "  item   meaning\n"
            "  rate   one two\n"
            "         three four\n"
            "         five six\n");
}

TEST(TextFormats, WrapWordsBreaksAtSpacesWithinTheWidth) {
  EXPECT_EQ(wrap_words("aaa bbb ccc ddd", 9, "  ", "    "), "  aaa bbb\n    ccc\n    ddd\n");
  EXPECT_EQ(wrap_words("short", 100, "  ", "    "), "  short\n");
  // A word longer than the width stays whole on its own line.
  EXPECT_EQ(wrap_words("x abcdefghijkl y", 6, "", ""), "x\nabcdefghijkl\ny\n");
}

TEST(TextTable, RejectsARowOfTheWrongWidth) {
  TextTable table({"a", "b"});
  EXPECT_THROW(table.add_row({"1"}), std::logic_error);
}

}  // namespace
}  // namespace tenure::formats
