// Close corners read as one quadratic, the low-Q approximation, and the
// sketch that draws such a pair as one second-order corner.
#include "Analysis.h"
#include "EngineTestNetworks.h"
#include "LowQPair.h"
#include "StraightLineSketch.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>

using namespace tauline;
using namespace tauline::testing;

namespace {

// Two equal RC sections, loaded by nothing: D(s) = 1 + 3·sRC + (sRC)², so
// ω0 = 1/RC and Q = 1/3 (expanding the two-section ladder's determinant by
// hand; common practice, no source).
Analysis twoSections(double r, double c)
{
    return analyze(transfer(ResponseKind::VoltageGain,
                            {part("R1", r, "in", "a"), part("C1", c, "a", kGroundNode), part("R2", r, "a", "out"),
                             part("C2", c, "out", kGroundNode)},
                            "in", "out"));
}

}  // namespace

TEST_CASE("the low-Q split of a quadratic follows the published formula", "[lowq]")
{
    // Erickson & Maksimović, Fundamentals of Power Electronics, 3rd ed.,
    // 2020, ch. 8, "The low-Q approximation": roots ω0·Q/F and ω0·F/Q with
    // F = (1 + √(1 − 4Q²))/2, ≈ Q·ω0 and ω0/Q for Q ≪ 0.5.
    for (double q : {0.05, 0.1, 0.2, 1.0 / 3.0, 0.45, 0.5}) {
        const double w0 = 2.0e4;
        const auto roots = quadraticRealCorners(w0, q);
        REQUIRE(roots);
        const double f = 0.5 * (1.0 + std::sqrt(1.0 - 4.0 * q * q));
        CHECK(roots->low == Approx(w0 * q / f).epsilon(1e-14));
        CHECK(roots->high == Approx(w0 * f / q).epsilon(1e-14));
        // They are the roots: 1 − ω/(Q·ω0) + (ω/ω0)² = 0 at s = −ω.
        for (double w : {roots->low, roots->high})
            CHECK(1.0 - w / (q * w0) + (w / w0) * (w / w0) == Approx(0.0).margin(1e-12));
        const auto approx = lowQCorners(w0, q);
        CHECK(approx.low == Approx(q * w0).epsilon(1e-15));
        CHECK(approx.high == Approx(w0 / q).epsilon(1e-15));
    }
    // Q ≥ 0.5 has no real split: a complex pair.
    CHECK_FALSE(quadraticRealCorners(1.0, 0.51));
    // The approximation's error is F − 1 at the low root: under 1 % for Q ≤ 0.1.
    const auto exact = *quadraticRealCorners(1.0, 0.1);
    CHECK(std::abs(lowQCorners(1.0, 0.1).low / exact.low - 1.0) < 0.011);
}

TEST_CASE("two equal RC sections: a flagged pair read as ω0 = 1/RC, Q = 1/3", "[lowq]")
{
    const double r = 1e3, c = 100e-9, rc = r * c;
    const Analysis a = twoSections(r, c);
    REQUIRE(a.breakpoints.size() == 2);
    CHECK(a.breakpoints[0].poorlySeparated);
    const auto pairs = lowQPairs(a);
    REQUIRE(pairs.size() == 1);
    const LowQPair& p = pairs[0];
    CHECK(p.type == RootType::Pole);
    CHECK(p.lowBreakpoint == 0);
    CHECK(p.highBreakpoint == 1);
    CHECK(p.omega0 == Approx(1.0 / rc).epsilon(1e-9));
    CHECK(p.q == Approx(1.0 / 3.0).epsilon(1e-9));
    // Exact roots (3 ∓ √5)/(2RC), the quadratic formula (common practice).
    const double twoPi = 2.0 * std::numbers::pi;
    CHECK(p.exactLowHz == Approx((3.0 - std::sqrt(5.0)) / 2.0 / rc / twoPi).epsilon(1e-9));
    CHECK(p.exactHighHz == Approx((3.0 + std::sqrt(5.0)) / 2.0 / rc / twoPi).epsilon(1e-9));
    // The simple estimates are off by more than 10 %; the quadratic's own
    // roots are exact here (the denominator is that quadratic).
    CHECK(std::abs(p.estimateLowError) > 0.10);
    REQUIRE(p.quadraticLowError);
    CHECK(std::abs(*p.quadraticLowError) < 1e-9);
    CHECK(std::abs(*p.quadraticHighError) < 1e-9);
    // The low-Q approximation at Q = 1/3 is F − 1 off at the low root.
    const double f = 0.5 * (1.0 + std::sqrt(1.0 - 4.0 / 9.0));
    CHECK(p.lowQLowError == Approx(f - 1.0).epsilon(1e-9));
    CHECK(p.lowQHighError == Approx(1.0 / f - 1.0).epsilon(1e-9));
    CHECK(p.sketchHz == Approx(1.0 / rc / twoPi).epsilon(1e-9));
}

TEST_CASE("a close pair among other corners: the quadratic lands closer than the simple estimates", "[lowq]")
{
    // A third section far above: the pair's quadratic is only approximate
    // now, but it must beat the one-ratio estimate it replaces.
    const Analysis a = analyze(transfer(ResponseKind::VoltageGain,
                                        {part("R1", 1e3, "in", "a"), part("C1", 100e-9, "a", kGroundNode),
                                         part("R2", 1e3, "a", "b"), part("C2", 100e-9, "b", kGroundNode),
                                         part("R3", 10e3, "b", "out"), part("C3", 10e-12, "out", kGroundNode)},
                                        "in", "out"));
    const auto pairs = lowQPairs(a);
    REQUIRE(pairs.size() == 1);
    const LowQPair& p = pairs[0];
    REQUIRE(p.quadraticLowError);
    CHECK(std::abs(*p.quadraticLowError) < std::abs(p.estimateLowError));
    CHECK(std::abs(*p.quadraticHighError) < std::abs(p.estimateHighError));
    CHECK(std::abs(*p.quadraticLowError) < 0.01);
}

TEST_CASE("well separated corners make no pair", "[lowq]")
{
    const Analysis a = analyze(transfer(ResponseKind::VoltageGain,
                                        {part("R1", 1e3, "in", "a"), part("C1", 1e-6, "a", kGroundNode),
                                         part("R2", 100e3, "a", "out"), part("C2", 10e-12, "out", kGroundNode)},
                                        "in", "out"));
    CHECK(lowQPairs(a).empty());
}

TEST_CASE("a pair drawn as one corner keeps the line outside the pair", "[lowq][sketch]")
{
    const double r = 1e3, c = 100e-9;
    const Analysis a = twoSections(r, c);
    const auto pairs = lowQPairs(a);
    REQUIRE(pairs.size() == 1);
    const double f1 = pairs[0].exactLowHz, f2 = pairs[0].exactHighHz, f0 = pairs[0].sketchHz;
    for (double f : {f1 / 10.0, f1, f2, 3.0 * f2, 100.0 * f2})
        CHECK(sketchDb(a, pairs, f) == Approx(sketchDb(a, f)).margin(1e-9));
    // Flat up to ω0, then −40 dB/decade at once (a second-order corner).
    CHECK(sketchDb(a, pairs, f0) == Approx(0.0).margin(1e-9));
    CHECK(sketchDb(a, pairs, 10.0 * f0) == Approx(-40.0).margin(1e-9));
    // The default sketch is unchanged: one vertex per exact corner.
    CHECK(sketchPolyline(a, 1.0, 1e6).size() == 4);
    CHECK(sketchPolyline(a, pairs, 1.0, 1e6).size() == 3);
}
