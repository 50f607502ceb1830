// When the time-constant estimates fail: two adjacent real poles (or zeros)
// too close for the one-corner-per-coefficient-ratio estimate are read
// together as one quadratic factor 1 + s/(Q·ω0) + (s/ω0)² taken from the
// three coefficients around them, and split by the low-Q approximation
// (Erickson & Maksimović, Fundamentals of Power Electronics, 3rd ed., 2020,
// ch. 8, "The low-Q approximation"): for Q ≪ 0.5 the roots are ≈ Q·ω0 and
// ω0/Q; exactly ω0·Q/F and ω0·F/Q with F = (1 + √(1 − 4Q²))/2.
#pragma once

#include "Analysis.h"

#include <optional>
#include <vector>

namespace tauline {

struct QuadraticCorners {
    double low = 0.0;   // rad/s
    double high = 0.0;
};

// ω0·Q/F and ω0·F/Q: the quadratic's two real roots (magnitudes). Empty for
// Q ≥ 0.5, where they are a complex pair.
std::optional<QuadraticCorners> quadraticRealCorners(double omega0, double q);
// Q·ω0 and ω0/Q: the low-Q approximation.
QuadraticCorners lowQCorners(double omega0, double q);

struct LowQPair {
    RootType type = RootType::Pole;
    int lowBreakpoint = -1;   // indices into Analysis::breakpoints
    int highBreakpoint = -1;
    // From the coefficients a of the pair's polynomial (origin factor
    // removed, a0 = 1), the pair at places k and k+1 (k = 1 for the first
    // two roots): ω0 = √(a_{k−1}/a_{k+1}), Q = √(a_{k−1}·a_{k+1})/a_k.
    int place = 1;
    double omega0 = 0.0;  // rad/s
    double q = 0.0;
    // Exact corners, and the simple estimates a_{k−1}/a_k, a_k/a_{k+1}.
    double exactLowHz = 0.0, exactHighHz = 0.0;
    double estimateLowHz = 0.0, estimateHighHz = 0.0;
    double estimateLowError = 0.0, estimateHighError = 0.0;  // (estimate − exact)/exact
    // The low-Q approximation, and the quadratic's exact roots (empty for
    // Q ≥ 0.5), with their errors against the exact corners.
    double lowQLowHz = 0.0, lowQHighHz = 0.0;
    double lowQLowError = 0.0, lowQHighError = 0.0;
    std::optional<double> quadraticLowHz, quadraticHighHz;
    std::optional<double> quadraticLowError, quadraticHighError;
    // Where the sketch's quadratic corner goes when pairs are drawn as one:
    // √(exact low · exact high), so the sketch above and below the pair is
    // the same line as with two corners.
    double sketchHz = 0.0;

    double omega0Hz() const;
};

// Adjacent real corners of one polynomial, both in the left half-plane,
// paired low to high where either estimate is flagged (more than 10 % off).
// Three or more crowded corners pair greedily from the lowest; one left over
// stays a single flagged corner.
std::vector<LowQPair> lowQPairs(const Analysis& analysis);

}  // namespace tauline
