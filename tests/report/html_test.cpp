// Text into the page: the five HTML-special characters are escaped wherever database text goes,
// and numbers carry thousands separators.
#include <gtest/gtest.h>

#include "report/html.h"

namespace tenure::report {
namespace {

TEST(Html, EscapesEverySpecialCharacter) {
  EXPECT_EQ(escape("<script>alert('x')</script> & \"y\""),
            "&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt; &amp; &quot;y&quot;");
  EXPECT_EQ(escape("PU-0042"), "PU-0042");
  EXPECT_EQ(escape(""), "");
}

TEST(Html, GroupsThousands) {
  EXPECT_EQ(grouped(1234567.891, 2), "1,234,567.89");
  EXPECT_EQ(grouped(999, 0), "999");
  EXPECT_EQ(grouped(1000, 0), "1,000");
  EXPECT_EQ(grouped(-1234, 0), "-1,234");
  EXPECT_EQ(grouped(-0.001, 2), "0.00");  // no minus sign on a zero
  EXPECT_EQ(grouped(2.5, 1), "2.5");
}

}  // namespace
}  // namespace tenure::report
