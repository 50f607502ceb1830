#include "Errors.h"
#include "NetworkFile.h"

#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <vector>

using tauline::InputError;
using tauline::LoadedNetwork;
using tauline::Network;
using tauline::PartKind;
using tauline::ResponseKind;

namespace {

std::string dataPath(const std::string& name)
{
    return std::string(TAULINE_TEST_DATA_DIR) + "/" + name;
}

std::vector<std::string> problemsOf(const std::string& path)
{
    try {
        tauline::readNetworkFile(path);
    } catch (const InputError& e) {
        return e.problems();
    }
    return {};
}

bool contains(const std::string& text, const std::string& piece)
{
    return text.find(piece) != std::string::npos;
}

}  // namespace

// The errors network-file.md lists under "Errors the reader must report":
// each file in tests/data holds one kind of mistake; every message must begin
// with the file's path, name the part or field, and say what is wrong.
TEST_CASE("every reader error names the file, the part or field, and the problem", "[file]")
{
    struct Expected {
        std::string where;  // the part or field
        std::string what;   // what is wrong
    };
    struct Case {
        const char* file;
        std::vector<Expected> problems;
    };
    const std::vector<Case> cases = {
        {"malformed-json.tauline", {{"JSON", "line 6"}}},
        {"empty-file.tauline", {{"JSON", "malformed"}}},
        {"not-an-object.tauline", {{"JSON", "expected an object"}}},
        {"wrong-format.tauline", {{"format", "\"some-other-drawing\""}}},
        {"missing-format.tauline", {{"format", "missing"}}},
        {"newer-version.tauline", {{"version", "version 2 is not supported"}}},
        {"version-as-text.tauline", {{"version", "whole number"}}},
        {"missing-name.tauline", {{"part #2", "missing \"name\""}, {"part #3", "non-empty"}}},
        {"duplicate-names.tauline", {{"part R1", "#1 and #3"}}},
        {"unknown-kind.tauline", {{"part D1", "unknown kind \"diode\""}}},
        {"later-kinds.tauline",
         {{"part L1", "\"inductor\" is not supported by this build yet"},
          {"part G1", "\"transconductance\" is not supported by this build yet"},
          {"part E1", "\"voltage-amplifier\" is not supported by this build yet"}}},
        {"bad-values.tauline",
         {{"part R1", "\"0\" is zero"},
          {"part R2", "\"-4k7\" is negative"},
          {"part R3", "\"4x7\" is not a number"},
          {"part R4", "\"10 nF\": unit \"F\" does not fit a resistor"},
          {"part C1", "\"nan\" is not a finite number"},
          {"part C2", "\"\" is empty"},
          {"part C3", "-1e-09 is negative"},
          {"part C4", "0 is zero"},
          {"part C5", "number or text"},
          {"part C6", "missing \"value\""},
          {"part C7", "\"1e999\" is too large"}}},
        {"same-node.tauline", {{"part C1", "both ends on node \"a\""}}},
        {"bad-nodes.tauline",
         {{"part R2", "missing \"nodes\""},
          {"part R3", "found 3 entries"},
          {"part R4", "nodes[1] must be a non-empty node name"},
          {"part R5", "nodes[0] must be a non-empty node name"},
          {"part R6", "exactly two node names"}}},
        {"missing-response.tauline", {{"response", "missing \"response\""}}},
        {"response-without-kind.tauline", {{"response", "missing \"kind\""}}},
        {"unknown-response-kind.tauline", {{"response", "unknown kind \"current-gain\""}}},
        {"response-missing-fields.tauline", {{"response", "missing \"output\""}}},
        {"response-untouched-node.tauline", {{"response.output", "node \"out\" is not connected to any part"}}},
        {"no-parts.tauline", {{"parts", "no parts"}}},
        {"missing-parts.tauline", {{"parts", "missing \"parts\""}}},
        {"bad-title.tauline", {{"title", "must be text"}}},
    };
    for (const auto& c : cases) {
        const std::string path = dataPath(c.file);
        INFO("file: " << c.file);
        std::vector<std::string> problems = problemsOf(path);
        REQUIRE(problems.size() == c.problems.size());
        for (size_t i = 0; i < problems.size(); ++i) {
            INFO("message: " << problems[i]);
            CHECK(problems[i].rfind(path + ": " + c.problems[i].where + ": ", 0) == 0);
            CHECK(contains(problems[i], c.problems[i].what));
        }
    }
}

TEST_CASE("all problems in a file are reported together", "[file]")
{
    const std::string path = dataPath("many-problems.tauline");
    std::vector<std::string> problems = problemsOf(path);
    REQUIRE(problems.size() == 5);
    std::string all;
    for (const auto& p : problems) {
        CHECK(p.rfind(path + ": ", 0) == 0);
        all += p + "\n";
    }
    CHECK(contains(all, "part C1: value \"10 k\u03A9\": unit \"\u03A9\" does not fit a capacitor"));
    CHECK(contains(all, "part L1: kind \"inductor\""));
    CHECK(contains(all, "part C2: \"nodes\" has both ends on node \"mid\""));
    CHECK(contains(all, "part R1: the name is used by parts #1 and #2"));
    CHECK(contains(all, "response.output: node \"nowhere\""));
}

TEST_CASE("a file that cannot be opened is reported with its path", "[file]")
{
    const std::string missing = dataPath("no-such-file.tauline");
    auto problems = problemsOf(missing);
    REQUIRE(problems.size() == 1);
    CHECK(problems[0].rfind(missing + ": cannot open", 0) == 0);

    auto folder = problemsOf(std::string(TAULINE_TEST_DATA_DIR));
    REQUIRE(folder.size() == 1);
    CHECK(contains(folder[0], "is a folder"));
}

TEST_CASE("a good file loads with its values, nodes, response and drawing", "[file]")
{
    LoadedNetwork loaded = tauline::readNetworkFile(dataPath("with-drawing.tauline"));
    const Network& n = loaded.network;
    CHECK(n.title == "Divider with a drawing, \u03A9 \u00B5");
    REQUIRE(n.parts.size() == 3);
    CHECK(n.parts[0].name == "R1");
    CHECK(n.parts[0].kind == PartKind::Resistor);
    CHECK(n.parts[0].value == 4700.0);
    CHECK(n.parts[0].valueText == "4k7");
    CHECK(n.parts[0].nodes == std::array<std::string, 2>{"in", "mid"});
    CHECK(n.parts[1].value == 10000.0);
    CHECK(n.parts[1].valueText.empty());
    CHECK(n.parts[2].kind == PartKind::Capacitor);
    CHECK(n.parts[2].value == 2.2e-9);
    CHECK(n.response.kind == ResponseKind::Impedance);
    CHECK(n.response.input == std::array<std::string, 2>{"in", "gnd"});
    CHECK(n.response.output == n.response.input);
    REQUIRE(loaded.drawing.is_object());
    CHECK(loaded.drawing["parts"]["R1"]["rotation"] == 90);
    CHECK(loaded.drawing["view"]["zoom"] == 1.5);
}

TEST_CASE("the example in the file contract reads", "[file]")
{
    // network-file.md, the example at the top (values as written there).
    const char* text = R"({
      "format": "tauline-network",
      "version": 1,
      "title": "Loop compensator, 100 kHz converter",
      "parts": [
        {"name": "R1", "kind": "resistor",  "value": "4k7", "nodes": ["in", "mid"]},
        {"name": "C1", "kind": "capacitor", "value": "10n", "nodes": ["mid", "gnd"]},
        {"name": "C2", "kind": "capacitor", "value": 2.2e-9, "nodes": ["mid", "out"]}
      ],
      "response": {"kind": "voltage-gain", "input": ["in", "gnd"], "output": ["out", "gnd"]}
    })";
    LoadedNetwork loaded = tauline::parseNetworkText(text, "example");
    REQUIRE(loaded.network.parts.size() == 3);
    CHECK(loaded.network.parts[1].value == 10e-9);
    CHECK(loaded.network.response.kind == ResponseKind::VoltageGain);
    CHECK(loaded.network.response.output == std::array<std::string, 2>{"out", "gnd"});
    CHECK(loaded.drawing.is_null());
}

TEST_CASE("a byte-order mark at the start is accepted", "[file]")
{
    std::string text = "\xEF\xBB\xBF{\"format\": \"tauline-network\", \"version\": 1, \"parts\": ["
                       "{\"name\": \"R1\", \"kind\": \"resistor\", \"value\": \"1k\", \"nodes\": [\"a\", \"gnd\"]}],"
                       "\"response\": {\"kind\": \"impedance\", \"port\": [\"a\", \"gnd\"]}}";
    CHECK(tauline::parseNetworkText(text, "bom").network.parts.size() == 1);
}

namespace {

Network sampleNetwork()
{
    Network n;
    n.title = "Round trip \"quoted\" \u03A9";
    auto add = [&](const char* name, PartKind kind, double value, const char* text, const char* a, const char* b) {
        tauline::Part p;
        p.name = name;
        p.kind = kind;
        p.value = value;
        p.valueText = text;
        p.nodes = {a, b};
        n.parts.push_back(p);
    };
    add("R1", PartKind::Resistor, 4700.0, "4k7", "in", "mid");
    add("R2", PartKind::Resistor, 4990.0, "", "mid", "gnd");
    add("C1", PartKind::Capacitor, 2.2e-9, "2n2", "mid", "out");
    add("C2", PartKind::Capacitor, 1.0 / 3.0 * 1e-6, "", "out", "gnd");      // needs many digits
    add("R3", PartKind::Resistor, 12345.678, "10k", "out", "gnd");            // stale text: value wins
    n.response.kind = ResponseKind::Transimpedance;
    n.response.input = {"in", "gnd"};
    n.response.output = {"out", "gnd"};
    return n;
}

}  // namespace

TEST_CASE("write then read gives the same network and drawing", "[file]")
{
    Network original = sampleNetwork();
    nlohmann::json drawing = {{"parts", {{"R1", {{"x", 10}, {"y", -20}, {"rotation", 180}}}}},
                              {"wires", {{{0, 0}, {10, 0}}}}};
    std::string text = tauline::writeNetworkText(original, drawing);
    LoadedNetwork back = tauline::parseNetworkText(text, "written");

    CHECK(back.network.title == original.title);
    REQUIRE(back.network.parts.size() == original.parts.size());
    for (size_t i = 0; i < original.parts.size(); ++i) {
        const auto& a = original.parts[i];
        const auto& b = back.network.parts[i];
        INFO(a.name);
        CHECK(b.name == a.name);
        CHECK(b.kind == a.kind);
        CHECK(b.value == a.value);  // bit for bit
        CHECK(b.nodes == a.nodes);
    }
    CHECK(back.network.parts[0].valueText == "4k7");
    CHECK(back.network.parts[1].valueText == "4.99 k\u03A9");
    CHECK(back.network.parts[4].valueText != "10k");
    CHECK(back.network.response.kind == original.response.kind);
    CHECK(back.network.response.input == original.response.input);
    CHECK(back.network.response.output == original.response.output);
    CHECK(back.drawing == drawing);

    // Writing what was read gives the same text again.
    CHECK(tauline::writeNetworkText(back.network, back.drawing) == text);
}

TEST_CASE("an impedance is written with its port, and no drawing when none is given", "[file]")
{
    Network n = sampleNetwork();
    n.response.kind = ResponseKind::Impedance;
    std::string text = tauline::writeNetworkText(n);
    CHECK(contains(text, "\"port\": [\"in\", \"gnd\"]"));
    CHECK(!contains(text, "\"drawing\""));
    CHECK(tauline::parseNetworkText(text, "written").network.response.kind == ResponseKind::Impedance);
}

TEST_CASE("every sample file reads", "[file][samples]")
{
    int count = 0;
    for (const auto& entry : std::filesystem::directory_iterator(TAULINE_SAMPLES_DIR)) {
        if (entry.path().extension() != ".tauline")
            continue;
        INFO(entry.path().string());
        CHECK_NOTHROW(tauline::readNetworkFile(entry.path().string()));
        ++count;
    }
    CHECK(count >= 4);
}
