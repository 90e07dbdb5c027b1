// Section 15 of `tenure explain`: what is at stake (review/at_stake.h, SPEC 11), each figure as
// its formula, then with the run's numbers put in it, then its value.
#include <algorithm>
#include <cmath>

#include <fmt/format.h>

#include "explain/text_sections.h"
#include "formats/text_table.h"
#include "replacement/break_even.h"

namespace tenure::explain::text {

using formats::money;
using formats::percent;

namespace {

// "  name = formula\n" then "    = numbers = value\n", wrapped at the line width.
std::string figure(const char* name, const std::string& formula, const std::string& numbers) {
  return formats::wrap_words(fmt::format("{} = {}", name, formula), formats::kLineWidth, "  ",
                             "    ") +
         formats::wrap_words(numbers, formats::kLineWidth, "    = ", "      ");
}

}  // namespace

std::string at_stake(const Explanation& e) {
  const review::AtStake& s = *e.review.at_stake;
  const replacement::Decision& d = *e.review.decision;
  const std::vector<Money>& t = d.timing.present_worth;
  const Years k = d.timing.keep_years;
  const Rate i = e.basis_rate();
  const tax::Rates& rates = e.policy->rates;
  const bool taxed = d.basis == replacement::Basis::after_tax;
  std::string body;

  body += figure("cost of waiting a year", "T(k*+1) - T(k*), from section 13",
                 s.delay_cost ? fmt::format("T({}) - T({}) = {} - {} = {}", k + 1, k,
                                            money(t[k + 1]), money(t[k]), money(*s.delay_cost))
                              : "none: k* is the last year weighed");
  body += figure("cost of replacing now", "T(0) - T(k*)",
                 fmt::format("T(0) - T({}) = {} - {} = {}", k, money(t[0]), money(t[k]),
                             money(s.early_cost)));
  const std::string deduction =
      taxed ? fmt::format(" / (1 - {:.4f} x (P/F, {}, 1))", rates.income_tax_rate, percent(i))
            : "";
  if (k == 0) {
    body += figure("repair limit", "0 when the verdict is replace (k* = 0)", money(0));
  } else {
    const Money best_kept = *std::min_element(t.begin() + 1, t.end());
    body += figure("repair limit",
                   std::string("max(0, T(0) - least T(k), k >= 1)") +
                       (taxed ? " / (1 - t (P/F, i, 1))" : ""),
                   fmt::format("max(0, {} - {}){} = {}", money(t[0]), money(best_kept), deduction,
                               money(s.repair_limit)));
  }
  const Money price = e.model.challenger_price;
  if (s.break_even_price && s.break_even_price_life) {
    const replacement::Line& line = e.model.price_lines[*s.break_even_price_life - 1];
    body += figure("break-even price", "max over n of (D* - beta_n) / alpha_n",
                   fmt::format("({} - {}) / {:.6f} at n = {} = {}, against the price {} ({:+.2f}%)",
                               money(d.defender_euac), money(line.intercept), line.slope,
                               *s.break_even_price_life, money(*s.break_even_price), money(price),
                               (*s.break_even_price / price - 1) * 100));
  } else {
    body += figure("break-even price", "max over n of (D* - beta_n) / alpha_n",
                   "none in (0, 1e15]: no challenger price makes replacing now pay");
  }
  if (s.break_even_cost_factor && s.break_even_factor_years) {
    const auto lines = replacement::cost_factor_lines(e.review.inputs.ownership, *e.review.defender,
                                                      rates, d.basis);
    const replacement::Line& line = lines[*s.break_even_factor_years - 1];
    body += figure("break-even cost factor", "max over k of (C* - b_k) / a_k",
                   fmt::format("({} - {}) / {} at k = {} = {:.4f}", money(d.challenger_euac),
                               money(line.intercept), money(line.slope),
                               *s.break_even_factor_years, *s.break_even_cost_factor));
  } else {
    body += figure("break-even cost factor", "max over k of (C* - b_k) / a_k",
                   "none: no positive factor on its operating costs makes replacing now pay");
  }
  body += figure("close call", "|P_be / P - 1| <= review margin",
                 s.break_even_price
                     ? fmt::format("|{} / {} - 1| = {:.2f}% against {}: {}",
                                   money(*s.break_even_price), money(price),
                                   std::abs(*s.break_even_price / price - 1) * 100,
                                   percent(e.policy->review_margin), s.close_call ? "yes" : "no")
                     : "no break-even price: no");
  body +=
      "  T(k): present worth of keeping k more years, then the challenger forever (section 13).\n"
      "  D*, C*: the least EUACs of defender and challenger on the basis; the challenger's EUAC(n)\n"
      "  = alpha_n P + beta_n at price P, the defender's EUAC(k) = f a_k + b_k with its operating\n"
      "  costs times f. The break-evens are where replacing now and keeping cost the same.\n";
  if (taxed) {
    body += "  A repair is expensed: its tax deduction comes at the end of year 1.\n";
  }
  return section(fmt::format("15. What is at stake ({} basis, present worth at {})",
                             basis_words(d.basis), percent(i)),
                 body);
}

}  // namespace tenure::explain::text
