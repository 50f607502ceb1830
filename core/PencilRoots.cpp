#include "PencilRoots.h"

#include "EquilibratedLu.h"

#include <Eigen/Eigenvalues>
#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace tauline {

namespace {

constexpr double kInfiniteRatio = 1e11;   // |r|/σ beyond which μ is rounding noise
// A root computed at two shifts agrees with itself to this relative
// distance; rounding noise (an infinite root left finite) does not.
constexpr double kSameRoot = 1e-6;
// A multiple root at the origin comes out of an eigenvalue problem split by
// about ε^(1/m) of the shift; roots this far below lowRate are taken as that
// cluster (a real root there needs a bridge balanced to ~0.1 %).
constexpr double kOriginCluster = 1e-3;
constexpr double kDecadesPerShift = 2.0;

// Eigenvalues μ of K for one shift; empty when A(σ) is singular there.
// `reactive` is P·diag(cap)·Pᵀ, formed once for all shifts.
bool shiftedEigenvalues(const PencilRootProblem& p, const Eigen::MatrixXd& reactive, double sigma,
                        std::vector<std::complex<double>>& mu)
{
    const Eigen::MatrixXd a = p.a0 + sigma * reactive;
    const EquilibratedLu<double> lu(a);
    if (!lu.regular())
        return false;
    const Eigen::VectorXd root = p.capacitance.cwiseSqrt();
    const Eigen::MatrixXd scaledPorts = p.ports * root.asDiagonal();
    // One refinement step: without it the slowest zeros of some transfers
    // drift past 1e-9; a second step buys nothing measurable.
    Eigen::MatrixXd k = scaledPorts.transpose() * lu.solve(scaledPorts, 1);
    mu.clear();
    if (p.symmetric) {
        k = 0.5 * (k + k.transpose());
        Eigen::SelfAdjointEigenSolver<Eigen::MatrixXd> eig(k, Eigen::EigenvaluesOnly);
        for (int i = 0; i < eig.eigenvalues().size(); ++i)
            mu.emplace_back(eig.eigenvalues()(i), 0.0);
    } else {
        Eigen::EigenSolver<Eigen::MatrixXd> eig(k, false);
        for (int i = 0; i < eig.eigenvalues().size(); ++i)
            mu.push_back(eig.eigenvalues()(i));
    }
    return true;
}

// Finite roots for one shift; false when A(σ) is singular there (a shift on
// a root, or σ·C swamping a conductive path to the reference).
bool rootsAtShift(const PencilRootProblem& p, const Eigen::MatrixXd& reactive, double sigma,
                  std::vector<std::complex<double>>& roots)
{
    std::vector<std::complex<double>> mu;
    if (!shiftedEigenvalues(p, reactive, sigma, mu))
        return false;
    roots.clear();
    for (const auto& m : mu) {
        if (std::abs(m) * sigma * kInfiniteRatio < 1.0)
            continue;
        const std::complex<double> r = sigma - 1.0 / m;
        roots.push_back(r);
    }
    return true;
}

}  // namespace

PencilRoots finitePencilRoots(const PencilRootProblem& problem, int originRoots)
{
    return finitePencilRoots(problem, OriginRootBounds{originRoots, originRoots});
}

PencilRoots finitePencilRoots(const PencilRootProblem& problem, OriginRootBounds origin)
{
    PencilRoots out;
    if (problem.capacitance.size() == 0)
        return out;

    const double low = problem.lowRate;
    const double high = std::max(problem.highRate, low);
    int shifts = 1 + static_cast<int>(std::ceil(std::log10(high / low) / kDecadesPerShift));

    const Eigen::MatrixXd reactive =
        problem.ports * problem.capacitance.asDiagonal() * problem.ports.transpose();
    std::vector<double> sigma;
    std::vector<std::vector<std::complex<double>>> perShift;
    for (int k = 0; k < shifts; ++k) {
        const double candidate = low * std::pow(10.0, k * std::log10(high / low) / std::max(1, shifts - 1));
        std::vector<std::complex<double>> roots;
        // A shift that lands on a root leaves A(σ) singular: nudge it once.
        for (double s : {candidate, candidate * 1.618})
            if (rootsAtShift(problem, reactive, s, roots)) {
                sigma.push_back(s);
                perShift.push_back(roots);
                break;
            }
    }
    if (sigma.empty())
        throw std::runtime_error("the network's nodal matrix is singular at every trial frequency");
    shifts = static_cast<int>(sigma.size());

    // Each root from the highest shift at or below it. Above a root, σ·C
    // swamps the conductances when A(σ) is formed and their digits are lost;
    // below it, the error grows only as ε·|r|/σ, at most 10^kDecadesPerShift.
    // The top shift's list (every finite root, roughly) says which shift
    // that is; the value is that shift's nearest root.
    std::vector<std::complex<double>> roots;
    std::vector<std::vector<bool>> used(shifts);
    for (int k = 0; k < shifts; ++k)
        used[k].assign(perShift[k].size(), false);
    for (const auto& estimate : perShift.back()) {
        int k = 0;
        while (k + 1 < shifts && sigma[k + 1] <= std::abs(estimate))
            ++k;
        int best = -1;
        for (int i = 0; i < static_cast<int>(perShift[k].size()); ++i)
            if (!used[k][i] && (best < 0 || std::abs(perShift[k][i] - estimate) < std::abs(perShift[k][best] - estimate)))
                best = i;
        if (best < 0) {  // the lower shift saw this root as infinite: keep the estimate
            roots.push_back(estimate);
            continue;
        }
        used[k][best] = true;
        roots.push_back(perShift[k][best]);
    }

    auto seenAt = [&](int k, std::complex<double> r) {
        for (const auto& other : perShift[k])
            if (std::abs(other - r) <= kSameRoot * std::abs(r))
                return true;
        return false;
    };
    // Above the top shift a root must be seen by the shift below too.
    if (shifts > 1)
        roots.erase(std::remove_if(roots.begin(), roots.end(),
                                   [&](auto r) { return std::abs(r) > sigma.back() && !seenAt(shifts - 2, r); }),
                    roots.end());

    std::sort(roots.begin(), roots.end(), [](auto x, auto y) { return std::abs(x) < std::abs(y); });
    int originRoots = origin.atLeast;
    if (origin.atMost > origin.atLeast) {
        while (originRoots < origin.atMost && originRoots < static_cast<int>(roots.size()) &&
               std::abs(roots[originRoots]) < kOriginCluster * low)
            ++originRoots;
    }
    for (int i = 0; i < originRoots && i < static_cast<int>(roots.size()); ++i)
        roots[i] = 0.0;
    // Real matrices give real roots or conjugate pairs; rounding in σ − 1/μ
    // leaves the pairs exact, so only clean signed zeros.
    for (auto& r : roots)
        if (r.imag() == 0.0)
            r = {r.real(), 0.0};
    out.roots = std::move(roots);
    return out;
}

}  // namespace tauline
