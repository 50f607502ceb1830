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

// The same bounds, and the pencil with the certain origin roots taken out:
// the passes above carried out in extended precision on A0 and on the
// factors of the reactive part (L·diag(cap)·Pᵀ stays of that form, rows and
// columns only being rotated and scaled), so that
// det(A0' + s·B') = const · det(A0 + s·B) / s^removed. Its dc matrix is
// regular to the rank test, so a slow root refined on it is no longer
// spoilt by a multiple origin root's Jordan chain. Its degree drop is exact
// to rounding only (spurious far roots can appear), so roots are found on
// the original pencil and refined on this one. `deflated` is empty when
// nothing is removed.
struct OriginDeflation {
    OriginRootBounds bounds;
    int removed = 0;
    PencilRootProblem deflated;
};
OriginDeflation deflateOrigin(const PencilRootProblem& problem);

}  // namespace tauline
