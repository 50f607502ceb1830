#pragma once

#include "Analysis.h"
#include "Network.h"
#include "StandardSeries.h"

#include <optional>
#include <string>
#include <vector>

namespace tauline {

// Moving one corner to a chosen frequency by changing one part.
struct PlacementRequest {
    int corner = 0;                    // index into analyze(network).breakpoints (low to high)
    double targetHz = 0.0;
    std::optional<std::string> part;   // empty: the part the corner is most sensitive to
    ValueSeries series = ValueSeries::E24;
};

// A value of the series and where the corner lands with it.
struct PlacedValue {
    double value = 0.0;
    std::string text;                  // "4.7 kΩ"
    std::optional<double> hz;          // empty when the corner could not be followed there
    int corner = -1;                   // its index in that analysis's breakpoints
};

struct CornerPlacement {
    std::string part;
    PartKind kind = PartKind::Resistor;
    double startValue = 0.0;
    double startHz = 0.0;
    double targetHz = 0.0;
    int corner = 0;                    // as requested
    RootType type = RootType::Pole;
    double sensitivity = 0.0;          // d ln f / d ln x at the start (exact)

    double value = 0.0;                // the exact solution
    double hz = 0.0;                   // the corner with it (equals the target to ~1e-12)
    int landingCorner = 0;             // its index then: corners of the other type may have been passed
    int steps = 0;                     // analyses the search took

    ValueSeries series = ValueSeries::E24;
    // The nearest series values below and above (one entry when the exact
    // value is a series value).
    std::vector<PlacedValue> nearest;
};

// Solves for the part value that puts the corner at the target: safeguarded
// Newton on ln f(ln x) − ln target, the network re-analysed at every step and
// the exact sensitivity as derivative, bracketed once the target is passed;
// the corner is followed by continuity from step to step, so it is never
// confused with a neighbour. Throws InputError with a message a user can act
// on: no such corner or part, a part that does not move the corner, or a
// target the corner cannot reach (it saturates at a limit as the part goes
// to 0 or ∞ — the limit is given — or it meets another corner).
CornerPlacement placeCorner(const Network& network, const PlacementRequest& request);

// The part a corner is most sensitive to (largest |d ln f / d ln x|), by
// index into network.parts; empty when no part moves it.
std::optional<std::size_t> mostSensitivePart(const Network& network, const Analysis& analysis, int corner);

}  // namespace tauline
