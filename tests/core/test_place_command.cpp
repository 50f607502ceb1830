// `tauline place` as scripts meet it: exit status, messages, the JSON fields
// and the numbers in them.
#include "CommandLineRun.h"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <cmath>
#include <numbers>
#include <string>
#include <vector>

using Run = tauline::testing::CommandLineRun;
using tauline::testing::contains;
using tauline::testing::runTauline;

namespace {

// R1 = 4.7 kΩ in series with R2 = 10 kΩ ∥ C1 = 2.2 nF, the impedance at in.
// Common practice (no source): Z = (R1 + R2 + s R1 R2 C1) / (1 + s R2 C1),
// a pole at 1 / (2 pi R2 C1) = 7.234 kHz (corner 1) and a zero at
// (R1 + R2) / (2 pi R1 R2 C1) = 22.63 kHz (corner 2).
const std::string kDivider = std::string(TAULINE_TEST_DATA_DIR) + "/divider-impedance.tauline";
constexpr double R2 = 10e3, C1 = 2.2e-9;

}  // namespace

TEST_CASE("place moves the pole to the target and prints the exact and series values", "[cli][place]")
{
    const Run r = runTauline({"place", kDivider, "--corner", "1", "--to", "5k", "--vary", "R2", "--json"});
    INFO(r.err);
    REQUIRE(r.status == 0);
    const auto j = nlohmann::json::parse(r.out);
    CHECK(j["corner"] == 1);
    CHECK(j["type"] == "pole");
    CHECK(j["part"] == "R2");
    CHECK(j["series"] == "E24");
    const double expected = 1.0 / (2.0 * std::numbers::pi * 5000.0 * C1);  // R2 for a 5 kHz pole
    CHECK(j["value"].get<double>() == Approx(expected).epsilon(1e-10));
    CHECK(j["placed_hz"].get<double>() == Approx(5000.0).epsilon(1e-12));
    // 14.47 kΩ lies between the E24 values 13 k and 15 k (IEC 60063:2015).
    REQUIRE(j["nearest"].size() == 2);
    CHECK(j["nearest"][0]["value"].get<double>() == Approx(13e3).epsilon(1e-12));
    CHECK(j["nearest"][1]["value"].get<double>() == Approx(15e3).epsilon(1e-12));
    CHECK(j["nearest"][1]["hz"].get<double>() == Approx(1.0 / (2.0 * std::numbers::pi * 15e3 * C1)).epsilon(1e-10));

    const Run text = runTauline({"place", kDivider, "--corner", "1", "--to", "5k", "--vary", "R2", "--series", "E12"});
    REQUIRE(text.status == 0);
    CHECK(contains(text.out, "exact"));
    CHECK(contains(text.out, "E12"));
    CHECK(contains(text.out, "12 k"));
    CHECK(contains(text.out, "15 k"));
}

TEST_CASE("place picks the most sensitive part by default", "[cli][place]")
{
    // The pole 1 / (2 pi R2 C1) depends on R2 and C1 alone (-1 each): the
    // first of them is varied.
    const Run r = runTauline({"place", kDivider, "--corner", "1", "--to", "10k", "--json"});
    REQUIRE(r.status == 0);
    const auto j = nlohmann::json::parse(r.out);
    CHECK((j["part"] == "R2" || j["part"] == "C1"));
    CHECK(j["sensitivity"].get<double>() == Approx(-1.0).margin(1e-9));
}

TEST_CASE("an unreachable target exits with 1 and names the limit", "[cli][place]")
{
    // The zero (R1 + R2) / (2 pi R1 R2 C1) falls towards 1 / (2 pi R2 C1) =
    // 7.234 kHz as R1 grows, and never below.
    const Run r = runTauline({"place", kDivider, "--corner", "2", "--to", "5k", "--vary", "R1"});
    CHECK(r.status == 1);
    CHECK(r.out.empty());
    CHECK(contains(r.err, kDivider + ": cannot move corner 2"));
    CHECK(contains(r.err, "7.234 kHz"));

    const Run ok = runTauline({"place", kDivider, "--corner", "2", "--to", "10k", "--vary", "R1", "--json"});
    REQUIRE(ok.status == 0);
    const double expected = R2 / (2.0 * std::numbers::pi * 10e3 * R2 * C1 - 1.0);
    CHECK(nlohmann::json::parse(ok.out)["value"].get<double>() == Approx(expected).epsilon(1e-10));
}

TEST_CASE("place: bad usage exits with 2, a bad file with 1", "[cli][place]")
{
    for (const auto& args : std::vector<std::vector<std::string>>{
             {"place", kDivider, "--to", "5k"},
             {"place", kDivider, "--corner", "1"},
             {"place", kDivider, "--corner", "0", "--to", "5k"},
             {"place", kDivider, "--corner", "x", "--to", "5k"},
             {"place", kDivider, "--corner", "3", "--to", "5k"},
             {"place", kDivider, "--corner", "1", "--to", "-5"},
             {"place", kDivider, "--corner", "1", "--to", "5k", "--series", "E7"},
             {"place", kDivider, "--corner", "1", "--to", "5k", "--vary", "R7"},
             {"place", "--corner", "1", "--to", "5k"}}) {
        const Run r = runTauline(args);
        INFO(r.err);
        CHECK(r.status == 2);
        CHECK(r.out.empty());
        CHECK(contains(r.err, "tauline: "));
    }
    const Run missing = runTauline({"place", "/nonexistent/none.tauline", "--corner", "1", "--to", "5k"});
    CHECK(missing.status == 1);
    const Run help = runTauline({"place", "--help"});
    CHECK(help.status == 0);
    CHECK(contains(help.out, "--corner N"));
}
