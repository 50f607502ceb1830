// Which terminals are joined: the nodes of the drawing. Wires join everything
// that lies on them (a terminal anywhere on a wire, a wire end on another
// wire); two wires that merely cross are not joined; wires with the same label
// are one node; ground symbols are the node "gnd".
#pragma once

#include "DrawingSnapshot.h"

#include <QHash>
#include <QStringList>

#include <array>

namespace tauline::ui {

struct LabelConflict {
    QStringList labels;  // two or more names given to one node
    QPoint where;
};

struct Connectivity {
    QVector<QString> nodeNames;  // by node index
    QHash<ItemId, std::array<int, 2>> partNodes;
    QHash<ItemId, std::array<int, 2>> markerNodes;
    QHash<ItemId, int> wireNodes;
    QHash<ItemId, int> groundNodes;
    // Whether a terminal touches a wire or another terminal.
    QHash<ItemId, std::array<bool, 2>> partTerminalJoined;
    QHash<ItemId, std::array<bool, 2>> markerTerminalJoined;
    QVector<QPoint> junctions;        // where three or more ends meet
    QVector<QPoint> danglingWireEnds;  // wire ends that touch nothing
    QVector<LabelConflict> labelConflicts;
    int groundNode = -1;               // -1 when nothing is grounded

    QString nodeName(int node) const { return node >= 0 ? nodeNames.value(node) : QString(); }
};

Connectivity deriveConnectivity(const DrawingSnapshot& drawing);

}  // namespace tauline::ui
