#include "CornerSensitivity.h"

#include "Errors.h"
#include "NodalModel.h"
#include "RootSensitivity.h"

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

// Exact sensitivities below this are rounding in the null vectors: no
// dependence.
constexpr double kNoDependence = 1e-10;

// Two roots of one kind this close (relative) are one double root.
constexpr double kDoubleRoot = 1e-7;

bool onDoubleRoot(const Analysis& base, const Breakpoint& corner)
{
    const auto& roots = corner.type == RootType::Pole ? base.poles : base.zeros;
    int near = 0;
    for (const auto& r : roots)
        if (std::abs(r - corner.root) <= kDoubleRoot * std::abs(corner.root))
            ++near;
    return near > 1;
}

void sortByMagnitude(CornerSensitivity& corner)
{
    std::stable_sort(corner.parts.begin(), corner.parts.end(),
                     [](const PartSensitivity& a, const PartSensitivity& b) {
                         return std::abs(a.value) > std::abs(b.value);
                     });
}

// Central differences for the corners flagged in `wanted` only.
void centralDifferences(const Network& network, const Analysis& base, double step,
                        const std::function<bool()>& keepGoing, const std::vector<bool>& wanted,
                        std::vector<CornerSensitivity>& result)
{
    const auto& corners = base.breakpoints;
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
            if (!wanted[c])
                continue;
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
}

}  // namespace

std::vector<CornerSensitivity> finiteDifferenceSensitivities(const Network& network, const Analysis& base,
                                                             double step, const std::function<bool()>& keepGoing)
{
    std::vector<CornerSensitivity> result(base.breakpoints.size());
    for (auto& corner : result)
        corner.method = SensitivityMethod::FiniteDifference;
    if (result.empty())
        return result;
    centralDifferences(network, base, step, keepGoing, std::vector<bool>(result.size(), true), result);
    for (auto& corner : result)
        sortByMagnitude(corner);
    return result;
}

std::vector<CornerSensitivity> cornerSensitivities(const Network& network, const Analysis& base, double step,
                                                   const std::function<bool()>& keepGoing)
{
    const auto& corners = base.breakpoints;
    std::vector<CornerSensitivity> result(corners.size());
    if (corners.empty())
        return result;
    const NodalModel model = buildNodalModel(network);
    const std::vector<PartStamp> stamps = partStamps(model, network);

    std::vector<std::optional<std::vector<std::complex<double>>>> derivatives(corners.size());
    std::vector<bool> fallback(corners.size(), false);
    for (std::size_t c = 0; c < corners.size(); ++c) {
        if (onDoubleRoot(base, corners[c])) {
            result[c].note = "a double root: the exact derivative does not exist (the roots move as the "
                             "square root of a change); central differences shown";
        } else {
            derivatives[c] = rootDerivatives(model, stamps, corners[c].type, corners[c].root);
            if (!derivatives[c])
                result[c].note = "the root's null vectors could not be resolved (a double root, or nearly); "
                                 "central differences shown";
        }
        fallback[c] = !derivatives[c];
        if (fallback[c])
            result[c].method = SensitivityMethod::FiniteDifference;
    }

    for (std::size_t p = 0; p < network.parts.size(); ++p) {
        if (keepGoing && !keepGoing())
            return result;
        for (std::size_t c = 0; c < corners.size(); ++c) {
            if (!derivatives[c])
                continue;
            double s = normalisedCornerSensitivity(corners[c].root, (*derivatives[c])[p]);
            if (std::abs(s) < kNoDependence)
                s = 0.0;
            result[c].parts.push_back({network.parts[p].name, s});
        }
    }
    if (std::find(fallback.begin(), fallback.end(), true) != fallback.end())
        centralDifferences(network, base, step, keepGoing, fallback, result);
    for (auto& corner : result)
        sortByMagnitude(corner);
    return result;
}

std::optional<double> exactCornerSensitivity(const Network& network, const Breakpoint& corner, std::size_t part)
{
    if (part >= network.parts.size())
        return std::nullopt;
    const NodalModel model = buildNodalModel(network);
    const auto d = rootDerivatives(model, partStamps(model, network), corner.type, corner.root);
    if (!d)
        return std::nullopt;
    return normalisedCornerSensitivity(corner.root, (*d)[part]);
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
