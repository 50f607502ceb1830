// Network files that several tests analyse, as text for networkOf()
// (NetworkBuilding.h). Each test states the closed form it checks against
// beside its check; here is only what each network is.
#pragma once

namespace tauline::testing {

// R1 = 10 kΩ ∥ C1 = 2.2 nF between p and gnd, the impedance at p: one pole.
constexpr const char* kSingleRcPort = R"({
  "format": "tauline-network", "version": 1,
  "parts": [
    {"name": "R1", "kind": "resistor",  "value": "10k", "nodes": ["p", "gnd"]},
    {"name": "C1", "kind": "capacitor", "value": "2n2", "nodes": ["p", "gnd"]}],
  "response": {"kind": "impedance", "port": ["p", "gnd"]}})";

// A bridged T: R1 (in-m) = 10 kΩ, R2 (m-out) = 10 kΩ, C1 (m-gnd) = 100 nF,
// C2 bridging in-out = 1 nF; the voltage gain to the open output. Its zeros
// are a complex pair.
constexpr const char* kBridgedT = R"({
  "format": "tauline-network", "version": 1,
  "parts": [
    {"name": "R1", "kind": "resistor",  "value": "10k",  "nodes": ["in", "m"]},
    {"name": "R2", "kind": "resistor",  "value": "10k",  "nodes": ["m", "out"]},
    {"name": "C1", "kind": "capacitor", "value": "100n", "nodes": ["m", "gnd"]},
    {"name": "C2", "kind": "capacitor", "value": "1n",   "nodes": ["in", "out"]}],
  "response": {"kind": "voltage-gain", "input": ["in", "gnd"], "output": ["out", "gnd"]}})";

// R1 = 4.7 kΩ in series with R2 = 10 kΩ ∥ C1 = 2.2 nF, the impedance at in:
// a pole (corner 1) and a zero (corner 2). The same network as
// tests/data/divider-impedance.tauline, the command-line contract's example.
constexpr const char* kDividerImpedance = R"({
  "format": "tauline-network", "version": 1,
  "parts": [
    {"name": "R1", "kind": "resistor",  "value": "4k7", "nodes": ["in", "mid"]},
    {"name": "R2", "kind": "resistor",  "value": "10k", "nodes": ["mid", "gnd"]},
    {"name": "C1", "kind": "capacitor", "value": "2n2", "nodes": ["mid", "gnd"]}],
  "response": {"kind": "impedance", "port": ["in", "gnd"]}})";

}  // namespace tauline::testing
