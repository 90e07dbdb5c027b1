// Day numbers (days since 1970-01-01, as Date::days_since_epoch) back to calendar dates, for the
// generator, which draws days as integers. Boost.Date_Time does the calendar.
//
//   date_from_days(0).to_iso();                        // "1970-01-01"
//   years_earlier(*Date::from_ymd(2024, 2, 29), 1);    // 2023-02-28
#pragma once

#include <cstdint>

#include "fleet/date.h"

namespace tenure::demo {

// The day `days` after 1970-01-01 (before it when negative); it must lie in Date's range.
Date date_from_days(std::int32_t days);

// The same month and day `years` years earlier, 29 February becoming 28 February in a common
// year (the anniversary rule of fleet/date.h, backwards).
Date years_earlier(Date date, int years);

}  // namespace tenure::demo
