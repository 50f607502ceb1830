#pragma once

#include "Analysis.h"
#include "NodalModel.h"
#include "Network.h"

#include <complex>
#include <optional>
#include <vector>

namespace tauline {

// Where one part sits in the nodal model: its two node indices (-1 the
// reference) and its kind, or absent when the model left it out (a separate
// piece, which moves no root).
struct PartStamp {
    bool inModel = false;
    PartKind kind = PartKind::Resistor;
    double value = 0.0;
    std::array<int, 2> nodes{-1, -1};
};

// One entry per part of `network`, in its order.
std::vector<PartStamp> partStamps(const NodalModel& model, const Network& network);

// The derivative of one simple root s of a pencil det(A0 + s·A1) = 0 with
// respect to the logarithm of every part value. With right and left null
// vectors x, y of A(s) (A(s)x = 0, yᵀA(s) = 0), first-order perturbation
// of a simple generalised eigenvalue gives
//     ds/dp = −yᵀ(∂A0/∂p + s·∂A1/∂p)x / (yᵀ·A1·x)
// (Wilkinson, The Algebraic Eigenvalue Problem, 1965, ch. 2, the
// perturbation of a simple eigenvalue; here for the pencil). A resistor R
// between nodes a, b stamps (1/R)·e·eᵀ into G (e = u_a − u_b), so
// ∂G/∂ln R = −(1/R)·e·eᵀ; a capacitor stamps C·e·eᵀ into C, so
// ∂C/∂ln C = C·e·eᵀ. Poles use the pencil (G, C); zeros the same pencil
// bordered by the input vector b and the output vector c, whose border does
// not depend on any part.
//
// Empty when the root is not simple (a double root: the derivative does not
// exist, the roots move as the square root of the change) or cannot be
// resolved (the pencil is singular away from the root).
std::optional<std::vector<std::complex<double>>> rootDerivatives(const NodalModel& model,
                                                                 const std::vector<PartStamp>& stamps,
                                                                 RootType type, std::complex<double> root);

// ∂ln f/∂ln x for the corner f = |s|/2π, from ds/d ln x:
// Re(conj(s)·ds/d ln x) / |s|².
double normalisedCornerSensitivity(std::complex<double> root, std::complex<double> dsDlnx);

}  // namespace tauline
