// Seeded random series–parallel RC networks: built by nesting series and
// parallel connections of resistors and capacitors between the input's two
// nodes, so the network with any capacitor's ends as terminals has no K4
// minor, and every resistance the time-constant view asks for reduces
// series–parallel (Duffin, "Topology of series-parallel networks", J. Math.
// Anal. Appl. 10, 1965). Values are inputs only, drawn log-uniformly.
#pragma once

#include "Network.h"

#include <cmath>
#include <random>
#include <string>

namespace tauline::testing {

struct SeriesParallelShape {
    int maxParts = 12;
    double capacitorShare = 0.35;
    double minR = 10.0, maxR = 1e6;
    double minC = 1e-11, maxC = 1e-5;
    ResponseKind kind = ResponseKind::Impedance;
};

class SeriesParallelBuilder {
public:
    SeriesParallelBuilder(std::mt19937& rng, const SeriesParallelShape& shape) : rng_(rng), shape_(shape) {}

    Network build()
    {
        Network net;
        net.title = "random series-parallel";
        nodes_ = 1;  // n1; gnd is the other end
        const int budget = std::uniform_int_distribution<int>(2, shape_.maxParts)(rng_);
        grow(net, "n1", std::string(kGroundNode), budget);
        int r = 0;
        int c = 0;
        for (auto& p : net.parts)
            p.name = p.kind == PartKind::Resistor ? "R" + std::to_string(++r) : "C" + std::to_string(++c);
        net.response.kind = shape_.kind;
        net.response.input = {"n1", kGroundNode};
        // The output: the node made last (or n1 when there is no other).
        const std::string out = nodes_ > 1 ? "n" + std::to_string(nodes_) : "n1";
        net.response.output = shape_.kind == ResponseKind::Impedance
                                  ? net.response.input
                                  : std::array<std::string, 2>{out, kGroundNode};
        return net;
    }

private:
    double logUniform(double lo, double hi)
    {
        std::uniform_real_distribution<double> u(std::log(lo), std::log(hi));
        return std::exp(u(rng_));
    }

    void grow(Network& net, const std::string& a, const std::string& b, int budget)
    {
        std::uniform_real_distribution<double> u(0.0, 1.0);
        if (budget <= 1) {
            Part p;
            p.kind = u(rng_) < shape_.capacitorShare ? PartKind::Capacitor : PartKind::Resistor;
            p.value = p.kind == PartKind::Resistor ? logUniform(shape_.minR, shape_.maxR)
                                                   : logUniform(shape_.minC, shape_.maxC);
            p.nodes = {a, b};
            net.parts.push_back(p);
            return;
        }
        const int left = std::uniform_int_distribution<int>(1, budget - 1)(rng_);
        if (u(rng_) < 0.5) {
            const std::string middle = "n" + std::to_string(++nodes_);
            grow(net, a, middle, left);
            grow(net, middle, b, budget - left);
        } else {
            grow(net, a, b, left);
            grow(net, a, b, budget - left);
        }
    }

    std::mt19937& rng_;
    SeriesParallelShape shape_;
    int nodes_ = 1;
};

}  // namespace tauline::testing
