// Compound-interest factors (see factors.h). Small rates use expm1/log1p, and the gradient
// factors switch to direct summation near i = 0, where their closed forms cancel badly.
#include "interest/factors.h"

#include <algorithm>
#include <array>
#include <bitset>
#include <cctype>
#include <cmath>
#include <string>

#include "core/checks.h"
#include "core/errors.h"

namespace tenure::interest {
namespace {

constexpr double kSmallRate = 1e-5;  // below this the gradient factors are summed directly
// Direct sums run to here at most; a longer series (n up to the double's limit is finite and
// allowed) takes the closed form, whose cancellation at tiny i matters far less at such n.
constexpr double kMaxSummedPeriods = 100000;

void check(Rate i, double n, bool n_positive) {
  require_rate(i, "i");
  require_finite(n, "n");
  if (n_positive ? n <= 0 : n < 0) {
    throw InputError("n", n_positive ? "must be > 0" : "must be >= 0");
  }
}

// (1+i)^n - 1 without losing digits for small i.
double growth_minus_one(Rate i, double n) { return std::expm1(n * std::log1p(i)); }

// 1 - (1+i)^-n, likewise; it stays finite where (1+i)^n overflows (a huge i or n), so factors
// written with it give their limits there instead of inf / inf = NaN.
double one_minus_discount(Rate i, double n) { return -std::expm1(-n * std::log1p(i)); }

// The nightly review asks for the same factors at one or two rates (before and after tax) and
// n = 1, 2, ... for every asset of a fleet. Each thread keeps the values of its last two rates
// at whole n below kMemoPeriods, computed by the very expression a miss evaluates, so a hit
// returns the same bits the computation would.
constexpr std::size_t kMemoPeriods = 256;

class PeriodMemo {
 public:
  template <class Compute>
  double get(Rate i, double n, Compute compute) {
    if (!(n >= 0 && n < kMemoPeriods) || n != std::floor(n)) return compute();
    const auto k = static_cast<std::size_t>(n);
    Rates* entry = nullptr;
    for (Rates& e : entries_) {
      if (e.used && e.rate == i) entry = &e;
    }
    if (!entry) {
      entry = &entries_[next_];
      next_ = (next_ + 1) % entries_.size();
      *entry = Rates{};
      entry->used = true;
      entry->rate = i;
    }
    if (!entry->known[k]) {
      entry->value[k] = compute();
      entry->known[k] = true;
    }
    return entry->value[k];
  }

 private:
  struct Rates {
    bool used = false;
    Rate rate = 0;
    std::array<double, kMemoPeriods> value{};
    std::bitset<kMemoPeriods> known;
  };
  std::array<Rates, 2> entries_{};
  std::size_t next_ = 0;
};

thread_local PeriodMemo pf_memo, fp_memo, pa_memo;

}  // namespace

double pf(Rate i, double n) {
  check(i, n, false);
  return pf_memo.get(i, n, [&] { return std::exp(-n * std::log1p(i)); });
}

double fp(Rate i, double n) {
  check(i, n, false);
  return fp_memo.get(i, n, [&] { return std::exp(n * std::log1p(i)); });
}

double pa(Rate i, double n) {
  check(i, n, false);
  if (i == 0) return n;
  return pa_memo.get(i, n, [&] { return one_minus_discount(i, n) / i; });
}

double fa(Rate i, double n) {
  check(i, n, false);
  if (i == 0) return n;
  return growth_minus_one(i, n) / i;
}

double ap(Rate i, double n) {
  check(i, n, true);
  return 1.0 / pa(i, n);
}

double af(Rate i, double n) {
  check(i, n, true);
  return 1.0 / fa(i, n);
}

double pg(Rate i, double n) {
  check(i, n, false);
  if (std::abs(i) < kSmallRate && n == std::floor(n) && n <= kMaxSummedPeriods) {
    // Sum (k-1)/(1+i)^k for k = 1..n: exact in form, stable at i -> 0 (limit n(n-1)/2).
    double sum = 0;
    for (int k = 2; k <= static_cast<int>(n); ++k) sum += (k - 1) * pf(i, k);
    return sum;
  }
  if (i == 0) return n * (n - 1) / 2;
  const double growth = fp(i, n);
  if (std::isinf(growth)) {
    // Divided through by (1+i)^n, which has overflowed: (1 - (1+i)^-n - i n (1+i)^-n) / i^2.
    return (one_minus_discount(i, n) - i * (n * pf(i, n))) / (i * i);
  }
  return (growth_minus_one(i, n) - i * n) / (i * i * growth);
}

double ag(Rate i, double n) {
  check(i, n, true);
  if (std::abs(i) < kSmallRate) return pg(i, n) * ap(i, n);  // limit (n-1)/2
  return 1.0 / i - n / growth_minus_one(i, n);
}

double geometric_pa(Rate i, Rate g, double n) {
  check(i, n, false);
  require_rate(g, "g");
  const double ratio = (1 + g) / (1 + i);
  if (std::abs(i - g) < kSmallRate * (1 + std::abs(i))) {
    // Sum of ratio^(k-1) / (1+i), stable as g -> i (limit n / (1+i)).
    if (n == std::floor(n) && n <= kMaxSummedPeriods) {
      double sum = 0, term = 1;
      for (int k = 1; k <= static_cast<int>(n); ++k, term *= ratio) sum += term;
      return sum / (1 + i);
    }
    return n / (1 + i);
  }
  return -std::expm1(n * std::log(ratio)) / (i - g);
}

std::optional<Kind> kind_from_name(std::string_view name) {
  std::string key;
  for (char c : name) {
    if (c != '/' && c != ' ') key.push_back(static_cast<char>(std::tolower(static_cast<unsigned char>(c))));
  }
  static constexpr std::pair<std::string_view, Kind> kNames[] = {
      {"pf", Kind::pf}, {"fp", Kind::fp}, {"ap", Kind::ap}, {"af", Kind::af},
      {"pa", Kind::pa}, {"fa", Kind::fa}, {"ag", Kind::ag}, {"pg", Kind::pg}};
  for (const auto& [text, kind] : kNames) {
    if (key == text) return kind;
  }
  return std::nullopt;
}

double factor(Kind kind, Rate i, double n) {
  switch (kind) {
    case Kind::pf: return pf(i, n);
    case Kind::fp: return fp(i, n);
    case Kind::ap: return ap(i, n);
    case Kind::af: return af(i, n);
    case Kind::pa: return pa(i, n);
    case Kind::fa: return fa(i, n);
    case Kind::ag: return ag(i, n);
    case Kind::pg: return pg(i, n);
  }
  throw InputError("kind", "unknown factor");
}

}  // namespace tenure::interest
