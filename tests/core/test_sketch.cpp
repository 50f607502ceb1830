// The straight-line sketch against the Bode asymptote facts.
#include "Analysis.h"
#include "EngineTestNetworks.h"

#include <catch2/catch.hpp>

using namespace tauline;
using namespace tauline::testing;

TEST_CASE("a single real pole's sketch error", "[sketch]")
{
    // 3.01 dB at the corner and 0.97 dB an octave either side: Erickson &
    // Maksimović, Fundamentals of Power Electronics, 3rd ed., 2020, §8.1.1.
    const double r = 1e3, c = 159e-9;
    const Analysis a = analyze(transfer(ResponseKind::VoltageGain,
                                        {part("R1", r, "in", "out"), part("C1", c, "out", kGroundNode)}, "in", "out"));
    REQUIRE(a.breakpoints.size() == 1);
    const double f0 = a.breakpoints[0].hz;
    CHECK(f0 == Approx(1.0 / (2 * M_PI * r * c)).epsilon(1e-12));
    auto exactDb = [&](double f) { return 20.0 * std::log10(std::abs(a.atHz(f))); };
    CHECK(sketchDb(a, f0) - exactDb(f0) == Approx(3.0103).epsilon(1e-4));
    CHECK(sketchDb(a, f0 / 2) - exactDb(f0 / 2) == Approx(0.9691).epsilon(1e-3));
    CHECK(sketchDb(a, f0 * 2) - exactDb(f0 * 2) == Approx(0.9691).epsilon(1e-3));
    // −20 dB/decade above the corner.
    CHECK(sketchDb(a, 100 * f0) - sketchDb(a, 10 * f0) == Approx(-20.0).epsilon(1e-12));
}

TEST_CASE("the sketch polyline turns at every corner", "[sketch]")
{
    // Lead-lag impedance from the command-line contract's example: R1 in
    // series with R2 ∥ C1. Slopes: 0, −20, then 0 dB/decade.
    const Analysis a = analyze(impedance(
        {part("R1", 4.7e3, "in", "mid"), part("R2", 10e3, "mid", kGroundNode), part("C1", 2.2e-9, "mid", kGroundNode)},
        "in"));
    const auto range = suggestedRangeHz(a);
    CHECK(range.first <= a.breakpoints.front().hz / 10.0);
    CHECK(range.second >= a.breakpoints.back().hz * 10.0);
    const auto line = sketchPolyline(a, range.first, range.second);
    REQUIRE(line.size() == 4);
    CHECK(line.front().db == Approx(20.0 * std::log10(14.7e3)).epsilon(1e-12));
    CHECK(line.back().db == Approx(20.0 * std::log10(4.7e3)).epsilon(1e-9));
}

TEST_CASE("sweep is sorted, unique, and wraps phase into the half-open turn", "[sketch][sweep]")
{
    const Analysis a = analyze(transfer(ResponseKind::VoltageGain,
                                        {part("R1", 1e3, "in", "a"), part("C1", 1e-7, "a", kGroundNode),
                                         part("R2", 1e3, "a", "b"), part("C2", 1e-7, "b", kGroundNode),
                                         part("R3", 1e3, "b", "c"), part("C3", 1e-7, "c", kGroundNode)},
                                        "in", "c"));
    const auto points = sweep(a, {1e5, 10.0, 1e5, 1e3});
    REQUIRE(points.size() == 3);
    CHECK(points[0].hz == 10.0);
    CHECK(points[2].hz == 1e5);
    for (const auto& p : points) {
        CHECK(p.deg > -180.0);
        CHECK(p.deg <= 180.0);
        CHECK(p.db == Approx(20.0 * std::log10(std::abs(p.value))).epsilon(1e-12));
    }
    CHECK(logSpacedHz(1.0, 1e3, 4) == std::vector<double>{1.0, 10.0, 100.0, 1000.0});
}
