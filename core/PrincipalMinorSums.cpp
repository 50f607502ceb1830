#include "PrincipalMinorSums.h"

#include "DoubleDouble.h"

#include <cmath>

namespace tauline {

namespace {

using DD = DoubleDouble;

struct Square {
    int n = 0;
    std::vector<DD> a;
    DD& operator()(int i, int j) { return a[static_cast<size_t>(i) * n + j]; }
};

// Row and column off-diagonal 1-norms brought within a factor of two by
// diagonal similarity with powers of two: exact in any binary format.
void balance(Square& m)
{
    const int n = m.n;
    for (bool done = false; !done;) {
        done = true;
        for (int i = 0; i < n; ++i) {
            double c = 0.0, r = 0.0;
            for (int j = 0; j < n; ++j) {
                if (j == i)
                    continue;
                c += std::abs(m(j, i).hi);
                r += std::abs(m(i, j).hi);
            }
            if (c == 0.0 || r == 0.0)
                continue;
            const double s = c + r;
            double f = 1.0;
            for (double g = r / 2.0; c < g; c *= 4.0)
                f *= 2.0;
            for (double g = r * 2.0; c >= g; c /= 4.0)
                f /= 2.0;
            if ((c + r) / f < 0.95 * s) {
                done = false;
                for (int j = 0; j < n; ++j) {
                    m(i, j) = m(i, j) * DD(1.0 / f);
                    m(j, i) = m(j, i) * DD(f);
                }
            }
        }
    }
}

void reduceToHessenberg(Square& m)
{
    const int n = m.n;
    std::vector<DD> v(n);
    for (int k = 0; k + 2 < n; ++k) {
        DD norm2 = 0.0;
        for (int i = k + 1; i < n; ++i)
            norm2 += m(i, k) * m(i, k);
        if (norm2.hi == 0.0)
            continue;
        DD alpha = sqrt(norm2);
        if (m(k + 1, k).hi > 0.0)
            alpha = -alpha;
        DD vnorm2 = 0.0;
        for (int i = k + 1; i < n; ++i) {
            v[i] = m(i, k);
            if (i == k + 1)
                v[i] -= alpha;
            vnorm2 += v[i] * v[i];
        }
        if (vnorm2.hi == 0.0)
            continue;
        const DD beta = DD(2.0) / vnorm2;
        for (int j = k; j < n; ++j) {
            DD t = 0.0;
            for (int i = k + 1; i < n; ++i)
                t += v[i] * m(i, j);
            t = t * beta;
            for (int i = k + 1; i < n; ++i)
                m(i, j) -= t * v[i];
        }
        for (int i = 0; i < n; ++i) {
            DD t = 0.0;
            for (int j = k + 1; j < n; ++j)
                t += m(i, j) * v[j];
            t = t * beta;
            for (int j = k + 1; j < n; ++j)
                m(i, j) -= t * v[j];
        }
        m(k + 1, k) = alpha;
        for (int i = k + 2; i < n; ++i)
            m(i, k) = 0.0;
    }
}

}  // namespace

PrincipalMinorSums principalMinorSums(const Eigen::Matrix<long double, Eigen::Dynamic, Eigen::Dynamic>& input)
{
    Square m;
    m.n = static_cast<int>(input.rows());
    const int n = m.n;
    m.a.resize(static_cast<size_t>(n) * n);
    for (int i = 0; i < n; ++i)
        for (int j = 0; j < n; ++j)
            m(i, j) = DD::fromLong(input(i, j));
    balance(m);
    reduceToHessenberg(m);

    // q_i(s) = det(I + s·H_i) over the leading i×i blocks (La Budde):
    // q_i = (1 + s·h_ii)·q_{i−1} − Σ_m h_{i−m,i}·Π h_{j,j−1}·(−s)^{m+1}·q_{i−m−1},
    // the product over the m subdiagonal entries below it.
    std::vector<std::vector<DD>> q(n + 1);
    std::vector<std::vector<double>> bound(n + 1);
    q[0] = {DD(1.0)};
    bound[0] = {1.0};
    for (int i = 1; i <= n; ++i) {
        q[i].assign(i + 1, DD(0.0));
        bound[i].assign(i + 1, 0.0);
        const DD hii = m(i - 1, i - 1);
        for (int k = 0; k < i; ++k) {
            q[i][k] += q[i - 1][k];
            q[i][k + 1] += hii * q[i - 1][k];
            bound[i][k] += bound[i - 1][k];
            bound[i][k + 1] += std::abs(hii.hi) * bound[i - 1][k];
        }
        DD chain = 1.0;
        for (int mm = 1; mm < i; ++mm) {
            chain = chain * m(i - mm, i - mm - 1);  // h_{j,j−1}, 0-based rows i−1 … i−mm
            const DD factor = m(i - mm - 1, i - 1) * chain;
            const DD signedFactor = (mm % 2 == 1) ? -factor : factor;  // −(−1)^{m+1}
            const double size = std::abs(factor.hi);
            const auto& lower = q[i - mm - 1];
            for (size_t k = 0; k < lower.size(); ++k) {
                q[i][k + mm + 1] += signedFactor * lower[k];
                bound[i][k + mm + 1] += size * bound[i - mm - 1][k];
            }
        }
    }
    PrincipalMinorSums out;
    for (int k = 0; k <= n; ++k) {
        out.e.push_back(q[n][k].value());
        out.magnitude.push_back(bound[n][k]);
    }
    return out;
}

}  // namespace tauline
