// Static SVG charts (see svg_chart.h). Layout: title on top, plot in the middle, x-axis label
// and legend rows at the bottom; the plot shrinks to leave the legend the rows it needs.
#include "report/svg_chart.h"

#include <algorithm>
#include <cmath>
#include <limits>

#include <fmt/format.h>

#include "report/html.h"
#include "report/palette.h"

namespace tenure::report {
namespace {

constexpr double kLeft = 72, kRight = 24, kTop = 44, kAxisBelow = 46;
constexpr double kLegendRow = 20, kCharWidth = 6.6;  // 12px text, average width
constexpr double kShadeOpacity = 0.22;  // a shade's tint: the grid and the lines show through

const char* dash(Stroke stroke) {
  switch (stroke) {
    case Stroke::solid: return "";
    case Stroke::dashed: return " stroke-dasharray=\"8 5\"";
    case Stroke::dotted: return " stroke-dasharray=\"0.5 5\"";
  }
  return "";
}

std::string marker(Marker shape, double x, double y, const char* colour) {
  switch (shape) {
    case Marker::none: return "";
    case Marker::circle:
      return fmt::format("<circle cx=\"{:.1f}\" cy=\"{:.1f}\" r=\"3.4\" fill=\"{}\" "
                         "stroke=\"#fff\" stroke-width=\"1\"/>",
                         x, y, colour);
    case Marker::square:
      return fmt::format("<rect x=\"{:.1f}\" y=\"{:.1f}\" width=\"6.4\" height=\"6.4\" "
                         "fill=\"{}\" stroke=\"#fff\" stroke-width=\"1\"/>",
                         x - 3.2, y - 3.2, colour);
    case Marker::diamond:  // marks a single notable point: larger, with a dark outline
      return fmt::format("<path d=\"M{:.1f} {:.1f}l6.5 6.5l-6.5 6.5l-6.5 -6.5z\" fill=\"{}\" "
                         "stroke=\"{}\" stroke-width=\"1.2\"/>",
                         x, y - 6.5, colour, colour::kInk);
  }
  return "";
}

// Decimals that show a tick step exactly enough: 2500 -> 0, 0.5 -> 1, 0.25 -> 2.
int decimals_for(double step) {
  int decimals = 0;
  while (decimals < 6 && std::abs(step * std::pow(10, decimals) -
                                  std::round(step * std::pow(10, decimals))) > 1e-9) {
    ++decimals;
  }
  return decimals;
}

struct LegendEntry {
  std::string label;
  const char* colour;
  Stroke stroke;
  Marker marker;
  bool box;   // a filled swatch (bars) rather than a line sample
  bool line;  // a line sample (a single point shows its marker only)
  double opacity = 1;  // a swatch's: a shade's is translucent
};

std::vector<LegendEntry> legend_entries(const Chart& c) {
  std::vector<LegendEntry> out;
  for (const Series& s : c.series) {
    out.push_back({s.name, s.colour, s.stroke, s.marker, false, s.points.size() > 1});
  }
  for (const Bar& b : c.bars) {
    const bool seen = std::any_of(out.begin(), out.end(),
                                  [&](const LegendEntry& e) { return e.box && e.label == b.legend; });
    if (!b.legend.empty() && !seen) {
      out.push_back({b.legend, b.colour, Stroke::solid, Marker::none, true, false});
    }
  }
  for (const ReferenceLine& l : c.vlines) {
    out.push_back({l.label, l.colour, l.stroke, Marker::none, false, true});
  }
  for (const ReferenceLine& l : c.hlines) {
    out.push_back({l.label, l.colour, l.stroke, Marker::none, false, true});
  }
  for (const Shade& s : c.shades) {
    out.push_back({s.label, s.colour, Stroke::solid, Marker::none, true, false, kShadeOpacity});
  }
  return out;
}

double entry_width(const LegendEntry& e) {
  return 30 + kCharWidth * static_cast<double>(e.label.size()) + 18;
}

// Rows of legend entries that fit the chart's width.
std::vector<std::vector<LegendEntry>> legend_rows(const std::vector<LegendEntry>& entries,
                                                  double width) {
  std::vector<std::vector<LegendEntry>> rows;
  const double room = width - kLeft - kRight;
  double used = 0;
  for (const LegendEntry& e : entries) {
    if (rows.empty() || (used + entry_width(e) > room && !rows.back().empty())) {
      rows.emplace_back();
      used = 0;
    }
    rows.back().push_back(e);
    used += entry_width(e);
  }
  return rows;
}

}  // namespace

std::vector<double> nice_ticks(double low, double high, int target, bool integer) {
  if (!(high > low)) high = low + 1;
  const double raw = (high - low) / std::max(1, target);
  const double magnitude = std::pow(10, std::floor(std::log10(raw)));
  const double norm = raw / magnitude;
  double step = (norm <= 1 ? 1 : norm <= 2 ? 2 : norm <= 2.5 ? 2.5 : norm <= 5 ? 5 : 10) * magnitude;
  if (integer) step = std::max(1.0, std::ceil(step));
  const double first = std::floor(low / step + 1e-9) * step;
  std::vector<double> ticks;
  for (double t = first; t < high + step * (1 - 1e-9); t += step) {
    ticks.push_back(std::abs(t) < step * 1e-9 ? 0.0 : t);
    if (ticks.size() > 200) break;
  }
  if (ticks.back() < high - step * 1e-9) ticks.push_back(ticks.back() + step);
  return ticks;
}

std::string render_chart(const Chart& c) {
  // Data bounds.
  double x_min = std::numeric_limits<double>::infinity(), x_max = -x_min;
  double y_min = 0, y_max = 0;
  const auto see_x = [&](double x) { x_min = std::min(x_min, x); x_max = std::max(x_max, x); };
  const auto see_y = [&](double y) { y_min = std::min(y_min, y); y_max = std::max(y_max, y); };
  for (const Series& s : c.series) {
    for (const auto& [x, y] : s.points) { see_x(x); see_y(y); }
  }
  for (const Bar& b : c.bars) { see_x(b.x0); see_x(b.x1); see_y(b.y); }
  for (const ReferenceLine& l : c.vlines) see_x(l.at);
  for (const ReferenceLine& l : c.hlines) see_y(l.at);
  for (const Shade& s : c.shades) { see_x(s.x0); see_x(s.x1); }
  if (c.x_range) { x_min = c.x_range->first; x_max = c.x_range->second; }
  if (!std::isfinite(x_min)) { x_min = 0; x_max = 1; }
  const std::vector<double> x_ticks = nice_ticks(x_min, x_max, 8, c.integer_x);
  const std::vector<double> y_ticks = nice_ticks(y_min, y_max * 1.04, 5, c.integer_y);
  if (!c.x_range) { x_min = x_ticks.front(); x_max = x_ticks.back(); }
  y_min = y_ticks.front();
  y_max = y_ticks.back();

  const std::vector<LegendEntry> entries = legend_entries(c);
  const auto rows = legend_rows(entries, c.width);
  const double legend_height = static_cast<double>(rows.size()) * kLegendRow;
  const double plot_left = kLeft, plot_right = c.width - kRight;
  const double plot_top = kTop, plot_bottom = c.height - kAxisBelow - legend_height - 6;
  const auto px = [&](double x) {
    return plot_left + (x - x_min) / (x_max - x_min) * (plot_right - plot_left);
  };
  const auto py = [&](double y) {
    return plot_bottom - (y - y_min) / (y_max - y_min) * (plot_bottom - plot_top);
  };

  std::string svg = fmt::format(
      "<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"chart\" viewBox=\"0 0 {0} {1}\" "
      "role=\"img\" aria-label=\"{2}\" font-size=\"12\">"
      "<title>{2}</title><desc>{3} against {4}</desc>"
      "<rect width=\"{0}\" height=\"{1}\" fill=\"#fff\"/>"
      "<text x=\"{5}\" y=\"22\" font-size=\"14\" font-weight=\"600\" fill=\"{6}\">{2}</text>",
      c.width, c.height, escape(c.title), escape(c.y_label), escape(c.x_label), 12, colour::kInk);

  // Grid and y ticks.
  const int y_decimals = decimals_for(y_ticks.size() > 1 ? y_ticks[1] - y_ticks[0] : 1);
  for (const double t : y_ticks) {
    svg += fmt::format("<line x1=\"{:.1f}\" x2=\"{:.1f}\" y1=\"{:.1f}\" y2=\"{:.1f}\" "
                       "stroke=\"{}\" stroke-width=\"1\"/>"
                       "<text x=\"{:.1f}\" y=\"{:.1f}\" text-anchor=\"end\" fill=\"{}\">{}</text>",
                       plot_left, plot_right, py(t), py(t), t == 0 ? "#9aa4ae" : colour::kGrid,
                       plot_left - 8, py(t) + 4, colour::kMuted, grouped(t, y_decimals));
  }
  // x ticks.
  const int x_decimals = decimals_for(x_ticks.size() > 1 ? x_ticks[1] - x_ticks[0] : 1);
  for (const double t : x_ticks) {
    if (t < x_min - 1e-9 || t > x_max + 1e-9) continue;
    svg += fmt::format("<line x1=\"{0:.1f}\" x2=\"{0:.1f}\" y1=\"{1:.1f}\" y2=\"{2:.1f}\" "
                       "stroke=\"{3}\"/><text x=\"{0:.1f}\" y=\"{4:.1f}\" text-anchor=\"middle\" "
                       "fill=\"{5}\">{6}</text>",
                       px(t), plot_bottom, plot_bottom + 5, colour::kInk, plot_bottom + 18,
                       colour::kMuted, grouped(t, x_decimals));
  }
  // Axes and their labels.
  svg += fmt::format("<line x1=\"{0:.1f}\" x2=\"{1:.1f}\" y1=\"{2:.1f}\" y2=\"{2:.1f}\" "
                     "stroke=\"{3}\" stroke-width=\"1.2\"/>"
                     "<line x1=\"{0:.1f}\" x2=\"{0:.1f}\" y1=\"{4:.1f}\" y2=\"{2:.1f}\" "
                     "stroke=\"{3}\" stroke-width=\"1.2\"/>",
                     plot_left, plot_right, plot_bottom, colour::kInk, plot_top);
  svg += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" text-anchor=\"middle\" fill=\"{}\">{}</text>",
                     (plot_left + plot_right) / 2, plot_bottom + 36, colour::kInk,
                     escape(c.x_label));
  svg += fmt::format("<text transform=\"translate(16 {:.1f}) rotate(-90)\" text-anchor=\"middle\" "
                     "fill=\"{}\">{}</text>",
                     (plot_top + plot_bottom) / 2, colour::kInk, escape(c.y_label));

  // Shades first, under everything drawn on the plot.
  for (const Shade& s : c.shades) {
    const double left = px(std::clamp(std::min(s.x0, s.x1), x_min, x_max));
    const double right = px(std::clamp(std::max(s.x0, s.x1), x_min, x_max));
    svg += fmt::format(
        "<rect class=\"shade\" x=\"{:.1f}\" y=\"{:.1f}\" width=\"{:.1f}\" "
        "height=\"{:.1f}\" fill=\"{}\" fill-opacity=\"{}\"/>",
        left, plot_top, right - left, plot_bottom - plot_top, s.colour, kShadeOpacity);
  }

  // Horizontal lines are named in the legend only: a label on the line would cover the series
  // that cross it.
  for (const ReferenceLine& l : c.hlines) {
    const double y = py(l.at);
    svg += fmt::format("<line x1=\"{0:.1f}\" x2=\"{1:.1f}\" y1=\"{2:.1f}\" y2=\"{2:.1f}\" "
                       "stroke=\"{3}\" stroke-width=\"2.4\" stroke-linecap=\"round\"{4}/>",
                       plot_left, plot_right, y, l.colour, dash(l.stroke));
  }

  // Bars, then lines, then vertical reference lines on top.
  for (const Bar& b : c.bars) {
    const double top = py(std::max(0.0, b.y)), base = py(std::min(0.0, b.y));
    svg += fmt::format("<rect x=\"{:.1f}\" y=\"{:.1f}\" width=\"{:.1f}\" height=\"{:.1f}\" "
                       "fill=\"{}\" stroke=\"#fff\" stroke-width=\"1\"/>",
                       px(b.x0), top, std::max(0.0, px(b.x1) - px(b.x0)), base - top, b.colour);
  }
  for (const Series& s : c.series) {
    std::string path;
    for (const auto& [x, y] : s.points) {
      path += fmt::format("{}{:.1f} {:.1f}", path.empty() ? "M" : " L", px(x), py(y));
    }
    if (!path.empty()) {
      svg += fmt::format("<path d=\"{}\" fill=\"none\" stroke=\"{}\" stroke-width=\"2.4\" "
                         "stroke-linejoin=\"round\" stroke-linecap=\"round\"{}/>",
                         path, s.colour, dash(s.stroke));
    }
    for (const auto& [x, y] : s.points) svg += marker(s.marker, px(x), py(y), s.colour);
  }
  for (const ReferenceLine& l : c.vlines) {
    const double x = px(l.at);
    const bool right_half = x > (plot_left + plot_right) / 2;
    svg += fmt::format("<line x1=\"{0:.1f}\" x2=\"{0:.1f}\" y1=\"{1:.1f}\" y2=\"{2:.1f}\" "
                       "stroke=\"{3}\" stroke-width=\"2.4\" stroke-linecap=\"round\"{4}/>"
                       "<text x=\"{5:.1f}\" y=\"{6:.1f}\" text-anchor=\"{7}\" fill=\"{8}\" "
                       "paint-order=\"stroke\" stroke=\"#fff\" stroke-width=\"4\">{9}</text>",
                       x, plot_top, plot_bottom, l.colour, dash(l.stroke),
                       right_half ? x - 5 : x + 5, plot_top + 12, right_half ? "end" : "start",
                       colour::kInk, escape(l.label));
  }
  // Legend rows under the x-axis label.
  double legend_y = plot_bottom + kAxisBelow + 8;
  for (const auto& row : rows) {
    double x = plot_left;
    for (const LegendEntry& e : row) {
      if (e.box) {
        svg += fmt::format(
            "<rect x=\"{:.1f}\" y=\"{:.1f}\" width=\"22\" height=\"10\" "
            "fill=\"{}\"{}/>",
            x, legend_y - 9, e.colour,
            e.opacity < 1 ? fmt::format(" fill-opacity=\"{}\"", e.opacity) : "");
      } else {
        if (e.line) {
          svg += fmt::format("<line x1=\"{:.1f}\" x2=\"{:.1f}\" y1=\"{:.1f}\" y2=\"{:.1f}\" "
                             "stroke=\"{}\" stroke-width=\"2.4\" stroke-linecap=\"round\"{}/>",
                             x, x + 22, legend_y - 4, legend_y - 4, e.colour, dash(e.stroke));
        }
        svg += marker(e.marker, x + 11, legend_y - 4, e.colour);
      }
      svg += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" fill=\"{}\">{}</text>", x + 30,
                         legend_y, colour::kInk, escape(e.label));
      x += entry_width(e);
    }
    legend_y += kLegendRow;
  }
  return svg + "</svg>";
}

}  // namespace tenure::report
