// make_method (see method.h): one overload per spec type, chosen by std::visit.
#include "depreciation/declining_balance.h"
#include "depreciation/macrs.h"
#include "depreciation/method.h"
#include "depreciation/no_depreciation.h"
#include "depreciation/pool.h"
#include "depreciation/straight_line.h"
#include "depreciation/sum_of_years_digits.h"

namespace tenure::depreciation {
namespace {

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
    return std::make_shared<Macrs>(spec);
  }
  std::shared_ptr<const Method> operator()(const NoDepreciationSpec&) const {
    return std::make_shared<NoDepreciation>();
  }
  std::shared_ptr<const Method> operator()(const PoolSpec& spec) const {
    return std::make_shared<Pool>(spec);
  }
};

}  // namespace

std::shared_ptr<const Method> make_method(const Spec& spec) {
  return std::visit(MethodBuilder{}, spec);
}

}  // namespace tenure::depreciation
