// The straight-line (Bode asymptote) magnitude sketch: from the dc asymptote
// (a level, or a slope of 20 dB/decade per root at the origin), each real
// corner turns the slope by ±20 dB/decade and each complex pair by
// ±40 dB/decade at |p| (Erickson & Maksimović, Fundamentals of Power
// Electronics, 3rd ed., §8.1).
#include "StraightLineSketch.h"

#include <algorithm>
#include <cmath>
#include <numbers>

namespace tauline {

namespace {

struct Corner {
    double hz = 0.0;
    double slope = 0.0;  // change of log10|H| per decade above the corner
};

std::vector<Corner> cornersOf(const Analysis& analysis, const std::vector<LowQPair>& pairsAsOne)
{
    std::vector<bool> merged(analysis.breakpoints.size(), false);
    std::vector<Corner> out;
    for (const LowQPair& pair : pairsAsOne) {
        if (pair.lowBreakpoint < 0 || pair.highBreakpoint < 0 ||
            pair.highBreakpoint >= static_cast<int>(analysis.breakpoints.size()))
            continue;
        merged[pair.lowBreakpoint] = merged[pair.highBreakpoint] = true;
        out.push_back({pair.sketchHz, pair.type == RootType::Zero ? 2.0 : -2.0});
    }
    for (size_t k = 0; k < analysis.breakpoints.size(); ++k) {
        const Breakpoint& bp = analysis.breakpoints[k];
        if (merged[k])
            continue;
        const double order = bp.q ? 2.0 : 1.0;
        out.push_back({bp.hz, (bp.type == RootType::Zero ? 1.0 : -1.0) * order});
    }
    return out;
}

double sketchDbOf(const Analysis& analysis, const std::vector<Corner>& corners, double hz)
{
    const double w = 2.0 * std::numbers::pi * hz;
    double logMag = std::log10(std::abs(analysis.gainConstant)) + analysis.originPower * std::log10(w);
    for (const Corner& c : corners)
        if (hz > c.hz)
            logMag += c.slope * std::log10(hz / c.hz);
    return 20.0 * logMag;
}

std::vector<SketchVertex> polylineOf(const Analysis& analysis, const std::vector<Corner>& corners, double fromHz,
                                     double toHz)
{
    std::vector<double> at{fromHz, toHz};
    for (const Corner& c : corners)
        if (c.hz > fromHz && c.hz < toHz)
            at.push_back(c.hz);
    std::sort(at.begin(), at.end());
    at.erase(std::unique(at.begin(), at.end()), at.end());
    std::vector<SketchVertex> out;
    for (double hz : at)
        out.push_back({hz, sketchDbOf(analysis, corners, hz)});
    return out;
}

}  // namespace

double sketchDb(const Analysis& analysis, double hz)
{
    return sketchDbOf(analysis, cornersOf(analysis, {}), hz);
}

std::vector<SketchVertex> sketchPolyline(const Analysis& analysis, double fromHz, double toHz)
{
    return polylineOf(analysis, cornersOf(analysis, {}), fromHz, toHz);
}

double sketchDb(const Analysis& analysis, const std::vector<LowQPair>& pairsAsOne, double hz)
{
    return sketchDbOf(analysis, cornersOf(analysis, pairsAsOne), hz);
}

std::vector<SketchVertex> sketchPolyline(const Analysis& analysis, const std::vector<LowQPair>& pairsAsOne,
                                         double fromHz, double toHz)
{
    return polylineOf(analysis, cornersOf(analysis, pairsAsOne), fromHz, toHz);
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
