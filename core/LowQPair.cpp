#include "LowQPair.h"

#include <cmath>
#include <numbers>

namespace tauline {

namespace {

constexpr double kTwoPi = 2.0 * std::numbers::pi;

double relativeError(double estimate, double exact)
{
    return exact > 0.0 ? (estimate - exact) / exact : 0.0;
}

// The polynomial's coefficients past the origin factor, as the breakpoint
// table reads them.
std::vector<double> withoutOrigin(const std::vector<double>& poly)
{
    size_t first = 0;
    while (first < poly.size() && poly[first] == 0.0)
        ++first;
    return std::vector<double>(poly.begin() + static_cast<long>(first), poly.end());
}

}  // namespace

std::optional<QuadraticCorners> quadraticRealCorners(double omega0, double q)
{
    const double d = 1.0 - 4.0 * q * q;
    if (!(q > 0.0) || d < 0.0)
        return std::nullopt;
    const double f = 0.5 * (1.0 + std::sqrt(d));
    return QuadraticCorners{omega0 * q / f, omega0 * f / q};
}

QuadraticCorners lowQCorners(double omega0, double q)
{
    return {q * omega0, omega0 / q};
}

double LowQPair::omega0Hz() const
{
    return omega0 / kTwoPi;
}

std::vector<LowQPair> lowQPairs(const Analysis& analysis)
{
    std::vector<LowQPair> out;
    for (RootType type : {RootType::Pole, RootType::Zero}) {
        const std::vector<double> a =
            withoutOrigin(type == RootType::Pole ? analysis.denominator : analysis.numerator);
        // Breakpoints of this type in order, with the coefficient place of
        // each (a pair takes two places).
        std::vector<int> index;
        std::vector<int> place;
        int next = 1;
        for (size_t k = 0; k < analysis.breakpoints.size(); ++k) {
            const Breakpoint& bp = analysis.breakpoints[k];
            if (bp.type != type)
                continue;
            index.push_back(static_cast<int>(k));
            place.push_back(next);
            next += bp.q ? 2 : 1;
        }
        for (size_t m = 0; m + 1 < index.size(); ++m) {
            const Breakpoint& low = analysis.breakpoints[index[m]];
            const Breakpoint& high = analysis.breakpoints[index[m + 1]];
            const bool real = !low.q && !high.q && low.root.real() < 0.0 && high.root.real() < 0.0;
            const int k = place[m];
            if (!real || !(low.poorlySeparated || high.poorlySeparated) || k + 1 >= static_cast<int>(a.size()))
                continue;
            const double before = std::abs(a[k - 1]);
            const double middle = std::abs(a[k]);
            const double after = std::abs(a[k + 1]);
            if (!(before > 0.0 && middle > 0.0 && after > 0.0))
                continue;
            LowQPair pair;
            pair.type = type;
            pair.lowBreakpoint = index[m];
            pair.highBreakpoint = index[m + 1];
            pair.place = k;
            pair.omega0 = std::sqrt(before / after);
            pair.q = std::sqrt(before * after) / middle;
            pair.exactLowHz = low.hz;
            pair.exactHighHz = high.hz;
            pair.estimateLowHz = low.estimateHz;
            pair.estimateHighHz = high.estimateHz;
            pair.estimateLowError = low.estimateError;
            pair.estimateHighError = high.estimateError;
            const QuadraticCorners approx = lowQCorners(pair.omega0, pair.q);
            pair.lowQLowHz = approx.low / kTwoPi;
            pair.lowQHighHz = approx.high / kTwoPi;
            pair.lowQLowError = relativeError(pair.lowQLowHz, low.hz);
            pair.lowQHighError = relativeError(pair.lowQHighHz, high.hz);
            if (const auto roots = quadraticRealCorners(pair.omega0, pair.q)) {
                pair.quadraticLowHz = roots->low / kTwoPi;
                pair.quadraticHighHz = roots->high / kTwoPi;
                pair.quadraticLowError = relativeError(*pair.quadraticLowHz, low.hz);
                pair.quadraticHighError = relativeError(*pair.quadraticHighHz, high.hz);
            }
            pair.sketchHz = std::sqrt(low.hz * high.hz);
            out.push_back(pair);
            ++m;  // both corners are taken
        }
    }
    return out;
}

}  // namespace tauline
