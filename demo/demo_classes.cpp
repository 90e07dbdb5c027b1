// The invented classes of the demo (see demo_classes.h). The numbers are made up so that the
// economic lives differ by class (roughly 12 years for pumps, 8 to 9 for vans and forklifts, over
// 20 for standby generators at a 7% real MARR before tax). Each class's oldest units are a few
// years past that life, as in a fleet that replaces late, so the review finds units to keep, to
// review and to replace.
#include "demo/demo_classes.h"

#include <cmath>

namespace tenure::demo {

namespace {

// Kind shares in kEventKinds order: repair, parts, labour, fuel, inspection.
constexpr std::array<DemoClass, 4> kClasses = {{
    {.name = "pump-centrifugal", .id_prefix = "PMP", .fleet_share = 0.35, .price = 24000,
     .shape = CurveShape::linear, .a = 900, .g = 250, .event_rate_weight = 1.0,
     .oldest_unit_years = 18, .value_start = 0.92, .value_decline = 0.12,
     .kind_shares = {0.30, 0.30, 0.28, 0.00, 0.12}},
    {.name = "van-service", .id_prefix = "VAN", .fleet_share = 0.30, .price = 48000,
     .shape = CurveShape::geometric, .a = 3000, .g = 0.15, .event_rate_weight = 1.8,
     .oldest_unit_years = 12, .value_start = 0.88, .value_decline = 0.18,
     .kind_shares = {0.18, 0.17, 0.12, 0.45, 0.08}},
    {.name = "generator-standby", .id_prefix = "GEN", .fleet_share = 0.15, .price = 85000,
     .shape = CurveShape::linear, .a = 1200, .g = 320, .event_rate_weight = 0.35,
     .oldest_unit_years = 25, .value_start = 0.95, .value_decline = 0.06,
     .kind_shares = {0.10, 0.20, 0.25, 0.10, 0.35}},
    {.name = "forklift-electric", .id_prefix = "FLT", .fleet_share = 0.20, .price = 36000,
     .shape = CurveShape::geometric, .a = 1800, .g = 0.16, .event_rate_weight = 0.9,
     .oldest_unit_years = 14, .value_start = 0.90, .value_decline = 0.15,
     .kind_shares = {0.35, 0.30, 0.25, 0.00, 0.10}},
}};

}  // namespace

Money DemoClass::true_cost(int age_year) const {
  const int years_after_first = age_year - 1;
  if (shape == CurveShape::linear) return a + g * years_after_first;
  return a * std::pow(1.0 + g, years_after_first);
}

std::span<const DemoClass> demo_classes() { return kClasses; }

}  // namespace tenure::demo
