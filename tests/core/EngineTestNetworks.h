// What the engine tests write their networks with: the builders, shared with
// the other tests (tests/support/NetworkBuilding.h), and a closeness test.
#pragma once

#include "NetworkBuilding.h"

#include <algorithm>
#include <cmath>

namespace tauline::testing {

// Relative closeness for coefficients and roots.
inline bool closeRelative(double a, double b, double tol)
{
    return std::abs(a - b) <= tol * std::max(std::abs(a), std::abs(b));
}

}  // namespace tauline::testing
