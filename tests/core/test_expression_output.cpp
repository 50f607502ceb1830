// `tauline analyze` with expressions, the factored form and close pairs:
// the fields scripts read, and the human table's sections.
#include "CommandLineRun.h"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <cmath>
#include <filesystem>
#include <fstream>
#include <unistd.h>

namespace {

// Two equal RC sections with a divider: the poles sit too close for the
// one-ratio estimate.
const char* kTwoSections = R"({"format": "tauline-network", "version": 1, "title": "two sections",
  "parts": [
    {"name": "R1", "kind": "resistor",  "value": "1k",   "nodes": ["in", "a"]},
    {"name": "C1", "kind": "capacitor", "value": "100n", "nodes": ["a", "gnd"]},
    {"name": "R2", "kind": "resistor",  "value": "1k",   "nodes": ["a", "out"]},
    {"name": "C2", "kind": "capacitor", "value": "100n", "nodes": ["out", "gnd"]}],
  "response": {"kind": "voltage-gain", "input": ["in", "gnd"], "output": ["out", "gnd"]}})";

std::string analyzeFile(const std::string& text, bool json)
{
    // One name per process: ctest runs this file's cases side by side.
    const auto path = std::filesystem::temp_directory_path() /
                      ("tauline-expression-output-" + std::to_string(::getpid()) + ".tauline");
    std::ofstream(path) << text;
    std::vector<std::string> arguments{"analyze", path.string()};
    if (json)
        arguments.push_back("--json");
    const auto run = tauline::testing::runTauline(arguments);
    std::filesystem::remove(path);
    REQUIRE(run.status == 0);
    return run.out;
}

}  // namespace

TEST_CASE("analyze --json carries expressions, the factored form and close pairs", "[expression][cli]")
{
    const auto j = nlohmann::json::parse(analyzeFile(kTwoSections, true));
    const auto& tcs = j.at("time_constants");
    REQUIRE(tcs.size() == 2);
    // Input shorted: C1 sees R1 ∥ R2 (C2 open leaves R2 dangling: R1 alone),
    // derived by hand.
    CHECK(tcs[0].at("expression") == "C1 \u00B7 R1");
    CHECK(tcs[1].at("expression") == "C2 \u00B7 (R1 + R2)");
    CHECK(tcs[0].at("r_expression") == "R1");
    CHECK(tcs[0].at("series_parallel") == true);
    // Output nulled: the output node's capacitor sees 0 (a nullator across it).
    CHECK(tcs[1].at("expression_null") == "0");
    const auto& factored = j.at("factored");
    CHECK(factored.at("text").get<std::string>().rfind("H(s) = 1 / [", 0) == 0);
    CHECK(factored.at("poles").size() == 2);
    // ω0 = 1/RC, Q = 1/3 (D(s) = 1 + 3sRC + (sRC)², expanded by hand).
    const auto& pairs = j.at("pairs");
    REQUIRE(pairs.size() == 1);
    CHECK(pairs[0].at("w0_rad_s").get<double>() == Approx(1e4).epsilon(1e-9));
    CHECK(pairs[0].at("q").get<double>() == Approx(1.0 / 3.0).epsilon(1e-9));
    CHECK(std::abs(pairs[0].at("quadratic_error")[0].get<double>()) < 1e-9);
    // The contract's breakpoints keep their meaning: two corners, exact.
    CHECK(j.at("breakpoints").size() == 2);
}

TEST_CASE("analyze prints expressions, the factored form and close pairs", "[expression][cli]")
{
    const std::string text = analyzeFile(kTwoSections, false);
    CHECK(text.find("Time constants in part names") != std::string::npos);
    CHECK(text.find("C2 \u00B7 (R1 + R2)") != std::string::npos);
    CHECK(text.find("Factored form") != std::string::npos);
    CHECK(text.find("Close corners read as one quadratic") != std::string::npos);
}
