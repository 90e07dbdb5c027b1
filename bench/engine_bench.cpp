// Timings of the engine's kernels with Google Benchmark, on invented assets:
//
//   build/bench/tenure_bench_engine                       # all of them
//   build/bench/tenure_bench_engine --benchmark_filter=Macrs
//
// ChallengerEconomicLife     analyse_asset on a 20-year challenger (MACRS 7, both tax bases)
// DefenderAgainstChallenger  analyse_asset on a defender, then decide against a challenger
// MacrsTable/R               the computed MACRS percentages of an R-year recovery period
// InterestFactors/n          the eight factors at 10% for n years; SmallRate at 1e-6
#include <benchmark/benchmark.h>

#include <cmath>
#include <vector>

#include "depreciation/macrs.h"
#include "interest/factors.h"
#include "replacement/case_analysis.h"

namespace tenure {
namespace {

// Invented series: costs rise 8% a year from `first_cost_of_year_1`, values fall 15% a year.
replacement::Ownership invented_asset(Money first_cost, Years age, Money value_now, Years years,
                                      depreciation::Spec depreciation) {
  std::vector<Money> costs, values;
  for (Years k = 1; k <= years; ++k) {
    costs.push_back(0.08 * first_cost * std::pow(1.08, k - 1));
    values.push_back(value_now * std::pow(0.85, k));
  }
  return {first_cost, age, value_now, costs, values, depreciation::make_method(depreciation)};
}

const tax::Rates kRates = tax::Rates::make(0.10, 0.25);

void ChallengerEconomicLife(benchmark::State& state) {
  const auto challenger = invented_asset(120000, 0, 120000, 20, depreciation::MacrsSpec{7});
  for (auto _ : state) benchmark::DoNotOptimize(replacement::analyse_asset(challenger, kRates));
}
BENCHMARK(ChallengerEconomicLife);

void DefenderAgainstChallenger(benchmark::State& state) {
  const auto challenger = invented_asset(120000, 0, 120000, 20, depreciation::MacrsSpec{7});
  const auto defender = invented_asset(95000, 6, 30000, 8, depreciation::MacrsSpec{7});
  const replacement::AssetAnalysis challenger_analysis =
      replacement::analyse_asset(challenger, kRates);
  for (auto _ : state) {
    const replacement::AssetAnalysis defender_analysis =
        replacement::analyse_asset(defender, kRates);
    benchmark::DoNotOptimize(replacement::decide(defender_analysis, challenger_analysis, kRates));
  }
}
BENCHMARK(DefenderAgainstChallenger);

void MacrsTable(benchmark::State& state) {
  const auto recovery_years = static_cast<Years>(state.range(0));
  for (auto _ : state) benchmark::DoNotOptimize(depreciation::macrs_percentages(recovery_years));
}
BENCHMARK(MacrsTable)->Arg(3)->Arg(5)->Arg(7)->Arg(10)->Arg(15)->Arg(20);

double all_factors(Rate i, double n) {
  using interest::Kind;
  double sum = 0;
  for (Kind kind : {Kind::pf, Kind::fp, Kind::ap, Kind::af, Kind::pa, Kind::fa, Kind::ag,
                    Kind::pg}) {
    sum += interest::factor(kind, i, n);
  }
  return sum;
}

void InterestFactors(benchmark::State& state) {
  const auto n = static_cast<double>(state.range(0));
  for (auto _ : state) benchmark::DoNotOptimize(all_factors(0.10, n));
}
BENCHMARK(InterestFactors)->Arg(5)->Arg(20)->Arg(40);

// Near i = 0 the gradient factors are summed term by term instead of taken in closed form.
void InterestFactorsSmallRate(benchmark::State& state) {
  const auto n = static_cast<double>(state.range(0));
  for (auto _ : state) benchmark::DoNotOptimize(all_factors(1e-6, n));
}
BENCHMARK(InterestFactorsSmallRate)->Arg(5)->Arg(20)->Arg(40);

}  // namespace
}  // namespace tenure
