// Depreciation from flat parameters, as a command line or an SQL call gives them, made into a
// checked schedule: the one reader of them for `tenure schedule` (cli/schedule_command.cpp) and
// the SQL functions tenure_depreciation and tenure_book_value (plugin/depreciation_arguments.cpp).
// The parameters go into a case file's depreciation object and through read_depreciation, so
// they accept exactly what a case file accepts.
//
//   FlatDepreciation flat{.method = "macrs", .basis = 10000, .life = 5, .disposal_year = 3};
//   FlatSchedule s = flat_schedule(flat, refusals);
//   s.spec;                              // MacrsSpec{5}
//   s.schedule.rows(s.disposal_year);    // years 1..3; year 3 takes half of its 19.20%
//
// Every InputError's `where` is a flat parameter's name (below), which the caller maps to its
// own ("life" is `--life` on the command line, the 4th argument in SQL). The rules:
//   (1) method is one of depreciation_method_names(), else at "method": "unknown method 'x'
//       (expected one of straight_line, ...)".
//   (2) A parameter the method takes must be given; refusals.missing says so. basis is taken by
//       every method; straight_line and sum_of_years_digits take life and salvage;
//       declining_balance life, rate, salvage and switch_to_straight_line; macrs life (its
//       recovery period); macrs_ads life (its ADS recovery period); none nothing more.
//   (2a) The optional parameters may be left out: section_179 and bonus (macrs, macrs_ads),
//       convention and quarter (macrs), as the optional fields of a case file.
//   (3) A parameter the method does not take must not be given; refusals.unused says so. A
//       salvage of 0 counts as not given: macrs and none recover the whole basis, so a zero
//       salvage says nothing they would ignore.
//   (4) The values are checked as a case file's: life whole years >= 1 (macrs: 3, 5, 7, 10, 15
//       or 20), rate > 0, salvage >= 0 and not above the basis, basis > 0, and basis and salvage
//       at most 1e15 in magnitude, the bound of every amount (core/checks.h).
//   (5) disposal_year, when given, is a whole year >= 1.
//   (6) A method that is JSON text starting with '{' is a whole depreciation object, as a case
//       file writes it ({"method": "macrs", "recovery_years": 5}): every key a case file
//       accepts, read by read_depreciation. Beside it only basis and disposal_year may be
//       given; any other parameter "must not be given when the method is a depreciation object
//       (put it in the object)". The object's errors are at its JSON paths ("$.recovery_years").
// Rules (2) and (3) are checked parameter by parameter in the order of FlatDepreciation, the
// optional ones after the others: section_179, bonus, convention, quarter.
#pragma once

#include <functional>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "core/errors.h"
#include "core/types.h"
#include "depreciation/method.h"
#include "depreciation/schedule.h"

namespace tenure::formats {

// The flat parameters by their names; nullopt is "not given".
struct FlatDepreciation {
  std::string method;
  std::optional<Money> basis = std::nullopt;
  std::optional<Money> salvage = std::nullopt;
  std::optional<double> life = std::nullopt;  // years; for macrs the recovery period
  std::optional<double> rate = std::nullopt;  // multiple of the straight-line rate (2 = double)
  std::optional<bool> switch_to_straight_line = std::nullopt;
  std::optional<double> disposal_year = std::nullopt;  // sold at the end of this year
  // The US fields (SPEC 13), each optional for the methods that take it (rule 2a).
  std::optional<Money> section_179 = std::nullopt;     // macrs, macrs_ads
  std::optional<double> bonus = std::nullopt;          // macrs, macrs_ads: fraction 0..1
  std::optional<std::string> convention = std::nullopt;  // macrs: half_year or mid_quarter
  std::optional<double> quarter = std::nullopt;        // macrs, mid_quarter: 1..4
};

// How the caller refuses a parameter that does not fit the method (rules 2 and 3). The command
// line and the SQL functions word these two refusals differently, and the tests of both pin
// their words, so the words are the caller's:
//   tenure schedule: --salvage: required by method straight_line
//                    --rate: not used by method straight_line (it takes --life, --salvage)
//   tenure_depreciation: 3rd argument (salvage) is missing      ("must be a number" when NULL)
//                        5th argument (rate) is not used by method macrs
//                        3rd argument (salvage) must be 0 or NULL for method macrs
// Each returns the error to throw, at the flat parameter's name.
struct MisfitRefusals {
  // `parameter`, which `method` takes, was not given.
  std::function<InputError(std::string_view parameter, std::string_view method)> missing;
  // `parameter` was given, and `method` takes only `taken` (in the method's order; maybe none).
  std::function<InputError(std::string_view parameter, std::string_view method,
                           const std::vector<std::string_view>& taken)>
      unused;
};

// The schedule the parameters describe, with the spec it was made from and the disposal year.
struct FlatSchedule {
  depreciation::Spec spec;
  depreciation::Schedule schedule;
  std::optional<Years> disposal_year;
};

// Applies rules (1) to (5) in that order; throws InputError at the name of the parameter that
// breaks one.
FlatSchedule flat_schedule(const FlatDepreciation& flat, const MisfitRefusals& refusals);

}  // namespace tenure::formats
