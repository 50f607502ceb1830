#pragma once

#include "StandardSeries.h"

namespace tauline::ui {

// The standard series (IEC 60063) that wheel and drag steps of a part value
// follow. One QSettings entry, shared by the inspector (which chooses it) and
// the canvas (which steps through it).
tauline::ValueSeries valueSeriesSetting();
void setValueSeriesSetting(tauline::ValueSeries series);

}  // namespace tauline::ui
