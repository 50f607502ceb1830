// One reactive element: the extra-element theorem's driving-point form
// Z(s) = Z_DC·(1 + s·τ_N)/(1 + s·τ), τ with the port open (test current
// source removed), τ_N with the port shorted.
// Source: R. D. Middlebrook, "Null double injection and the extra element
// theorem", IEEE Trans. Education 32(3), 1989, driving-point impedance form.
#include "Analysis.h"
#include "EngineTestNetworks.h"
#include "ExactResponse.h"
#include "NodalModel.h"
#include "RandomNetwork.h"

#include <catch2/catch.hpp>

using namespace tauline;
using namespace tauline::testing;

TEST_CASE("single-capacitor impedance follows the extra-element form", "[engine][eet]")
{
    std::mt19937 rng(1989);
    for (int trial = 0; trial < 60; ++trial) {
        RandomNetworkShape shape;
        shape.nodes = 2 + trial % 5;
        shape.resistors = shape.nodes + trial % 4;
        shape.capacitors = 1;
        const Network net = randomNetwork(rng, shape);
        const Analysis a = analyze(net);
        REQUIRE(a.timeConstants.size() == 1);
        const auto& tc = a.timeConstants[0];
        REQUIRE(tc.tau);
        REQUIRE(tc.tauNull);
        REQUIRE(a.dc.kind == LimitKind::Finite);
        const double zdc = a.dc.value;

        // The extra-element form, evaluated against one full nodal solve
        // (whose own rounding, with cond(G + jωC) up to ~1e8 on these
        // values, sets the tolerance).
        const NodalModel model = buildNodalModel(net);
        for (double w : {1e1, 1e3, 1e5, 1e7}) {
            const std::complex<double> s(0.0, w);
            const auto eet = zdc * (1.0 + s * *tc.tauNull) / (1.0 + s * *tc.tau);
            const auto direct = directResponse(model, s);
            CHECK(std::abs(eet - direct) <= 1e-8 * std::abs(direct));
        }
        // Pole and zero where the form puts them (a cancelled pair drops both).
        if (!a.poles.empty()) {
            CHECK(closeRelative(a.poles[0].real(), -1.0 / *tc.tau, 1e-10));
            if (*tc.tauNull > 0.0) {
                REQUIRE(a.zeros.size() == 1);
                CHECK(closeRelative(a.zeros[0].real(), -1.0 / *tc.tauNull, 1e-10));
            } else {
                CHECK(a.zeros.empty());  // capacitor across the port: zero at infinity
            }
        }
    }
}

TEST_CASE("series RC port: the open-port time constant is infinite", "[engine][eet]")
{
    // Z = R + 1/(sC): dc infinite, pole at the origin, zero at -1/RC
    // (common practice, no source).
    const Analysis a = analyze(impedance({part("R1", 1e3, "in", "x"), part("C1", 1e-6, "x", kGroundNode)}, "in"));
    CHECK(a.dc.kind == LimitKind::Infinite);
    CHECK(a.hf.kind == LimitKind::Finite);
    CHECK(a.hf.value == Approx(1e3).epsilon(1e-12));
    REQUIRE(a.poles.size() == 1);
    CHECK(a.poles[0] == std::complex<double>(0.0, 0.0));
    REQUIRE(a.zeros.size() == 1);
    CHECK(a.zeros[0].real() == Approx(-1e3).epsilon(1e-12));
    REQUIRE(a.timeConstants.size() == 1);
    CHECK_FALSE(a.timeConstants[0].tau);
    REQUIRE(a.timeConstants[0].tauNull);
    CHECK(*a.timeConstants[0].tauNull == Approx(1e-3).epsilon(1e-12));
    CHECK(a.breakpoints.size() == 1);
}
