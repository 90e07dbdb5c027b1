// No depreciation (see no_depreciation.h).
#include "depreciation/no_depreciation.h"

namespace tenure::depreciation {

std::vector<Money> NoDepreciation::deductions(Money /*basis*/) const { return {}; }

}  // namespace tenure::depreciation
