#pragma once

#include "PencilRoots.h"

namespace tauline {

// Bounds on how many roots det(A0 + s·P·diag(cap)·Pᵀ) has at s = 0, from
// rank tests rather than from how small the computed roots are: a multiple
// root at the origin splits by ε^(1/m) in an eigenvalue solver, which no
// magnitude threshold tells apart from a genuinely slow root.
//
// Each pass takes an orthogonal U with the last d rows of Uᵀ·A0 (numerically)
// zero; those rows of Uᵀ·(A0 + sB) are then s·(Uᵀ·B), and taking s^d out
// leaves a pencil of the same size with those rows of Uᵀ·B in its dc matrix.
// The passes end when the dc matrix is regular; d summed is the multiplicity.
// Rank decisions are by SVD of the row- and column-equilibrated dc matrix.
// `atLeast` counts singular values at rounding level only; above it the
// caller decides from the roots (`atMost` is the pencil's size: later
// passes' rounding overlaps slow non-zero roots, see the .cpp).
OriginRootBounds originMultiplicity(const PencilRootProblem& problem);

}  // namespace tauline
