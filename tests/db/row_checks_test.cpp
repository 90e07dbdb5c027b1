// What the readers share (db/row_checks.h): UTF-8 well-formedness by RFC 3629 (the boundary
// cases are those of table 3-7 of the Unicode standard, from memory), and the quoted, cut,
// one-line, valid-UTF-8 text of a value in a rejection.
#include <gtest/gtest.h>

#include <string>

#include "db/row_checks.h"

namespace tenure::db {
namespace {

// 'inner', built by appending (g++ 12 warns falsely on "literal" + std::string).
std::string in_quotes(const std::string& inner, const char* tail = "'") {
  std::string out("'");
  out.append(inner).append(tail);
  return out;
}

TEST(Utf8, WellFormedSequencesAreAccepted) {
  EXPECT_TRUE(valid_utf8(""));
  EXPECT_TRUE(valid_utf8("PU-0017"));
  EXPECT_TRUE(valid_utf8("Pumpe-\xC3\xBC"));             // U+00FC
  EXPECT_TRUE(valid_utf8("\xE0\xA0\x80"));               // U+0800, the first three-byte form
  EXPECT_TRUE(valid_utf8("\xED\x9F\xBF"));               // U+D7FF, just below the surrogates
  EXPECT_TRUE(valid_utf8("\xEE\x80\x80"));               // U+E000, just above them
  EXPECT_TRUE(valid_utf8("\xF0\x90\x80\x80"));           // U+10000
  EXPECT_TRUE(valid_utf8("\xF4\x8F\xBF\xBF"));           // U+10FFFF, the last code point
}

TEST(Utf8, IllFormedSequencesAreRefused) {
  EXPECT_FALSE(valid_utf8("\xC3\x28"));          // a lead byte without its continuation
  EXPECT_FALSE(valid_utf8("\xFF\x41"));          // never a UTF-8 byte
  EXPECT_FALSE(valid_utf8("\x80"));              // a lone continuation byte
  EXPECT_FALSE(valid_utf8("\xC0\xAF"));          // overlong '/'
  EXPECT_FALSE(valid_utf8("\xE0\x80\xAF"));      // overlong, three bytes
  EXPECT_FALSE(valid_utf8("\xED\xA0\x80"));      // U+D800, a surrogate
  EXPECT_FALSE(valid_utf8("\xF4\x90\x80\x80"));  // above U+10FFFF
  EXPECT_FALSE(valid_utf8("\xE2\x82"));          // cut short
}

TEST(Shown, QuotesAndKeepsValidText) {
  EXPECT_EQ(shown("PU-0017"), "'PU-0017'");
  EXPECT_EQ(shown("Pumpe-\xC3\xBC"), "'Pumpe-\xC3\xBC'");
  EXPECT_EQ(shown(""), "''");
}

TEST(Shown, ControlCharactersAndBadBytesBecomeQuestionMarks) {
  EXPECT_EQ(shown("tab\tand\nnewline"), "'tab?and?newline'");
  EXPECT_EQ(shown("\xC3\x28"), "'?('");
  EXPECT_EQ(shown("\xED\xA0\x80"), in_quotes(std::string(3, '?')));
  EXPECT_TRUE(valid_utf8(shown("\xFF\xFE\x80 x \xF4\x90\x80\x80")));
}

TEST(Shown, LongTextIsCutAfter64CharactersNeverInsideOne) {
  EXPECT_EQ(shown(std::string(100, 'L')), in_quotes(std::string(64, 'L'), "...'"));
  std::string umlauts;
  for (int i = 0; i < 70; ++i) umlauts += "\xC3\xBC";
  EXPECT_EQ(shown(umlauts), in_quotes(umlauts.substr(0, 128), "...'"));
  EXPECT_EQ(shown(std::string(64, 'L')), in_quotes(std::string(64, 'L')));
}

}  // namespace
}  // namespace tenure::db
