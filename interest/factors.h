// Compound-interest factors of engineering economy, end-of-year convention, with their i -> 0
// limits. Names follow the standard notation: PF is (P/F, i, n), "present worth given a future
// amount". Every function checks its inputs: i finite and > -1, n finite and >= 0 (> 0 where the
// factor divides by n), and throws InputError naming "i" or "n".
//
//   double pw = 1000 * tenure::interest::pf(0.10, 10);   // 385.54...
//   double a  = 60000 * tenure::interest::ap(0.10, 5);   // annual equivalent of 60000 now
#pragma once

#include <optional>
#include <string_view>

#include "core/types.h"

namespace tenure::interest {

double pf(Rate i, double n);  // (P/F): 1 / (1+i)^n
double fp(Rate i, double n);  // (F/P): (1+i)^n
double ap(Rate i, double n);  // (A/P): capital recovery, i(1+i)^n / ((1+i)^n - 1); n > 0
double af(Rate i, double n);  // (A/F): sinking fund, i / ((1+i)^n - 1); n > 0
double pa(Rate i, double n);  // (P/A): ((1+i)^n - 1) / (i(1+i)^n)
double fa(Rate i, double n);  // (F/A): ((1+i)^n - 1) / i
double ag(Rate i, double n);  // (A/G): 1/i - n/((1+i)^n - 1); n > 0
double pg(Rate i, double n);  // (P/G): ((1+i)^n - i n - 1) / (i^2 (1+i)^n)
// (P/A1, g, i, n): present worth of a series A1, A1(1+g), ..., A1(1+g)^(n-1) per unit A1.
// Equals n / (1+i) when g == i. g must be finite and > -1.
double geometric_pa(Rate i, Rate g, double n);

// The factor named by its usual text ("P/F", "A/P", ..., "P/A1,g" needs g), case-insensitive,
// with or without the slash ("pf"). Returns nullopt for an unknown name.
enum class Kind { pf, fp, ap, af, pa, fa, ag, pg };
std::optional<Kind> kind_from_name(std::string_view name);
double factor(Kind kind, Rate i, double n);

}  // namespace tenure::interest
