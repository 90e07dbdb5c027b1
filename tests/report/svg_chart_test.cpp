// The report's SVG charts: tick steps of 1, 2, 2.5 or 5 times a power of ten that cover the
// data, escaped titles and legends, dash patterns and markers so colour is not the only cue,
// points placed on the plot by the axis ranges, and shades cut to them.
#include <gtest/gtest.h>

#include <cmath>

#include "report/palette.h"
#include "report/svg_chart.h"

namespace tenure::report {
namespace {

TEST(NiceTicks, CoverTheRangeInRoundSteps) {
  EXPECT_EQ(nice_ticks(0, 14332.9, 5, false),
            (std::vector<double>{0, 5000, 10000, 15000}));
  EXPECT_EQ(nice_ticks(0, 9, 8, true), (std::vector<double>{0, 2, 4, 6, 8, 10}));
  EXPECT_EQ(nice_ticks(0, 7, 5, true), (std::vector<double>{0, 2, 4, 6, 8}));
  EXPECT_EQ(nice_ticks(0, 1, 4, false), (std::vector<double>{0, 0.25, 0.5, 0.75, 1}));
  for (const auto& [low, high] : {std::pair{-350.0, 12000.0}, {3.0, 17.0}, {0.0, 0.07}}) {
    const auto ticks = nice_ticks(low, high, 5, false);
    ASSERT_GE(ticks.size(), 2u);
    EXPECT_LE(ticks.front(), low);
    EXPECT_GE(ticks.back(), high);
    const double step = ticks[1] - ticks[0];
    const double mantissa = step / std::pow(10, std::floor(std::log10(step)));
    EXPECT_TRUE(std::abs(mantissa - 1) < 1e-9 || std::abs(mantissa - 2) < 1e-9 ||
                std::abs(mantissa - 2.5) < 1e-9 || std::abs(mantissa - 5) < 1e-9)
        << step;
  }
}

TEST(RenderChart, DrawsAxesLabelsAndALegendWithEscapedText) {
  Chart c{"<b>PU & co</b>", "years kept", "EUAC (money units per year)"};
  c.series.push_back({"before tax", {{1, 100}, {2, 80}, {3, 90}}, colour::kBlue, Stroke::solid,
                      Marker::circle});
  c.series.push_back({"after tax", {{1, 70}, {2, 60}, {3, 65}}, colour::kVermillion,
                      Stroke::dashed, Marker::square});
  c.vlines.push_back({2, "economic life 2 years", colour::kReddishPurple, Stroke::dotted});
  const std::string svg = render_chart(c);
  EXPECT_EQ(svg.rfind("<svg xmlns=\"http://www.w3.org/2000/svg\"", 0), 0u);
  EXPECT_EQ(svg.substr(svg.size() - 6), "</svg>");
  EXPECT_NE(svg.find("aria-label=\"&lt;b&gt;PU &amp; co&lt;/b&gt;\""), std::string::npos);
  EXPECT_EQ(svg.find("<b>"), std::string::npos);
  for (const char* text : {">years kept<", ">EUAC (money units per year)<", ">before tax<",
                           ">after tax<", ">economic life 2 years<", "stroke-dasharray=\"8 5\"",
                           "stroke-dasharray=\"0.5 5\"", "<circle", "<rect x="}) {
    EXPECT_NE(svg.find(text), std::string::npos) << text;
  }
}

TEST(RenderChart, PlacesTheFirstTickOnTheLeftAxis) {
  Chart c{"t", "x", "y"};
  c.series.push_back({"s", {{0, 0}, {10, 10}}, colour::kBlue, Stroke::solid, Marker::none});
  const std::string svg = render_chart(c);
  // The path starts at the plot's left edge (72) on the x axis.
  EXPECT_NE(svg.find("<path d=\"M72.0 "), std::string::npos) << svg;
}

TEST(RenderChart, ShadesAnXRangeUnderTheLinesWithATranslucentSwatch) {
  Chart c{"t", "years kept", "EUAC"};
  c.series.push_back({"s", {{1, 10}, {10, 5}}, colour::kBlue, Stroke::solid, Marker::none});
  c.shades.push_back({7.5, 12.5, "near-best <lives>", colour::kBluishGreen});
  c.x_range = std::make_pair(0.0, 10.0);
  const std::string svg = render_chart(c);
  // By hand: the plot runs from x = 72 to 560 - 24 = 536, so 7.5 of 0..10 is at 72 + 0.75 x 464
  // = 420.0, and 12.5 is cut to 10, the right edge: width 116.0.
  const std::size_t shade =
      svg.find("<rect class=\"shade\" x=\"420.0\" y=\"44.0\" width=\"116.0\"");
  ASSERT_NE(shade, std::string::npos) << svg;
  EXPECT_NE(svg.find("fill=\"#009E73\" fill-opacity=\"0.22\"/>", shade), std::string::npos);
  EXPECT_LT(shade, svg.find("<path d="));  // under the line
  EXPECT_NE(svg.find("fill=\"#009E73\" fill-opacity=\"0.22\"/><text"),
            std::string::npos);  // swatch
  EXPECT_NE(svg.find(">near-best &lt;lives&gt;<"), std::string::npos);
}

}  // namespace
}  // namespace tenure::report
