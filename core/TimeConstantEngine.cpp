#include "TimeConstantEngine.h"

#include "DoubleDouble.h"
#include "EquilibratedLu.h"
#include "PrincipalMinorSums.h"
#include "RootPolynomial.h"

#include <Eigen/Eigenvalues>
#include <algorithm>
#include <cmath>
#include <limits>
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

// Port voltages Pᵀ·x refined until they carry the digits of the result,
// not those of the node voltages. Where the nulling nearly shorts a port,
// its voltage is a difference of node voltages up to 1e11 times larger
// (wide-61594: 3.3e-5 Ω from voltages of MV per A), and a residual formed
// from the summed matrix, even in long double, leaves 1e-19 of those
// voltages — 3e-8 of the result. Here the residual is KCL itself: each
// resistor's current g·(x_a − x_b) from the node voltages in double-double,
// so the rows' sums hold exactly, and the double factors correct x until
// the correction stops shrinking (iterative refinement with a residual in
// doubled precision: Wilkinson, Rounding Errors in Algebraic Processes,
// 1963, ch. 3; Higham, Accuracy and Stability of Numerical Algorithms, 2nd
// ed., 2002, ch. 12).
Eigen::Matrix<long double, Eigen::Dynamic, Eigen::Dynamic> portVoltages(const NodalModel& model, const Eigen::MatrixXd& m,
                                                                       const std::vector<int>& labels,
                                                                       const EquilibratedLu<double>& lu,
                                                                       const Eigen::MatrixXd& p, const Eigen::MatrixXd& x)
{
    using DD = DoubleDouble;
    const int size = static_cast<int>(m.rows());
    const int unknowns = model.unknowns();  // node voltages, and the source current
    const int ports = static_cast<int>(p.cols());
    // Everything but the resistors, entry by entry: the source's incidence,
    // the bordering input and output, the floating pieces' w·wᵀ.
    Eigen::MatrixXd rest = m;
    rest.topLeftCorner(unknowns, unknowns).setZero();
    if (model.sourceRow >= 0) {
        rest.row(model.sourceRow).head(unknowns) = model.G.row(model.sourceRow);
        rest.col(model.sourceRow).head(unknowns) = model.G.col(model.sourceRow);
    }
    for (const auto& w : floatingVectors(labels, size))
        rest += w * w.transpose();
    struct Entry {
        int row, col;
        double value;
    };
    std::vector<Entry> entries;
    for (int i = 0; i < size; ++i)
        for (int j = 0; j < size; ++j)
            if (rest(i, j) != 0.0)
                entries.push_back({i, j, rest(i, j)});
    std::vector<DD> conductance;
    for (const auto& e : model.resistorEdges)
        conductance.push_back(DD(1.0) / DD(e.resistance));

    std::vector<std::vector<DD>> xs(ports, std::vector<DD>(size));
    for (int j = 0; j < ports; ++j)
        for (int i = 0; i < size; ++i)
            xs[j][i] = x(i, j);
    auto voltage = [](const std::vector<DD>& v, int node) { return node < 0 ? DD(0.0) : v[node]; };
    std::vector<double> previous(ports, std::numeric_limits<double>::infinity());
    std::vector<bool> converging(ports, true);
    for (int step = 0; step < 4; ++step) {
        Eigen::MatrixXd residual(size, ports);
        for (int j = 0; j < ports; ++j) {
            std::vector<DD> r(size);
            for (int i = 0; i < size; ++i)
                r[i] = p(i, j);
            for (const Entry& e : entries)
                r[e.row] -= DD(e.value) * xs[j][e.col];
            for (size_t k = 0; k < conductance.size(); ++k) {
                const auto& edge = model.resistorEdges[k];
                const DD current = conductance[k] * (voltage(xs[j], edge.a) - voltage(xs[j], edge.b));
                if (edge.a >= 0)
                    r[edge.a] -= current;
                if (edge.b >= 0)
                    r[edge.b] += current;
            }
            for (int i = 0; i < size; ++i)
                residual(i, j) = r[i].value();
        }
        const Eigen::MatrixXd correction = lu.solve(residual, 0);
        bool any = false;
        for (int j = 0; j < ports; ++j) {
            const double norm = correction.col(j).norm();
            if (!converging[j] || !(norm <= 0.5 * previous[j])) {
                converging[j] = false;
                continue;
            }
            previous[j] = norm;
            any = true;
            for (int i = 0; i < size; ++i)
                xs[j][i] += DD(correction(i, j));
        }
        if (!any)
            break;
    }
    Eigen::Matrix<long double, Eigen::Dynamic, Eigen::Dynamic> out(ports, ports);
    for (int j = 0; j < ports; ++j) {
        // What the refinement leaves of a voltage that is exactly zero (a
        // port the nulling shorts) is double-double rounding of the node
        // voltages, ~1e-32 of them: a zero, not a resistance of 1e-92 Ω.
        const double floor = 1e-28 * x.col(j).cwiseAbs().maxCoeff();
        for (int i = 0; i < ports; ++i) {
            const auto& nodesOf = model.capacitorNodes[i];
            const DD v = voltage(xs[j], nodesOf[0]) - voltage(xs[j], nodesOf[1]);
            const long double r = static_cast<long double>(v.hi) + static_cast<long double>(v.lo);
            out(i, j) = std::abs(r) <= floor ? 0.0L : r;
        }
    }
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
    // The same matrix with G's entries summed in extended precision, for the
    // factor's refinement (see portVoltages for the last digits).
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
    // Unrefined: portVoltages refines against KCL in double-double, which
    // the long-double steps of solve() would only repeat less exactly.
    const Eigen::MatrixXd x = lu.solve(p, 0);
    out.rExtended = portVoltages(model, m, labels, lu, p, x);
    out.r = out.rExtended.cast<double>();
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
        nulled_ = portResistance(model, borderedByResponse(model), labels);
    } else if (dcValue_) {
        // Null double injection: the input is free, the output held at zero.
        // It is regular when every floating component stays clear of the
        // input and output; otherwise it has no unique solution.
        bool clear = true;
        for (const auto& w : floatingVectors(openLabels, model.unknowns()))
            clear = clear && std::abs(w.dot(model.b)) < 1e-12 && std::abs(w.dot(model.c)) < 1e-12;
        if (clear)
            nulled_ = portResistance(model, borderedByResponse(model), openLabels);
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

namespace {

// The numerator's sums a_k/H⁰ = e_k(C^½·Rᴺ·C^½) from the null port matrix
// itself, in extended precision. Rᴺ's principal minors are
// det(R_SS)·H^S/H⁰: where shorting a set S nearly kills the transfer they
// are small differences of Rᴺ's entries (1e7 below them on the test
// networks), so Rᴺ enters with the digits its refinement found past double,
// and the polynomial is formed in double-double (PrincipalMinorSums).
std::vector<double> nullPortSums(const PortResistance& nulled, const Eigen::VectorXd& capacitance)
{
    const auto root = capacitance.cast<long double>().cwiseSqrt();
    const Eigen::Matrix<long double, Eigen::Dynamic, Eigen::Dynamic> k =
        root.asDiagonal() * nulled.rExtended * root.asDiagonal();
    std::vector<double> e = principalMinorSums(k).e;
    // Zero time constants (a capacitor loop, a port the nulling shorts) are
    // zero eigenvalues that the entries' last digits make ~1e-18 of the
    // largest: the coefficients from there on are that rounding. e_k/e_{k−1}
    // is about the k-th largest eigenvalue; ρ bounds the largest.
    double rho = 0.0;
    for (size_t j = 1; j < e.size(); ++j)
        rho = std::max(rho, std::pow(std::abs(e[j]), 1.0 / static_cast<double>(j)));
    for (size_t j = 1; j < e.size(); ++j) {
        bool restIsRounding = true;
        for (size_t i = j; i < e.size() && restIsRounding; ++i)
            restIsRounding = std::abs(e[i]) <= kZeroEigenvalue * 0.1 * std::pow(rho, static_cast<double>(i - j + 1)) *
                                                      std::abs(e[j - 1]);
        if (restIsRounding) {
            e.resize(j);
            break;
        }
    }
    return e;
}

}  // namespace

std::optional<std::vector<double>> TimeConstantEngine::numerator() const
{
    if (!dcValue_)
        return std::nullopt;
    if (model_.kind != ResponseKind::Impedance && nulled_.allFinite()) {
        std::vector<double> poly = nullPortSums(nulled_, model_.capacitance);
        for (auto& a : poly)
            a *= *dcValue_;
        return trimmed(poly);
    }
    // Nulling the response is a rank-one change of the port matrix,
    // Rᴺ = R − h_out·h_inᵀ/H⁰ (h_in: port voltages per unit input, h_out:
    // output per unit port current), so with K = C^½RC^½ = Q·Λ·Qᵀ
    //   N(s) = H⁰·[Π(1 + sλ_k) − s·Σ_k α_k·β_k·Π_{j≠k}(1 + sλ_j)],
    // α = Qᵀ·C^½·h_in, β = Qᵀ·C^½·h_out/H⁰: the fallback where the null
    // state has an infinite port. Its terms cancel where H^S ≪ H⁰.
    if (!opened_.allFinite())
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
