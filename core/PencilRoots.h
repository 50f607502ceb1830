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
struct PencilRootProblem {
    Eigen::MatrixXd a0;
    // a0 with its entries summed in extended precision; empty: a0 itself.
    Eigen::Matrix<long double, Eigen::Dynamic, Eigen::Dynamic> a0Extended;
    Eigen::MatrixXd ports;        // P
    Eigen::VectorXd capacitance;  // positive
    bool symmetric = false;       // A0 symmetric: use the self-adjoint solver
    double lowRate = 1.0;         // rad/s: below every non-zero root worth resolving
    double highRate = 1.0;        // rad/s: above every finite root
};

struct PencilRoots {
    std::vector<std::complex<double>> roots;  // finite, origin roots exactly 0
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

}  // namespace tauline
