#pragma once

#include <string_view>

namespace tauline {

// The caution every network that can hurt someone gets: parts are ideal and
// have no voltage or power rating. The same rule and words as the editor's
// banner (ui/SafetyCaution), for the display-free command line.
const char* hazardCautionText();

// True when a network's title suggests mains, snubber, X/Y-capacitor or
// high-voltage use.
bool suggestsHazardousUse(std::string_view title);

}  // namespace tauline
