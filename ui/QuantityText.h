#pragma once

#include "Network.h"

#include <QString>

#include <optional>

namespace tauline::ui {

// Display text for the quantities the tables, plot and readout show. Built
// on core's engineering notation so every view writes numbers the same way.
// Four significant digits: enough to tell a corner moved one E96 step.
QString frequencyText(double hz);                     // "7.234 kHz"
QString secondsText(std::optional<double> seconds);   // "22 µs", "∞" when empty
QString ohmsText(std::optional<double> ohms);         // "10 kΩ", "∞" when empty
QString decibelText(double db, ResponseKind kind);    // "80.2 dBΩ", "-3.01 dB"
QString decibelUnit(ResponseKind kind);               // "dBΩ" or "dB"
QString percentText(double fraction);                 // "+1.2 %"
QString axisFrequencyLabel(double hz);                // "1 k", "10 k", "1 M", "100"

// A frequency typed by the user: "1000", "1e3", "1k", "1 kHz", "2.2 MHz"
// (core's parseFrequency). Empty unless positive and finite.
std::optional<double> parseFrequencyText(const QString& text);

// For values a view cannot show: an infinite time constant or resistance,
// and a null time constant that does not exist.
inline const QString kInfiniteText = QStringLiteral("∞");
inline const QString kUndefinedText = QStringLiteral("—");

}  // namespace tauline::ui
