// Streaming the demo's cost events (see event_stream.h and fleet_generator.h rules (2) to (4)).
#include "demo/event_stream.h"

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <string>

#include "demo/day_numbers.h"

namespace tenure::demo {

namespace {

struct PlannedEvent {
  std::int32_t day;
  std::uint8_t kind;  // index into kEventKinds
  Money amount;       // nominal, on its day
};

// One event of the month being emitted: a unit's, or a bad one from the plan.
struct MonthEvent {
  std::int32_t day;
  bool bad;
  std::uint32_t source;  // the unit's index, or the bad event's index in the plan
  std::uint8_t kind;
  Money amount;
};

// One unit's cost events, planned an age-year at a time.
class UnitCosts {
 public:
  UnitCosts(const Unit& unit, double events_per_day, std::int32_t as_of)
      : unit_(&unit),
        events_per_day_(events_per_day),
        as_of_(as_of),
        next_year_start_(unit.in_service.days_since_epoch()) {}

  // Appends the unit's events dated up to `month_last` that were not taken yet. Months are
  // visited in order. `weights` is scratch space shared by all units.
  void take_until(std::int32_t month_last, std::uint32_t index, Random& random,
                  std::vector<double>& weights, std::vector<MonthEvent>& out) {
    for (;;) {
      if (next_ < plan_.size()) {
        const PlannedEvent& event = plan_[next_];
        if (event.day > month_last) return;
        if (event.day <= unit_->last_day)
          out.push_back({event.day, false, index, event.kind, event.amount});
        ++next_;
      } else {
        if (next_year_start_ > std::min(month_last, unit_->last_day)) return;
        plan_next_year(random, weights);
      }
    }
  }

 private:
  // Rule (2): the next age-year's total split over its events; rule (3): their number.
  void plan_next_year(Random& random, std::vector<double>& weights) {
    ++age_year_;
    const std::int32_t start = next_year_start_;
    next_year_start_ = anniversary(unit_->in_service, age_year_).days_since_epoch();
    const std::int32_t days = next_year_start_ - start;
    const std::int64_t count = 1 + random.poisson(std::max(0.0, events_per_day_ * days - 1.0));
    const DemoClass& c = *unit_->demo_class;
    const Money total =
        unit_->level * c.true_cost(age_year_) * random.mean_one_lognormal(kYearNoise);

    plan_.clear();
    next_ = 0;
    weights.clear();
    double weight_sum = 0;
    for (std::int64_t i = 0; i < count; ++i) {
      const auto day =
          start + static_cast<std::int32_t>(random.below(static_cast<std::uint64_t>(days)));
      const auto kind = static_cast<std::uint8_t>(random.pick(c.kind_shares));
      const double weight = kEventKindScale[kind] * random.mean_one_lognormal(kEventSizeNoise);
      plan_.push_back({day, kind, 0});
      weights.push_back(weight);
      weight_sum += weight;
    }
    for (std::size_t i = 0; i < plan_.size(); ++i) {
      // As-of money back to the event's own day: the inverse of fleet::Escalation's restatement.
      const double deflator =
          std::exp(-(as_of_ - plan_[i].day) * std::log1p(kDemoInflation) / kDaysPerYear);
      plan_[i].amount = to_cents(total * weights[i] / weight_sum * deflator);
    }
    std::stable_sort(plan_.begin(), plan_.end(),
                     [](const PlannedEvent& x, const PlannedEvent& y) { return x.day < y.day; });
  }

  const Unit* unit_;
  double events_per_day_;
  std::int32_t as_of_;
  int age_year_ = 0;
  std::int32_t next_year_start_;  // the first day of age-year age_year_ + 1
  std::vector<PlannedEvent> plan_;
  std::size_t next_ = 0;
};

// Rule (3): events per unit-day of a class with weight 1, so the expected total is the target.
double base_events_per_day(const std::vector<Unit>& units, std::size_t target) {
  double weighted_days = 0;
  for (const Unit& unit : units) {
    weighted_days += unit.demo_class->event_rate_weight *
                     (unit.last_day - unit.in_service.days_since_epoch() + 1);
  }
  return static_cast<double>(target) / weighted_days;
}

// The first day of the month after the one `date` is in.
Date next_month(Date date) {
  return date.month() == 12 ? *Date::from_ymd(date.year() + 1, 1, 1)
                            : *Date::from_ymd(date.year(), date.month() + 1, 1);
}

BadRow bad_row(const BadEvent& event, std::int64_t row_number) {
  return {event.kind, "cost_event", row_number, event.asset_id, event.detail};
}

}  // namespace

void emit_events(const std::vector<Unit>& units, const BadRowPlan& bad, const Options& options,
                 Random& random, Sink& sink, Summary& summary) {
  const std::int32_t as_of = options.as_of.days_since_epoch();
  const double base_rate = base_events_per_day(units, options.events);
  std::vector<UnitCosts> costs;
  costs.reserve(units.size());
  for (const Unit& unit : units) {
    costs.emplace_back(unit, base_rate * unit.demo_class->event_rate_weight, as_of);
  }

  std::int32_t first_day = units.front().in_service.days_since_epoch();
  if (!bad.events.empty()) first_day = std::min(first_day, bad.events.front().day);
  const Date first = date_from_days(first_day);
  std::size_t next_bad = 0;
  std::vector<MonthEvent> month;
  std::vector<double> weights;
  std::vector<std::string> day_text;  // ISO text of each day of the month, formatted once
  for (Date month_start = *Date::from_ymd(first.year(), first.month(), 1);
       month_start.days_since_epoch() <= as_of; month_start = next_month(month_start)) {
    const std::int32_t month_first = month_start.days_since_epoch();
    const std::int32_t month_last = next_month(month_start).days_since_epoch() - 1;
    month.clear();
    for (std::uint32_t u = 0; u < units.size(); ++u) {
      if (units[u].in_service.days_since_epoch() > month_last) break;  // sorted by in-service day
      if (units[u].last_day < month_first) continue;
      costs[u].take_until(month_last, u, random, weights, month);
    }
    for (; next_bad < bad.events.size() && bad.events[next_bad].day <= month_last; ++next_bad) {
      month.push_back({bad.events[next_bad].day, true, static_cast<std::uint32_t>(next_bad), 0, 0});
    }
    std::stable_sort(month.begin(), month.end(),
                     [](const MonthEvent& x, const MonthEvent& y) { return x.day < y.day; });

    day_text.clear();
    for (int d = 1; d <= month_last - month_first + 1; ++d) {
      day_text.push_back(Date::from_ymd(month_start.year(), month_start.month(), d)->to_iso());
    }
    for (const MonthEvent& event : month) {
      ++summary.events;
      if (event.bad) {
        const BadEvent& b = bad.events[event.source];
        const StoredAmount amount =
            b.amount_text ? StoredAmount(std::string_view(*b.amount_text)) : StoredAmount(b.amount);
        sink.on_event({b.asset_id, b.occurred_on, amount, b.event_kind});
        summary.bad_rows.push_back(bad_row(b, static_cast<std::int64_t>(summary.events)));
      } else {
        sink.on_event({units[event.source].id,
                       day_text[static_cast<std::size_t>(event.day - month_first)], event.amount,
                       kEventKinds[event.kind]});
      }
    }
  }
}

}  // namespace tenure::demo
