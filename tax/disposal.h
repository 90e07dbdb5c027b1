// Tax on selling an asset (SPEC 6): the gain over book value is taxed, the part up to the
// original basis as depreciation recapture at the income rate and any excess over the basis at
// the capital-gains rate; a sale below book value is a loss that saves tax at the income rate.
//
//   // basis 10000, book 4000, sold for 12000 at t = 0.25, capital gains 0.15:
//   tax_on_disposal({12000, 4000, 10000}, rates);   // 0.25*6000 + 0.15*2000 = 1800
#pragma once

#include "core/types.h"
#include "tax/rates.h"

namespace tenure::tax {

struct Sale {
  Money market_value;  // what the sale brings
  Money book_value;    // book value at the sale
  Money basis;         // original depreciable basis (first cost)
};

// Tax due on the sale; negative when the sale is a loss (a tax saving).
Money tax_on_disposal(const Sale& sale, const Rates& rates);

// What the sale leaves after tax: market_value - tax_on_disposal.
inline Money after_tax_proceeds(const Sale& sale, const Rates& rates) {
  return sale.market_value - tax_on_disposal(sale, rates);
}

}  // namespace tenure::tax
