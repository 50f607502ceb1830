#pragma once

#include "Analysis.h"
#include "NodalModel.h"

#include <complex>
#include <vector>

namespace tauline {

// The referee: the response from the network's matrices alone. Poles are the
// natural frequencies of the (G, C) pencil, zeros those of the pencil
// bordered by the input and output; then equal pole-zero pairs cancel.
struct ExactResponse {
    // Before cancellation: the determinants themselves, which the
    // time-constant engine reproduces.
    std::vector<std::complex<double>> rawPoles;
    std::vector<std::complex<double>> rawZeros;
    std::vector<double> rawNumerator;
    std::vector<double> rawDenominator;

    std::vector<std::complex<double>> poles;
    std::vector<std::complex<double>> zeros;
    std::vector<double> numerator;     // ascending; the lowest non-zero one is gainConstant
    std::vector<double> denominator;   // lowest non-zero coefficient 1
    double gainConstant = 0.0;
    int originPower = 0;               // zeros at 0 minus poles at 0, after cancellation
    ResponseLimit dc;
    ResponseLimit hf;

    std::complex<double> evaluate(std::complex<double> s) const;
};

ExactResponse solveExact(const NodalModel& model);

// H(s) by one full nodal solve: slow, exact to rounding; for checks.
std::complex<double> directResponse(const NodalModel& model, std::complex<double> s);

// Relative distance within which a pole and a zero are taken as equal.
inline constexpr double kCancellationTolerance = 1e-9;

// Rate bounds from the part values: no non-zero natural frequency of an RC
// network lies below 1/(ΣR·ΣC); the upper bound is generous.
double lowestRate(const NodalModel& model);
double highestRate(const NodalModel& model);

}  // namespace tauline
