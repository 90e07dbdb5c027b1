// The tax rules of a depreciation spec in words (see tax_rules_text.h).
#include "formats/tax_rules_text.h"

#include <fmt/format.h>

#include "formats/text_table.h"

namespace tenure::formats {
namespace {

using namespace tenure::depreciation;

std::string allowance_words(const UsAllowances& a) {
  if (!a.any()) return ", no section 179 amount, no special allowance";
  return fmt::format(", section 179 {}, special allowance {} (IRS Publication 946 order)",
                     money(a.section_179.value_or(0)), percent(a.bonus.value_or(0)));
}

struct Words {
  std::string operator()(const StraightLineSpec& s) const {
    return fmt::format("straight line over {} years to a salvage of {} (a book method)",
                       s.life_years, money(s.salvage));
  }
  std::string operator()(const DecliningBalanceSpec& s) const {
    return fmt::format(
        "declining balance at {}x the straight-line rate over {} years to a "
        "salvage of {}{} (a book method)",
        s.rate, s.life_years, money(s.salvage),
        s.switch_to_straight_line ? ", switching to straight line" : "");
  }
  std::string operator()(const SumOfYearsDigitsSpec& s) const {
    return fmt::format("sum of the years' digits over {} years to a salvage of {} (a book method)",
                       s.life_years, money(s.salvage));
  }
  std::string operator()(const MacrsSpec& s) const {
    const std::string convention =
        s.convention == MacrsConvention::mid_quarter
            ? fmt::format("mid-quarter convention (placed in service in quarter {})",
                          s.quarter.value_or(0))
            : std::string("half-year convention");
    return fmt::format("MACRS GDS {}-year, {}{}", s.recovery_years, convention,
                       allowance_words(s.allowances));
  }
  std::string operator()(const MacrsAdsSpec& s) const {
    return fmt::format("MACRS ADS {}-year straight line, half-year convention{}", s.recovery_years,
                       allowance_words(s.allowances));
  }
  std::string operator()(const NoDepreciationSpec&) const { return "no depreciation"; }
  std::string operator()(const PoolSpec& s) const {
    std::string out = fmt::format("a pool written down at {} a year", percent(s.rate));
    if (s.half_year_rule) out += ", half-year rule";
    if (s.first_year_allowance) {
      out += fmt::format(", first-year allowance {}", percent(*s.first_year_allowance));
    }
    return out + "; a sale takes its proceeds off the pool";
  }
};

}  // namespace

std::string tax_rules_sentence(const Spec& spec) { return std::visit(Words{}, spec); }

}  // namespace tenure::formats
