#include "RandomNetwork.h"

#include <cmath>
#include <string>

namespace tauline::testing {

namespace {
double logUniform(std::mt19937& rng, double lo, double hi)
{
    std::uniform_real_distribution<double> u(std::log(lo), std::log(hi));
    return std::exp(u(rng));
}

std::string nodeName(int k)
{
    return k == 0 ? std::string(kGroundNode) : "n" + std::to_string(k);
}
}  // namespace

Network randomNetwork(std::mt19937& rng, const RandomNetworkShape& shape)
{
    Network net;
    net.title = "random";
    const int total = shape.nodes + 1;
    auto pick = [&](int below) { return std::uniform_int_distribution<int>(0, below - 1)(rng); };
    auto addPart = [&](PartKind kind, int a, int b) {
        Part p;
        const bool isR = kind == PartKind::Resistor;
        p.kind = kind;
        p.value = isR ? logUniform(rng, shape.minR, shape.maxR) : logUniform(rng, shape.minC, shape.maxC);
        p.nodes = {nodeName(a), nodeName(b)};
        net.parts.push_back(p);
    };
    auto distinctPair = [&](int& a, int& b) {
        a = pick(total);
        do
            b = pick(total);
        while (b == a);
    };

    int resistors = 0;
    // The tree hangs every node from n1 (n1 itself from gnd), so the input at
    // n1 reaches them all.
    for (int k = 1; k < total && resistors < shape.resistors; ++k, ++resistors)
        addPart(PartKind::Resistor, k, k == 1 ? 0 : 1 + pick(k - 1));
    for (; resistors < shape.resistors; ++resistors) {
        int a, b;
        distinctPair(a, b);
        addPart(PartKind::Resistor, a, b);
    }
    for (int c = 0; c < shape.capacitors; ++c) {
        int a, b;
        distinctPair(a, b);
        addPart(PartKind::Capacitor, a, b);
    }
    int r = 0, c = 0;
    for (auto& p : net.parts)
        p.name = (p.kind == PartKind::Resistor ? "R" + std::to_string(++r) : "C" + std::to_string(++c));

    net.response.kind = shape.kind;
    const std::string in = nodeName(1);
    const std::string out = nodeName(shape.nodes);
    net.response.input = {in, kGroundNode};
    net.response.output = shape.kind == ResponseKind::Impedance ? net.response.input
                                                                : std::array<std::string, 2>{out, kGroundNode};
    return net;
}

}  // namespace tauline::testing
