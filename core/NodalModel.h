#pragma once

#include "Network.h"

#include <Eigen/Dense>
#include <string>
#include <vector>

namespace tauline {

// The modified nodal description of a network's response, reduced to the
// piece that carries it:  (G + s·C)·x = b·u,  y = cᵀ·x.  Unknowns are the
// non-reference node voltages, plus the input source's current for a
// voltage gain. C = P·diag(capacitance)·Pᵀ: P holds one incidence column per
// capacitor, the "ports" of the time-constant engine.
struct NodalModel {
    ResponseKind kind = ResponseKind::Impedance;
    std::vector<std::string> nodeNames;  // index = unknown index (voltages first)
    std::string referenceNode;
    int sourceRow = -1;  // voltage gain: the source's branch equation

    Eigen::MatrixXd G;
    Eigen::MatrixXd C;
    // G and C with their entries summed in extended precision: the exact
    // relations between entries (rows of a piece summing to zero, a
    // dead-end branch carrying no current) hold there to 1e-19, and
    // near-cancelling responses rest on them (see EquilibratedLu).
    using ExtendedMatrix = Eigen::Matrix<long double, Eigen::Dynamic, Eigen::Dynamic>;
    ExtendedMatrix extendedG;
    ExtendedMatrix extendedC;
    Eigen::VectorXd b;
    Eigen::VectorXd c;

    Eigen::MatrixXd ports;               // P, unknowns × capacitors
    Eigen::VectorXd capacitance;         // farads, per port
    std::vector<std::string> capacitorNames;
    std::vector<std::array<int, 2>> capacitorNodes;  // node indices, -1 = reference

    // Resistive topology, for exact (not numerical) decisions about DC paths.
    struct Edge {
        int a = -1;
        int b = -1;  // node indices, -1 = reference
        double resistance = 0.0;  // ohms, for a resistor
    };
    std::vector<Edge> resistorEdges;
    std::array<int, 2> inputNodes{-1, -1};
    std::array<int, 2> outputNodes{-1, -1};

    double sumResistance = 0.0;   // bounds on the network's time scales
    double sumCapacitance = 0.0;
    double minResistance = 0.0;
    double minCapacitance = 0.0;
    int resistorCount = 0;

    std::vector<std::string> warnings;

    int unknowns() const { return static_cast<int>(G.rows()); }
    int nodeCount() const { return sourceRow >= 0 ? unknowns() - 1 : unknowns(); }
    int capacitorCount() const { return static_cast<int>(capacitance.size()); }
};

// Builds the model; drops parts in separate pieces (with a warning) and
// throws InputError when the response cannot be defined by this network.
NodalModel buildNodalModel(const Network& network);

// Components of the resistive graph formed by the resistors plus the given
// extra edges, over the model's nodes. Label per node; the reference's
// component is labelled 0, so a node labelled 0 has a DC path to it.
std::vector<int> dcComponents(const NodalModel& model, const std::vector<NodalModel::Edge>& extraEdges);

// The same model in coordinates where each piece with no DC path to the
// reference (through resistors or the input's voltage source) is described
// by one node's voltage (its anchor) and the other nodes' voltages relative
// to it. The change of unknowns has determinant 1, so the pencil's roots
// are the same; but the resistors are stamped on differences alone, so the
// anchors' rows and columns of G are exactly zero instead of summing to
// rounding: a floating piece's root at the origin stays exactly there, and
// the rounding of those sums no longer moves the other roots (by 1e-8
// relative on some networks).
NodalModel anchorFloatingPieces(const NodalModel& model);

// G bordered by the input column b and the output row cᵀ: with C in the
// same corner it is the zeros' pencil, singular exactly where the response
// is zero (the output held at 0 V, the input free).
Eigen::MatrixXd borderedByResponse(const NodalModel& model);

}  // namespace tauline
