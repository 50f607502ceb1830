// Placing a corner: the solved part value re-analysed must give the target;
// targets the corner cannot reach must say why.
#include "CornerPlacement.h"
#include "Errors.h"
#include "NetworkBuilding.h"
#include "NetworkTexts.h"
#include "RandomNetwork.h"
#include "StandardSeries.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>
#include <random>

using tauline::testing::networkOf;
using tauline::testing::withValue;

namespace {

// An RC low-pass divider: R1 from in to out, R2 and C1 from out to gnd.
constexpr const char* kDivider = R"({
  "format": "tauline-network", "version": 1,
  "parts": [
    {"name": "R1", "kind": "resistor",  "value": "10k", "nodes": ["in", "out"]},
    {"name": "R2", "kind": "resistor",  "value": "10k", "nodes": ["out", "gnd"]},
    {"name": "C1", "kind": "capacitor", "value": "10n", "nodes": ["out", "gnd"]}],
  "response": {"kind": "voltage-gain", "input": ["in", "gnd"], "output": ["out", "gnd"]}})";

std::string messageOf(const std::function<void()>& f)
{
    try {
        f();
    } catch (const tauline::InputError& e) {
        return e.what();
    }
    return {};
}

}  // namespace

TEST_CASE("Placing a single RC pole gives R = 1 / (2 pi f C)", "[placement]")
{
    // common practice (no source): f = 1 / (2 pi R C).
    const tauline::Network network = networkOf(tauline::testing::kSingleRcPort);
    tauline::PlacementRequest request;
    request.corner = 0;
    request.targetHz = 1000.0;
    request.part = "R1";
    const auto placed = tauline::placeCorner(network, request);
    CHECK(placed.part == "R1");
    CHECK(placed.value == Approx(1.0 / (2.0 * std::numbers::pi * 1000.0 * 2.2e-9)).epsilon(1e-11));
    CHECK(placed.hz == Approx(1000.0).epsilon(1e-12));
    CHECK(placed.sensitivity == Approx(-1.0).margin(1e-12));
    // 72.34 kΩ lies between the E24 values 68 k and 75 k (IEC 60063:2015
    // table); the pole lands at 1 / (2 pi R C) with each.
    REQUIRE(placed.nearest.size() == 2);
    CHECK(placed.nearest[0].value == Approx(68e3).epsilon(1e-12));
    CHECK(placed.nearest[1].value == Approx(75e3).epsilon(1e-12));
    for (const auto& v : placed.nearest) {
        REQUIRE(v.hz);
        CHECK(*v.hz == Approx(1.0 / (2.0 * std::numbers::pi * v.value * 2.2e-9)).epsilon(1e-10));
    }

    request.part = "C1";
    request.series = tauline::ValueSeries::E12;
    const auto byC = tauline::placeCorner(network, request);
    CHECK(byC.value == Approx(1.0 / (2.0 * std::numbers::pi * 1000.0 * 10e3)).epsilon(1e-11));
}

TEST_CASE("The placed value, re-analysed, puts the corner on the target on random networks", "[placement]")
{
    std::mt19937 rng(4242);
    int placed = 0;
    int refused = 0;
    for (int trial = 0; trial < 60; ++trial) {
        tauline::testing::RandomNetworkShape shape;
        shape.nodes = 3 + trial % 3;
        shape.resistors = shape.nodes + 2;
        shape.capacitors = 1 + trial % 3;
        shape.kind = trial % 2 ? tauline::ResponseKind::VoltageGain : tauline::ResponseKind::Impedance;
        const tauline::Network network = tauline::testing::randomNetwork(rng, shape);
        tauline::Analysis a;
        try {
            a = tauline::analyze(network);
        } catch (const tauline::InputError&) {
            continue;
        }
        for (std::size_t c = 0; c < a.breakpoints.size(); ++c) {
            tauline::PlacementRequest request;
            request.corner = static_cast<int>(c);
            // Alternately up and down by a factor that keeps most corners
            // within reach of their most sensitive part.
            request.targetHz = a.breakpoints[c].hz * ((trial + c) % 2 ? 1.25 : 0.8);
            tauline::CornerPlacement result;
            try {
                result = tauline::placeCorner(network, request);
            } catch (const tauline::InputError& e) {
                ++refused;
                CHECK(std::string(e.what()).find("cannot move corner") != std::string::npos);
                continue;
            }
            INFO("trial " << trial << " corner " << c << " part " << result.part);
            const auto again = tauline::analyze(withValue(network, result.part, result.value));
            REQUIRE(result.landingCorner >= 0);
            REQUIRE(result.landingCorner < static_cast<int>(again.breakpoints.size()));
            const auto& landed = again.breakpoints[result.landingCorner];
            CHECK(landed.type == a.breakpoints[c].type);
            CHECK(std::abs(landed.hz / request.targetHz - 1.0) < 1e-9);
            // The series neighbours straddle the exact value.
            REQUIRE(!result.nearest.empty());
            CHECK(result.nearest.front().value <= result.value * (1 + 1e-9));
            CHECK(result.nearest.back().value >= result.value * (1 - 1e-9));
            ++placed;
        }
    }
    CHECK(placed >= 100);
    CHECK(refused < placed / 4);
}

TEST_CASE("A corner that saturates says where its limit is", "[placement]")
{
    // common practice (no source): the divider's pole is at
    // (R1 + R2) / (2 pi R1 R2 C1) = 3.183 kHz; as R1 grows it falls towards
    // 1 / (2 pi R2 C1) = 1.592 kHz and no further.
    const tauline::Network network = networkOf(kDivider);
    tauline::PlacementRequest request;
    request.corner = 0;
    request.targetHz = 1000.0;
    request.part = "R1";
    const std::string message = messageOf([&] { tauline::placeCorner(network, request); });
    INFO(message);
    CHECK(message.find("cannot move corner 1") != std::string::npos);
    CHECK(message.find("limit") != std::string::npos);
    CHECK(message.find("1.592 kHz") != std::string::npos);
    CHECK(message.find("R1 → ∞") != std::string::npos);

    // Upwards there is no limit: R1 = R2 / (2 pi f R2 C1 − 1).
    request.targetHz = 5000.0;
    const auto placed = tauline::placeCorner(network, request);
    const double expected = 10e3 / (2.0 * std::numbers::pi * 5000.0 * 10e3 * 10e-9 - 1.0);
    CHECK(placed.value == Approx(expected).epsilon(1e-10));
}

TEST_CASE("Bad requests are refused with a message naming the problem", "[placement]")
{
    const tauline::Network network = networkOf(R"({
      "format": "tauline-network", "version": 1,
      "parts": [
        {"name": "R1", "kind": "resistor",  "value": "10k", "nodes": ["p", "gnd"]},
        {"name": "C1", "kind": "capacitor", "value": "2n2", "nodes": ["p", "gnd"]},
        {"name": "R9", "kind": "resistor",  "value": "1k",  "nodes": ["x", "y"]}],
      "response": {"kind": "impedance", "port": ["p", "gnd"]}})");
    tauline::PlacementRequest request;
    request.targetHz = 1000.0;
    request.corner = 3;
    CHECK(messageOf([&] { tauline::placeCorner(network, request); }).find("no corner 4") != std::string::npos);
    request.corner = 0;
    request.part = "R7";
    CHECK(messageOf([&] { tauline::placeCorner(network, request); }).find("no part named R7") != std::string::npos);
    request.part = "R9";
    CHECK(messageOf([&] { tauline::placeCorner(network, request); }).find("does not move") != std::string::npos);
}

TEST_CASE("A corner cannot pass the corner its limit lies on", "[placement]")
{
    // common practice (no source): Z = (R1 + R2 + s R1 R2 C1) / (1 + s R2 C1)
    // has its zero at (R1 + R2) / (2 pi R1 R2 C1), which falls towards the
    // pole 1 / (2 pi R2 C1) = 7.234 kHz as R1 grows and never passes it (an
    // RC impedance's poles and zeros alternate; from memory).
    const tauline::Network network = networkOf(tauline::testing::kDividerImpedance);
    tauline::PlacementRequest request;
    request.corner = 1;
    request.targetHz = 5000.0;
    request.part = "R1";
    const std::string message = messageOf([&] { tauline::placeCorner(network, request); });
    INFO(message);
    CHECK(message.find("cannot move corner 2 (zero at 22.63 kHz)") != std::string::npos);
    CHECK(message.find("7.234 kHz") != std::string::npos);
    CHECK(message.find("pole") != std::string::npos);
    CHECK(message.find("cannot pass") != std::string::npos);
}

TEST_CASE("A complex pair that would have to split says so", "[placement]")
{
    // The bridged T of test_root_sensitivity.cpp: zeros 1 + s·C2·(R1 + R2) +
    // s²·R1·R2·C1·C2 (SymPy, from the nodal equations), a complex pair while
    // (R1 + R2)²·C2² < 4·R1·R2·C1·C2, i.e. C1 > 1 nF here; at C1 = 1 nF it
    // splits, at |s| = 1/sqrt(R1 R2 C1 C2), 15.92 kHz. Above that it is no
    // longer one corner. Below, f = 1/(2 pi sqrt(R1 R2 C1 C2)) gives C1.
    const tauline::Network network = networkOf(tauline::testing::kBridgedT);
    const tauline::Analysis a = tauline::analyze(network);
    REQUIRE(a.breakpoints.size() == 3);
    REQUIRE(a.breakpoints[1].q);
    tauline::PlacementRequest request;
    request.corner = 1;
    request.part = "C1";
    request.targetHz = 10e3;
    const auto placed = tauline::placeCorner(network, request);
    const double w = 2.0 * std::numbers::pi * 10e3;
    CHECK(placed.value == Approx(1.0 / (w * w * 10e3 * 10e3 * 1e-9)).epsilon(1e-10));

    request.targetHz = 20e3;
    const std::string message = messageOf([&] { tauline::placeCorner(network, request); });
    INFO(message);
    CHECK(message.find("splits") != std::string::npos);
    CHECK(message.find("15.9") != std::string::npos);
}
