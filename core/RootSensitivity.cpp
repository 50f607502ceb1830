#include "RootSensitivity.h"

#include "EquilibratedLu.h"

#include <cmath>
#include <map>

namespace tauline {

namespace {

using cd = std::complex<double>;
using MatrixC = Eigen::MatrixXcd;

struct Pencil {
    Eigen::MatrixXd a0;
    Eigen::MatrixXd a1;
};

Pencil pencilFor(const NodalModel& model, RootType type)
{
    if (type == RootType::Pole)
        return {model.G, model.C};
    // The zeros' pencil, bordered as in ExactResponse: the output held at
    // zero while the input is free.
    const int n = model.unknowns();
    Pencil p;
    p.a0 = borderedByResponse(model);
    p.a1 = Eigen::MatrixXd::Zero(n + 1, n + 1);
    p.a1.topLeftCorner(n, n) = model.C;
    return p;
}

// Two fixed, unrelated start vectors for inverse iteration: a null space of
// dimension two (a double root with two eigenvectors) shows as two results
// that are not parallel.
MatrixC startVectors(int n)
{
    MatrixC v(n, 2);
    for (int i = 0; i < n; ++i) {
        v(i, 0) = cd(std::cos(0.7 * i + 0.3), std::sin(1.3 * i + 0.1));
        v(i, 1) = cd(std::sin(2.9 * i + 1.1), std::cos(0.37 * i * i + 0.5));
    }
    return v;
}

void normaliseColumns(MatrixC& m)
{
    for (int j = 0; j < m.cols(); ++j) {
        const double norm = m.col(j).norm();
        if (norm > 0.0 && std::isfinite(norm))
            m.col(j) /= norm;
    }
}

// Null vectors of a nearly singular A by two steps of inverse iteration
// (the computed root is off by rounding, so A is singular only to rounding;
// one solve already amplifies the null direction by 1/that).
// Returns false when the null space looks two-dimensional.
bool nullVector(const MatrixC& a, Eigen::VectorXcd& out)
{
    // A row or column of exact zeros (a root hit to the last bit) leaves
    // nothing to scale: the caller nudges the root.
    const Eigen::MatrixXd magnitude = a.cwiseAbs();
    if (!(magnitude.rowwise().maxCoeff().minCoeff() > 0.0) || !(magnitude.colwise().maxCoeff().minCoeff() > 0.0))
        return false;
    const EquilibratedLu<cd> lu(a);
    MatrixC v = startVectors(static_cast<int>(a.rows()));
    for (int step = 0; step < 2; ++step) {
        v = lu.solve(v, 0);
        if (!v.allFinite())
            return false;
        normaliseColumns(v);
    }
    const double parallel = std::abs(v.col(0).dot(v.col(1)));
    out = v.col(0);
    return parallel > 1.0 - 1e-8;
}

std::optional<cd> refinedRoot(const Pencil& p, cd s, Eigen::VectorXcd& x, Eigen::VectorXcd& y)
{
    // A root exactly on a singular point of rounding leaves a zero pivot:
    // a nudge far below the root's own accuracy avoids it.
    for (int attempt = 0; attempt < 3; ++attempt) {
        const cd at = s * (1.0 + (attempt == 0 ? 0.0 : std::pow(10.0, attempt - 14)));
        const MatrixC a = p.a0.cast<cd>() + at * p.a1.cast<cd>();
        if (!nullVector(a, x) || !nullVector(a.transpose(), y))
            continue;
        const cd den = y.transpose() * p.a1.cast<cd>() * x;
        const cd num = y.transpose() * a * x;
        const double scale = (p.a1.cast<cd>() * x).norm() * y.norm();
        // yᵀ·A1·x vanishes for a defective (double) root.
        if (!(std::abs(den) > 1e-7 * scale))
            return std::nullopt;
        const cd step = -num / den;
        return std::abs(step) < 1e-6 * std::abs(at) ? at + step : at;
    }
    return std::nullopt;
}

}  // namespace

std::vector<PartStamp> partStamps(const NodalModel& model, const Network& network)
{
    std::map<std::string, int> index;
    for (std::size_t k = 0; k < model.nodeNames.size(); ++k)
        index[model.nodeNames[k]] = static_cast<int>(k);
    std::vector<PartStamp> out(network.parts.size());
    for (std::size_t i = 0; i < network.parts.size(); ++i) {
        const Part& part = network.parts[i];
        PartStamp& stamp = out[i];
        stamp.kind = part.kind;
        stamp.value = part.value;
        // The model keeps a part when it lies in the response's piece; the
        // nodes of a separate piece never reach the model's node list.
        stamp.inModel = true;
        for (int side = 0; side < 2; ++side) {
            const std::string& node = part.nodes[side];
            if (node == model.referenceNode) {
                stamp.nodes[side] = -1;
            } else if (auto it = index.find(node); it != index.end()) {
                stamp.nodes[side] = it->second;
            } else {
                stamp.inModel = false;
            }
        }
        stamp.inModel = stamp.inModel && (part.kind == PartKind::Resistor || part.kind == PartKind::Capacitor);
    }
    return out;
}

std::optional<std::vector<cd>> rootDerivatives(const NodalModel& model, const std::vector<PartStamp>& stamps,
                                               RootType type, cd root)
{
    if (root == cd(0.0, 0.0))
        return std::nullopt;  // the origin is no corner and moves with no part
    const Pencil p = pencilFor(model, type);
    Eigen::VectorXcd x, y;
    const auto s = refinedRoot(p, root, x, y);
    if (!s)
        return std::nullopt;
    const cd den = y.transpose() * p.a1.cast<cd>() * x;
    auto across = [](const Eigen::VectorXcd& v, const std::array<int, 2>& nodes) {
        cd d = 0.0;
        if (nodes[0] >= 0)
            d += v(nodes[0]);
        if (nodes[1] >= 0)
            d -= v(nodes[1]);
        return d;
    };
    std::vector<cd> out(stamps.size(), cd(0.0, 0.0));
    for (std::size_t i = 0; i < stamps.size(); ++i) {
        const PartStamp& part = stamps[i];
        if (!part.inModel)
            continue;
        const cd coupling = across(y, part.nodes) * across(x, part.nodes) / den;
        out[i] = part.kind == PartKind::Resistor ? coupling / part.value : -(*s) * part.value * coupling;
    }
    return out;
}

double normalisedCornerSensitivity(cd root, cd dsDlnx)
{
    const double magnitude = std::norm(root);
    return magnitude > 0.0 ? (std::conj(root) * dsDlnx).real() / magnitude : 0.0;
}

}  // namespace tauline
