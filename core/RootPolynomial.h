#pragma once

#include <complex>
#include <vector>

namespace tauline {

// s^origin · Π(1 − s/r) over the non-zero roots, ascending coefficients.
// Conjugate pairs are multiplied as real quadratics, so an RC network's
// polynomial (all roots negative real) is a sum of positive terms.
std::vector<double> polynomialFromRoots(const std::vector<std::complex<double>>& roots);

// 1 + e1·s + e2·s² + … = Π(1 + λ_k·s): the elementary symmetric functions of
// the λ, by the product recurrence (no cancellation when all λ ≥ 0).
std::vector<double> elementarySymmetric(const std::vector<std::complex<double>>& lambdas);

// K·s^power·Π(1 − s/z)/Π(1 − s/p) over the non-zero roots: the factored form
// every evaluation goes through (cheap, and accurate near the roots).
std::complex<double> evaluateFactored(double gain, int originPower, const std::vector<std::complex<double>>& zeros,
                                      const std::vector<std::complex<double>>& poles, std::complex<double> s);

// Π(1 − s/r) over the non-zero roots.
std::complex<double> productOfFactors(const std::vector<std::complex<double>>& roots, std::complex<double> s);

// Number of exact zeros among the roots.
int originCount(const std::vector<std::complex<double>>& roots);

}  // namespace tauline
