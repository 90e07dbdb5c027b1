// Names for the quantities tenure computes with, so signatures say what they mean.
//
//   Money first_cost = 52000;   // positive is a cost or a value, in one currency
//   Rate marr = 0.10;           // per year, as a fraction
//   Years life = 5;             // whole years of ownership
#pragma once

namespace tenure {

using Money = double;  // an amount in the case's currency
using Rate = double;   // a per-year rate as a fraction: 0.10 is ten percent
using Years = int;     // a count of whole years

// Ties between lives or years are decided within this relative tolerance (SPEC 6).
inline constexpr double kTieTolerance = 1e-9;

}  // namespace tenure
