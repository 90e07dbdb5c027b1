// A pooled regime ("method": "pool", SPEC 13), as Canada's capital cost allowance (CCA) classes
// and the UK's main and special-rate pools work: each year deducts the rate d of the pool's
// undepreciated balance (UCC). The method follows one asset's share of its pool; its book value
// is that share of the UCC.
//
//   Pool cca(PoolSpec{0.30, true, std::nullopt});   // a 30% class (CCA class 10), half-year rule
//   cca.deductions(10000);   // {1500, 2550, 1785, ...}: 15%, then 30% of 8500, 30% of 5950, ...
//   Pool fya(PoolSpec{0.18, false, 0.40});          // 40% first-year allowance, then an 18% pool
//   fya.deductions(10000);   // {4000, 1080, 885.6, ...}: 40%, then 18% of 6000, of 4920, ...
//
// Rules:
//   (1) Year 1 deducts d x C on an addition C; under the half-year rule d x C / 2 (d on half the
//       addition in the year it is added).
//   (2) A first-year allowance f deducts f x C in year 1 instead, and the rest (1 - f) x C joins
//       the pool, written down at d from year 2 (the UK rule for a part-claimed first-year
//       allowance; also Canada's accelerated first years, such as 45% on a 30% class, f = 0.45;
//       f = 1 is immediate expensing).
//   (3) Every later year deducts d x the UCC at the end of the year before, so the balance falls
//       by d a year and never ends unless d or f is 1.
//   (4) The half-year rule together with a first-year allowance is refused: the allowance is
//       the year-1 deduction and the rest is written down from year 2, so there is no year 1 in
//       which the rest could take half a year.
//   (5) deductions() lists the years until the UCC is under 1% of the addition, at most 100
//       (that is what `tenure schedule` shows without a year of sale); pool_rate() tells
//       Schedule to carry the balance on past them at d (schedule.h), so no year an analysis
//       reaches is cut short.
//   (6) The year of a sale takes its full deduction (at year end, on the balance before the
//       sale), and the sale itself follows the pool's rule (tax/pool_disposal.h), not recapture.
//   d, f and the half-year rule are the user's: rates are set by each jurisdiction and year.
#pragma once

#include <optional>

#include "depreciation/method.h"

namespace tenure::depreciation {

class Pool : public Method {
 public:
  // Throws InputError naming "rate" (not in (0, 1]), "first_year_allowance" (not in (0, 1]) or
  // "half_year_rule" (true with a first-year allowance, rule 4).
  explicit Pool(PoolSpec spec);

  std::string_view name() const override { return "pool"; }
  // Rules (1) to (3) for the years of rule (5).
  std::vector<Money> deductions(Money basis) const override;
  std::optional<Rate> pool_rate() const override { return spec_.rate; }
  // A pool holds no amount: the same method.
  std::shared_ptr<const Method> scaled(double) const override {
    return std::make_shared<Pool>(*this);
  }

 private:
  PoolSpec spec_;
};

}  // namespace tenure::depreciation
