// Draws a netlist that came without a drawing, legibly rather than prettily:
// each part and marker stands vertically in its own column (in breadth-first
// order from the input); each node is a horizontal bus on a row, spanning the
// columns that touch it (ground at the bottom); short wires join terminals to
// buses. Buses on one row never share a column and joined nodes never share a
// row, so no two parts overlap and no wire touches a node it does not belong
// to; each bus carries its node's name, so the drawing derives exactly the
// network it was made from.
#pragma once

#include "Network.h"

#include <QStringList>

#include <nlohmann/json.hpp>

namespace tauline::ui {

struct AutoPlacementResult {
    nlohmann::json drawing;  // a drawing object (see DrawingJson.h)
    QStringList warnings;    // parts that cannot be drawn yet
};

AutoPlacementResult placeAutomatically(const tauline::Network& network);

}  // namespace tauline::ui
