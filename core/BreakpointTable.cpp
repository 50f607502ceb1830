#include "BreakpointTable.h"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <numbers>

namespace tauline {

namespace {

using cd = std::complex<double>;

void addCorners(std::vector<Breakpoint>& out, RootType type, std::vector<cd> roots, const std::vector<double>& poly)
{
    // Skip the origin: its roots give no corner, and its powers of s lead
    // the polynomial.
    size_t first = 0;
    while (first < poly.size() && poly[first] == 0.0)
        ++first;
    const std::vector<double> a(poly.begin() + static_cast<long>(first), poly.end());
    roots.erase(std::remove(roots.begin(), roots.end(), cd(0.0, 0.0)), roots.end());
    std::sort(roots.begin(), roots.end(), [](cd x, cd y) {
        return std::abs(x) != std::abs(y) ? std::abs(x) < std::abs(y) : x.imag() > y.imag();
    });

    auto ratio = [&](size_t lower, size_t upper) {
        return upper < a.size() && a[upper] != 0.0 ? std::abs(a[lower] / a[upper]) : 0.0;
    };
    for (size_t k = 0; k < roots.size(); ++k) {
        Breakpoint bp;
        bp.type = type;
        bp.root = roots[k];
        const double w = std::abs(roots[k]);
        bp.hz = w / (2.0 * std::numbers::pi);
        double estimate = 0.0;
        if (roots[k].imag() != 0.0) {
            // The pair's partner is next in order; one corner for both.
            const double re = std::abs(roots[k].real());
            bp.q = re > 0.0 ? w / (2.0 * re) : std::numeric_limits<double>::infinity();
            estimate = std::sqrt(ratio(k, k + 2));
            ++k;
        } else {
            estimate = ratio(k, k + 1);
        }
        bp.estimateHz = estimate / (2.0 * std::numbers::pi);
        bp.estimateError = bp.hz > 0.0 ? (bp.estimateHz - bp.hz) / bp.hz : 0.0;
        bp.poorlySeparated = !(std::abs(bp.estimateError) <= kPoorEstimate);
        out.push_back(bp);
    }
}

}  // namespace

std::vector<Breakpoint> breakpointTable(const std::vector<cd>& poles, const std::vector<cd>& zeros,
                                        const std::vector<double>& numerator, const std::vector<double>& denominator)
{
    std::vector<Breakpoint> out;
    addCorners(out, RootType::Pole, poles, denominator);
    addCorners(out, RootType::Zero, zeros, numerator);
    std::stable_sort(out.begin(), out.end(), [](const Breakpoint& x, const Breakpoint& y) { return x.hz < y.hz; });
    return out;
}

std::string qualityFactorText(double q)
{
    if (!std::isfinite(q))
        return "\u221E";
    char buffer[32];
    std::snprintf(buffer, sizeof buffer, "%.3g", q);
    return buffer;
}

}  // namespace tauline
