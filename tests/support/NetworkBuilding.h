// Networks for tests, made inline: from parts, from network-file text, or
// from another network with one value changed.
#pragma once

#include "Network.h"
#include "NetworkFile.h"

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

// Read through the file reader, so values are written as a user writes them
// ("2n2", "4k7") and parsed exactly as a file's would be.
inline Network networkOf(const char* text)
{
    return parseNetworkText(text, "test network").network;
}

inline Network withValue(Network network, const std::string& part, double value)
{
    for (auto& p : network.parts)
        if (p.name == part)
            p.value = value;
    return network;
}

}  // namespace tauline::testing
