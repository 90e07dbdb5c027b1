// Calendar days over Boost.Date_Time (see date.h). The hot paths (parsing, completed years) check
// ranges by hand first so that Boost's constrained types never throw, and compare cached
// year/month/day integers instead of building Boost dates per call.
#include "fleet/date.h"

#include <boost/date_time/gregorian/gregorian.hpp>

#include "core/errors.h"

namespace tenure {
namespace {

namespace greg = boost::gregorian;

constexpr int kMinYear = 1400;  // Boost's greg_year range, rule (1)
constexpr int kMaxYear = 9999;

const greg::date::date_int_type kEpochDayNumber = greg::date(1970, 1, 1).day_number();

// Boost's calendar; the year and month must already be in range (its types throw otherwise).
int month_length(int year, int month) {
  return greg::gregorian_calendar::end_of_month_day(static_cast<unsigned short>(year),
                                                    static_cast<unsigned short>(month));
}

// The day of `month` on which an anniversary of (month, day) falls in `year` (rule 2).
int anniversary_day(int year, int month, int day) {
  if (month == 2 && day == 29 && !greg::gregorian_calendar::is_leap_year(
                                     static_cast<unsigned short>(year))) {
    return 28;
  }
  return day;
}

// Reads `count` ASCII digits at `p`; -1 if any is not a digit.
int read_digits(const char* p, int count) {
  int value = 0;
  for (int i = 0; i < count; ++i) {
    const char c = p[i];
    if (c < '0' || c > '9') return -1;
    value = value * 10 + (c - '0');
  }
  return value;
}

}  // namespace

std::optional<Date> Date::from_ymd(int year, int month, int day) noexcept {
  if (year < kMinYear || year > kMaxYear || month < 1 || month > 12) return std::nullopt;
  if (day < 1 || day > month_length(year, month)) return std::nullopt;
  const greg::date boost_date(static_cast<unsigned short>(year), static_cast<unsigned short>(month),
                              static_cast<unsigned short>(day));
  const auto days = static_cast<std::int32_t>(boost_date.day_number()) -
                    static_cast<std::int32_t>(kEpochDayNumber);
  return Date(days, year, month, day);
}

std::string Date::to_iso() const {
  return greg::to_iso_extended_string(greg::date(static_cast<unsigned short>(year_), month_, day_));
}

std::optional<Date> parse_iso_date(std::string_view text) noexcept {
  if (text.size() != 10 || text[4] != '-' || text[7] != '-') return std::nullopt;
  const int year = read_digits(text.data(), 4);
  const int month = read_digits(text.data() + 5, 2);
  const int day = read_digits(text.data() + 8, 2);
  if (year < 0 || month < 0 || day < 0) return std::nullopt;
  return Date::from_ymd(year, month, day);
}

Date anniversary(Date in_service, int k) {
  if (k < 0) throw InputError("k", "anniversary number must be >= 0");
  if (k > kMaxYear - in_service.year()) throw InputError("k", "anniversary falls after 9999-12-31");
  const int year = in_service.year() + k;
  const int month = in_service.month();
  return *Date::from_ymd(year, month, anniversary_day(year, month, in_service.day()));
}

int completed_years(Date in_service, Date as_of) noexcept {
  if (as_of < in_service) return 0;
  int years = as_of.year() - in_service.year();
  // This year's anniversary has not come yet: compare (month, day) with it.
  const int due_day = anniversary_day(as_of.year(), in_service.month(), in_service.day());
  if (as_of.month() < in_service.month() ||
      (as_of.month() == in_service.month() && as_of.day() < due_day)) {
    --years;
  }
  return years;
}

int age_year_of(Date in_service, Date d) {
  if (d < in_service) throw InputError("date", "is before the in-service date");
  return completed_years(in_service, d) + 1;
}

}  // namespace tenure
