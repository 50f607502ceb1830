// Which parts set a corner: normalised sensitivities d ln f / d ln x by
// central differences, checked against closed forms and scaling laws.
#include "CornerSensitivity.h"
#include "NetworkBuilding.h"
#include "NetworkTexts.h"
#include "SensitivityByPart.h"

#include <catch2/catch.hpp>

using tauline::testing::byPart;
using tauline::testing::networkOf;

TEST_CASE("A single RC pole depends on R and C with sensitivity -1 each", "[sensitivity]")
{
    // from memory: f = 1 / (2 pi R C), so d ln f / d ln R = d ln f / d ln C = -1.
    const tauline::Network network = networkOf(tauline::testing::kSingleRcPort);
    const tauline::Analysis a = tauline::analyze(network);
    const auto s = tauline::cornerSensitivities(network, a);
    REQUIRE(s.size() == 1);
    const auto parts = byPart(s[0]);
    CHECK(parts.at("R1") == Approx(-1.0).margin(1e-6));
    CHECK(parts.at("C1") == Approx(-1.0).margin(1e-6));
    CHECK(tauline::dominantParts(s[0]).size() == 2);
}

TEST_CASE("A series resistor sets an RC zero but not the pole at the origin", "[sensitivity]")
{
    // from memory: Z = R + 1/(sC) has its zero at 1/(2 pi R C) and a pole at
    // the origin, which gives no corner.
    const tauline::Network network = networkOf(R"({
      "format": "tauline-network", "version": 1,
      "parts": [
        {"name": "R1", "kind": "resistor",  "value": "1k",   "nodes": ["p", "a"]},
        {"name": "C1", "kind": "capacitor", "value": "100n", "nodes": ["a", "gnd"]}],
      "response": {"kind": "impedance", "port": ["p", "gnd"]}})");
    const tauline::Analysis a = tauline::analyze(network);
    REQUIRE(a.breakpoints.size() == 1);
    REQUIRE(a.breakpoints[0].type == tauline::RootType::Zero);
    const auto parts = byPart(tauline::cornerSensitivities(network, a)[0]);
    CHECK(parts.at("R1") == Approx(-1.0).margin(1e-6));
    CHECK(parts.at("C1") == Approx(-1.0).margin(1e-6));
}

TEST_CASE("Sensitivities of every corner sum to -1 over the resistors and over the capacitors",
          "[sensitivity]")
{
    // from memory (impedance and frequency scaling): multiplying every
    // resistance by k, or every capacitance by k, divides every pole and zero
    // frequency of an RC network by k, so each sum of d ln f / d ln x is -1.
    const tauline::Network network =
        tauline::readNetworkFile(TAULINE_SAMPLES_DIR "/strain-gauge-input-filter.tauline").network;
    const tauline::Analysis a = tauline::analyze(network);
    REQUIRE(a.breakpoints.size() >= 3);
    const auto s = tauline::cornerSensitivities(network, a);
    REQUIRE(s.size() == a.breakpoints.size());
    for (const auto& corner : s) {
        double resistors = 0.0;
        double capacitors = 0.0;
        for (const auto& p : corner.parts)
            (p.part[0] == 'R' ? resistors : capacitors) += p.value;
        CHECK(resistors == Approx(-1.0).margin(1e-5));
        CHECK(capacitors == Approx(-1.0).margin(1e-5));
        // Sorted by size, largest first.
        for (std::size_t i = 1; i < corner.parts.size(); ++i)
            CHECK(std::abs(corner.parts[i - 1].value) >= std::abs(corner.parts[i].value));
    }
}

TEST_CASE("Asking to stop ends the work early", "[sensitivity]")
{
    const tauline::Network network =
        tauline::readNetworkFile(TAULINE_SAMPLES_DIR "/strain-gauge-input-filter.tauline").network;
    const tauline::Analysis a = tauline::analyze(network);
    int asked = 0;
    const auto s = tauline::cornerSensitivities(network, a, 1e-4, [&] { return ++asked <= 2; });
    CHECK(asked == 3);
    for (const auto& corner : s)
        CHECK(corner.parts.size() <= 2);
}
