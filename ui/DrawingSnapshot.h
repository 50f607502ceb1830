// A plain copy of what the drawing holds, taken from the scene after each edit:
// the connectivity, the derived network and the drawing problems are pure
// functions of it (and so testable without a scene).
#pragma once

#include "Network.h"

#include <QPoint>
#include <QPointF>
#include <QString>
#include <QVector>

#include <array>

namespace tauline::ui {

using ItemId = quint64;

// What a response marker stands for: a driving-point port, or the input or
// output of a transfer response.
enum class MarkerRole { Port, Input, Output };
// How an input marker drives: a voltage (voltage gain) or a current
// (transimpedance).
enum class DriveKind { Voltage, Current };

const char* markerRoleName(MarkerRole role);   // "port", "input", "output"
const char* driveKindName(DriveKind drive);    // "voltage", "current"
bool markerRoleFromName(const QString& name, MarkerRole* role);
bool driveKindFromName(const QString& name, DriveKind* drive);

struct DrawnPart {
    ItemId id = 0;
    QString name;
    tauline::PartKind kind = tauline::PartKind::Resistor;
    double value = 0.0;
    QString valueText;
    std::array<QPoint, 2> terminals;
    QPointF centre;
};

struct DrawnGround {
    ItemId id = 0;
    QPoint terminal;
};

struct DrawnWire {
    ItemId id = 0;
    QVector<QPoint> points;  // at least two
    QString label;           // a node name the user gave, may be empty
};

// Terminal 0 is the + side, terminal 1 the − side; a − terminal that touches
// nothing means "referenced to ground".
struct DrawnMarker {
    ItemId id = 0;
    MarkerRole role = MarkerRole::Port;
    DriveKind drive = DriveKind::Voltage;
    std::array<QPoint, 2> terminals;
    QPointF centre;
};

// Each list is in item-id (creation) order, which makes node numbering and
// the part order of the derived network independent of positions.
struct DrawingSnapshot {
    QString title;
    QVector<DrawnPart> parts;
    QVector<DrawnGround> grounds;
    QVector<DrawnWire> wires;
    QVector<DrawnMarker> markers;
};

}  // namespace tauline::ui
