#include "HazardCaution.h"

#include <regex>
#include <string>

namespace tauline {

const char* hazardCautionText()
{
    return "Tauline models ideal parts with no voltage or power rating; for mains, "
           "X/Y-capacitor and high-voltage networks defer to local codes and licensed practice.";
}

bool suggestsHazardousUse(std::string_view title)
{
    // Kept in step with ui/SafetyCaution.cpp so both faces warn on the same files.
    static const std::regex pattern(
        R"(\bmains\b|snubber|high[\s-]*voltage|\bhv\b|\b[xy][12]?[\s-]*(cap|capacitor)s?\b|\bline[\s-]+voltage\b)",
        std::regex::ECMAScript | std::regex::icase);
    return std::regex_search(std::string(title), pattern);
}

}  // namespace tauline
