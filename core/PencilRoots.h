#pragma once

#include <Eigen/Dense>
#include <complex>
#include <vector>

namespace tauline {

// The finite roots s of det(A0 + s·P·diag(cap)·Pᵀ) = 0, the natural
// frequencies of a nodal pencil whose reactive part has low rank.
//
// For a shift σ where A(σ) is regular, det A(s) = det A(σ)·det(I + (s−σ)·K)
// with K = cap^½·Pᵀ·A(σ)⁻¹·P·cap^½ (capacitor-count square), so every finite
// root is σ − 1/μ for an eigenvalue μ ≠ 0 of K. A root r comes out with
// relative error that depends on the shift: the roots are computed at every
// shift of a log grid spanning the network's time scales, followed from
// shift to shift, and each is taken where two neighbouring shifts agree
// best (see the .cpp), which keeps roots spread over many decades accurate.
// Each non-zero root is then refined on the pencil itself by a two-sided
// Rayleigh quotient summed in extended precision (the shifted eigenproblems
// left some zeros 1e-9…5e-9 off, a different value at every shift).
struct PencilRootProblem {
    Eigen::MatrixXd a0;
    // a0 with its entries summed in extended precision; empty: a0 itself.
    Eigen::Matrix<long double, Eigen::Dynamic, Eigen::Dynamic> a0Extended;
    Eigen::MatrixXd ports;        // P
    Eigen::VectorXd capacitance;  // positive
    bool symmetric = false;       // A0 symmetric: use the self-adjoint solver
    double lowRate = 1.0;         // rad/s: below every non-zero root worth resolving
    double highRate = 1.0;        // rad/s: above every finite root
    // The reactive part is L·diag(cap)·Pᵀ with L = leftPorts; empty: L = P.
    // (A pencil with its origin roots deflated out has L ≠ P.)
    Eigen::MatrixXd leftPorts;
    // L·diag(cap)·Pᵀ formed in extended precision; empty: from L and P.
    Eigen::Matrix<long double, Eigen::Dynamic, Eigen::Dynamic> reactiveExtended;
};

struct PencilRoots {
    std::vector<std::complex<double>> roots;  // finite, origin roots exactly 0
    // Roots kept although no two shifts agreed on them and the Rayleigh
    // refinement did not settle them: their digits are not vouched for.
    int unsettled = 0;
};

// Exactly `originRoots` roots, those nearest the origin, are set to 0: the
// caller knows the multiplicity there better than rounding does (a double
// root at 0 splits by √ε).
PencilRoots finitePencilRoots(const PencilRootProblem& problem, int originRoots);

// Bounds on the multiplicity at the origin where only those are certain:
// the cluster of roots far below lowRate is counted, then brought within
// [atLeast, atMost].
struct OriginRootBounds {
    int atLeast = 0;
    int atMost = 0;
};
PencilRoots finitePencilRoots(const PencilRootProblem& problem, OriginRootBounds origin);

// The same, with each non-zero root refined (two-sided Rayleigh quotient) on
// `refinement`, a pencil with the same non-zero roots: the one with the
// certain origin roots deflated out (see deflateOrigin), where a slow root
// is no longer swamped by the origin's Jordan chain. Root finding itself
// stays on `problem`, whose structure at infinity is exact.
PencilRoots finitePencilRoots(const PencilRootProblem& problem, OriginRootBounds origin,
                              const PencilRootProblem& refinement);

}  // namespace tauline
