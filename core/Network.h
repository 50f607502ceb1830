// core/: the Qt-free engine. Network model, value parsing, file reading, the
// exact nodal solver, the time-constant engine, corners and the sketch.
#pragma once

#include <array>
#include <string>
#include <vector>

namespace tauline {

enum class PartKind { Resistor, Capacitor, Inductor, Transconductance, VoltageAmplifier };

// The reference node's fixed name in files and drawings.
inline constexpr const char* kGroundNode = "gnd";

struct Part {
    std::string name;
    PartKind kind = PartKind::Resistor;
    double value = 0.0;        // ohms, farads, henries, siemens or V/V
    std::string valueText;     // as the user wrote it (kept for saving)
    std::array<std::string, 2> nodes;
    std::array<std::string, 2> control;  // controlled sources only
};

enum class ResponseKind { Impedance, VoltageGain, Transimpedance };

struct ResponseSpec {
    ResponseKind kind = ResponseKind::Impedance;
    // For an impedance, input and output are both the port.
    std::array<std::string, 2> input;
    std::array<std::string, 2> output;
};

struct Network {
    std::string title;
    std::vector<Part> parts;
    ResponseSpec response;
};

bool isReactive(PartKind kind);
const char* kindName(PartKind kind);        // "resistor", "capacitor", ...
const char* responseKindName(ResponseKind kind);  // "impedance", ...
// "ohm" for impedance and transimpedance, "V/V" for voltage gain.
const char* responseUnit(ResponseKind kind);

}  // namespace tauline
