// Small static SVG charts drawn by tenure for the HTML report: lines with markers, bars,
// vertical and horizontal reference lines and shaded x ranges, on axes with ticks, labels and
// units, with a title and a legend. Every text is escaped. Colour is never the only cue: each
// series also has a stroke pattern and a marker, and each has a legend entry.
//
//   Chart c{"EUAC by years kept", "years kept", "EUAC (money units per year)"};
//   c.series.push_back({"before tax", {{1, 9800}, {2, 8100}}, colour::kBlue, Stroke::solid,
//                       Marker::circle});
//   c.vlines.push_back({13, "economic life 13 years", colour::kReddishPurple, Stroke::dotted});
//   c.shades.push_back({10.5, 15.5, "lives within 2% of the least", colour::kBluishGreen});
//   std::string svg = render_chart(c);   // "<svg ...>...</svg>"
#pragma once

#include <optional>
#include <string>
#include <utility>
#include <vector>

namespace tenure::report {

enum class Stroke { solid, dashed, dotted };
enum class Marker { none, circle, square, diamond };

struct Series {
  std::string name;
  std::vector<std::pair<double, double>> points;  // (x, y), in order of x
  const char* colour;
  Stroke stroke;
  Marker marker;
};

// A bar from x0 to x1 and from 0 to y; bars with the same legend name share one legend entry.
struct Bar {
  double x0, x1, y;
  const char* colour;
  std::string legend;
};

// A translucent rectangle over the plot's whole height from x0 to x1 (cut to the x range),
// drawn under the bars and lines, with a legend swatch of the same tint.
struct Shade {
  double x0, x1;
  std::string label;
  const char* colour;
};

struct ReferenceLine {
  double at;           // x for a vertical line, y for a horizontal one
  std::string label;   // in the legend, and beside a vertical line
  const char* colour;
  Stroke stroke;
};

struct Chart {
  Chart(std::string chart_title, std::string x_axis_label, std::string y_axis_label)
      : title(std::move(chart_title)),
        x_label(std::move(x_axis_label)),
        y_label(std::move(y_axis_label)) {}

  std::string title;
  std::string x_label;
  std::string y_label;
  std::vector<Series> series;
  std::vector<Bar> bars;
  std::vector<ReferenceLine> vlines;
  std::vector<ReferenceLine> hlines;
  std::vector<Shade> shades;
  double width = 560;
  double height = 320;
  // Axis ranges: by default from the data (y always includes 0), widened to whole ticks.
  std::optional<std::pair<double, double>> x_range;
  bool integer_x = true;  // x ticks on whole numbers (years, ages)
  bool integer_y = false; // y ticks on whole numbers (counts)
};

// One self-contained <svg> element (role="img", with <title> and <desc>), sized by its viewBox
// so it scales with the page.
std::string render_chart(const Chart& chart);

// Tick positions covering [low, high] with about `target` steps of 1, 2, 2.5 or 5 times a power
// of ten (whole steps when `integer`); the first tick <= low, the last >= high.
std::vector<double> nice_ticks(double low, double high, int target, bool integer);

}  // namespace tenure::report
