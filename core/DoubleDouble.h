#pragma once

#include <cmath>

namespace tauline {

// A number carried as an unevaluated sum hi + lo of two doubles (about 32
// significant digits), with error-free transformations for its sums and
// products (Dekker, "A floating-point technique for extending the available
// precision", Numer. Math. 18, 1971; Knuth, TAOCP vol. 2, §4.2.2). For the
// few O(n³) steps whose rounding a graded port matrix would amplify past
// what double or long double leave.
struct DoubleDouble {
    double hi = 0.0;
    double lo = 0.0;

    DoubleDouble() = default;
    DoubleDouble(double x) : hi(x) {}  // NOLINT: a double is exactly a DoubleDouble
    DoubleDouble(double h, double l) : hi(h), lo(l) {}
    static DoubleDouble fromLong(long double x)
    {
        const double h = static_cast<double>(x);
        return {h, static_cast<double>(x - static_cast<long double>(h))};
    }
    double value() const { return hi + lo; }
};

namespace doubledouble {
inline DoubleDouble twoSum(double a, double b)
{
    const double s = a + b;
    const double v = s - a;
    return {s, (a - (s - v)) + (b - v)};
}
inline DoubleDouble quickTwoSum(double a, double b)
{
    const double s = a + b;
    return {s, b - (s - a)};
}
}  // namespace doubledouble

inline DoubleDouble operator+(DoubleDouble a, DoubleDouble b)
{
    DoubleDouble s = doubledouble::twoSum(a.hi, b.hi);
    const DoubleDouble t = doubledouble::twoSum(a.lo, b.lo);
    s = doubledouble::quickTwoSum(s.hi, s.lo + t.hi);
    return doubledouble::quickTwoSum(s.hi, s.lo + t.lo);
}
inline DoubleDouble operator-(DoubleDouble a) { return {-a.hi, -a.lo}; }
inline DoubleDouble operator-(DoubleDouble a, DoubleDouble b) { return a + (-b); }
inline DoubleDouble operator*(DoubleDouble a, DoubleDouble b)
{
    const double p = a.hi * b.hi;
    const double e = std::fma(a.hi, b.hi, -p);
    return doubledouble::quickTwoSum(p, e + (a.hi * b.lo + a.lo * b.hi));
}
inline DoubleDouble operator/(DoubleDouble a, DoubleDouble b)
{
    // Two Newton steps from the double quotient.
    const double q1 = a.hi / b.hi;
    const DoubleDouble r = a - b * DoubleDouble(q1);
    const double q2 = r.hi / b.hi;
    const DoubleDouble r2 = r - b * DoubleDouble(q2);
    const double q3 = r2.hi / b.hi;
    return doubledouble::quickTwoSum(q1, q2) + DoubleDouble(q3);
}
inline DoubleDouble& operator+=(DoubleDouble& a, DoubleDouble b) { return a = a + b; }
inline DoubleDouble& operator-=(DoubleDouble& a, DoubleDouble b) { return a = a - b; }
inline DoubleDouble abs(DoubleDouble a) { return a.hi < 0.0 ? -a : a; }
inline DoubleDouble sqrt(DoubleDouble a)
{
    if (a.hi <= 0.0)
        return {};
    const double x = std::sqrt(a.hi);
    // One Newton step: x + (a − x²)/(2x).
    const DoubleDouble residual = a - DoubleDouble(x) * DoubleDouble(x);
    return doubledouble::quickTwoSum(x, residual.hi / (2.0 * x));
}

}  // namespace tauline
