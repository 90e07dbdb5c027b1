// libFuzzer target: the strict ISO 8601 date reader and the anniversary arithmetic of
// fleet/date.h, against an independent check built on Boost.Date_Time (SPEC 3: the hot-path
// reader "rejects what Boost would reject"). The input is one or two 10-byte texts:
//   - parse_iso_date(a) gives a date exactly when `a` is "DDDD-DD-DD" in ASCII digits and Boost's
//     gregorian::date accepts its numbers; then the day number, the fields and to_iso agree;
//   - for two valid dates, completed_years and age_year_of agree with a plain count of the
//     anniversaries (29 February falling on 28 February in common years, date.h rule 2).
//
//   build-fuzz/fuzz/date_fuzzer -max_total_time=60 build-fuzz/corpus/date fixtures/fuzz/date
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <optional>
#include <string>
#include <string_view>

#include <boost/date_time/gregorian/gregorian.hpp>

#include "fleet/date.h"

namespace {

namespace greg = boost::gregorian;

void check(bool ok, const char* what, std::string_view a, std::string_view b = {}) {
  if (ok) return;
  std::fprintf(stderr, "date check failed: %s for '%.*s' '%.*s'\n", what, static_cast<int>(a.size()),
               a.data(), static_cast<int>(b.size()), b.data());
  std::abort();
}

// The reference reading: the shape by hand, the calendar by Boost (which throws for a bad year,
// month or day).
std::optional<greg::date> boost_reading(std::string_view text) {
  if (text.size() != 10) return std::nullopt;
  for (std::size_t i = 0; i < text.size(); ++i) {
    const bool dash = i == 4 || i == 7;
    if (dash ? text[i] != '-' : (text[i] < '0' || text[i] > '9')) return std::nullopt;
  }
  const int year = std::stoi(std::string(text.substr(0, 4)));
  const int month = std::stoi(std::string(text.substr(5, 2)));
  const int day = std::stoi(std::string(text.substr(8, 2)));
  try {
    return greg::date(static_cast<unsigned short>(year), static_cast<unsigned short>(month),
                      static_cast<unsigned short>(day));
  } catch (const std::out_of_range&) {
    return std::nullopt;
  }
}

// The k-th anniversary of d by date.h rule 2, or nullopt past Boost's last year.
std::optional<greg::date> reference_anniversary(greg::date d, int k) {
  const int year = d.year() + k;
  if (year > 9999) return std::nullopt;
  int day = d.day();
  if (d.month() == 2 && day == 29 && !greg::gregorian_calendar::is_leap_year(year)) day = 28;
  return greg::date(static_cast<unsigned short>(year), d.month(), static_cast<unsigned short>(day));
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  const std::string_view input(reinterpret_cast<const char*>(data), size);
  const std::string_view a = input.substr(0, 10);
  const auto mine = tenure::parse_iso_date(size <= 10 ? input : a);
  const auto boost = boost_reading(size <= 10 ? input : a);
  check(mine.has_value() == boost.has_value(), "parse_iso_date disagrees with Boost", input);
  if (!mine) return 0;
  check(mine->year() == boost->year() && mine->month() == boost->month() && mine->day() == boost->day(),
        "fields", a);
  check(mine->days_since_epoch() == (*boost - greg::date(1970, 1, 1)).days(), "day number", a);
  check(mine->to_iso() == a, "to_iso round trip", a);
  if (size < 20) return 0;

  const std::string_view b = input.substr(10, 10);
  const auto mine_b = tenure::parse_iso_date(b);
  const auto boost_b = boost_reading(b);
  check(mine_b.has_value() == boost_b.has_value(), "parse_iso_date disagrees with Boost", b);
  if (!mine_b) return 0;
  int completed = 0;
  while (true) {
    const auto next = reference_anniversary(*boost, completed + 1);
    if (!next || *next > *boost_b) break;
    ++completed;
  }
  check(tenure::completed_years(*mine, *mine_b) == completed, "completed_years", a, b);
  if (*mine_b >= *mine) {
    check(tenure::age_year_of(*mine, *mine_b) == completed + 1, "age_year_of", a, b);
    const tenure::Date anniversary = tenure::anniversary(*mine, completed);
    check(anniversary.to_iso() == greg::to_iso_extended_string(*reference_anniversary(*boost, completed)),
          "anniversary", a, b);
  }
  return 0;
}
