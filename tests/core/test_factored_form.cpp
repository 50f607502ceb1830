// The factored form: it must be the exact response, and name a corner by a
// time constant only where one capacitor alone sets it.
#include "Analysis.h"
#include "EngineTestNetworks.h"
#include "FactoredForm.h"
#include "RandomNetwork.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <complex>

using namespace tauline;
using namespace tauline::testing;

namespace {

std::complex<double> evaluateForm(const FactoredForm& f, std::complex<double> s)
{
    std::complex<double> h = f.constant * std::pow(s, f.originPower);
    auto factor = [&](const FactoredTerm& t) {
        const double sign = t.rightHalfPlane ? -1.0 : 1.0;
        if (!t.quadratic)
            return 1.0 + sign * s / t.omega;
        const std::complex<double> x = s / t.omega;
        return std::isfinite(t.q) ? 1.0 + sign * x / t.q + x * x : 1.0 + x * x;
    };
    for (const auto& t : f.zeros)
        h *= factor(t);
    for (const auto& t : f.poles)
        h /= factor(t);
    return h;
}

}  // namespace

TEST_CASE("the factored form is the exact response on random networks", "[factored]")
{
    // The engine's exact evaluation is the reference.
    std::mt19937 rng(4242);
    int checked = 0;
    for (int trial = 0; trial < 60; ++trial) {
        RandomNetworkShape shape;
        shape.kind = trial % 2 ? ResponseKind::VoltageGain : ResponseKind::Impedance;
        const Network net = randomNetwork(rng, shape);
        Analysis a;
        try {
            a = analyze(net);
        } catch (...) {
            continue;
        }
        const FactoredForm f = factoredForm(a, timeConstantExpressions(net, a));
        for (double hz : {1.0, 1e3, 1e6}) {
            const std::complex<double> s(0.0, 2.0 * M_PI * hz);
            const auto want = a.evaluate(s);
            CHECK(std::abs(evaluateForm(f, s) - want) <= 1e-9 * std::abs(want));
        }
        ++checked;
    }
    CHECK(checked >= 40);
}

TEST_CASE("a corner set by one capacitor alone is named by its time constant", "[factored]")
{
    SECTION("the only capacitor: lead network, pole 1/(C1·(R1 ∥ R2)), zero 1/(C1·R1)")
    {
        // Single-element form (Middlebrook, "Null double injection and the
        // extra element theorem", IEEE Trans. Education 32(3), 1989): the pole
        // is 1/τd, the zero 1/τn.
        const Network net = transfer(ResponseKind::VoltageGain,
                                     {part("R1", 47e3, "in", "out"), part("C1", 1e-9, "in", "out"),
                                      part("R2", 4.7e3, "out", kGroundNode)},
                                     "in", "out");
        const Analysis a = analyze(net);
        const FactoredForm f = factoredForm(a, timeConstantExpressions(net, a));
        REQUIRE(f.poles.size() == 1);
        REQUIRE(f.zeros.size() == 1);
        CHECK(f.poles[0].expression == "1/(C1 \u00B7 (R1 \u2225 R2))");
        CHECK(f.zeros[0].expression == "1/(C1 \u00B7 R1)");
        CHECK(f.formula() == "H(s) = 0.09091 \u00B7 (1 + s/\u03C9z1) / (1 + s/\u03C9p1)");
        const auto names = cornerExpressions(f, a.breakpoints.size());
        CHECK(names[0] == "1/(C1 \u00B7 R1)");  // the zero is the lower corner
    }
    SECTION("two decoupled sections in series: each pole named")
    {
        // Z = R1 ∥ C1 + R2 ∥ C2: the port current drives each section alone.
        const Network net = impedance({part("R1", 1e3, "in", "m"), part("C1", 1e-6, "in", "m"),
                                       part("R2", 10e3, "m", kGroundNode), part("C2", 1e-9, "m", kGroundNode)},
                                      "in");
        const Analysis a = analyze(net);
        const FactoredForm f = factoredForm(a, timeConstantExpressions(net, a));
        REQUIRE(f.poles.size() == 2);
        CHECK(f.poles[0].expression == "1/(C1 \u00B7 R1)");
        CHECK(f.poles[1].expression == "1/(C2 \u00B7 R2)");
    }
    SECTION("coupled capacitors: no single time constant is a pole")
    {
        const Network net = transfer(ResponseKind::VoltageGain,
                                     {part("R1", 1e3, "in", "a"), part("C1", 1e-7, "a", kGroundNode),
                                      part("R2", 1e3, "a", "out"), part("C2", 1e-7, "out", kGroundNode)},
                                     "in", "out");
        const Analysis a = analyze(net);
        const FactoredForm f = factoredForm(a, timeConstantExpressions(net, a));
        REQUIRE(f.poles.size() == 2);
        CHECK(f.poles[0].expression.empty());
        CHECK(f.poles[1].expression.empty());
    }
    SECTION("a series capacitor: a pole at the origin written 1/(s·C)")
    {
        const Network net = impedance({part("R1", 1e3, "in", "m"), part("C1", 2.2e-9, "m", kGroundNode)}, "in");
        const Analysis a = analyze(net);
        const FactoredForm f = factoredForm(a, timeConstantExpressions(net, a));
        CHECK(f.originPower == -1);
        CHECK(f.formula() == "H(s) = 1/(s\u00B72.2 nF) \u00B7 (1 + s/\u03C9z1)");
    }
}
