// The degenerate shapes the design note lists, each against a response that
// follows from elementary circuit laws (common practice, no source, unless
// stated).
#include "Analysis.h"
#include "EngineTestNetworks.h"
#include "Errors.h"
#include "ExactResponse.h"
#include "NetworkFile.h"
#include "NodalModel.h"
#include "TimeConstantEngine.h"

#include <catch2/catch.hpp>

#include <string>

using namespace tauline;
using namespace tauline::testing;

TEST_CASE("node without a DC path: infinite time constant and a pole at the origin", "[engine][degenerate]")
{
    // Current into a capacitor to ground with a resistor in series to a node
    // that floats: Z = 1/(sC) at the port.
    const Analysis a = analyze(impedance({part("C1", 1e-6, "in", kGroundNode)}, "in"));
    CHECK(a.dc.kind == LimitKind::Infinite);
    CHECK(a.hf.kind == LimitKind::Zero);
    REQUIRE(a.poles.size() == 1);
    CHECK(a.poles[0] == std::complex<double>(0.0, 0.0));
    CHECK(a.zeros.empty());
    CHECK_FALSE(a.timeConstants[0].tau);
    CHECK_FALSE(a.timeConstants[0].r);
    CHECK(a.breakpoints.empty());
    // |Z| = 1/(ωC): the sketch is the exact line here.
    CHECK(sketchDb(a, 1e3) == Approx(20.0 * std::log10(1.0 / (2 * M_PI * 1e3 * 1e-6))).epsilon(1e-12));
    CHECK(std::abs(a.atHz(1e3)) == Approx(1.0 / (2 * M_PI * 1e3 * 1e-6)).epsilon(1e-12));
}

TEST_CASE("two capacitors in series to ground: a flat capacitive divider", "[engine][degenerate]")
{
    // The middle node has no DC path, yet the pole and zero at the origin
    // cancel: H = C1/(C1 + C2) at every frequency.
    const Analysis a = analyze(transfer(ResponseKind::VoltageGain,
                                        {part("C1", 1e-9, "in", "mid"), part("C2", 3.3e-9, "mid", kGroundNode)},
                                        "in", "mid"));
    CHECK(a.order == 0);
    CHECK(a.poles.empty());
    CHECK(a.zeros.empty());
    REQUIRE(a.dc.kind == LimitKind::Finite);
    CHECK(a.dc.value == Approx(1.0 / 4.3).epsilon(1e-12));
    CHECK(a.hf.value == Approx(1.0 / 4.3).epsilon(1e-12));
    for (const auto& tc : a.timeConstants) {
        CHECK_FALSE(tc.tau);
        CHECK_FALSE(tc.tauNull);
    }
}

TEST_CASE("capacitor loop: a zero time constant and a lower order", "[engine][degenerate]")
{
    // C1, C2, C3 in a triangle over n1, n2 and gnd, each node fed by a
    // resistor: three capacitors, yet only two independent states.
    const Analysis a = analyze(transfer(ResponseKind::VoltageGain,
                                        {part("R1", 1e3, "in", "n1"), part("R2", 2.2e3, "n1", "n2"),
                                         part("R3", 4.7e3, "n2", kGroundNode), part("C1", 1e-8, "n1", kGroundNode),
                                         part("C2", 2.2e-8, "n1", "n2"), part("C3", 4.7e-8, "n2", kGroundNode)},
                                        "in", "n2"));
    CHECK(a.order == 2);
    CHECK(a.poles.size() == 2);
}

TEST_CASE("capacitor loop: shorting two of the loop shorts the third", "[engine][degenerate]")
{
    const Network net = transfer(ResponseKind::VoltageGain,
                                 {part("R1", 1e3, "in", "n1"), part("R2", 2.2e3, "n1", "n2"),
                                  part("R3", 4.7e3, "n2", kGroundNode), part("C1", 1e-8, "n1", kGroundNode),
                                  part("C2", 2.2e-8, "n1", "n2"), part("C3", 4.7e-8, "n2", kGroundNode)},
                                 "in", "n2");
    const NodalModel model = buildNodalModel(net);
    const ExactResponse exact = solveExact(model);
    const TimeConstantEngine engine(model, exact);
    REQUIRE(engine.resistanceSeen(2, {0, 1}));
    CHECK(*engine.resistanceSeen(2, {0, 1}) == Approx(0.0).margin(1e-9));
    // b3 = τ1·τ2^1·τ3^12 = 0: the engine's cubic term vanishes.
    const auto den = engine.denominator();
    REQUIRE(den);
    CHECK(den->size() == 3);
}

TEST_CASE("AC coupling: zero dc gain, null time constants undefined", "[engine][degenerate]")
{
    // High-pass C–R: H = sRC/(1 + sRC).
    const double r = 10e3, c = 100e-9;
    const Analysis a = analyze(transfer(ResponseKind::VoltageGain,
                                        {part("C1", c, "in", "out"), part("R1", r, "out", kGroundNode)}, "in", "out"));
    CHECK(a.dc.kind == LimitKind::Zero);
    CHECK(a.hf.kind == LimitKind::Finite);
    CHECK(a.hf.value == Approx(1.0).epsilon(1e-12));
    REQUIRE(a.zeros.size() == 1);
    CHECK(a.zeros[0] == std::complex<double>(0.0, 0.0));
    REQUIRE(a.numerator.size() == 2);
    CHECK(a.numerator[0] == 0.0);
    CHECK(a.numerator[1] == Approx(r * c).epsilon(1e-12));
    REQUIRE(a.timeConstants.size() == 1);
    CHECK(*a.timeConstants[0].tau == Approx(r * c).epsilon(1e-12));
    CHECK_FALSE(a.timeConstants[0].tauNull);
    // Sloped low-frequency asymptote: +20 dB/decade through |H| = ωRC.
    const double f = 1.0;
    CHECK(sketchDb(a, f) == Approx(20.0 * std::log10(2 * M_PI * f * r * c)).epsilon(1e-12));
    CHECK(sketchDb(a, 1e6) == Approx(0.0).margin(1e-9));
}

TEST_CASE("port between two non-ground nodes", "[engine][degenerate]")
{
    // R1 ∥ C1 between a and b; a and b tied to gnd by R2 and R3: the port
    // sees R1 ∥ (C1) ∥ (R2 + R3).
    const double r1 = 10e3, r2 = 4.7e3, r3 = 2.2e3, c1 = 1e-9;
    const Analysis a = analyze(impedance({part("R1", r1, "a", "b"), part("C1", c1, "a", "b"),
                                          part("R2", r2, "a", kGroundNode), part("R3", r3, "b", kGroundNode)},
                                         "a", "b"));
    const double rp = 1.0 / (1.0 / r1 + 1.0 / (r2 + r3));
    REQUIRE(a.dc.kind == LimitKind::Finite);
    CHECK(a.dc.value == Approx(rp).epsilon(1e-12));
    REQUIRE(a.poles.size() == 1);
    CHECK(a.poles[0].real() == Approx(-1.0 / (rp * c1)).epsilon(1e-12));
    CHECK(a.hf.kind == LimitKind::Zero);
    CHECK(*a.timeConstants[0].tauNull == Approx(0.0).margin(1e-20));
}

TEST_CASE("a part that carries no signal leaves no trace", "[engine][degenerate]")
{
    // An R–C branch straight across the ideal input source changes nothing
    // the output sees: its pole cancels. The result is the plain R–C low-pass.
    const double r = 1e3, c = 1e-6;
    const Analysis a = analyze(transfer(ResponseKind::VoltageGain,
                                        {part("R1", r, "in", "out"), part("C1", c, "out", kGroundNode),
                                         part("R9", 470.0, "in", "x"), part("C9", 47e-9, "x", kGroundNode)},
                                        "in", "out"));
    CHECK(a.order == 1);
    REQUIRE(a.poles.size() == 1);
    CHECK(a.poles[0].real() == Approx(-1.0 / (r * c)).epsilon(1e-12));
    CHECK(a.zeros.empty());
    CHECK(a.timeConstants.size() == 2);  // C9 is listed: it is in the response's piece
}

TEST_CASE("a separate piece is left out with a warning", "[engine][degenerate]")
{
    const Analysis a = analyze(impedance({part("R1", 1e3, "in", kGroundNode), part("C1", 1e-6, "in", kGroundNode),
                                          part("R7", 1e3, "p", "q"), part("C7", 1e-6, "q", "p")},
                                         "in"));
    REQUIRE(a.warnings.size() == 1);
    CHECK(a.warnings[0].find("R7") != std::string::npos);
    CHECK(a.timeConstants.size() == 1);
}

TEST_CASE("undefined responses are errors that say why", "[engine][degenerate]")
{
    // Output in a piece the input cannot reach.
    CHECK_THROWS_AS(analyze(transfer(ResponseKind::VoltageGain,
                                     {part("R1", 1e3, "in", kGroundNode), part("R2", 1e3, "out", "x")}, "in", "out")),
                    InputError);
    // A balanced bridge at every frequency: the output never moves.
    try {
        Network net = transfer(ResponseKind::VoltageGain,
                               {part("R1", 1e3, "in", "a"), part("C1", 1e-9, "a", kGroundNode),
                                part("R2", 1e3, "in", "b"), part("C2", 1e-9, "b", kGroundNode)},
                               "in", "a");
        net.response.output = {"a", "b"};
        analyze(net);
        FAIL("a balanced bridge should have been rejected");
    } catch (const InputError& e) {
        CHECK(std::string(e.what()).find("zero at every frequency") != std::string::npos);
    }
}

TEST_CASE("a port the nulling nearly shorts keeps its null resistance's digits", "[engine][degenerate]")
{
    // A transimpedance whose null state drives n2 and n7 to megavolts per
    // ampere while C1 (n2–n7) sees 3.3e-5 Ω: the voltages cancel to 1e-11.
    // Check value: the exact rational 4792783937/144786246622520 Ω from
    // SymPy's exact nodal solve of this network (tests/reference/
    // sympy_network.py, _port_view 'nulled'; Meurer et al., SymPy, PeerJ
    // Computer Science 3:e103, 2017). The network is generated (reference
    // seed 61594), not a design.
    // The same file the SymPy reference reads (test_wide_values.py).
    const Network net =
        readNetworkFile(std::string(TAULINE_WIDE_NETWORKS_DIR) + "/wide-61594-plain-transimpedance.tauline").network;
    const NodalModel model = buildNodalModel(net);
    const TimeConstantEngine engine(model, solveExact(model));
    const double exact = 4792783937.0 / 144786246622520.0;
    for (const auto& tc : engine.firstOrder()) {
        if (tc.element != "C1" && tc.element != "C6" && tc.element != "C10")
            continue;
        INFO(tc.element);
        REQUIRE(tc.rNull);
        // 3e-8 off while the port voltage was a difference of node voltages
        // summed from the long-double matrix.
        CHECK(closeRelative(*tc.rNull, exact, 1e-12));
    }
}

TEST_CASE("ports the nulling shorts have a null resistance of exactly zero", "[engine][degenerate]")
{
    // A three-section low-pass into a resistive load: with the output held
    // at 0 V (null double injection) no current flows in the load, so the
    // series resistors carry none and every node ahead of the output sits
    // at 0 V — the shunt capacitors see exactly 0 Ω (Middlebrook, "Null
    // double injection and the extra element theorem", IEEE Trans.
    // Education 32(3), 1989; the conclusion from circuit laws, common
    // practice). Rounding of the refined node voltages must not leave
    // 1e-90 Ω there.
    const Analysis a = analyze(transfer(ResponseKind::VoltageGain,
                                        {part("R1", 2.2e3, "in", "a"), part("C1", 220e-9, "a", kGroundNode),
                                         part("R2", 47e3, "a", "b"), part("C2", 1e-9, "b", kGroundNode),
                                         part("R3", 100e3, "b", "out"), part("C3", 47e-12, "b", "out"),
                                         part("R4", 100e3, "out", kGroundNode)},
                                        "in", "out"));
    REQUIRE(a.timeConstants.size() == 3);
    for (int i : {0, 1}) {
        INFO(a.timeConstants[i].element);
        REQUIRE(a.timeConstants[i].rNull);
        CHECK(*a.timeConstants[i].rNull == 0.0);
        CHECK(*a.timeConstants[i].tauNull == 0.0);
    }
    // C3 bridges R3 with the output held: it sees R3 alone.
    REQUIRE(a.timeConstants[2].rNull);
    CHECK(*a.timeConstants[2].rNull == Approx(100e3).epsilon(1e-12));
}
