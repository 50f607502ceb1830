#include "ValueStep.h"

#include "Errors.h"
#include "ValueParser.h"

#include <cmath>

namespace tauline::ui {

namespace {

double roundToThreeDigits(double v)
{
    const double unit = std::pow(10.0, std::floor(std::log10(v)) - 2);
    return std::round(v / unit) * unit;
}

}  // namespace

double steppedValue(double value, tauline::ValueSeries series, int steps, bool continuous)
{
    if (!(value > 0.0) || !std::isfinite(value) || steps == 0)
        return value;
    if (!continuous)
        return tauline::stepInSeries(value, series, steps);
    double next = roundToThreeDigits(value * std::pow(1.01, steps));
    if (std::abs(next / value - 1.0) < 1e-9) {
        // Rounding swallowed the step: move by one unit of the third digit.
        const double unit = std::pow(10.0, std::floor(std::log10(value)) - 2);
        next = roundToThreeDigits(value + (steps > 0 ? unit : -unit));
    }
    return next;
}

ValueWithText canonicalValue(double value, tauline::PartKind kind)
{
    // The shortest engineering text within a hair of the value (a stepped
    // value carries binary noise: 1.1 * 100 is 110.00000000000001), then
    // exactly what that text reads back as.
    ValueWithText out;
    for (int digits = 2; digits <= 17; ++digits) {
        const std::string text = tauline::formatQuantity(value, tauline::valueUnit(kind), digits);
        try {
            const double back = tauline::parseValue(text, kind);
            if (std::abs(back / value - 1.0) <= 1e-12 || digits == 17) {
                out.text = QString::fromStdString(text);
                out.value = back;
                return out;
            }
        } catch (const tauline::InputError&) {
            break;
        }
    }
    out.value = value;
    return out;
}

}  // namespace tauline::ui
