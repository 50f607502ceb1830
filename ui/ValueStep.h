// Where a wheel notch or a drag step takes a part's value: to the next entry
// of the chosen IEC 60063 series, or (continuous) 1 % per step, kept to three
// significant digits so the value still reads as typed.
#pragma once

#include "Network.h"
#include "StandardSeries.h"

#include <QString>

namespace tauline::ui {

double steppedValue(double value, tauline::ValueSeries series, int steps, bool continuous);

// The text stored with a stepped value, and the value that text reads back as
// (so a saved and reopened file holds exactly the same number).
struct ValueWithText {
    double value = 0.0;
    QString text;
};
ValueWithText canonicalValue(double value, tauline::PartKind kind);

}  // namespace tauline::ui
