#pragma once

#include "Network.h"

#include <complex>
#include <optional>
#include <string>
#include <vector>

namespace tauline {

enum class LimitKind { Finite, Zero, Infinite };

struct ResponseLimit {
    LimitKind kind = LimitKind::Finite;
    double value = 0.0;  // the finite value; 0 for Zero; unused for Infinite
};

// One reactive element's first-order view. Empty optionals are infinite
// (tau, r) or undefined (tauNull, rNull where the null double injection does
// not exist: a transfer response whose dc value is zero or infinite).
struct ElementTimeConstant {
    std::string element;
    std::optional<double> tau;      // s, other reactive parts at zero value, input zeroed
    std::optional<double> r;        // ohms seen then
    std::optional<double> tauNull;  // s, response nulled instead
    std::optional<double> rNull;
};

// A second-order time constant tau_j^i: element j's time constant with
// element i at its infinite-value state (capacitor shorted) and every other
// reactive part at zero value.
struct PairTimeConstant {
    std::string element;   // j
    std::string shorted;   // i
    std::optional<double> tau;
    std::optional<double> r;
};

enum class RootType { Pole, Zero };

struct Breakpoint {
    RootType type = RootType::Pole;
    double hz = 0.0;                   // exact |root| / 2 pi
    double estimateHz = 0.0;           // from coefficient ratios (time constants)
    double estimateError = 0.0;        // (estimate - exact) / exact
    bool poorlySeparated = false;      // |estimateError| > 10 %
    std::optional<double> q;           // complex pair only
    std::complex<double> root;         // the exact root (upper one of a pair)
};

struct SketchVertex {
    double hz = 0.0;
    double db = 0.0;
};

struct Analysis {
    ResponseKind kind = ResponseKind::Impedance;
    std::vector<std::string> warnings;  // e.g. separate pieces left out

    // Exact, after pole-zero cancellation.
    std::vector<std::complex<double>> poles;
    std::vector<std::complex<double>> zeros;
    std::vector<double> numerator;    // ascending powers of s
    std::vector<double> denominator;  // lowest non-zero coefficient is 1
    int order = 0;
    ResponseLimit dc;
    ResponseLimit hf;

    std::vector<ElementTimeConstant> timeConstants;
    std::vector<PairTimeConstant> pairTimeConstants;
    std::vector<Breakpoint> breakpoints;

    // H(s) from the factored exact form: cheap, used by sweeps and plots.
    std::complex<double> evaluate(std::complex<double> s) const;
    std::complex<double> atHz(double hz) const;

    // Lowest non-zero numerator coefficient and the power of s it goes with;
    // the sketch and the factored form start from here.
    double gainConstant = 0.0;
    int originPower = 0;  // zeros at the origin minus poles at the origin
};

// Runs the whole engine on a network. Throws InputError when the response is
// undefined (no path at all, zero at every frequency, a loop of sources) with
// a message naming the part or field.
Analysis analyze(const Network& network);

struct SweepPoint {
    double hz = 0.0;
    std::complex<double> value;
    double db = 0.0;
    double deg = 0.0;  // wrapped to (-180, 180]
};

// Frequencies sorted low to high, duplicates once.
std::vector<SweepPoint> sweep(const Analysis& analysis, std::vector<double> hz);
std::vector<double> logSpacedHz(double fromHz, double toHz, int points);

// The straight-line magnitude sketch, in dB (dB-ohm for impedances).
double sketchDb(const Analysis& analysis, double hz);
// Vertices at the range ends and at every corner inside it.
std::vector<SketchVertex> sketchPolyline(const Analysis& analysis, double fromHz, double toHz);
// The frequency range that covers every corner with a decade to spare.
std::pair<double, double> suggestedRangeHz(const Analysis& analysis);

}  // namespace tauline
