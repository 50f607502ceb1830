#pragma once

#include "Analysis.h"

#include <complex>
#include <string>
#include <vector>

namespace tauline {

// Corners of the straight-line sketch from the exact roots, low to high.
// Each is estimated from the coefficients of its own polynomial (the
// time-constant sums): the k-th real root by a_{k−1}/a_k, a complex pair
// occupying places k and k+1 by √(a_{k−1}/a_{k+1}). This is exact for well
// separated corners (Gray, Hurst, Lewis & Meyer, Analysis and Design of
// Analog Integrated Circuits, 5th ed., §7.2–7.3) and drifts as corners close
// in, which the error column shows.
std::vector<Breakpoint> breakpointTable(const std::vector<std::complex<double>>& poles,
                                        const std::vector<std::complex<double>>& zeros,
                                        const std::vector<double>& numerator,
                                        const std::vector<double>& denominator);

// A pair's Q as people read it: three significant digits, "∞" for a pair
// on the jω axis (an ideal notch's zeros).
std::string qualityFactorText(double q);

// Estimates flagged as poor past this relative error.
inline constexpr double kPoorEstimate = 0.10;

}  // namespace tauline
