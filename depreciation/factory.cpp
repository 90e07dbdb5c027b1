// make_method (see method.h): one overload per spec type, chosen by std::visit.
#include <utility>

#include "depreciation/declining_balance.h"
#include "depreciation/macrs.h"
#include "depreciation/macrs_ads.h"
#include "depreciation/method.h"
#include "depreciation/no_depreciation.h"
#include "depreciation/pool.h"
#include "depreciation/straight_line.h"
#include "depreciation/sum_of_years_digits.h"
#include "depreciation/us_allowances.h"

namespace tenure::depreciation {
namespace {

// A US method, with its section 179 and special allowance around it when it has any.
std::shared_ptr<const Method> with_allowances(std::shared_ptr<const Method> method,
                                              const UsAllowances& allowances) {
  if (!allowances.any()) return method;
  return std::make_shared<UsAllowancesFirst>(std::move(method), allowances);
}

struct MethodBuilder {
  std::shared_ptr<const Method> operator()(const StraightLineSpec& spec) const {
    return std::make_shared<StraightLine>(spec);
  }
  std::shared_ptr<const Method> operator()(const DecliningBalanceSpec& spec) const {
    return std::make_shared<DecliningBalance>(spec);
  }
  std::shared_ptr<const Method> operator()(const SumOfYearsDigitsSpec& spec) const {
    return std::make_shared<SumOfYearsDigits>(spec);
  }
  std::shared_ptr<const Method> operator()(const MacrsSpec& spec) const {
    return with_allowances(std::make_shared<Macrs>(spec), spec.allowances);
  }
  std::shared_ptr<const Method> operator()(const MacrsAdsSpec& spec) const {
    return with_allowances(std::make_shared<MacrsAds>(spec), spec.allowances);
  }
  std::shared_ptr<const Method> operator()(const NoDepreciationSpec&) const {
    return std::make_shared<NoDepreciation>();
  }
  std::shared_ptr<const Method> operator()(const PoolSpec& spec) const {
    return std::make_shared<Pool>(spec);
  }
};

}  // namespace

std::optional<Money> section_179_of(const Spec& spec) {
  if (const auto* macrs = std::get_if<MacrsSpec>(&spec)) return macrs->allowances.section_179;
  if (const auto* ads = std::get_if<MacrsAdsSpec>(&spec)) return ads->allowances.section_179;
  return std::nullopt;
}

std::shared_ptr<const Method> make_method(const Spec& spec) {
  return std::visit(MethodBuilder{}, spec);
}

}  // namespace tenure::depreciation
