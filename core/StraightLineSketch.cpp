// The straight-line (Bode asymptote) magnitude sketch: from the dc asymptote
// (a level, or a slope of 20 dB/decade per root at the origin), each real
// corner turns the slope by ±20 dB/decade and each complex pair by
// ±40 dB/decade at |p| (Erickson & Maksimović, Fundamentals of Power
// Electronics, 3rd ed., §8.1).
#include "Analysis.h"

#include <algorithm>
#include <cmath>
#include <numbers>

namespace tauline {

double sketchDb(const Analysis& analysis, double hz)
{
    const double w = 2.0 * std::numbers::pi * hz;
    double logMag = std::log10(std::abs(analysis.gainConstant)) + analysis.originPower * std::log10(w);
    for (const Breakpoint& bp : analysis.breakpoints) {
        const double corner = 2.0 * std::numbers::pi * bp.hz;
        if (w <= corner)
            continue;
        const double order = bp.q ? 2.0 : 1.0;
        const double sign = bp.type == RootType::Zero ? 1.0 : -1.0;
        logMag += sign * order * std::log10(w / corner);
    }
    return 20.0 * logMag;
}

std::vector<SketchVertex> sketchPolyline(const Analysis& analysis, double fromHz, double toHz)
{
    std::vector<double> at{fromHz, toHz};
    for (const Breakpoint& bp : analysis.breakpoints)
        if (bp.hz > fromHz && bp.hz < toHz)
            at.push_back(bp.hz);
    std::sort(at.begin(), at.end());
    at.erase(std::unique(at.begin(), at.end()), at.end());
    std::vector<SketchVertex> out;
    for (double hz : at)
        out.push_back({hz, sketchDb(analysis, hz)});
    return out;
}

std::pair<double, double> suggestedRangeHz(const Analysis& analysis)
{
    if (analysis.breakpoints.empty())
        return {1.0, 1e6};
    double low = analysis.breakpoints.front().hz;
    double high = low;
    for (const Breakpoint& bp : analysis.breakpoints) {
        low = std::min(low, bp.hz);
        high = std::max(high, bp.hz);
    }
    // A decade to spare on each side, rounded out to whole decades.
    return {std::pow(10.0, std::floor(std::log10(low)) - 1.0), std::pow(10.0, std::ceil(std::log10(high)) + 1.0)};
}

}  // namespace tauline
