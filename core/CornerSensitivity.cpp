#include "CornerSensitivity.h"

#include "Errors.h"

#include <algorithm>
#include <cmath>
#include <optional>

namespace tauline {

namespace {

// A corner's rank among the corners of its own type: poles and zeros are
// each sorted by frequency, and a small change of one part value keeps that
// order unless two corners of one type coincide.
std::vector<int> rankWithinType(const std::vector<Breakpoint>& corners)
{
    std::vector<int> rank(corners.size());
    int poles = 0;
    int zeros = 0;
    for (std::size_t i = 0; i < corners.size(); ++i)
        rank[i] = corners[i].type == RootType::Pole ? poles++ : zeros++;
    return rank;
}

std::optional<double> cornerHz(const std::vector<Breakpoint>& corners, RootType type, int rank)
{
    int seen = 0;
    for (const auto& corner : corners) {
        if (corner.type != type)
            continue;
        if (seen == rank)
            return corner.hz;
        ++seen;
    }
    return std::nullopt;
}

std::optional<std::vector<Breakpoint>> cornersWithScaledPart(Network network, std::size_t part,
                                                             double factor)
{
    network.parts[part].value *= factor;
    try {
        return analyze(network).breakpoints;
    } catch (const InputError&) {
        return std::nullopt;
    }
}

}  // namespace

std::vector<CornerSensitivity> cornerSensitivities(const Network& network, const Analysis& base,
                                                   double step,
                                                   const std::function<bool()>& keepGoing)
{
    const auto& corners = base.breakpoints;
    std::vector<CornerSensitivity> result(corners.size());
    if (corners.empty())
        return result;
    const std::vector<int> rank = rankWithinType(corners);
    const double lnStep = std::log1p(step) - std::log1p(-step);

    for (std::size_t p = 0; p < network.parts.size(); ++p) {
        if (keepGoing && !keepGoing())
            break;
        const auto up = cornersWithScaledPart(network, p, 1.0 + step);
        const auto down = cornersWithScaledPart(network, p, 1.0 - step);
        if (!up || !down)
            continue;
        for (std::size_t c = 0; c < corners.size(); ++c) {
            const auto fUp = cornerHz(*up, corners[c].type, rank[c]);
            const auto fDown = cornerHz(*down, corners[c].type, rank[c]);
            if (!fUp || !fDown || *fUp <= 0.0 || *fDown <= 0.0)
                continue;
            double s = (std::log(*fUp) - std::log(*fDown)) / lnStep;
            // Differences below the rounding of the engine are no dependence.
            if (std::abs(s) < 1e-6)
                s = 0.0;
            result[c].parts.push_back({network.parts[p].name, s});
        }
    }
    for (auto& corner : result)
        std::stable_sort(corner.parts.begin(), corner.parts.end(),
                         [](const PartSensitivity& a, const PartSensitivity& b) {
                             return std::abs(a.value) > std::abs(b.value);
                         });
    return result;
}

std::vector<PartSensitivity> dominantParts(const CornerSensitivity& corner, double fraction,
                                           std::size_t maxParts)
{
    std::vector<PartSensitivity> out;
    if (corner.parts.empty() || corner.parts.front().value == 0.0)
        return out;
    const double largest = std::abs(corner.parts.front().value);
    for (const auto& part : corner.parts) {
        if (out.size() >= maxParts || std::abs(part.value) < fraction * largest)
            break;
        out.push_back(part);
    }
    return out;
}

}  // namespace tauline
