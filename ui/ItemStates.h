// Item states keyed by id, and the rigid grid motions (move, quarter turn,
// mirror) applied to them. Undo commands hold a "before" and an "after" map;
// an id missing from one side means the item does not exist on that side.
#pragma once

#include "DrawingSnapshot.h"

#include <nlohmann/json.hpp>

#include <map>

namespace tauline::ui {

using ItemStates = std::map<ItemId, nlohmann::json>;

// Mirror about the vertical line through `centre` (if `mirror`), then turn
// clockwise by `quarterTurns` about `centre`, then shift by `delta`. With a
// grid-point centre it maps grid points to grid points.
struct GridMotion {
    QPoint delta;
    int quarterTurns = 0;
    bool mirror = false;
    QPoint centre;

    QPoint map(QPoint p) const;
    bool isIdentity() const { return delta.isNull() && quarterTurns % 4 == 0 && !mirror; }
};

// The state of an item after the motion (symbol position and orientation, or
// wire points).
nlohmann::json movedState(const nlohmann::json& state, const GridMotion& motion);

QVector<QPoint> wirePoints(const nlohmann::json& wireState);
void setWirePoints(nlohmann::json& wireState, const QVector<QPoint>& points);

}  // namespace tauline::ui
