// CSV fields and records against the rules of RFC 4180, section 2 (rule numbers as there).
#include <gtest/gtest.h>

#include "formats/csv_text.h"

namespace tenure::formats {
namespace {

TEST(CsvText, APlainFieldIsItself) {
  EXPECT_EQ(csv_field("PMP-00031"), "PMP-00031");
  EXPECT_EQ(csv_field(""), "");
  EXPECT_EQ(csv_field(" two words "), " two words ");  // rule 4: spaces are part of a field
}

TEST(CsvText, CommaQuoteAndLineBreaksAreQuoted) {
  EXPECT_EQ(csv_field("worn, tired"), "\"worn, tired\"");            // rule 6
  EXPECT_EQ(csv_field("two\r\nlines"), "\"two\r\nlines\"");          // rule 6
  EXPECT_EQ(csv_field("line\nfeed"), "\"line\nfeed\"");              // LF alone too
  EXPECT_EQ(csv_field("carriage\rreturn"), "\"carriage\rreturn\"");  // CR alone too
  EXPECT_EQ(csv_field("say \"when\""), "\"say \"\"when\"\"\"");      // rule 7
  EXPECT_EQ(csv_field("\""), "\"\"\"\"");                            // rule 7
}

TEST(CsvText, ARecordIsCommaSeparatedAndEndsInCrLf) {
  EXPECT_EQ(csv_record({"a", "b,c", "", "d"}), "a,\"b,c\",,d\r\n");  // rules 1 and 4
  EXPECT_EQ(csv_record({""}), "\r\n");
}

}  // namespace
}  // namespace tenure::formats
