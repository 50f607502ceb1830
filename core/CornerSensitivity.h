#pragma once

#include "Analysis.h"
#include "Network.h"

#include <functional>
#include <optional>
#include <string>
#include <vector>

namespace tauline {

// How strongly one part sets one corner: the normalised sensitivity
// d ln f / d ln x (f the corner frequency, x the part value). A single RC
// pole f = 1/(2 pi R C) gives -1 for both R and C.
struct PartSensitivity {
    std::string part;
    double value = 0.0;
};

enum class SensitivityMethod {
    Exact,             // from the root's null vectors (RootSensitivity.h)
    FiniteDifference,  // the exact derivative does not exist here (a double root)
};

// One entry per breakpoint of the base analysis, in the same order. `parts`
// is sorted by |value|, largest first; parts whose perturbed network could
// not be matched to this corner (the corner vanished or changed type) are
// left out, so an empty list means "unknown".
struct CornerSensitivity {
    std::vector<PartSensitivity> parts;
    SensitivityMethod method = SensitivityMethod::Exact;
    std::string note;  // why the exact value is not given, for people
};

// Exact: one factorisation per corner, then a product per part (see
// rootDerivatives). A corner on a double root has no derivative; it gets the
// central difference below instead, with method FiniteDifference and a note.
// Parts the network leaves out (a separate piece) get 0. `keepGoing` is asked
// before each part; returning false stops early (the result is then
// incomplete and should be thrown away).
std::vector<CornerSensitivity> cornerSensitivities(
    const Network& network, const Analysis& base, double step = 1e-4,
    const std::function<bool()>& keepGoing = {});

// Central difference: each part value scaled by (1 +/- step), the network
// re-analysed, corners matched by their rank among corners of the same type.
// Two analyses per part; the check on the exact values, and their fallback.
std::vector<CornerSensitivity> finiteDifferenceSensitivities(
    const Network& network, const Analysis& base, double step = 1e-4,
    const std::function<bool()>& keepGoing = {});

// The exact sensitivity of one corner to one part (index into
// network.parts), or none where the corner sits on a double root. For the
// placement search, which needs one derivative per step.
std::optional<double> exactCornerSensitivity(const Network& network, const Breakpoint& corner,
                                             std::size_t part);

// The parts that set a corner most: every part within `fraction` of the
// largest |sensitivity|, at most `maxParts` of them.
std::vector<PartSensitivity> dominantParts(const CornerSensitivity& corner,
                                           double fraction = 0.5, std::size_t maxParts = 3);

}  // namespace tauline
