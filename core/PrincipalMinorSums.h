#pragma once

#include <Eigen/Dense>
#include <vector>

namespace tauline {

// det(I + s·M) = Σ e_k·s^k for a general real square M: e_k is the sum of
// M's k×k principal minors (e_0 = 1). `magnitude[k]` bounds the sum of the
// magnitudes of the terms the computation added for e_k: the scale of its
// rounding.
struct PrincipalMinorSums {
    std::vector<double> e;
    std::vector<double> magnitude;
};

// Balancing by powers of two (Parlett & Reinsch, "Balancing a matrix for
// calculation of eigenvalues and eigenvectors", Numer. Math. 13, 1969),
// Householder reduction to upper Hessenberg form and La Budde's recurrence
// for the characteristic polynomial of a Hessenberg matrix (Rehman & Ipsen,
// "La Budde's method for computing characteristic polynomials", 2011; year
// from memory), all in double-double: O(n³), no eigenvalues, and the
// normwise rounding of the reduction is ~1e-32, so coefficients whose
// eigenvalues span twenty decades keep their digits.
PrincipalMinorSums principalMinorSums(const Eigen::Matrix<long double, Eigen::Dynamic, Eigen::Dynamic>& m);

}  // namespace tauline
