// The preferred number series of IEC 60063:2015 (E12, E24, E96), stored as the
// standard's tables: several E24 entries (2.7, 3.0 ... 4.7, 8.2) differ from
// 10^(k/24) rounded, so computing them would give the wrong parts.
#pragma once

#include <optional>
#include <span>
#include <string_view>

namespace tauline {

enum class ValueSeries { E12, E24, E96 };

// The mantissas of one decade, ascending, from 1.0 (inclusive) to 10
// (exclusive): 12, 24 or 96 entries.
std::span<const double> seriesTable(ValueSeries series);

const char* seriesName(ValueSeries series);                    // "E24"
std::optional<ValueSeries> seriesFromName(std::string_view name);  // "E24" -> E24

// The series value closest to `value` on a logarithmic scale (the ratio that is
// nearest to 1), in the value's decade or a neighbouring one. value > 0.
double nearestInSeries(double value, ValueSeries series);

// Moves `steps` places up the series (down for negative steps), across decades.
// A value that is already a series value (to 1e-9 relative) starts from its
// own place; any other value counts the first step to the next series value in
// that direction, so one step up from 4.75 k in E24 is 5.1 k.
double stepInSeries(double value, ValueSeries series, int steps);
inline double stepUp(double value, ValueSeries series, int steps = 1)
{
    return stepInSeries(value, series, steps);
}
inline double stepDown(double value, ValueSeries series, int steps = 1)
{
    return stepInSeries(value, series, -steps);
}

}  // namespace tauline
