// Tax on selling an asset of a pool (see pool_disposal.h).
#include "tax/pool_disposal.h"

#include <algorithm>

namespace tenure::tax {

Money tax_on_pool_sale(const PoolSale& sale, const Rates& rates) {
  const Rate d = sale.pool_rate;
  const Money off_the_pool = std::min(sale.proceeds, sale.capital_cost);  // rule (1)
  const Money write_downs = d * (sale.balance - off_the_pool) / (rates.after_tax_marr + d);
  const Money capital_gain = std::max(sale.proceeds - sale.capital_cost, 0.0);  // rule (3)
  return -rates.income_tax_rate * write_downs + rates.capital_gains_tax_rate * capital_gain;
}

}  // namespace tenure::tax
