// The compound-interest factors of interest/factors.h against printed table values, against their
// textbook closed forms, against one another (the identities that tie them together), at and
// around i = 0, and with bad inputs.
//
// Table values are from memory of standard compound-interest tables (the appendix tables of
// engineering-economy texts, 4 decimals, 5 for A/P and A/F). Because they are typed from memory,
// each one is also checked against the closed form computed here with std::pow, so a mistyped
// value fails the test instead of passing unnoticed.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <limits>
#include <string>
#include <vector>

#include "core/errors.h"
#include "interest/factors.h"

namespace tenure::interest {
namespace {

// Identities between factors hold to rounding: relative tolerance.
constexpr double kIdentity = 1e-10;

bool near_relative(double a, double b, double tolerance) {
  return std::abs(a - b) <= tolerance * std::max({std::abs(a), std::abs(b), 1e-300});
}

#define EXPECT_REL(a, b, tolerance) \
  EXPECT_PRED3(near_relative, a, b, tolerance)

// The textbook closed forms, written out independently of factors.cpp (valid for i != 0).
double closed_form(Kind kind, double i, double n) {
  const double g = std::pow(1 + i, n);
  switch (kind) {
    case Kind::pf: return 1 / g;
    case Kind::fp: return g;
    case Kind::ap: return i * g / (g - 1);
    case Kind::af: return i / (g - 1);
    case Kind::pa: return (g - 1) / (i * g);
    case Kind::fa: return (g - 1) / i;
    case Kind::ag: return 1 / i - n / (g - 1);
    case Kind::pg: return (g - i * n - 1) / (i * i * g);
  }
  return std::numeric_limits<double>::quiet_NaN();
}

struct Printed {
  const char* name;
  double i;
  double n;
  double value;
  int decimals;
};

// From memory of standard compound-interest tables.
const Printed kPrinted[] = {
    {"P/F", 0.10, 10, 0.3855, 4},   {"F/P", 0.10, 10, 2.5937, 4},
    {"A/P", 0.10, 10, 0.16275, 5},  {"A/F", 0.10, 10, 0.06275, 5},
    {"P/A", 0.10, 10, 6.1446, 4},   {"F/A", 0.10, 10, 15.9374, 4},
    {"A/G", 0.10, 10, 3.7255, 4},   {"P/G", 0.10, 10, 22.8913, 4},
    {"P/A", 0.05, 20, 12.4622, 4},  {"F/P", 0.05, 20, 2.6533, 4},
    {"P/F", 0.05, 20, 0.3769, 4},   {"F/A", 0.05, 20, 33.0660, 4},
    {"A/G", 0.05, 20, 7.9030, 4},   {"A/P", 0.05, 20, 0.08024, 5},
    {"A/F", 0.05, 20, 0.03024, 5},  {"P/G", 0.05, 20, 98.4884, 4},
    {"P/A", 0.08, 5, 3.9927, 4},    {"P/F", 0.08, 5, 0.6806, 4},
    {"F/P", 0.08, 5, 1.4693, 4},    {"F/A", 0.08, 5, 5.8666, 4},
    {"A/G", 0.08, 5, 1.8465, 4},    {"P/G", 0.08, 5, 7.3724, 4},
    {"A/P", 0.08, 5, 0.25046, 5},   {"A/F", 0.08, 5, 0.17046, 5},
};

TEST(PrintedTables, GoldenValuesMatchTheClosedForm) {
  for (const Printed& row : kPrinted) {
    SCOPED_TRACE(std::string(row.name) + " i=" + std::to_string(row.i) +
                 " n=" + std::to_string(row.n));
    const double half_unit = 0.5 * std::pow(10.0, -row.decimals);
    // A failure here means the golden value was mistyped: fix the value, not the tolerance.
    EXPECT_NEAR(closed_form(*kind_from_name(row.name), row.i, row.n), row.value, half_unit);
  }
}

TEST(PrintedTables, FactorsRoundToThePrintedValue) {
  for (const Printed& row : kPrinted) {
    SCOPED_TRACE(std::string(row.name) + " i=" + std::to_string(row.i) +
                 " n=" + std::to_string(row.n));
    const double half_unit = 0.5 * std::pow(10.0, -row.decimals);
    EXPECT_NEAR(factor(*kind_from_name(row.name), row.i, row.n), row.value, half_unit);
  }
}

// Rates of every kind the engine may see: negative (> -1), tiny, zero, ordinary, large.
const std::vector<double> kRates = {-0.5, -0.1, -1e-3, -1e-7, 0,   1e-9, 1e-7,
                                    1e-6, 1e-5, 1e-3,  0.05,  0.10, 0.25, 1.0};
const std::vector<int> kYears = {1, 2, 3, 5, 10, 20, 40};

std::string where(double i, double n) {
  return "i=" + std::to_string(i) + " n=" + std::to_string(n);
}

TEST(Identities, CapitalRecoveryIsSinkingFundPlusRate) {
  for (double i : kRates) {
    for (int n : kYears) {
      SCOPED_TRACE(where(i, n));
      EXPECT_REL(ap(i, n), af(i, n) + i, kIdentity);
    }
  }
}

TEST(Identities, ReciprocalPairs) {
  for (double i : kRates) {
    for (int n : kYears) {
      SCOPED_TRACE(where(i, n));
      EXPECT_REL(pa(i, n) * ap(i, n), 1.0, kIdentity);
      EXPECT_REL(fa(i, n) * af(i, n), 1.0, kIdentity);
      EXPECT_REL(pf(i, n) * fp(i, n), 1.0, kIdentity);
      EXPECT_REL(fp(i, n), 1.0 / pf(i, n), kIdentity);
    }
  }
}

TEST(Identities, UniformSeriesIsTheSumOfSinglePayments) {
  for (double i : kRates) {
    for (int n : kYears) {
      SCOPED_TRACE(where(i, n));
      double present = 0, future = 0;
      for (int k = 1; k <= n; ++k) {
        present += pf(i, k);
        future += fp(i, n - k);
      }
      EXPECT_REL(pa(i, n), present, kIdentity);
      EXPECT_REL(fa(i, n), future, kIdentity);
    }
  }
}

TEST(Identities, GradientIsTheSumOfItsPayments) {
  for (double i : kRates) {
    for (int n : kYears) {
      SCOPED_TRACE(where(i, n));
      double present = 0;  // payments 0, 1, ..., n-1 at the ends of years 1..n
      for (int k = 1; k <= n; ++k) present += (k - 1) * pf(i, k);
      if (n == 1) {
        EXPECT_EQ(pg(i, n), 0.0);
        EXPECT_EQ(ag(i, n), 0.0);
        continue;
      }
      EXPECT_REL(pg(i, n), present, kIdentity);
      EXPECT_REL(pg(i, n), ag(i, n) * pa(i, n), kIdentity);
    }
  }
}

TEST(Identities, ClosedFormsAwayFromZero) {
  const Kind kinds[] = {Kind::pf, Kind::fp, Kind::ap, Kind::af,
                        Kind::pa, Kind::fa, Kind::ag, Kind::pg};
  for (double i : {-0.5, -0.1, 0.05, 0.10, 0.25, 1.0}) {
    for (double n : {1.0, 2.5, 5.0, 10.0, 20.0, 40.0}) {
      for (Kind kind : kinds) {
        SCOPED_TRACE(where(i, n) + " kind=" + std::to_string(static_cast<int>(kind)));
        if ((kind == Kind::ag || kind == Kind::pg) && n == 1.0) continue;  // 0 by cancellation
        EXPECT_REL(factor(kind, i, n), closed_form(kind, i, n), 1e-9);
      }
    }
  }
}

TEST(Identities, EmptySeriesAtZeroYears) {
  for (double i : kRates) {
    SCOPED_TRACE(where(i, 0));
    EXPECT_EQ(pf(i, 0), 1.0);
    EXPECT_EQ(fp(i, 0), 1.0);
    EXPECT_EQ(pa(i, 0), 0.0);
    EXPECT_EQ(fa(i, 0), 0.0);
    EXPECT_EQ(pg(i, 0), 0.0);
  }
}

TEST(GeometricGradient, IsTheSumOfItsPayments) {
  for (double i : {-0.3, -1e-7, 0.0, 1e-7, 0.05, 0.10, 0.5}) {
    for (double g : {-0.2, -0.05, 0.0, 0.03, 0.10, 0.4}) {
      for (int n : {1, 2, 5, 10, 25}) {
        SCOPED_TRACE(where(i, n) + " g=" + std::to_string(g));
        double present = 0;
        for (int k = 1; k <= n; ++k) present += std::pow(1 + g, k - 1) / std::pow(1 + i, k);
        EXPECT_REL(geometric_pa(i, g, n), present, kIdentity);
      }
    }
  }
}

TEST(GeometricGradient, GrowthEqualToRateGivesNOverOnePlusI) {
  for (double i : {-0.5, 0.0, 1e-7, 0.05, 0.10, 1.0}) {
    for (int n : {1, 5, 20}) {
      SCOPED_TRACE(where(i, n));
      EXPECT_REL(geometric_pa(i, i, n), n / (1 + i), kIdentity);
      // Approached continuously from both sides of g = i.
      for (double h : {1e-4, 1e-6, 1e-9, 1e-12}) {
        const double n_over = n / (1 + i);
        EXPECT_NEAR(geometric_pa(i, i + h, n), n_over, n_over * n * h * 2 + 1e-12 * n_over);
        EXPECT_NEAR(geometric_pa(i, i - h, n), n_over, n_over * n * h * 2 + 1e-12 * n_over);
      }
    }
  }
}

// The i -> 0 limits, and no jump between i = 0 and small rates either side of it.
TEST(ZeroRate, Limits) {
  for (int n : kYears) {
    SCOPED_TRACE(where(0, n));
    EXPECT_EQ(pa(0, n), n);
    EXPECT_EQ(fa(0, n), n);
    EXPECT_REL(ap(0, n), 1.0 / n, kIdentity);
    EXPECT_REL(af(0, n), 1.0 / n, kIdentity);
    EXPECT_REL(ag(0, n), (n - 1) / 2.0, kIdentity);
    EXPECT_REL(pg(0, n), n * (n - 1) / 2.0, kIdentity);
  }
}

TEST(ZeroRate, ApproachedContinuously) {
  const Kind kinds[] = {Kind::pa, Kind::fa, Kind::ap, Kind::af, Kind::ag, Kind::pg};
  for (int n : {2, 3, 5, 10, 20, 40}) {
    for (Kind kind : kinds) {
      const double at_zero = factor(kind, 0, n);
      for (double h : {1e-4, 1e-5, 1e-6, 1e-7, 1e-8, 1e-9, 1e-12}) {
        SCOPED_TRACE(where(h, n) + " kind=" + std::to_string(static_cast<int>(kind)));
        const double above = factor(kind, h, n), below = factor(kind, -h, n);
        // Each factor's relative slope at 0 is below n + 1, so a step of h moves it less than
        // (n + 1) h: at h = 1e-6 and n = 20, less than 2.1e-5 relative. A jump at i = 0 or
        // digits lost by a closed form at small i would exceed that.
        EXPECT_NEAR(above, at_zero, (n + 1) * h * std::abs(at_zero));
        EXPECT_NEAR(below, at_zero, (n + 1) * h * std::abs(at_zero));
        // The midpoint of +-h cancels the slope and agrees with i = 0 to second order (below
        // (n h)^2 relative), which a one-sided jump of any size above that would break.
        EXPECT_REL((above + below) / 2, at_zero, n * n * h * h + 1e-12);
      }
    }
  }
}

TEST(ZeroRate, MonotoneAcrossZero) {
  // Present-worth and gradient factors fall as the rate rises, on a fine grid through zero,
  // including wherever an implementation switches formulas near zero.
  std::vector<double> rates;
  for (double r = 1e-2; r > 1e-10; r /= 1.05) {
    rates.push_back(-r);
    rates.push_back(r);
  }
  rates.push_back(0);
  std::sort(rates.begin(), rates.end());
  for (int n : {2, 10, 40}) {
    for (std::size_t k = 1; k < rates.size(); ++k) {
      SCOPED_TRACE(where(rates[k], n));
      EXPECT_LT(pa(rates[k], n), pa(rates[k - 1], n));
      EXPECT_LT(pg(rates[k], n), pg(rates[k - 1], n));
      EXPECT_LT(ag(rates[k], n), ag(rates[k - 1], n));
      EXPECT_GT(fa(rates[k], n), fa(rates[k - 1], n));
    }
  }
}

// Bad inputs throw InputError naming the argument.
std::string thrown_where(double (*f)(Rate, double), double i, double n) {
  try {
    f(i, n);
  } catch (const InputError& error) {
    return error.where();
  }
  return "(no InputError)";
}

TEST(BadInputs, RateMustBeFiniteAndAboveMinusOne) {
  const double nan = std::numeric_limits<double>::quiet_NaN();
  const double inf = std::numeric_limits<double>::infinity();
  for (auto f : {pf, fp, ap, af, pa, fa, ag, pg}) {
    for (double i : {nan, inf, -inf, -1.0, -1.5}) {
      SCOPED_TRACE("i=" + std::to_string(i));
      EXPECT_EQ(thrown_where(f, i, 5), "i");
    }
  }
}

TEST(BadInputs, YearsMustBeFiniteAndNotNegative) {
  const double nan = std::numeric_limits<double>::quiet_NaN();
  const double inf = std::numeric_limits<double>::infinity();
  for (auto f : {pf, fp, ap, af, pa, fa, ag, pg}) {
    for (double n : {nan, inf, -inf, -1.0, -0.5}) {
      SCOPED_TRACE("n=" + std::to_string(n));
      EXPECT_EQ(thrown_where(f, 0.1, n), "n");
    }
  }
}

TEST(BadInputs, FactorsThatDivideByTheSeriesNeedPositiveYears) {
  for (auto f : {ap, af, ag}) EXPECT_EQ(thrown_where(f, 0.1, 0), "n");
  for (auto f : {pf, fp, pa, fa, pg}) EXPECT_EQ(thrown_where(f, 0.1, 0), "(no InputError)");
}

TEST(BadInputs, GeometricGrowthMustBeARate) {
  const double nan = std::numeric_limits<double>::quiet_NaN();
  for (double g : {nan, -1.0, -2.0}) {
    try {
      geometric_pa(0.1, g, 5);
      ADD_FAILURE() << "no InputError for g=" << g;
    } catch (const InputError& error) {
      EXPECT_EQ(error.where(), "g");
    }
  }
}

TEST(Names, KindFromName) {
  EXPECT_EQ(kind_from_name("P/F"), Kind::pf);
  EXPECT_EQ(kind_from_name("a/p"), Kind::ap);
  EXPECT_EQ(kind_from_name("AP"), Kind::ap);
  EXPECT_EQ(kind_from_name("P/G"), Kind::pg);
  EXPECT_EQ(kind_from_name("f/a"), Kind::fa);
  EXPECT_FALSE(kind_from_name("X/Y").has_value());
  EXPECT_FALSE(kind_from_name("").has_value());
  EXPECT_FALSE(kind_from_name("P/FF").has_value());
}

TEST(Names, FactorDispatchesToTheNamedFunction) {
  EXPECT_EQ(factor(Kind::pf, 0.1, 7), pf(0.1, 7));
  EXPECT_EQ(factor(Kind::fp, 0.1, 7), fp(0.1, 7));
  EXPECT_EQ(factor(Kind::ap, 0.1, 7), ap(0.1, 7));
  EXPECT_EQ(factor(Kind::af, 0.1, 7), af(0.1, 7));
  EXPECT_EQ(factor(Kind::pa, 0.1, 7), pa(0.1, 7));
  EXPECT_EQ(factor(Kind::fa, 0.1, 7), fa(0.1, 7));
  EXPECT_EQ(factor(Kind::ag, 0.1, 7), ag(0.1, 7));
  EXPECT_EQ(factor(Kind::pg, 0.1, 7), pg(0.1, 7));
}

TEST(Memo, RemembersValuesBitForBitAcrossRatesAndPeriods) {
  // The per-thread memo of pf, fp and pa (factors.cpp) must return exactly what the closed forms
  // give, also when more rates alternate than it keeps, at fractional n and beyond its periods.
  const std::vector<double> rates = {0.05, 0.0712, 0.09, 0.05, -0.02};
  for (int round = 0; round < 2; ++round) {
    for (double n = 0; n <= 300; n += 0.5) {
      for (double i : rates) {
        ASSERT_EQ(pf(i, n), std::exp(-n * std::log1p(i))) << i << " " << n;
        ASSERT_EQ(fp(i, n), std::exp(n * std::log1p(i))) << i << " " << n;
        ASSERT_EQ(pa(i, n), -std::expm1(-n * std::log1p(i)) / i) << i << " " << n;
      }
    }
  }
  EXPECT_THROW(pf(-1.5, 3), InputError) << "bad input is checked before the memo";
}

}  // namespace
}  // namespace tenure::interest
