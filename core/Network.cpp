#include "Network.h"

namespace tauline {

bool isReactive(PartKind kind)
{
    return kind == PartKind::Capacitor || kind == PartKind::Inductor;
}

const char* kindName(PartKind kind)
{
    switch (kind) {
    case PartKind::Resistor: return "resistor";
    case PartKind::Capacitor: return "capacitor";
    case PartKind::Inductor: return "inductor";
    case PartKind::Transconductance: return "transconductance";
    case PartKind::VoltageAmplifier: return "voltage-amplifier";
    }
    return "?";
}

const char* responseKindName(ResponseKind kind)
{
    switch (kind) {
    case ResponseKind::Impedance: return "impedance";
    case ResponseKind::VoltageGain: return "voltage-gain";
    case ResponseKind::Transimpedance: return "transimpedance";
    }
    return "?";
}

const char* responseUnit(ResponseKind kind)
{
    return kind == ResponseKind::VoltageGain ? "V/V" : "ohm";
}

}  // namespace tauline
