// Strict JSON parsing: comments allowed, duplicate keys and overflowing numbers rejected with
// the JSON path where they occur, syntax errors with their line and column.
#include <gtest/gtest.h>

#include <fmt/format.h>

#include "core/errors.h"
#include "formats/json_path.h"
#include "formats/json_text.h"

namespace tenure::formats {
namespace {

// Runs `parse_json_text` and returns the InputError it throws ("" where/rule if none).
InputError error_of(std::string_view text) {
  try {
    parse_json_text(text);
  } catch (const InputError& error) {
    return error;
  }
  return InputError("", "");
}

TEST(JsonText, AllowsLineAndBlockComments) {
  const auto doc = parse_json_text("// head\n{\"a\": 1, /* between */ \"b\": [2, 3] // tail\n}");
  EXPECT_EQ(doc["a"], 1);
  EXPECT_EQ(doc["b"][1], 3);
}

TEST(JsonText, SyntaxErrorNamesLineAndColumn) {
  const InputError error = error_of("{\"a\": 1,\n \"b\": ,}");
  EXPECT_EQ(error.where(), "$");
  EXPECT_EQ(error.rule().rfind("invalid JSON at line 2, column 7: ", 0), 0u) << error.rule();
}

TEST(JsonText, EmptyTextIsInvalid) {
  const InputError error = error_of("");
  EXPECT_EQ(error.where(), "$");
  EXPECT_EQ(error.rule().rfind("invalid JSON at line 1, column 1: ", 0), 0u) << error.rule();
}

TEST(JsonText, DuplicateKeyIsAnErrorAtItsPath) {
  const InputError top = error_of("{\"marr\": 0.1, \"marr\": 0.2}");
  EXPECT_EQ(top.where(), "$.marr");
  EXPECT_EQ(top.rule(), "duplicate key");
  const InputError nested = error_of("{\"a\": [{\"x\": 1}, {\"y\": 1, \"y\": 2}]}");
  EXPECT_EQ(nested.where(), "$.a[1].y");
}

TEST(JsonText, SameKeyInSiblingObjectsIsFine) {
  EXPECT_NO_THROW(parse_json_text("{\"a\": {\"x\": 1}, \"b\": {\"x\": 2}, \"c\": [{\"x\": 3}]}"));
}

TEST(JsonText, OverflowingNumberNamesItsPath) {
  const InputError top = error_of("{\"marr\": 1e999}");
  EXPECT_EQ(top.where(), "$.marr");
  EXPECT_EQ(top.rule(), "must be a finite number (this one overflows a double)");
  const InputError element = error_of("{\"c\": {\"costs\": [1, [2], -1e999]}}");
  EXPECT_EQ(element.where(), "$.c.costs[2]");
}

TEST(JsonText, TextAfterANulByteIsNotIgnored) {
  // A file of a whole document, a NUL and more bytes: the parser alone stops at the NUL.
  const std::string text("{\"marr\": 0.1}\0garbage", 21);
  const InputError error = error_of(text);
  EXPECT_EQ(error.where(), "$");
  EXPECT_EQ(error.rule(), "invalid JSON: a NUL byte at offset 13");
}

TEST(JsonPath, WritesControlCharactersOfKeysEscaped) {
  // An unknown key with a BEL in it must not ring the terminal when its path is printed.
  EXPECT_EQ(key_path("$", std::string("m\x07x")), "$.m\\u0007x");
  EXPECT_EQ(key_path("$.classes", std::string("a\nb\x7f")), "$.classes.a\\u000ab\\u007f");
  EXPECT_EQ(key_path("$", "van-delivery"), "$.van-delivery");
}

TEST(JsonPath, CutsAKeyTooLongForOneLine) {
  const std::string ninety_six(96, 'k');
  EXPECT_EQ(key_path("$", ninety_six), "$." + ninety_six);
  EXPECT_EQ(key_path("$", ninety_six + "k"), "$." + std::string(48, 'k') + "...(a key of 97 bytes)");
  // Not inside a UTF-8 character: 47 bytes, then a 2-byte e-acute at bytes 47 and 48.
  const std::string accented = std::string(47, 'a') + "\xc3\xa9" + std::string(60, 'b');
  EXPECT_EQ(key_path("$", accented), "$." + std::string(47, 'a') + "...(a key of 109 bytes)");
}

TEST(JsonText, ATextAboveTheLimitIsRefusedBeforeParsing) {
  std::string text = "{\"marr\": 0.1}";
  text.resize(kMaxJsonTextBytes, ' ');
  EXPECT_EQ(error_of(text).where(), "");  // exactly the limit: read
  text += ' ';
  const InputError error = error_of(text);
  EXPECT_EQ(error.where(), "$");
  EXPECT_EQ(error.rule(),
            "is 16777217 bytes; a case or policy file may be at most 16777216 bytes (16 MiB)");
}

TEST(JsonText, ManySiblingsParse) {
  // 50,000 members in one object (a policy of that many classes) parse, each key checked.
  std::string text = "{";
  for (int i = 0; i < 50000; ++i) text += fmt::format("{}\"k{}\": {}", i ? "," : "", i, i);
  text += ", \"k49999\": 0}";
  EXPECT_EQ(error_of(text).where(), "$.k49999");
  text.erase(text.rfind(','));
  EXPECT_EQ(parse_json_text(text + "}").size(), 50000u);
}

// Float noise (issue 16): 0.07 x (1 - 0.25), the after-tax MARR of SPEC 4's default, is
// 0.052500000000000005 in binary floating point; it is written 0.0525. A figure that is not
// within a few units in the last place of a 12-digit decimal is written to the last bit.
TEST(JsonOutput, WritesNumbersWithoutFloatNoise) {
  const double after_tax_marr = 0.07 * (1 - 0.25);
  ASSERT_NE(after_tax_marr, 0.0525);  // the noise this removes
  EXPECT_EQ(without_float_noise(after_tax_marr), 0.0525);
  EXPECT_EQ(without_float_noise(26447.399999999998), 26447.4);   // a book value of a demo unit
  EXPECT_EQ(without_float_noise(1605.5999999999985), 1605.6);    // 7 units in the last place off
  EXPECT_EQ(without_float_noise(1.0 / 3), 1.0 / 3);               // a true figure is kept
  EXPECT_EQ(without_float_noise(9562.864132481234), 9562.864132481234);
  EXPECT_EQ(without_float_noise(0.0), 0.0);
  EXPECT_EQ(json_output({{"after_tax_marr", after_tax_marr}, {"years", 3}}),
            "{\n  \"after_tax_marr\": 0.0525,\n  \"years\": 3\n}");
  EXPECT_EQ(json_output({{"rates", {after_tax_marr, 0.1}}}, -1), "{\"rates\":[0.0525,0.1]}");
  // A member named exact is written to the last bit.
  EXPECT_EQ(json_output({{"a", after_tax_marr}, {"case", {{"b", after_tax_marr}}}}, -1, {"case"}),
            "{\"a\":0.0525,\"case\":{\"b\":0.052500000000000005}}");
}

}  // namespace
}  // namespace tenure::formats
