// The demo policy text (see demo_policy.h).
#include "demo/demo_policy.h"

namespace tenure::demo {

namespace {

// The first line of the text is the policy's first comment: it says that it is invented.
constexpr std::string_view kDemoPolicy =
    R"json(// Invented for the demo: the policy of "Larkmoor Water", an invented water utility.
// No real organisation, price list or tax position is described here.
{
  // Past costs are restated into as-of-year money at 3% a year (cost_escalation), so every
  // amount is constant money and marr is a REAL rate: never mix real and nominal (NIST Handbook
  // 135 practice). 7% real is roughly 10% nominal at 3% inflation.
  "marr": 0.07,
  "income_tax_rate": 0.25,          // after-tax marr defaults to 0.07 * (1 - 0.25) = 0.0525
  "cost_escalation": 0.03,
  "review_margin": 0.05,
  "sources": {"assets": "asset", "costs": "cost_event", "valuations": "asset_valuation"},
  "classes": {
    "pump-centrifugal": {
      "challenger_first_cost": 24000,
      "max_life_years": 25,
      "depreciation": {"method": "straight_line", "life_years": 15, "salvage": 0},
      "market_value": {"annual_decline": 0.12},
      "cost_model": "linear"
    },
    "van-service": {
      "challenger_first_cost": 48000,
      "max_life_years": 15,
      "depreciation": {"method": "macrs", "recovery_years": 5},
      "market_value": {"annual_decline": 0.18},
      "cost_model": "auto"
    },
    "generator-standby": {
      "challenger_first_cost": 85000,
      "max_life_years": 30,
      "depreciation": {"method": "macrs", "recovery_years": 15},
      "market_value": {"annual_decline": 0.06},
      "cost_model": "auto"
    },
    "forklift-electric": {
      "challenger_first_cost": 36000,
      "max_life_years": 20,
      "depreciation": {"method": "macrs", "recovery_years": 7},
      "market_value": {"annual_decline": 0.15},
      "cost_model": "geometric"
    }
  }
}
)json";

}  // namespace

std::string_view demo_policy_json() { return kDemoPolicy; }

}  // namespace tenure::demo
