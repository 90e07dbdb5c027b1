// Calendar days, strict ISO parsing and the age-year rules of fleet/date.h.
#include "fleet/date.h"

#include <gtest/gtest.h>

#include <boost/date_time/gregorian/gregorian.hpp>
#include <cstdio>
#include <stdexcept>

#include "core/errors.h"

namespace tenure {
namespace {

Date d(const char* iso) {
  auto date = parse_iso_date(iso);
  if (!date) throw std::invalid_argument(iso);
  return *date;
}

TEST(ParseIsoDate, ReadsValidDays) {
  const auto leap_day = parse_iso_date("2024-02-29");
  ASSERT_TRUE(leap_day);
  EXPECT_EQ(leap_day->year(), 2024);
  EXPECT_EQ(leap_day->month(), 2);
  EXPECT_EQ(leap_day->day(), 29);
  EXPECT_EQ(d("1970-01-01").days_since_epoch(), 0);  // the epoch, by definition
  // Hand computed: 30 years of 365 days plus 7 leap days (1972..1996), then 31 + 29 days.
  EXPECT_EQ(d("2000-03-01").days_since_epoch(), 11017);
  EXPECT_EQ(d("1969-12-31").days_since_epoch(), -1);
  EXPECT_TRUE(parse_iso_date("1400-01-01"));  // Boost's first valid year
  EXPECT_TRUE(parse_iso_date("9999-12-31"));  // Boost's last valid year
  EXPECT_TRUE(parse_iso_date("2000-02-29"));  // divisible by 400: leap
}

TEST(ParseIsoDate, RejectsMalformedOrImpossibleText) {
  for (const char* bad : {"2023-02-29",     // 2023 is a common year
                          "1900-02-29",     // divisible by 100, not by 400: common
                          "2023-13-01", "2023-00-10", "2023-04-31", "2023-01-00", "2023-01-32",
                          "2023-1-01", " 2023-01-01", "2023-01-01x", "2023-01-01 ", "",
                          "2023/01/01", "+023-01-01", "2023-0a-01", "20230101",
                          "1399-12-31",     // before Boost's range 1400..9999
                          "0000-01-01"}) {
    EXPECT_FALSE(parse_iso_date(bad)) << bad;
  }
}

// The reader must reject exactly what Boost's gregorian::date rejects (SPEC 3).
TEST(ParseIsoDate, AgreesWithBoostOnEveryYearMonthDay) {
  for (int year : {1399, 1400, 1900, 2000, 2023, 2024, 2100, 9999}) {
    for (int month = 0; month <= 13; ++month) {
      for (int day = 0; day <= 32; ++day) {
        bool boost_accepts = true;
        try {
          boost::gregorian::date(static_cast<unsigned short>(year),
                                 static_cast<unsigned short>(month),
                                 static_cast<unsigned short>(day));
        } catch (const std::out_of_range&) {
          boost_accepts = false;
        }
        char text[16];
        std::snprintf(text, sizeof text, "%04d-%02d-%02d", year, month, day);
        EXPECT_EQ(parse_iso_date(text).has_value(), boost_accepts) << text;
      }
    }
  }
}

TEST(Date, RoundTripsAndOrders) {
  EXPECT_EQ(d("2024-02-29").to_iso(), "2024-02-29");
  EXPECT_EQ(d("1400-01-01").to_iso(), "1400-01-01");
  EXPECT_LT(d("2023-12-31"), d("2024-01-01"));
  EXPECT_EQ(d("2024-01-01"), *Date::from_ymd(2024, 1, 1));
  EXPECT_FALSE(Date::from_ymd(2023, 2, 29));
  EXPECT_EQ(days_between(d("2020-01-01"), d("2021-01-01")), 366);  // 2020 is leap
  // Hand computed: four years with one leap day are 1461 days = 4 * 365.25.
  EXPECT_DOUBLE_EQ(years_between(d("2020-01-01"), d("2024-01-01")), 4.0);
}

TEST(Anniversary, LeapDayFallsOnFebruary28InCommonYears) {
  const Date leap = d("2020-02-29");
  EXPECT_EQ(anniversary(leap, 0), leap);
  EXPECT_EQ(anniversary(leap, 1), d("2021-02-28"));  // SPEC 3
  EXPECT_EQ(anniversary(leap, 3), d("2023-02-28"));
  EXPECT_EQ(anniversary(leap, 4), d("2024-02-29"));  // leap again
  EXPECT_EQ(anniversary(d("2020-03-10"), 2), d("2022-03-10"));
}

TEST(Anniversary, February28StaysFebruary28UnlikeBoostYears) {
  const Date start = d("2021-02-28");
  EXPECT_EQ(anniversary(start, 3), d("2024-02-28"));
  // Boost's own year arithmetic snaps a month's last day to the target month's last day; this
  // check keeps the reason for our own rule visible.
  const boost::gregorian::date boost_start(2021, 2, 28);
  EXPECT_EQ(boost::gregorian::to_iso_extended_string(boost_start + boost::gregorian::years(3)),
            "2024-02-29");
}

TEST(Anniversary, RejectsNegativeAndOutOfRange) {
  EXPECT_THROW(anniversary(d("2020-01-01"), -1), InputError);
  EXPECT_EQ(anniversary(d("9998-06-01"), 1), d("9999-06-01"));
  EXPECT_THROW(anniversary(d("9998-06-01"), 2), InputError);
  EXPECT_THROW(anniversary(d("2020-06-01"), 2147483647), InputError);
}

TEST(CompletedYears, CountsAnniversariesOnOrBeforeAsOf) {
  const Date start = d("2020-03-10");
  EXPECT_EQ(completed_years(start, d("2022-03-10")), 2);  // the brief's example
  EXPECT_EQ(completed_years(start, d("2022-03-09")), 1);
  EXPECT_EQ(completed_years(start, start), 0);
  EXPECT_EQ(completed_years(start, d("2019-12-31")), 0);  // before in service
  const Date leap = d("2020-02-29");
  EXPECT_EQ(completed_years(leap, d("2021-02-27")), 0);
  EXPECT_EQ(completed_years(leap, d("2021-02-28")), 1);
  EXPECT_EQ(completed_years(leap, d("2024-02-28")), 3);
  EXPECT_EQ(completed_years(leap, d("2024-02-29")), 4);
}

TEST(AgeYearOf, BoundariesBelongToTheNextYear) {
  const Date start = d("2020-03-10");
  EXPECT_EQ(age_year_of(start, start), 1);
  EXPECT_EQ(age_year_of(start, d("2021-03-09")), 1);
  EXPECT_EQ(age_year_of(start, d("2021-03-10")), 2);
  EXPECT_EQ(age_year_of(d("2020-02-29"), d("2021-02-28")), 2);
  EXPECT_THROW(age_year_of(start, d("2020-03-09")), InputError);
}

// Definition check (rule 3) on every day of seven years, for awkward in-service days.
TEST(AgeYearOf, MatchesTheAnniversaryDefinitionEveryDay) {
  for (const char* start_text : {"2020-02-29", "2021-02-28", "2019-12-31", "2020-01-01"}) {
    const Date start = d(start_text);
    for (Date day = start; day < d("2027-01-01");) {
      const int k = age_year_of(start, day);
      EXPECT_LE(anniversary(start, k - 1), day) << start_text << " " << day.to_iso();
      EXPECT_LT(day, anniversary(start, k)) << start_text << " " << day.to_iso();
      EXPECT_EQ(completed_years(start, day), k - 1);
      const auto next = boost::gregorian::date(static_cast<unsigned short>(day.year()),
                                               static_cast<unsigned short>(day.month()),
                                               static_cast<unsigned short>(day.day())) +
                        boost::gregorian::days(1);
      day = *Date::from_ymd(next.year(), next.month(), next.day());
    }
  }
}

}  // namespace
}  // namespace tenure
