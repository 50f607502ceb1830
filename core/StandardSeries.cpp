#include "StandardSeries.h"

#include <array>
#include <cmath>

namespace tauline {

namespace {

// IEC 60063:2015, E12 and E24 two significant figures, E96 three.
constexpr std::array<double, 12> kE12 = {1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2};

constexpr std::array<double, 24> kE24 = {1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0,
                                         3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1};

constexpr std::array<double, 96> kE96 = {
    1.00, 1.02, 1.05, 1.07, 1.10, 1.13, 1.15, 1.18, 1.21, 1.24, 1.27, 1.30, 1.33, 1.37, 1.40, 1.43,
    1.47, 1.50, 1.54, 1.58, 1.62, 1.65, 1.69, 1.74, 1.78, 1.82, 1.87, 1.91, 1.96, 2.00, 2.05, 2.10,
    2.15, 2.21, 2.26, 2.32, 2.37, 2.43, 2.49, 2.55, 2.61, 2.67, 2.74, 2.80, 2.87, 2.94, 3.01, 3.09,
    3.16, 3.24, 3.32, 3.40, 3.48, 3.57, 3.65, 3.74, 3.83, 3.92, 4.02, 4.12, 4.22, 4.32, 4.42, 4.53,
    4.64, 4.75, 4.87, 4.99, 5.11, 5.23, 5.36, 5.49, 5.62, 5.76, 5.90, 6.04, 6.19, 6.34, 6.49, 6.65,
    6.81, 6.98, 7.15, 7.32, 7.50, 7.68, 7.87, 8.06, 8.25, 8.45, 8.66, 8.87, 9.09, 9.31, 9.53, 9.76};

// Entry `index` of the infinite series (index 0 = table[0] in decade 10^0);
// the power of ten is applied by division for negative decades so that, e.g.,
// 4.7 nF comes out as 4.7/1e9 exactly as "4.7e-9" parses.
double seriesValue(std::span<const double> table, long long index)
{
    const long long n = static_cast<long long>(table.size());
    long long decade = index >= 0 ? index / n : -((-index + n - 1) / n);
    const double mantissa = table[static_cast<size_t>(index - decade * n)];
    if (decade >= 0)
        return mantissa * std::pow(10.0, static_cast<double>(decade));
    return mantissa / std::pow(10.0, static_cast<double>(-decade));
}

// The index of the largest series value <= value (with a 1e-9 relative
// tolerance, so a value printed and parsed back finds its own entry).
long long floorIndex(std::span<const double> table, double value)
{
    const long long n = static_cast<long long>(table.size());
    long long index = static_cast<long long>(std::floor(std::log10(value))) * n;
    // log10 is exact enough to land within one decade; settle by comparison.
    while (seriesValue(table, index) > value * (1.0 + 1e-9))
        --index;
    while (seriesValue(table, index + 1) <= value * (1.0 + 1e-9))
        ++index;
    return index;
}

}  // namespace

std::span<const double> seriesTable(ValueSeries series)
{
    switch (series) {
    case ValueSeries::E12: return kE12;
    case ValueSeries::E24: return kE24;
    case ValueSeries::E96: return kE96;
    }
    return kE24;
}

const char* seriesName(ValueSeries series)
{
    switch (series) {
    case ValueSeries::E12: return "E12";
    case ValueSeries::E24: return "E24";
    case ValueSeries::E96: return "E96";
    }
    return "E24";
}

std::optional<ValueSeries> seriesFromName(std::string_view name)
{
    if (name == "E12") return ValueSeries::E12;
    if (name == "E24") return ValueSeries::E24;
    if (name == "E96") return ValueSeries::E96;
    return std::nullopt;
}

double nearestInSeries(double value, ValueSeries series)
{
    if (!(value > 0.0) || !std::isfinite(value))
        return value;
    const auto table = seriesTable(series);
    const long long below = floorIndex(table, value);
    const double low = seriesValue(table, below);
    const double high = seriesValue(table, below + 1);
    return std::log(value / low) <= std::log(high / value) ? low : high;
}

double stepInSeries(double value, ValueSeries series, int steps)
{
    if (!(value > 0.0) || !std::isfinite(value) || steps == 0)
        return value;
    const auto table = seriesTable(series);
    const long long below = floorIndex(table, value);
    const bool onSeries = std::abs(seriesValue(table, below) / value - 1.0) <= 1e-9;
    long long index;
    if (steps > 0)
        index = below + steps;
    else
        index = onSeries ? below + steps : below + steps + 1;
    return seriesValue(table, index);
}

}  // namespace tauline
