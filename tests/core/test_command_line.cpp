// The command line as scripts meet it (command-line.md): exit status, where
// messages go, and the shape and numbers of the JSON and CSV it prints.
#include "CommandLineRun.h"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <cmath>
#include <complex>
#include <numbers>
#include <sstream>
#include <string>
#include <vector>

using Run = tauline::testing::CommandLineRun;
using tauline::testing::contains;
using tauline::testing::runTauline;

namespace {

std::string data(const std::string& name)
{
    return std::string(TAULINE_TEST_DATA_DIR) + "/" + name;
}

std::string sample(const std::string& name)
{
    return std::string(TAULINE_SAMPLES_DIR) + "/" + name;
}

std::vector<std::string> lines(const std::string& text)
{
    std::vector<std::string> out;
    std::istringstream in(text);
    for (std::string line; std::getline(in, line);)
        out.push_back(line);
    return out;
}

// The example network of command-line.md: R1 = 4.7 kΩ in series with
// R2 = 10 kΩ ∥ C1 = 2.2 nF, the impedance between in and gnd. Its closed form
// is common practice (no source): Z(s) = (R1 + R2 + s·R1·R2·C1) / (1 + s·R2·C1).
constexpr double R1 = 4700.0, R2 = 10000.0, C1 = 2.2e-9;

std::complex<double> dividerImpedance(double hz)
{
    const std::complex<double> s(0.0, 2.0 * std::numbers::pi * hz);
    return (R1 + R2 + s * R1 * R2 * C1) / (1.0 + s * R2 * C1);
}

bool near(double a, double b, double relative = 1e-9)
{
    return std::fabs(a - b) <= relative * std::max(std::fabs(a), std::fabs(b));
}

}  // namespace

TEST_CASE("bad usage exits with 2 and says why on stderr", "[cli]")
{
    const std::string good = data("divider-impedance.tauline");
    const std::vector<std::vector<std::string>> cases = {
        {},
        {"frobnicate", good},
        {"analyze"},
        {"analyze", good, good},
        {"analyze", good, "--svg"},
        {"analyze", good, "--json=yes"},
        {"sweep", good},
        {"sweep", "--at", "1k"},
        {"sweep", good, "--at"},
        {"sweep", good, "--at", "1k", "--from", "10", "--to", "1k", "--points", "5"},
        {"sweep", good, "--at", "1k", "--json", "--csv"},
        {"sweep", good, "--at", "10x"},
        {"sweep", good, "--at", "1k,,10k"},
        {"sweep", good, "--at", "0"},
        {"sweep", good, "--at", "10 nF"},
        {"sweep", good, "--from", "10", "--to", "1k"},
        {"sweep", good, "--from", "10", "--to", "1k", "--points", "1"},
        {"sweep", good, "--from", "10", "--to", "1k", "--points", "ten"},
        {"sweep", good, "--from", "10", "--to", "1k", "--points", "10000000"},
        {"sweep", good, "--from", "1k", "--to", "10", "--points", "5"},
        {"sweep", good, "--from", "-5", "--to", "10", "--points", "5"},
        {"sweep", good, "--from", "10", "--from", "20", "--to", "1k", "--points", "5"},
    };
    for (const auto& arguments : cases) {
        std::string shown;
        for (const auto& a : arguments)
            shown += a + " ";
        INFO("tauline " << shown);
        Run r = runTauline(arguments);
        CHECK(r.status == 2);
        CHECK(r.out.empty());
        CHECK(r.err.rfind("tauline: ", 0) == 0);
        CHECK(contains(r.err, "usage:"));
    }
}

TEST_CASE("usage is checked before the file is read", "[cli]")
{
    Run r = runTauline({"sweep", data("no-such-file.tauline"), "--at", "nonsense"});
    CHECK(r.status == 2);
    CHECK(contains(r.err, "--at"));
}

TEST_CASE("help exits with 0 and documents the frequency prefixes", "[cli]")
{
    for (const auto& arguments : std::vector<std::vector<std::string>>{{"--help"}, {"help"}, {"-h"}}) {
        Run r = runTauline(arguments);
        CHECK(r.status == 0);
        CHECK(contains(r.out, "tauline analyze FILE [--json]"));
        CHECK(contains(r.out, "m is milli, M is mega"));
        CHECK(r.err.empty());
    }
    CHECK(runTauline({"analyze", "--help"}).status == 0);
    CHECK(contains(runTauline({"sweep", "--help"}).out, "--points"));
}

TEST_CASE("a file that cannot be read exits with 1, one line per problem naming the file", "[cli]")
{
    const std::string path = data("bad-values.tauline");
    for (const auto& command : {"analyze", "sweep"}) {
        std::vector<std::string> arguments = {command, path};
        if (std::string(command) == "sweep")
            arguments.insert(arguments.end(), {"--at", "1k", "--csv"});
        Run r = runTauline(arguments);
        CHECK(r.status == 1);
        CHECK(r.out.empty());
        auto errLines = lines(r.err);
        CHECK(errLines.size() == 11);  // every bad value in the file
        for (const auto& line : errLines)
            CHECK(line.rfind(path + ": part ", 0) == 0);
    }
    Run missing = runTauline({"analyze", data("no-such-file.tauline")});
    CHECK(missing.status == 1);
    CHECK(missing.err.rfind(data("no-such-file.tauline") + ": ", 0) == 0);
}

TEST_CASE("an undefined response exits with 1 and names the file", "[cli][engine]")
{
    for (const auto& name : {"undefined-no-path.tauline", "undefined-zero-response.tauline"}) {
        INFO(name);
        Run r = runTauline({"analyze", data(name), "--json"});
        CHECK(r.status == 1);
        CHECK(r.out.empty());
        auto errLines = lines(r.err);
        REQUIRE_FALSE(errLines.empty());
        for (const auto& line : errLines)
            CHECK(line.rfind(data(name) + ": ", 0) == 0);
    }
}

TEST_CASE("analyze --json has every field of the contract with the right numbers", "[cli][engine]")
{
    Run r = runTauline({"analyze", data("divider-impedance.tauline"), "--json"});
    REQUIRE(r.status == 0);
    CHECK(r.err.empty());
    const nlohmann::json j = nlohmann::json::parse(r.out);

    for (const char* field : {"response", "unit", "order", "dc", "hf", "poles", "zeros", "numerator", "denominator",
                              "time_constants", "breakpoints"})
        CHECK(j.contains(field));
    CHECK(j["response"] == "impedance");
    CHECK(j["unit"] == "ohm");
    CHECK(j["order"] == 1);
    CHECK(j["dc"]["limit"] == "finite");
    CHECK(near(j["dc"]["value"].get<double>(), R1 + R2));
    CHECK(j["hf"]["limit"] == "finite");
    CHECK(near(j["hf"]["value"].get<double>(), R1));

    REQUIRE(j["poles"].size() == 1);
    CHECK(near(j["poles"][0]["re"].get<double>(), -1.0 / (R2 * C1)));
    CHECK(j["poles"][0]["im"].get<double>() == 0.0);
    REQUIRE(j["zeros"].size() == 1);
    CHECK(near(j["zeros"][0]["re"].get<double>(), -(R1 + R2) / (R1 * R2 * C1)));

    REQUIRE(j["numerator"].size() == 2);
    CHECK(near(j["numerator"][0].get<double>(), R1 + R2));
    CHECK(near(j["numerator"][1].get<double>(), R1 * R2 * C1));
    REQUIRE(j["denominator"].size() == 2);
    CHECK(j["denominator"][0].get<double>() == 1.0);
    CHECK(near(j["denominator"][1].get<double>(), R2 * C1));

    REQUIRE(j["time_constants"].size() == 1);
    const auto& tc = j["time_constants"][0];
    CHECK(tc["element"] == "C1");
    CHECK(near(tc["tau_s"].get<double>(), R2 * C1));       // port open: C1 sees R2
    CHECK(near(tc["r_ohms"].get<double>(), R2));
    const double parallel = R1 * R2 / (R1 + R2);            // port shorted: R1 ∥ R2
    CHECK(near(tc["r_null_ohms"].get<double>(), parallel));
    CHECK(near(tc["tau_null_s"].get<double>(), parallel * C1));

    REQUIRE(j["breakpoints"].size() == 2);
    const auto& pole = j["breakpoints"][0];
    const auto& zero = j["breakpoints"][1];
    CHECK(pole["type"] == "pole");
    CHECK(near(pole["hz"].get<double>(), 1.0 / (2.0 * std::numbers::pi * R2 * C1)));
    CHECK(near(pole["estimate_hz"].get<double>(), pole["hz"].get<double>()));  // one pole: estimate is exact
    CHECK(zero["type"] == "zero");
    CHECK(near(zero["hz"].get<double>(), (R1 + R2) / (2.0 * std::numbers::pi * R1 * R2 * C1)));
    CHECK_FALSE(pole.contains("q"));
    CHECK(pole["poorly_separated"] == false);
    CHECK(j["warnings"].empty());
    CHECK_FALSE(j.contains("caution"));
}

TEST_CASE("infinite quantities are null with a sibling saying so", "[cli][engine]")
{
    // R1 = 1 kΩ in series with C1 = 1 µF: Z(s) = (1 + s·R1·C1) / (s·C1), by
    // inspection (common practice, no source).
    Run r = runTauline({"analyze", data("series-capacitor-impedance.tauline"), "--json"});
    REQUIRE(r.status == 0);
    const nlohmann::json j = nlohmann::json::parse(r.out);
    CHECK(j["dc"]["limit"] == "infinite");
    CHECK(j["dc"]["value"].is_null());
    CHECK(j["hf"]["limit"] == "finite");
    CHECK(near(j["hf"]["value"].get<double>(), 1000.0));
    REQUIRE(j["poles"].size() == 1);
    CHECK(j["poles"][0]["re"].get<double>() == 0.0);  // the origin is listed as 0
    REQUIRE(j["time_constants"].size() == 1);
    const auto& tc = j["time_constants"][0];
    CHECK(tc["tau_s"].is_null());  // port open: C1 sees no resistance path
    CHECK(tc["r_ohms"].is_null());
    CHECK(tc["tau_state"] == "infinite");
    CHECK(near(tc["tau_null_s"].get<double>(), 1e-3));  // port shorted: C1 sees R1
    // The pole at the origin gives no corner; the zero at 1/(2π·R1·C1) does.
    REQUIRE(j["breakpoints"].size() == 1);
    CHECK(j["breakpoints"][0]["type"] == "zero");
    CHECK(near(j["breakpoints"][0]["hz"].get<double>(), 1.0 / (2.0 * std::numbers::pi * 1e-3)));
}

TEST_CASE("a separate piece is a warning, in the JSON and on stderr", "[cli][engine]")
{
    const std::string path = data("separate-piece.tauline");
    Run r = runTauline({"analyze", path, "--json"});
    REQUIRE(r.status == 0);
    const nlohmann::json j = nlohmann::json::parse(r.out);
    REQUIRE_FALSE(j["warnings"].empty());
    CHECK(r.err.rfind(path + ": warning: ", 0) == 0);
    for (const auto& tc : j["time_constants"])
        CHECK(tc["element"] != "C9");

    Run table = runTauline({"analyze", path});
    CHECK(table.status == 0);
    CHECK(contains(table.out, "Warnings:"));
}

TEST_CASE("the readable table shows time constants and corners", "[cli][engine]")
{
    Run r = runTauline({"analyze", data("divider-impedance.tauline")});
    REQUIRE(r.status == 0);
    CHECK(contains(r.out, "Response:  impedance between in and gnd"));
    CHECK(contains(r.out, "Time constants"));
    CHECK(contains(r.out, "22 \u00B5s"));      // R2·C1
    CHECK(contains(r.out, "10 k\u03A9"));
    CHECK(contains(r.out, "7.234 kHz"));      // 1/(2π·22 µs)
    CHECK(contains(r.out, "Breakpoints"));
}

TEST_CASE("mains networks carry the caution", "[cli][engine]")
{
    Run table = runTauline({"analyze", sample("mains-dimmer-snubber.tauline")});
    REQUIRE(table.status == 0);
    CHECK(contains(table.out, "Caution:"));
    CHECK(contains(table.out, "licensed practice"));
    Run json = runTauline({"analyze", sample("mains-dimmer-snubber.tauline"), "--json"});
    REQUIRE(json.status == 0);
    CHECK(nlohmann::json::parse(json.out).contains("caution"));
    CHECK_FALSE(contains(runTauline({"analyze", sample("sensor-anti-alias.tauline")}).out, "Caution:"));
}

TEST_CASE("sweep --csv: header, sorted rows without duplicates, exact values", "[cli][engine]")
{
    Run r = runTauline({"sweep", data("divider-impedance.tauline"), "--at", "10k,100,10k", "--at", "1M", "--csv"});
    REQUIRE(r.status == 0);
    auto rows = lines(r.out);
    REQUIRE(rows.size() == 4);
    CHECK(rows[0] == "hz,re,im,db,deg");
    double lastHz = 0.0;
    for (size_t i = 1; i < rows.size(); ++i) {
        std::vector<double> v;
        std::istringstream in(rows[i]);
        for (std::string cell; std::getline(in, cell, ',');)
            v.push_back(std::stod(cell));
        REQUIRE(v.size() == 5);
        CHECK(v[0] > lastHz);
        lastHz = v[0];
        const auto z = dividerImpedance(v[0]);
        CHECK(near(v[1], z.real()));
        CHECK(near(v[2], z.imag()));
        CHECK(near(v[3], 20.0 * std::log10(std::abs(z))));
        CHECK(near(v[4], std::arg(z) * 180.0 / std::numbers::pi));
        CHECK(v[4] > -180.0);
        CHECK(v[4] <= 180.0);
    }
    CHECK(lastHz == 1e6);
}

TEST_CASE("sweep --json over a log range", "[cli][engine]")
{
    Run r = runTauline(
        {"sweep", data("divider-impedance.tauline"), "--from", "10", "--to", "1M", "--points", "51", "--json"});
    REQUIRE(r.status == 0);
    const nlohmann::json j = nlohmann::json::parse(r.out);
    REQUIRE(j.is_array());
    REQUIRE(j.size() == 51);
    CHECK(near(j.front()["hz"].get<double>(), 10.0));
    CHECK(near(j.back()["hz"].get<double>(), 1e6));
    for (const auto& point : j) {
        for (const char* field : {"hz", "re", "im", "db", "deg"})
            CHECK(point.contains(field));
        CHECK(near(point["db"].get<double>(), 20.0 * std::log10(std::abs(dividerImpedance(point["hz"])))));
    }
}

TEST_CASE("sweep prints a table by default", "[cli][engine]")
{
    Run r = runTauline({"sweep", data("divider-impedance.tauline"), "--at", "1k"});
    REQUIRE(r.status == 0);
    CHECK(contains(r.out, "1 kHz"));
    CHECK(contains(r.out, "phase"));
}

TEST_CASE("every sample analyses from the command line", "[cli][engine][samples]")
{
    for (const char* name : {"buck-type2-compensator.tauline", "guitar-treble-shelf.tauline",
                             "mains-dimmer-snubber.tauline", "sensor-anti-alias.tauline", "woofer-zobel.tauline"}) {
        INFO(name);
        Run r = runTauline({"analyze", sample(name), "--json"});
        CHECK(r.status == 0);
        CHECK(nlohmann::json::parse(r.out).contains("breakpoints"));
    }
}
