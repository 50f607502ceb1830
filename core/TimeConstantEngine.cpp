#include "TimeConstantEngine.h"

#include "EquilibratedLu.h"
#include "RootPolynomial.h"

#include <Eigen/Eigenvalues>
#include <algorithm>
#include <cmath>
#include <map>

namespace tauline {

namespace {

using Edge = NodalModel::Edge;

// Eigenvalues below this fraction of the largest are rounding: a capacitor
// loop's zero time constant, an order that drops.
constexpr double kZeroEigenvalue = 1e-13;

int labelOf(const std::vector<int>& labels, int node)
{
    return node < 0 ? 0 : labels[node];
}

// One indicator vector per floating DC component (no path to the
// reference), over the first `nodes` unknowns, padded to `size`.
std::vector<Eigen::VectorXd> floatingVectors(const std::vector<int>& labels, int size)
{
    std::map<int, Eigen::VectorXd> byLabel;
    for (int k = 0; k < static_cast<int>(labels.size()); ++k) {
        if (labels[k] == 0)
            continue;
        auto [it, inserted] = byLabel.try_emplace(labels[k], Eigen::VectorXd::Zero(size));
        it->second(k) = 1.0;
    }
    std::vector<Eigen::VectorXd> out;
    for (auto& [label, v] : byLabel)
        out.push_back(v.normalized());
    return out;
}

// Port resistances of the state whose nodal matrix is `m` (ports in its
// first rows) and whose DC components are `labels`. A floating component's
// indicator w is both a left and a right null vector of m; adding w·wᵀ makes
// m regular without changing the voltages across ports that lie inside one
// component, which are the only finite ones.
PortResistance portResistance(const NodalModel& model, Eigen::MatrixXd m, const std::vector<int>& labels)
{
    PortResistance out;
    // The same matrix with G's entries summed in extended precision: a null
    // resistance that is exactly zero (a port the nulling shorts) is a
    // cancellation of node voltages, and only refinement against the exact
    // sums, with the last correction kept apart, brings it to rounding of
    // the result rather than of the voltages.
    using Extended = long double;
    Eigen::Matrix<Extended, Eigen::Dynamic, Eigen::Dynamic> exact = m.cast<Extended>();
    exact.topLeftCorner(model.unknowns(), model.unknowns()) = model.extendedG;
    for (const auto& w : floatingVectors(labels, static_cast<int>(m.rows()))) {
        m += w * w.transpose();
        exact += (w * w.transpose()).cast<Extended>();
    }
    const EquilibratedLu<double> lu(m, exact);
    if (!lu.regular())
        return out;
    const int n = model.capacitorCount();
    Eigen::MatrixXd p = Eigen::MatrixXd::Zero(m.rows(), n);
    p.topRows(model.unknowns()) = model.ports;
    const Eigen::MatrixXd x = lu.solve(p);
    const Eigen::MatrixXd correction = lu.solve(lu.residual(p, x).cast<double>(), 0);
    const auto pExt = p.cast<Extended>();
    out.r = (pExt.transpose() * (x.cast<Extended>() + correction.cast<Extended>())).cast<double>();
    out.finite.resize(n);
    for (int i = 0; i < n; ++i) {
        const auto& nodes = model.capacitorNodes[i];
        out.finite[i] = labelOf(labels, nodes[0]) == labelOf(labels, nodes[1]);
    }
    out.defined = true;
    return out;
}

Eigen::MatrixXd bordered(const Eigen::MatrixXd& g, const Eigen::MatrixXd& columns, const Eigen::MatrixXd& rows)
{
    const auto n = g.rows();
    const auto k = columns.cols();
    Eigen::MatrixXd out = Eigen::MatrixXd::Zero(n + k, n + k);
    out.topLeftCorner(n, n) = g;
    out.topRightCorner(n, k) = columns;
    out.bottomLeftCorner(k, n) = rows.transpose();
    return out;
}

std::vector<Edge> sourceEdges(const NodalModel& model)
{
    if (model.kind == ResponseKind::VoltageGain)
        return {{model.inputNodes[0], model.inputNodes[1]}};
    return {};
}

std::vector<double> trimmed(std::vector<double> poly)
{
    while (poly.size() > 1 && poly.back() == 0.0)
        poly.pop_back();
    return poly;
}

}  // namespace

bool PortResistance::allFinite() const
{
    return defined && std::all_of(finite.begin(), finite.end(), [](bool f) { return f; });
}

TimeConstantEngine::TimeConstantEngine(const NodalModel& model, const ExactResponse& exact) : model_(model)
{
    // H⁰ from the uncancelled polynomials: a pole and zero that cancel
    // within the tolerance still shift the reduced constant by their distance.
    if (exact.dc.kind == LimitKind::Finite && exact.dc.value != 0.0)
        dcValue_ = exact.rawDenominator.front() != 0.0 ? exact.rawNumerator.front() / exact.rawDenominator.front()
                                                        : exact.dc.value;

    const std::vector<int> openLabels = dcComponents(model, sourceEdges(model));
    opened_ = portResistance(model, model.G, openLabels);

    if (model.kind == ResponseKind::Impedance) {
        // Nulling an impedance's response shorts its port.
        const std::vector<int> labels = dcComponents(model, {{model.inputNodes[0], model.inputNodes[1]}});
        nulled_ = portResistance(model, bordered(model.G, model.b, model.c), labels);
    } else if (dcValue_) {
        // Null double injection: the input is free, the output held at zero.
        // It is regular when every floating component stays clear of the
        // input and output; otherwise it has no unique solution.
        bool clear = true;
        for (const auto& w : floatingVectors(openLabels, model.unknowns()))
            clear = clear && std::abs(w.dot(model.b)) < 1e-12 && std::abs(w.dot(model.c)) < 1e-12;
        if (clear)
            nulled_ = portResistance(model, bordered(model.G, model.b, model.c), openLabels);
    }
}

std::vector<ElementTimeConstant> TimeConstantEngine::firstOrder() const
{
    std::vector<ElementTimeConstant> out;
    for (int i = 0; i < model_.capacitorCount(); ++i) {
        ElementTimeConstant e;
        e.element = model_.capacitorNames[i];
        const double c = model_.capacitance(i);
        if (opened_.defined && opened_.finite[i]) {
            e.r = std::max(0.0, opened_.r(i, i));
            e.tau = *e.r * c;
        }
        if (nulled_.defined && nulled_.finite[i]) {
            e.rNull = nulled_.r(i, i);
            e.tauNull = *e.rNull * c;
        }
        out.push_back(e);
    }
    return out;
}

std::optional<double> TimeConstantEngine::resistanceSeen(int j, const std::vector<int>& shorted) const
{
    if (shorted.empty())
        return opened_.defined && opened_.finite[j] ? std::optional<double>(opened_.r(j, j)) : std::nullopt;
    if (std::find(shorted.begin(), shorted.end(), j) != shorted.end())
        return 0.0;

    // Shorted ports become 0-V sources: the nodal matrix bordered by their
    // incidence columns, and their edges join DC components.
    Eigen::MatrixXd columns(model_.unknowns(), static_cast<int>(shorted.size()));
    std::vector<Edge> edges = sourceEdges(model_);
    for (size_t k = 0; k < shorted.size(); ++k) {
        columns.col(static_cast<int>(k)) = model_.ports.col(shorted[k]);
        const auto& nodes = model_.capacitorNodes[shorted[k]];
        edges.push_back({nodes[0], nodes[1]});
    }
    const std::vector<int> labels = dcComponents(model_, edges);
    const auto& nodes = model_.capacitorNodes[j];
    if (labelOf(labels, nodes[0]) != labelOf(labels, nodes[1]))
        return std::nullopt;

    Eigen::MatrixXd m = bordered(model_.G, columns, columns);
    for (const auto& w : floatingVectors(labels, static_cast<int>(m.rows())))
        m += w * w.transpose();
    const EquilibratedLu<double> lu(m);
    if (!lu.regular())
        return std::nullopt;
    Eigen::VectorXd p = Eigen::VectorXd::Zero(m.rows());
    p.head(model_.unknowns()) = model_.ports.col(j);
    return std::max(0.0, p.dot(lu.solve(p).col(0)));
}

std::vector<PairTimeConstant> TimeConstantEngine::secondOrder() const
{
    std::vector<PairTimeConstant> out;
    const int n = model_.capacitorCount();
    for (int i = 0; i < n; ++i) {
        for (int j = 0; j < n; ++j) {
            if (i == j)
                continue;
            PairTimeConstant pair;
            pair.element = model_.capacitorNames[j];
            pair.shorted = model_.capacitorNames[i];
            std::optional<double> r;
            if (opened_.defined && opened_.finite[i] && opened_.finite[j]) {
                // Schur complement: shorting port i removes its share.
                const double rii = opened_.r(i, i);
                const double rjj = opened_.r(j, j);
                r = rii > 1e-300 ? rjj - opened_.r(j, i) * opened_.r(i, j) / rii : rjj;
                r = std::max(0.0, *r);
            } else {
                r = resistanceSeen(j, {i});
            }
            pair.r = r;
            if (r)
                pair.tau = *r * model_.capacitance(j);
            out.push_back(pair);
        }
    }
    return out;
}

std::optional<double> TimeConstantEngine::transferConstant(const std::vector<int>& shorted) const
{
    Eigen::MatrixXd columns(model_.unknowns(), static_cast<int>(shorted.size()));
    for (size_t k = 0; k < shorted.size(); ++k)
        columns.col(static_cast<int>(k)) = model_.ports.col(shorted[k]);
    const Eigen::MatrixXd m = bordered(model_.G, columns, columns);
    const EquilibratedLu<double> lu(m);
    if (!lu.regular())
        return std::nullopt;
    Eigen::VectorXd rhs = Eigen::VectorXd::Zero(m.rows());
    rhs.head(model_.unknowns()) = model_.b;
    Eigen::VectorXd out = Eigen::VectorXd::Zero(m.rows());
    out.head(model_.unknowns()) = model_.c;
    return out.dot(lu.solve(rhs).col(0));
}

namespace {

// Eigen-decomposition K = Q·diag(λ)·Qᵀ of a symmetric positive semi-definite
// matrix, as the squared singular values and left singular vectors of a
// pivoted Cholesky factor by one-sided Jacobi: the λ keep their relative
// accuracy when the diagonal spans decades (Demmel & Veselić, "Jacobi's
// method is more accurate than QR", SIAM J. Matrix Anal. Appl. 13(4), 1992).
struct SymmetricEigen {
    Eigen::VectorXd lambda;
    Eigen::MatrixXd q;
};

SymmetricEigen accurateEigen(const Eigen::MatrixXd& k)
{
    const Eigen::LDLT<Eigen::MatrixXd> ldlt(0.5 * (k + k.transpose()));
    const Eigen::VectorXd d = ldlt.vectorD().cwiseMax(0.0).cwiseSqrt();
    const Eigen::MatrixXd factor =
        ldlt.transpositionsP().transpose() * (Eigen::MatrixXd(ldlt.matrixL()) * d.asDiagonal());
    const Eigen::JacobiSVD<Eigen::MatrixXd> svd(factor, Eigen::ComputeThinU);
    SymmetricEigen out;
    out.lambda = svd.singularValues().cwiseAbs2();
    out.q = svd.matrixU();
    const double largest = out.lambda.size() ? out.lambda.maxCoeff() : 0.0;
    for (int i = 0; i < out.lambda.size(); ++i)
        if (out.lambda(i) <= kZeroEigenvalue * largest)
            out.lambda(i) = 0.0;
    return out;
}

std::vector<std::complex<double>> asComplex(const Eigen::VectorXd& v)
{
    return std::vector<std::complex<double>>(v.data(), v.data() + v.size());
}

}  // namespace

std::optional<std::vector<double>> TimeConstantEngine::denominator() const
{
    if (!opened_.allFinite())
        return std::nullopt;
    const Eigen::VectorXd root = model_.capacitance.cwiseSqrt();
    const SymmetricEigen eig = accurateEigen(root.asDiagonal() * opened_.r * root.asDiagonal());
    return trimmed(elementarySymmetric(asComplex(eig.lambda)));
}

std::optional<std::vector<double>> TimeConstantEngine::numerator() const
{
    // Nulling the response is a rank-one change of the port matrix,
    // Rᴺ = R − h_out·h_inᵀ/H⁰ (h_in: port voltages per unit input, h_out:
    // output per unit port current), so with K = C^½RC^½ = Q·Λ·Qᵀ
    //   N(s) = H⁰·[Π(1 + sλ_k) − s·Σ_k α_k·β_k·Π_{j≠k}(1 + sλ_j)],
    // α = Qᵀ·C^½·h_in, β = Qᵀ·C^½·h_out/H⁰: the time-constant sums of the
    // numerator from the denominator's accurate eigenvalues.
    if (!dcValue_ || !opened_.allFinite())
        return std::nullopt;
    const Eigen::VectorXd root = model_.capacitance.cwiseSqrt();
    if (model_.kind == ResponseKind::Impedance && nulled_.allFinite()) {
        // Port shorted: Rᴺ is itself a symmetric resistance matrix.
        const SymmetricEigen eig = accurateEigen(root.asDiagonal() * nulled_.r * root.asDiagonal());
        std::vector<double> poly = elementarySymmetric(asComplex(eig.lambda));
        for (auto& a : poly)
            a *= *dcValue_;
        return trimmed(poly);
    }
    const EquilibratedLu<double> lu(model_.G);
    if (!lu.regular())
        return std::nullopt;
    const Eigen::VectorXd toInput = lu.solve(model_.b).col(0);
    const Eigen::VectorXd fromOutput = EquilibratedLu<double>(model_.G.transpose()).solve(model_.c).col(0);
    const double h0 = model_.c.dot(toInput);
    const SymmetricEigen eig = accurateEigen(root.asDiagonal() * opened_.r * root.asDiagonal());
    const Eigen::VectorXd alpha = eig.q.transpose() * (root.asDiagonal() * (model_.ports.transpose() * toInput));
    const Eigen::VectorXd beta = eig.q.transpose() * (root.asDiagonal() * (model_.ports.transpose() * fromOutput)) / h0;

    const int n = static_cast<int>(eig.lambda.size());
    std::vector<double> poly = elementarySymmetric(asComplex(eig.lambda));
    std::vector<double> scale = poly;  // magnitude of the terms, for the noise floor
    for (int k = 0; k < n; ++k) {
        Eigen::VectorXd others(n - 1);
        for (int j = 0, o = 0; j < n; ++j)
            if (j != k)
                others(o++) = eig.lambda(j);
        const std::vector<double> rest = elementarySymmetric(asComplex(others));
        // A zero λ is port current that leaves every node voltage at zero (a
        // capacitor loop, a capacitor across the input source): it couples
        // to neither input nor output, whatever rounding left in α and β.
        const double weight = eig.lambda(k) == 0.0 ? 0.0 : alpha(k) * beta(k);
        for (size_t m = 0; m < rest.size(); ++m) {
            poly[m + 1] -= weight * rest[m];
            scale[m + 1] += std::abs(weight * rest[m]);
        }
    }
    for (size_t m = 0; m < poly.size(); ++m) {
        // Terms that cancel below what double precision resolves are a zero
        // coefficient.
        poly[m] = std::abs(poly[m]) <= 1e-10 * scale[m] ? 0.0 : poly[m] * h0;
    }
    return trimmed(poly);
}

}  // namespace tauline
