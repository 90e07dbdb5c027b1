// A weighted least-squares straight line y = intercept + slope * x, accumulated one point at a
// time in O(1) memory. The cost curve fits it to age-year means, the value curve to log fractions.
//
//   LineFit fit;
//   fit.add(0, 10); fit.add(1, 12); fit.add(2, 14);
//   fit.slope();       // 2
//   fit.intercept();   // 10
//
// The update is West's weighted form of Welford's (running means and co-moments, no sums of
// squares), so noiseless data give their line back to rounding and large costs do not cancel.
#pragma once

#include <cstddef>

namespace tenure::fleet {

class LineFit {
 public:
  // Adds point (x, y) with weight w > 0 (the number of observations it stands for).
  void add(double x, double y, double w = 1.0);

  std::size_t points() const { return points_; }  // add() calls
  double weight() const { return weight_; }        // total weight
  double mean_x() const { return mean_x_; }
  double mean_y() const { return mean_y_; }
  // True when the points have at least two distinct x, so the slope is determined.
  bool x_varies() const { return sxx_ > 0; }
  // Least-squares slope and intercept; both require x_varies().
  double slope() const { return sxy_ / sxx_; }
  double intercept() const { return mean_y_ - slope() * mean_x_; }

 private:
  std::size_t points_ = 0;
  double weight_ = 0;
  double mean_x_ = 0;
  double mean_y_ = 0;
  double sxx_ = 0;  // sum of w (x - mean_x)^2
  double sxy_ = 0;  // sum of w (x - mean_x)(y - mean_y)
};

}  // namespace tenure::fleet
