// Weighted least-squares line (see line_fit.h).
#include "fleet/line_fit.h"

namespace tenure::fleet {

void LineFit::add(double x, double y, double w) {
  ++points_;
  weight_ += w;
  const double dx = x - mean_x_;
  mean_x_ += dx * (w / weight_);
  mean_y_ += (y - mean_y_) * (w / weight_);
  // Co-moments use the old x deviation and the new means (West 1979); with equal x, dx is exactly
  // 0, so x_varies() stays false instead of turning true on rounding noise.
  sxx_ += w * dx * (x - mean_x_);
  sxy_ += w * dx * (y - mean_y_);
}

}  // namespace tenure::fleet
