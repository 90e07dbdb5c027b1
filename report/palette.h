// The report's colours: the Okabe-Ito palette, chosen to stay distinct under the common forms
// of colour blindness, plus neutrals for axes and grids. Charts never rely on colour alone:
// series also differ by dash pattern and marker shape, and every series has a legend entry.
#pragma once

namespace tenure::report::colour {

inline constexpr const char* kBlue = "#0072B2";
inline constexpr const char* kVermillion = "#D55E00";
inline constexpr const char* kOrange = "#E69F00";
inline constexpr const char* kSkyBlue = "#56B4E9";
inline constexpr const char* kBluishGreen = "#009E73";
inline constexpr const char* kReddishPurple = "#CC79A7";
inline constexpr const char* kYellow = "#F0E442";
inline constexpr const char* kBlack = "#000000";

inline constexpr const char* kInk = "#1d2733";    // text and axes
inline constexpr const char* kMuted = "#5a6672";  // secondary text
inline constexpr const char* kGrid = "#e2e6ea";   // grid lines

}  // namespace tenure::report::colour
