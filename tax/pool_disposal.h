// Tax on selling an asset of a pool (SPEC 13; the pooled regime of depreciation/pool.h): the
// sale takes its proceeds off the pool instead of taxing a gain over book value, and the pool
// goes on with the class's other assets, so the sale's tax effect is the present worth of the
// write-downs it removes.
//
//   // balance 5950 after year 2's deduction, cost 10000, pool rate 0.30, sold for 2000,
//   // t = 0.25, after-tax MARR 0.075:
//   tax_on_pool_sale({2000, 5950, 10000, 0.30}, rates);   // -0.25 x 0.30 x 3950 / 0.375 = -790
//
// Rules, for a sale at the end of year n for S, with UCC_n the asset's balance after year n's
// deduction (years 1..n deduct on the whole balance; the sale changes year n + 1 on):
//   (1) The proceeds up to the capital cost C come off the pool: min(S, C).
//   (2) What is left of the asset's share, UCC_n - min(S, C), goes on being written down at d
//       a year from year n + 1, on a balance falling by d: worth d x (UCC_n - min(S, C)) / (k + d)
//       at year n, at the after-tax MARR k. The analysis stops the asset's deductions at the
//       sale, so the sale carries them as a saving: tax = -t x d x (UCC_n - min(S, C)) / (k + d).
//       Proceeds above the balance make it a tax: the write-downs the pool's other assets lose.
//   (3) Proceeds above C are a capital gain, taxed at the capital-gains rate.
//   (4) The pool is assumed to continue. A class that empties (the last asset sold, with a
//       terminal loss or recapture of the balance then) is not modelled, nor a balance that
//       turns negative at a year end.
#pragma once

#include "core/types.h"
#include "tax/rates.h"

namespace tenure::tax {

struct PoolSale {
  Money proceeds;      // S, what the sale brings
  Money balance;       // UCC_n, the asset's undepreciated balance after the year's deduction
  Money capital_cost;  // C, what the asset added to the pool
  Rate pool_rate;      // d
};

// Rules (1) to (3); negative is a saving.
Money tax_on_pool_sale(const PoolSale& sale, const Rates& rates);

}  // namespace tenure::tax
