// Day numbers to dates over Boost.Date_Time (see day_numbers.h).
#include "demo/day_numbers.h"

#include <boost/date_time/gregorian/gregorian.hpp>

namespace tenure::demo {

Date date_from_days(std::int32_t days) {
  namespace greg = boost::gregorian;
  const greg::date day = greg::date(1970, 1, 1) + greg::days(days);
  return *Date::from_ymd(day.year(), day.month(), day.day());
}

Date years_earlier(Date date, int years) {
  const int year = date.year() - years;
  if (auto same_day = Date::from_ymd(year, date.month(), date.day())) return *same_day;
  return *Date::from_ymd(year, date.month(), 28);
}

}  // namespace tenure::demo
