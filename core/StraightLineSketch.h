// The straight-line sketch with close pairs drawn as one second-order corner.
// sketchDb / sketchPolyline in Analysis.h keep their meaning: one corner per
// exact breakpoint (what the command line's `breakpoints` list). The
// variants here take the low-Q pairs and draw each as one corner at
// √(f_low·f_high) that turns the slope by ±40 dB/decade at once. Above and
// below the pair the line is the same as with two corners (the product of
// the two corners is kept); between them it runs flat to the geometric mean
// and then falls at 40 dB/decade, which is how the pair's quadratic factor
// 1 + s/(Q·ω0) + (s/ω0)² reads as a Bode asymptote (Erickson & Maksimović,
// Fundamentals of Power Electronics, 3rd ed., ch. 8, the quadratic pole
// response). For poles the exact curve lies 20·log10(1/Q) dB below that
// corner at ω0 — flagged pairs have Q of about 0.3 to 0.5, so 6 to 10 dB —
// which the two-corner line follows better; the one-corner line is the hand
// designer's reading of a pair, so it is an option, off by default.
#pragma once

#include "Analysis.h"
#include "LowQPair.h"

#include <vector>

namespace tauline {

double sketchDb(const Analysis& analysis, const std::vector<LowQPair>& pairsAsOne, double hz);
std::vector<SketchVertex> sketchPolyline(const Analysis& analysis, const std::vector<LowQPair>& pairsAsOne,
                                         double fromHz, double toHz);

}  // namespace tauline
