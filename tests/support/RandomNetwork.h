// Seeded random RC networks for the engine's property tests and benchmarks.
// Values are drawn log-uniformly; these are inputs only — every check value
// comes from an outside reference or a published identity.
#pragma once

#include "Network.h"

#include <random>

namespace tauline::testing {

struct RandomNetworkShape {
    int nodes = 5;          // excluding gnd
    int resistors = 8;
    int capacitors = 3;
    double minR = 10.0, maxR = 1e6;
    double minC = 1e-11, maxC = 1e-5;
    ResponseKind kind = ResponseKind::Impedance;
};

// A connected network: a random resistive spanning tree over gnd and the
// nodes (so every node has a DC path, and a path from n1), then the remaining resistors and the
// capacitors between random distinct nodes. The response uses node n1 as the
// input and the last node as the output.
Network randomNetwork(std::mt19937& rng, const RandomNetworkShape& shape);

}  // namespace tauline::testing
