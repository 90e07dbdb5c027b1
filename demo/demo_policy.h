// The demo's policy (SPEC 4), as JSON text with comments, for the invented water utility
// "Larkmoor Water". `tenure demo` stores it in the database it builds; the same text is kept in
// fixtures/policies/demo_policy.json (a test checks that the two are equal).
//
//   store_policy(db, demo_policy_json());   // db/policy_store.h
//
// Its classes and challenger costs are those of demo_classes.h; its cost_escalation is the demo
// world's inflation (kDemoInflation), so restated costs are as-of money and its marr is real.
#pragma once

#include <string_view>

namespace tenure::demo {

std::string_view demo_policy_json();

}  // namespace tenure::demo
