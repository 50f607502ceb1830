#pragma once

#include <QString>

namespace tauline::ui {

// The caution every network that can hurt someone gets: Tauline's parts are
// ideal and have no voltage or power rating.
QString safetyCautionText();

// True when a network's title suggests mains, snubber, X/Y-capacitor or
// high-voltage use, where the caution is shown as a banner too.
bool suggestsHazardousUse(const QString& title);

}  // namespace tauline::ui
