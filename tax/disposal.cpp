// Tax on selling an asset (see disposal.h).
#include "tax/disposal.h"

namespace tenure::tax {

Money tax_on_disposal(const Sale& sale, const Rates& rates) {
  const Money gain = sale.market_value - sale.book_value;
  if (gain <= 0) return rates.income_tax_rate * gain;  // a loss saves tax
  if (sale.market_value <= sale.basis) return rates.income_tax_rate * gain;  // recapture only
  const Money recapture = sale.basis - sale.book_value;
  const Money capital_gain = sale.market_value - sale.basis;
  return rates.income_tax_rate * recapture + rates.capital_gains_tax_rate * capital_gain;
}

}  // namespace tenure::tax
