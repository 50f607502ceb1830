#include "NodalModel.h"

#include "Errors.h"

#include <algorithm>
#include <map>
#include <numeric>
#include <set>

namespace tauline {

namespace {

// Union-find over node names; small and local to topology questions.
class NodeSets {
public:
    int add(const std::string& name)
    {
        auto [it, inserted] = index_.emplace(name, static_cast<int>(parent_.size()));
        if (inserted)
            parent_.push_back(it->second);
        return it->second;
    }
    int find(int i)
    {
        while (parent_[i] != i)
            i = parent_[i] = parent_[parent_[i]];
        return i;
    }
    void join(int a, int b) { parent_[find(a)] = find(b); }
    bool has(const std::string& name) const { return index_.count(name) != 0; }
    int at(const std::string& name) const { return index_.at(name); }

private:
    std::map<std::string, int> index_;
    std::vector<int> parent_;
};

std::vector<std::string> responseNodes(const ResponseSpec& r)
{
    if (r.kind == ResponseKind::Impedance)
        return {r.input[0], r.input[1]};
    return {r.input[0], r.input[1], r.output[0], r.output[1]};
}

std::string joinNames(const std::vector<std::string>& names)
{
    std::string out;
    for (const auto& n : names)
        out += (out.empty() ? "" : ", ") + n;
    return out;
}

void checkResponse(const Network& network, NodeSets& sets)
{
    const ResponseSpec& r = network.response;
    std::vector<std::string> problems;
    auto checkPair = [&](const std::array<std::string, 2>& pair, const char* field) {
        for (const auto& node : pair)
            if (!sets.has(node))
                problems.push_back(std::string("response ") + field + ": node '" + node +
                                   "' is not touched by any part");
        if (pair[0] == pair[1])
            problems.push_back(std::string("response ") + field + ": both ends are node '" + pair[0] +
                               "', so the response is undefined");
    };
    if (r.kind == ResponseKind::Impedance) {
        checkPair(r.input, "port");
    } else {
        checkPair(r.input, "input");
        checkPair(r.output, "output");
    }
    if (!problems.empty())
        throw InputError(problems);
    for (const auto& node : responseNodes(r))
        if (sets.find(sets.at(node)) != sets.find(sets.at(r.input[0]))) {
            throw InputError(std::string("response: node '") + node + "' has no path at all to node '" +
                             r.input[0] + "' (they are in separate pieces), so the response is " +
                             (r.kind == ResponseKind::Impedance ? "undefined" : "zero at every frequency"));
        }
}

}  // namespace

NodalModel buildNodalModel(const Network& network)
{
    NodeSets sets;
    for (const Part& part : network.parts) {
        if (part.kind != PartKind::Resistor && part.kind != PartKind::Capacitor)
            throw InputError("part " + part.name + ": kind '" + kindName(part.kind) +
                             "' is not supported by this build yet");
        if (part.nodes[0] == part.nodes[1])
            throw InputError("part " + part.name + ": both ends are on node '" + part.nodes[0] + "'");
        if (!(part.value > 0.0) || !std::isfinite(part.value))
            throw InputError("part " + part.name + ": value must be positive and finite");
        sets.join(sets.add(part.nodes[0]), sets.add(part.nodes[1]));
    }
    checkResponse(network, sets);

    NodalModel model;
    model.kind = network.response.kind;
    const int responsePiece = sets.find(sets.at(network.response.input[0]));

    std::vector<const Part*> kept;
    std::vector<std::string> leftOut;
    bool groundTouched = false;
    for (const Part& part : network.parts) {
        if (sets.find(sets.at(part.nodes[0])) == responsePiece) {
            kept.push_back(&part);
            groundTouched |= part.nodes[0] == kGroundNode || part.nodes[1] == kGroundNode;
        } else {
            leftOut.push_back(part.name);
        }
    }
    if (!leftOut.empty())
        model.warnings.push_back("parts " + joinNames(leftOut) +
                                 " form a separate piece connected to none of the response's nodes; left out");

    // The input's (or port's) negative node is the reference when no part of
    // the response's piece touches gnd.
    model.referenceNode = groundTouched ? std::string(kGroundNode) : network.response.input[1];

    std::map<std::string, int> nodeIndex;
    for (const Part* part : kept)
        for (const auto& node : part->nodes)
            if (node != model.referenceNode && !nodeIndex.count(node)) {
                nodeIndex[node] = static_cast<int>(model.nodeNames.size());
                model.nodeNames.push_back(node);
            }
    auto indexOf = [&](const std::string& node) { return node == model.referenceNode ? -1 : nodeIndex.at(node); };

    const int nodes = static_cast<int>(model.nodeNames.size());
    const bool voltageSource = model.kind == ResponseKind::VoltageGain;
    const int n = nodes + (voltageSource ? 1 : 0);
    model.G = Eigen::MatrixXd::Zero(n, n);
    model.C = Eigen::MatrixXd::Zero(n, n);
    model.b = Eigen::VectorXd::Zero(n);
    model.c = Eigen::VectorXd::Zero(n);

    model.extendedG = NodalModel::ExtendedMatrix::Zero(n, n);
    model.extendedC = NodalModel::ExtendedMatrix::Zero(n, n);
    auto stamp = [](auto& m, int a, int b, auto y) {
        if (a >= 0) m(a, a) += y;
        if (b >= 0) m(b, b) += y;
        if (a >= 0 && b >= 0) {
            m(a, b) -= y;
            m(b, a) -= y;
        }
    };

    int capacitors = 0;
    for (const Part* part : kept)
        capacitors += part->kind == PartKind::Capacitor ? 1 : 0;
    model.ports = Eigen::MatrixXd::Zero(n, capacitors);
    model.capacitance = Eigen::VectorXd::Zero(capacitors);

    double minR = std::numeric_limits<double>::infinity();
    double minC = std::numeric_limits<double>::infinity();
    for (const Part* part : kept) {
        const int a = indexOf(part->nodes[0]);
        const int b = indexOf(part->nodes[1]);
        if (part->kind == PartKind::Resistor) {
            stamp(model.G, a, b, 1.0 / part->value);
            stamp(model.extendedG, a, b, 1.0L / part->value);
            model.resistorEdges.push_back({a, b, part->value});
            model.sumResistance += part->value;
            minR = std::min(minR, part->value);
            ++model.resistorCount;
        } else {
            const int k = static_cast<int>(model.capacitorNames.size());
            stamp(model.C, a, b, part->value);
            stamp(model.extendedC, a, b, static_cast<long double>(part->value));
            if (a >= 0) model.ports(a, k) = 1.0;
            if (b >= 0) model.ports(b, k) = -1.0;
            model.capacitance(k) = part->value;
            model.capacitorNames.push_back(part->name);
            model.capacitorNodes.push_back({a, b});
            model.sumCapacitance += part->value;
            minC = std::min(minC, part->value);
        }
    }
    model.minResistance = std::isfinite(minR) ? minR : 1.0;
    model.minCapacitance = std::isfinite(minC) ? minC : 1.0;
    if (model.sumResistance == 0.0)
        model.sumResistance = 1.0;
    if (model.sumCapacitance == 0.0)
        model.sumCapacitance = 1.0;

    const ResponseSpec& r = network.response;
    model.inputNodes = {indexOf(r.input[0]), indexOf(r.input[1])};
    model.outputNodes = r.kind == ResponseKind::Impedance ? model.inputNodes
                                                          : std::array<int, 2>{indexOf(r.output[0]), indexOf(r.output[1])};
    auto setPair = [](Eigen::VectorXd& v, std::array<int, 2> pair) {
        if (pair[0] >= 0) v(pair[0]) += 1.0;
        if (pair[1] >= 0) v(pair[1]) -= 1.0;
    };
    if (voltageSource) {
        model.sourceRow = nodes;
        // V(p) - V(n) = u; the source's current enters the KCL rows.
        for (int side = 0; side < 2; ++side) {
            const int node = model.inputNodes[side];
            if (node < 0)
                continue;
            const double sign = side == 0 ? 1.0 : -1.0;
            model.G(node, nodes) += sign;
            model.G(nodes, node) += sign;
            model.extendedG(node, nodes) += sign;
            model.extendedG(nodes, node) += sign;
        }
        model.b(nodes) = 1.0;
    } else {
        setPair(model.b, model.inputNodes);
    }
    setPair(model.c, model.outputNodes);
    return model;
}

std::vector<int> dcComponents(const NodalModel& model, const std::vector<NodalModel::Edge>& extraEdges)
{
    // Node k is stored at k + 1; the reference at 0.
    const int count = model.nodeCount() + 1;
    std::vector<int> parent(count);
    std::iota(parent.begin(), parent.end(), 0);
    auto find = [&](int i) {
        while (parent[i] != i)
            i = parent[i] = parent[parent[i]];
        return i;
    };
    auto join = [&](const NodalModel::Edge& e) {
        const int ra = find(e.a + 1);
        const int rb = find(e.b + 1);
        if (ra != rb)
            parent[std::max(ra, rb)] = std::min(ra, rb);  // keeps the reference as root 0
    };
    for (const auto& e : model.resistorEdges)
        join(e);
    for (const auto& e : extraEdges)
        join(e);
    std::map<int, int> label{{find(0), 0}};
    std::vector<int> out(model.nodeCount());
    for (int k = 0; k < model.nodeCount(); ++k) {
        const int root = find(k + 1);
        auto [it, inserted] = label.emplace(root, static_cast<int>(label.size()));
        out[k] = it->second;
    }
    return out;
}

NodalModel anchorFloatingPieces(const NodalModel& model)
{
    std::vector<NodalModel::Edge> sourceEdge;
    if (model.kind == ResponseKind::VoltageGain)
        sourceEdge.push_back({model.inputNodes[0], model.inputNodes[1]});
    const std::vector<int> piece = dcComponents(model, sourceEdge);
    std::map<int, int> anchorOf;  // piece label -> anchor node
    for (int k = 0; k < model.nodeCount(); ++k)
        if (piece[k] != 0)
            anchorOf.emplace(piece[k], k);
    if (anchorOf.empty())
        return model;

    // v = T·y: a floating node's voltage is its anchor's plus its own
    // coordinate. Everything stamped through the incidence of a node pair
    // goes through Tᵀ, which on integer vectors is exact.
    const int n = model.unknowns();
    auto anchor = [&](int node) { return node >= 0 && piece[node] != 0 ? anchorOf.at(piece[node]) : -1; };
    auto liftRows = [&](Eigen::MatrixXd m) {  // Tᵀ·m
        for (int k = 0; k < model.nodeCount(); ++k) {
            const int a = anchor(k);
            if (a >= 0 && a != k)
                m.row(a) += m.row(k);
        }
        return m;
    };
    NodalModel out = model;
    out.b = liftRows(model.b);
    out.c = liftRows(model.c);
    out.ports = liftRows(model.ports);
    out.C = out.ports * model.capacitance.asDiagonal() * out.ports.transpose();
    out.extendedC = out.ports.cast<long double>() * model.capacitance.cast<long double>().asDiagonal() *
                    out.ports.cast<long double>().transpose();

    // Resistors: stamped on differences of the new coordinates, where an
    // anchor's own coordinate cancels inside its piece.
    out.G = Eigen::MatrixXd::Zero(n, n);
    out.extendedG = NodalModel::ExtendedMatrix::Zero(n, n);
    auto coordinate = [&](int node) { return node >= 0 && anchor(node) == node ? -1 : node; };
    auto stamp = [](auto& m, int a, int b, auto y) {
        if (a >= 0) m(a, a) += y;
        if (b >= 0) m(b, b) += y;
        if (a >= 0 && b >= 0) {
            m(a, b) -= y;
            m(b, a) -= y;
        }
    };
    for (const auto& e : model.resistorEdges) {
        stamp(out.G, coordinate(e.a), coordinate(e.b), 1.0 / e.resistance);
        stamp(out.extendedG, coordinate(e.a), coordinate(e.b), 1.0L / e.resistance);
    }
    if (model.sourceRow >= 0) {
        // The source's stamps are ±1: Tᵀ·G·T on them is exact.
        Eigen::MatrixXd source = Eigen::MatrixXd::Zero(n, n);
        source.row(model.sourceRow) = model.G.row(model.sourceRow);
        source.col(model.sourceRow) = model.G.col(model.sourceRow);
        source = liftRows(source);
        source = liftRows(source.transpose()).transpose();
        out.G += source;
        out.extendedG += source.cast<long double>();
    }
    return out;
}

Eigen::MatrixXd borderedByResponse(const NodalModel& model)
{
    const int n = model.unknowns();
    Eigen::MatrixXd out = Eigen::MatrixXd::Zero(n + 1, n + 1);
    out.topLeftCorner(n, n) = model.G;
    out.block(0, n, n, 1) = model.b;
    out.block(n, 0, 1, n) = model.c.transpose();
    return out;
}

}  // namespace tauline
