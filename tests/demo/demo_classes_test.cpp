// The invented classes: curve formulas (closed form, hand computed) and well-formed shares.
#include "demo/demo_classes.h"

#include <gtest/gtest.h>

#include <numeric>
#include <set>
#include <string>

namespace tenure::demo {
namespace {

const DemoClass& by_name(std::string_view name) {
  for (const DemoClass& c : demo_classes()) {
    if (c.name == name) return c;
  }
  throw std::invalid_argument(std::string(name));
}

TEST(DemoClasses, TrueCostFollowsTheClassFormula) {
  // Closed form, hand computed: linear a + g (k - 1), geometric a (1 + g)^(k - 1).
  EXPECT_DOUBLE_EQ(by_name("pump-centrifugal").true_cost(1), 900.0);
  EXPECT_DOUBLE_EQ(by_name("pump-centrifugal").true_cost(5), 900.0 + 4 * 250.0);  // 1900
  EXPECT_NEAR(by_name("van-service").true_cost(3), 3000.0 * 1.15 * 1.15, 1e-9);   // 3967.5
  EXPECT_NEAR(by_name("forklift-electric").true_cost(2), 1800.0 * 1.16, 1e-9);    // 2088
  EXPECT_DOUBLE_EQ(by_name("generator-standby").true_cost(11), 1200.0 + 10 * 320.0);
}

TEST(DemoClasses, SharesAddUpAndNamesAreDistinct) {
  double fleet = 0;
  std::set<std::string_view> names, prefixes;
  for (const DemoClass& c : demo_classes()) {
    fleet += c.fleet_share;
    names.insert(c.name);
    prefixes.insert(c.id_prefix);
    EXPECT_NEAR(std::accumulate(c.kind_shares.begin(), c.kind_shares.end(), 0.0), 1.0, 1e-12)
        << c.name;
    EXPECT_GT(c.price, 0);
    EXPECT_GT(c.value_decline, 0);
    EXPECT_LT(c.value_decline, 1);
  }
  EXPECT_NEAR(fleet, 1.0, 1e-12);
  EXPECT_EQ(names.size(), demo_classes().size());
  EXPECT_EQ(prefixes.size(), demo_classes().size());
  EXPECT_GE(demo_classes().size(), 4u);
}

}  // namespace
}  // namespace tenure::demo
