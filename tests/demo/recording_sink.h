// A Sink for tests that keeps copies of every generated row (small fleets only).
#pragma once

#include <optional>
#include <string>
#include <variant>
#include <vector>

#include "demo/fleet_generator.h"

namespace tenure::demo::testing {

struct Asset {
  std::string id, asset_class, in_service_on;
  double first_cost;
  std::optional<std::string> retired_on;
  bool operator==(const Asset&) const = default;
};

struct Event {
  std::string asset_id, occurred_on;
  std::variant<double, std::string> amount;
  std::string kind;
  bool operator==(const Event&) const = default;
};

struct Valuation {
  std::string asset_id, valued_on;
  double amount;
  std::string basis;
  bool operator==(const Valuation&) const = default;
};

class RecordingSink : public Sink {
 public:
  std::vector<Asset> assets;
  std::vector<Event> events;
  std::vector<Valuation> valuations;

  void on_asset(const AssetRow& r) override {
    assets.push_back({std::string(r.asset_id), std::string(r.asset_class),
                      std::string(r.in_service_on), r.first_cost,
                      r.retired_on ? std::optional<std::string>(*r.retired_on) : std::nullopt});
  }
  void on_valuation(const ValuationRow& r) override {
    valuations.push_back(
        {std::string(r.asset_id), std::string(r.valued_on), r.amount, std::string(r.basis)});
  }
  void on_event(const CostEventRow& r) override {
    Event e{std::string(r.asset_id), std::string(r.occurred_on), 0.0, std::string(r.kind)};
    if (const auto* text = std::get_if<std::string_view>(&r.amount)) {
      e.amount = std::string(*text);
    } else {
      e.amount = std::get<double>(r.amount);
    }
    events.push_back(std::move(e));
  }
};

}  // namespace tenure::demo::testing
