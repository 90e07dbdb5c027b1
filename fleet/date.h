// A calendar day (Gregorian, no time of day) and the age arithmetic of SPEC 3: anniversaries of
// an in-service date, completed years and the age-year a day falls in. Boost.Date_Time validates
// and numbers the days behind this header; Boost does not appear in it.
//
//   auto in_service = parse_iso_date("2020-02-29").value();
//   anniversary(in_service, 1).to_iso();                       // "2021-02-28"
//   completed_years(in_service, *parse_iso_date("2022-03-01"));  // 2
//   age_year_of(in_service, *parse_iso_date("2020-06-30"));      // 1 (its first year)
//
// Rules (cited by the code):
//   (1) Valid dates are those Boost's gregorian::date accepts: years 1400..9999, months 1..12,
//       days 1..the month's length with 29 February in leap years only.
//   (2) The k-th anniversary of D is the same month and day k years later, except that 29 February
//       falls on 28 February in a common year. (Boost's `date + years(k)` differs: it moves a last
//       day of month to the last day of the target month, so 2021-02-28 + 3 years is 2024-02-29;
//       here it stays 2024-02-28.)
//   (3) Age-year k runs from the (k-1)-th anniversary (inclusive) to the k-th (exclusive); the
//       0-th anniversary is the in-service date itself.
//   (4) Fractional years between two days are days / 365.25 (kDaysPerYear).
#pragma once

#include <compare>
#include <cstdint>
#include <optional>
#include <string>
#include <string_view>

namespace tenure {

class Date {
 public:
  // The day y-m-d, or nullopt when rule (1) rejects it. Never throws.
  static std::optional<Date> from_ymd(int year, int month, int day) noexcept;

  int year() const { return year_; }
  int month() const { return month_; }
  int day() const { return day_; }
  // Days since 1970-01-01 (negative before it); differences are exact day counts.
  std::int32_t days_since_epoch() const { return days_; }

  std::string to_iso() const;  // "YYYY-MM-DD"

  // Ordered by day; days_ comes first, the cached y/m/d agree with it.
  friend auto operator<=>(const Date&, const Date&) = default;

 private:
  Date(std::int32_t days, int year, int month, int day)
      : days_(days),
        year_(static_cast<std::int16_t>(year)),
        month_(static_cast<std::uint8_t>(month)),
        day_(static_cast<std::uint8_t>(day)) {}

  std::int32_t days_;
  std::int16_t year_;
  std::uint8_t month_;
  std::uint8_t day_;
};

inline constexpr double kDaysPerYear = 365.25;  // rule (4)

// Strict ISO 8601 calendar date: exactly "YYYY-MM-DD" (10 characters, ASCII digits, '-' at 4 and
// 7, no sign, spaces or suffix) naming a day valid under rule (1). Allocation-free; never throws.
std::optional<Date> parse_iso_date(std::string_view text) noexcept;

// Whole days from `from` to `to` (negative when `to` is earlier).
inline int days_between(Date from, Date to) { return to.days_since_epoch() - from.days_since_epoch(); }

// Fractional years from `from` to `to`, days / 365.25 (rule 4).
inline double years_between(Date from, Date to) { return days_between(from, to) / kDaysPerYear; }

// The k-th anniversary of `in_service`, k >= 0 (rule 2). Throws InputError naming "k" when k < 0
// or the anniversary falls after 9999-12-31.
Date anniversary(Date in_service, int k);

// The number of anniversaries k >= 1 on or before `as_of` (0 when as_of is before the first one,
// including when it is before `in_service`). An asset in service 2020-03-10 has completed 2 years
// on 2022-03-10 and 1 on 2022-03-09.
int completed_years(Date in_service, Date as_of) noexcept;

// The age-year k that day `d` falls in (rule 3): anniversary(k-1) <= d < anniversary(k); k >= 1.
// Throws InputError naming "date" when d is before in_service.
int age_year_of(Date in_service, Date d);

}  // namespace tenure
