#include "RootPolynomial.h"

#include <algorithm>

namespace tauline {

namespace {
std::vector<double> multiply(const std::vector<double>& a, const std::vector<double>& b)
{
    std::vector<double> out(a.size() + b.size() - 1, 0.0);
    for (size_t i = 0; i < a.size(); ++i)
        for (size_t j = 0; j < b.size(); ++j)
            out[i + j] += a[i] * b[j];
    return out;
}
}  // namespace

std::complex<double> productOfFactors(const std::vector<std::complex<double>>& roots, std::complex<double> s)
{
    std::complex<double> product = 1.0;
    for (const auto& r : roots)
        if (r != std::complex<double>(0.0, 0.0))
            product *= 1.0 - s / r;
    return product;
}

std::complex<double> evaluateFactored(double gain, int originPower, const std::vector<std::complex<double>>& zeros,
                                      const std::vector<std::complex<double>>& poles, std::complex<double> s)
{
    std::complex<double> h = gain * productOfFactors(zeros, s) / productOfFactors(poles, s);
    if (originPower != 0)
        h *= std::pow(s, originPower);
    return h;
}

int originCount(const std::vector<std::complex<double>>& roots)
{
    return static_cast<int>(std::count(roots.begin(), roots.end(), std::complex<double>(0.0, 0.0)));
}

std::vector<double> polynomialFromRoots(const std::vector<std::complex<double>>& roots)
{
    std::vector<double> poly(static_cast<size_t>(originCount(roots)) + 1, 0.0);
    poly.back() = 1.0;
    for (const auto& r : roots) {
        if (r == std::complex<double>(0.0, 0.0) || r.imag() < 0.0)
            continue;
        const std::complex<double> inv = 1.0 / r;
        if (r.imag() == 0.0)
            poly = multiply(poly, {1.0, -inv.real()});
        else
            poly = multiply(poly, {1.0, -2.0 * inv.real(), std::norm(inv)});
    }
    return poly;
}

std::vector<double> elementarySymmetric(const std::vector<std::complex<double>>& lambdas)
{
    std::vector<std::complex<double>> e(lambdas.size() + 1, 0.0);
    e[0] = 1.0;
    for (size_t k = 0; k < lambdas.size(); ++k)
        for (size_t j = k + 1; j >= 1; --j)
            e[j] += lambdas[k] * e[j - 1];
    std::vector<double> out(e.size());
    std::transform(e.begin(), e.end(), out.begin(), [](auto z) { return z.real(); });
    return out;
}

}  // namespace tauline
