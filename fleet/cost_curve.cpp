// The class cost curve (see cost_curve.h). Fits run on per-age statistics: least squares on the
// age means weighted by their counts gives the same line as on the individual points, because
// within an age x is constant; SSE and SST add each age's own scatter (sum_sq_dev) back in.
#include "fleet/cost_curve.h"

#include <algorithm>
#include <cmath>

#include "core/errors.h"
#include "fleet/line_fit.h"

namespace tenure::fleet {
namespace {

using AgeGroup = CostPool::AgeGroup;

// Rule (3) for a fitted curve.
double r_squared(std::span<const AgeGroup> groups, const CostCurve& curve) {
  double count = 0;
  double total = 0;
  double scale = 0;
  for (const AgeGroup& group : groups) {
    count += static_cast<double>(group.count);
    total += static_cast<double>(group.count) * group.mean;
    scale = std::max(scale, std::abs(group.mean));
  }
  const double mean = total / count;
  double sst = 0;
  double sse = 0;
  for (std::size_t i = 0; i < groups.size(); ++i) {
    const AgeGroup& group = groups[i];
    if (group.count == 0) continue;
    const double n = static_cast<double>(group.count);
    const double from_mean = group.mean - mean;
    const double from_curve = group.mean - curve.predict(static_cast<int>(i) + 1);
    sst += group.sum_sq_dev + n * from_mean * from_mean;
    sse += group.sum_sq_dev + n * from_curve * from_curve;
  }
  const double tiny = 1e-12 * scale;
  if (sst <= count * tiny * tiny) return 0;
  return 1 - sse / sst;
}

CostCurve fit_linear(const CostPool& pool) {
  LineFit line;
  for (std::size_t i = 0; i < pool.groups().size(); ++i) {
    const AgeGroup& group = pool.groups()[i];
    if (group.count > 0) line.add(static_cast<double>(i), group.mean, static_cast<double>(group.count));
  }
  CostCurve curve{CostModel::linear, line.mean_y(), 0.0, 0.0, pool.asset_years(), 0, pool.assets(),
                  !line.x_varies()};
  if (!curve.single_age) {
    curve.a = line.intercept();  // x = k - 1, so the intercept is age-year 1
    curve.g = line.slope();
    curve.r2 = r_squared(pool.groups(), curve);
  }
  return curve;
}

std::optional<CostCurve> fit_geometric(const CostPool& pool) {
  LineFit line;  // ln y = ln a + ln(1 + g) (k - 1)
  for (std::size_t i = 0; i < pool.groups().size(); ++i) {
    const AgeGroup& group = pool.groups()[i];
    if (group.positive_count > 0) {
      line.add(static_cast<double>(i), group.mean_log, static_cast<double>(group.positive_count));
    }
  }
  if (line.points() == 0) return std::nullopt;  // rule (6)
  const auto used = static_cast<std::size_t>(line.weight());
  CostCurve curve{CostModel::geometric, std::exp(line.mean_y()), 0.0, 0.0, used,
                  pool.asset_years() - used, pool.assets(), !line.x_varies()};
  if (!curve.single_age) {
    curve.a = std::exp(line.intercept());
    curve.g = std::expm1(line.slope());
    curve.r2 = r_squared(pool.groups(), curve);
  }
  return curve;
}

}  // namespace

std::string_view name(CostModel model) {
  return model == CostModel::linear ? "linear" : "geometric";
}

std::optional<CostModelChoice> cost_model_choice_from_name(std::string_view text) {
  if (text == "linear") return CostModelChoice::linear;
  if (text == "geometric") return CostModelChoice::geometric;
  if (text == "auto") return CostModelChoice::automatic;
  return std::nullopt;
}

void CostPool::add_asset(std::span<const Money> year_costs) {
  for (std::size_t i = 0; i < year_costs.size(); ++i) add(static_cast<int>(i) + 1, year_costs[i]);
  if (!year_costs.empty()) ++assets_;
}

void CostPool::add(int age_year, Money cost) {
  if (age_year < 1) throw InputError("age_year", "must be >= 1");
  if (!std::isfinite(cost)) throw InputError("cost", "must be a finite number");
  const auto index = static_cast<std::size_t>(age_year - 1);
  if (index >= groups_.size()) groups_.resize(index + 1);
  AgeGroup& group = groups_[index];
  // Welford's running mean and squared deviations.
  ++group.count;
  const double delta = cost - group.mean;
  group.mean += delta / static_cast<double>(group.count);
  group.sum_sq_dev += delta * (cost - group.mean);
  if (cost > 0) {
    ++group.positive_count;
    group.mean_log += (std::log(cost) - group.mean_log) / static_cast<double>(group.positive_count);
  }
  ++asset_years_;
}

Money CostCurve::predict(int age_year) const {
  if (age_year < 1) throw InputError("age_year", "must be >= 1");
  const double years = age_year - 1;
  return model == CostModel::linear ? a + g * years : a * std::pow(1 + g, years);
}

std::optional<CostCurve> fit_cost_curve(const CostPool& pool, CostModelChoice choice) {
  if (pool.asset_years() == 0) return std::nullopt;  // rule (6)
  switch (choice) {
    case CostModelChoice::linear:
      return fit_linear(pool);
    case CostModelChoice::geometric:
      return fit_geometric(pool);
    case CostModelChoice::automatic:
      break;
  }
  CostCurve linear = fit_linear(pool);
  const std::optional<CostCurve> geometric = fit_geometric(pool);
  if (geometric && geometric->r2 > linear.r2 + kTieTolerance) return geometric;  // rule (4)
  return linear;
}

}  // namespace tenure::fleet
