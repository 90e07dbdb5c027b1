// tenure_version(), tenure_factor(kind, i, n) and tenure_geometric_factor(i, g, n): the
// compound-interest factors of engineering economy (interest/factors.h) as SQL functions, for
// moving money through time inside a query. End-of-year convention; i and g are rates per
// period as fractions (0.10 is ten percent); n is a number of periods, not necessarily whole.
//
// Usage:
//   SELECT tenure_version();                              -- 0.1.0
//   SELECT round(tenure_factor('P/F', 0.10, 10), 4);      -- 0.3855
//   SELECT round(tenure_factor('A/P', 0.10, 10), 5);      -- 0.16275
//   SELECT round(tenure_factor('P/A', 0.10, 10), 4);      -- 6.1446
//   SELECT round(tenure_factor('A/G', 0.10, 10), 4);      -- 3.7255
//   SELECT round(tenure_factor('P/A', 0, 10), 4);         -- 10.0 (the i -> 0 limit)
//   SELECT round(tenure_geometric_factor(0.10, 0.05, 10), 4);   -- 7.4398, (P/A1, g, i, n)
//   -- What is 52000 spread over 7 years at 8% worth per year?
//   SELECT round(52000 * tenure_factor('A/P', 0.08, 7), 2);    -- 9987.76
//
// kind is one of 'P/F', 'F/P', 'A/P', 'A/F', 'P/A', 'F/A', 'A/G', 'P/G', in any letter case and
// with or without the slash ('ap'). Rules: i (and g) finite and > -1; n finite and >= 0, and
// > 0 for A/P, A/F and A/G, which divide by it. Numeric text counts as a number (as in SQLite's
// own functions); NULL or other text is an error:
//   tenure_factor: 3rd argument (n) must be >= 0
//   tenure_factor: 2nd argument (i) must be a number
//   tenure_factor: unknown kind 'X/Y' (expected one of P/F, F/P, A/P, A/F, P/A, F/A, A/G, P/G)
//
// All three are deterministic and innocuous: usable in views, indexes and generated columns.
#include "core/version.h"
#include "interest/factors.h"
#include "plugin/functions.h"
#include "plugin/sql_arguments.h"

namespace tenure::plugin {
namespace {

const Signature kFactor{"tenure_factor", {"kind", "i", "n"}};
const Signature kGeometricFactor{"tenure_geometric_factor", {"i", "g", "n"}};

constexpr const char* kKindNames = "P/F, F/P, A/P, A/F, P/A, F/A, A/G, P/G";

}  // namespace

void version_function(sqlite3_context* context, int, sqlite3_value**) {
  sqlite3_result_text(context, tenure::kVersion, -1, SQLITE_STATIC);
}

void factor_function(sqlite3_context* context, int argc, sqlite3_value** argv) {
  guarded(context, kFactor, [&] {
    const Arguments args(kFactor, argc, argv);
    const std::string name = args.text("kind");
    const auto kind = interest::kind_from_name(name);
    if (!kind) {
      throw InputError("", "unknown kind '" + name + "' (expected one of " + kKindNames + ")");
    }
    sqlite3_result_double(context, interest::factor(*kind, args.number("i"), args.number("n")));
  });
}

void geometric_factor_function(sqlite3_context* context, int argc, sqlite3_value** argv) {
  guarded(context, kGeometricFactor, [&] {
    const Arguments args(kGeometricFactor, argc, argv);
    sqlite3_result_double(context, interest::geometric_pa(args.number("i"), args.number("g"),
                                                          args.number("n")));
  });
}

}  // namespace tenure::plugin
