// Small builders for networks written inline in the engine tests.
#pragma once

#include "Network.h"

#include <initializer_list>
#include <string>

namespace tauline::testing {

inline Part part(const std::string& name, double value, const std::string& a, const std::string& b)
{
    Part p;
    p.name = name;
    p.kind = name[0] == 'C' ? PartKind::Capacitor : PartKind::Resistor;
    p.value = value;
    p.nodes = {a, b};
    return p;
}

inline Network impedance(std::initializer_list<Part> parts, const std::string& p, const std::string& n = kGroundNode)
{
    Network net;
    net.parts = parts;
    net.response = {ResponseKind::Impedance, {p, n}, {p, n}};
    return net;
}

inline Network transfer(ResponseKind kind, std::initializer_list<Part> parts, const std::string& in,
                        const std::string& out)
{
    Network net;
    net.parts = parts;
    net.response = {kind, {in, kGroundNode}, {out, kGroundNode}};
    return net;
}

// Relative closeness for coefficients and roots.
inline bool closeRelative(double a, double b, double tol)
{
    return std::abs(a - b) <= tol * std::max(std::abs(a), std::abs(b));
}

}  // namespace tauline::testing
