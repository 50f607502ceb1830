// Exact corner sensitivities (the pencil's eigenvalue derivative) against
// central differences of the re-analysed network, closed forms and the
// scaling identities.
#include "CornerSensitivity.h"
#include "Errors.h"
#include "NetworkBuilding.h"
#include "NetworkTexts.h"
#include "RandomNetwork.h"
#include "SensitivityByPart.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <map>
#include <random>

using tauline::testing::byPart;
using tauline::testing::networkOf;

namespace {

// The nearest other corner, in decades: central differences of step 1e-4
// are only trustworthy for corners well clear of their neighbours.
double clearance(const tauline::Analysis& a, std::size_t c)
{
    double nearest = 1e9;
    for (std::size_t k = 0; k < a.breakpoints.size(); ++k)
        if (k != c)
            nearest = std::min(nearest, std::abs(std::log10(a.breakpoints[k].hz / a.breakpoints[c].hz)));
    return nearest;
}

}  // namespace

TEST_CASE("Exact sensitivities of a single RC pole are -1 for R and for C", "[sensitivity][exact]")
{
    // common practice (no source): f = 1 / (2 pi R C), so d ln f / d ln R =
    // d ln f / d ln C = -1.
    const tauline::Network network = networkOf(tauline::testing::kSingleRcPort);
    const auto s = tauline::cornerSensitivities(network, tauline::analyze(network));
    REQUIRE(s.size() == 1);
    CHECK(s[0].method == tauline::SensitivityMethod::Exact);
    const auto parts = byPart(s[0]);
    CHECK(parts.at("R1") == Approx(-1.0).margin(1e-12));
    CHECK(parts.at("C1") == Approx(-1.0).margin(1e-12));
}

TEST_CASE("Exact sensitivities of an RC low-pass gain's pole are -1, the load's closed form",
          "[sensitivity][exact]")
{
    // common practice (no source): R1 from in to out, R2 and C1 from out to
    // gnd: the pole is at (R1 + R2) / (2 pi R1 R2 C1), so
    // d ln f / d ln R1 = -R2 / (R1 + R2), d ln f / d ln R2 = -R1 / (R1 + R2),
    // d ln f / d ln C1 = -1.
    const tauline::Network network = networkOf(R"({
      "format": "tauline-network", "version": 1,
      "parts": [
        {"name": "R1", "kind": "resistor",  "value": "3k3", "nodes": ["in", "out"]},
        {"name": "R2", "kind": "resistor",  "value": "10k", "nodes": ["out", "gnd"]},
        {"name": "C1", "kind": "capacitor", "value": "47n", "nodes": ["out", "gnd"]}],
      "response": {"kind": "voltage-gain", "input": ["in", "gnd"], "output": ["out", "gnd"]}})");
    const auto s = tauline::cornerSensitivities(network, tauline::analyze(network));
    REQUIRE(s.size() == 1);
    const auto parts = byPart(s[0]);
    CHECK(parts.at("R1") == Approx(-10e3 / 13.3e3).margin(1e-12));
    CHECK(parts.at("R2") == Approx(-3.3e3 / 13.3e3).margin(1e-12));
    CHECK(parts.at("C1") == Approx(-1.0).margin(1e-12));
}

TEST_CASE("Exact sensitivities agree with central differences on random networks", "[sensitivity][exact]")
{
    // The check is the re-analysed network itself: d ln f / d ln x by central
    // differences of step 1e-3 (truncation error O(1e-6)), confirmed by a
    // step of 1e-4. Every corner also obeys the scaling
    // identity (common practice, no source): scaling every R, or every C, by k
    // divides every corner frequency by k, so each set of sensitivities sums
    // to -1, exactly.
    std::mt19937 rng(20261202);
    int networks = 0;
    int compared = 0;
    int noisy = 0;
    for (int trial = 0; trial < 130; ++trial) {
        tauline::testing::RandomNetworkShape shape;
        shape.nodes = 3 + trial % 4;
        shape.resistors = shape.nodes + 1 + trial % 3;
        shape.capacitors = 1 + trial % 4;
        shape.kind = trial % 3 == 0   ? tauline::ResponseKind::Impedance
                     : trial % 3 == 1 ? tauline::ResponseKind::VoltageGain
                                      : tauline::ResponseKind::Transimpedance;
        const tauline::Network network = tauline::testing::randomNetwork(rng, shape);
        tauline::Analysis a;
        try {
            a = tauline::analyze(network);
        } catch (const tauline::InputError&) {
            continue;
        }
        if (a.breakpoints.empty())
            continue;
        ++networks;
        const auto exact = tauline::cornerSensitivities(network, a);
        // Two step sizes: where they disagree the engine's rounding, not the
        // derivative, shows in the differences, and the pair is no reference.
        const auto fd = tauline::finiteDifferenceSensitivities(network, a, 1e-3);
        const auto fdFine = tauline::finiteDifferenceSensitivities(network, a, 1e-4);
        REQUIRE(exact.size() == a.breakpoints.size());
        for (std::size_t c = 0; c < exact.size(); ++c) {
            INFO("trial " << trial << " corner " << c << " at " << a.breakpoints[c].hz << " Hz");
            if (exact[c].method != tauline::SensitivityMethod::Exact)
                continue;
            double sumR = 0.0, sumC = 0.0;
            for (const auto& p : exact[c].parts)
                (p.part[0] == 'R' ? sumR : sumC) += p.value;
            CHECK(sumR == Approx(-1.0).margin(1e-7));
            CHECK(sumC == Approx(-1.0).margin(1e-7));
            if (clearance(a, c) < 0.05)
                continue;
            const auto reference = byPart(fd[c]);
            const auto fine = byPart(fdFine[c]);
            for (const auto& p : exact[c].parts) {
                const auto it = reference.find(p.part);
                const auto other = fine.find(p.part);
                if (it == reference.end() || other == fine.end())
                    continue;
                if (std::abs(it->second - other->second) > 1e-5 + 1e-4 * std::abs(it->second)) {
                    ++noisy;
                    continue;
                }
                INFO("part " << p.part);
                CHECK(p.value == Approx(it->second).margin(2e-5).epsilon(1e-4));
                ++compared;
            }
        }
    }
    CHECK(networks >= 100);
    CHECK(compared >= 500);
    CHECK(noisy * 50 < compared);
}

TEST_CASE("A part in a separate piece moves no corner", "[sensitivity][exact]")
{
    const tauline::Network network = networkOf(R"({
      "format": "tauline-network", "version": 1,
      "parts": [
        {"name": "R1", "kind": "resistor",  "value": "1k",  "nodes": ["p", "gnd"]},
        {"name": "C1", "kind": "capacitor", "value": "1u",  "nodes": ["p", "gnd"]},
        {"name": "R9", "kind": "resistor",  "value": "1k",  "nodes": ["x", "y"]}],
      "response": {"kind": "impedance", "port": ["p", "gnd"]}})");
    const auto s = tauline::cornerSensitivities(network, tauline::analyze(network));
    REQUIRE(s.size() == 1);
    CHECK(byPart(s[0]).at("R9") == 0.0);
}

TEST_CASE("A corner on a double root is marked and differenced", "[sensitivity][exact]")
{
    // common practice (no source): driven from one voltage source, the
    // sections R1-C1 (to the output) and R2-C2 (to nowhere) do not interact.
    // With equal time constants the pole 1/(2 pi R1 C1) is a double root of
    // the network; one copy cancels against the zero the idle section makes,
    // the other is the corner, which moves with R1 and C1 (-1 each) only.
    const tauline::Network network = networkOf(R"({
      "format": "tauline-network", "version": 1,
      "parts": [
        {"name": "R1", "kind": "resistor",  "value": "1k",   "nodes": ["in", "out"]},
        {"name": "C1", "kind": "capacitor", "value": "100n", "nodes": ["out", "gnd"]},
        {"name": "R2", "kind": "resistor",  "value": "2k",   "nodes": ["in", "b"]},
        {"name": "C2", "kind": "capacitor", "value": "50n",  "nodes": ["b", "gnd"]}],
      "response": {"kind": "voltage-gain", "input": ["in", "gnd"], "output": ["out", "gnd"]}})");
    const tauline::Analysis a = tauline::analyze(network);
    REQUIRE(a.breakpoints.size() == 1);
    const auto s = tauline::cornerSensitivities(network, a);
    REQUIRE(s.size() == 1);
    CHECK(s[0].method == tauline::SensitivityMethod::FiniteDifference);
    CHECK_FALSE(s[0].note.empty());
    const auto parts = byPart(s[0]);
    CHECK(parts.at("R1") == Approx(-1.0).margin(1e-6));
    CHECK(parts.at("C1") == Approx(-1.0).margin(1e-6));
    CHECK(parts.at("R2") == Approx(0.0).margin(1e-6));
    CHECK(parts.at("C2") == Approx(0.0).margin(1e-6));
}

TEST_CASE("A complex zero pair moves as the square root of each part", "[sensitivity][exact]")
{
    // A bridged T: R1 (in-m), R2 (m-out), C1 (m-gnd), C2 bridging in-out, the
    // output open. By SymPy (nodal equations solved symbolically, Debian's
    // python3-sympy) the numerator is 1 + s·C2·(R1 + R2) + s²·R1·R2·C1·C2: with
    // C1 = 100 nF, C2 = 1 nF, R1 = R2 = 10 kΩ a complex pair with
    // |s| = 1/sqrt(R1 R2 C1 C2), so d ln f / d ln x = -1/2 for all four.
    const tauline::Network network = networkOf(tauline::testing::kBridgedT);
    const tauline::Analysis a = tauline::analyze(network);
    const auto s = tauline::cornerSensitivities(network, a);
    int pairs = 0;
    for (std::size_t c = 0; c < a.breakpoints.size(); ++c) {
        if (a.breakpoints[c].type != tauline::RootType::Zero || !a.breakpoints[c].q)
            continue;
        ++pairs;
        CHECK(s[c].method == tauline::SensitivityMethod::Exact);
        const auto parts = byPart(s[c]);
        for (const char* part : {"R1", "R2", "C1", "C2"})
            CHECK(parts.at(part) == Approx(-0.5).margin(1e-10));
    }
    CHECK(pairs == 1);
}
