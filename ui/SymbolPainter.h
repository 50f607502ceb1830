// How each symbol looks, drawn in its own local frame so the items, the
// placement ghost and the tool icons share one drawing. Two-terminal parts lie
// along x with terminals at (±20, 0); markers stand along y with + at
// (0, −20) and − at (0, 20); the ground pin is at (0, 0) with the sign below.
#pragma once

#include "DrawingSnapshot.h"

#include <QColor>
#include <QIcon>

class QPainter;

namespace tauline::ui {

enum class SymbolKind { Resistor, Capacitor, Ground, Port, Input, Output, Wire };

void paintResistor(QPainter* painter, const QColor& ink, const QColor& fill);
void paintCapacitor(QPainter* painter, const QColor& ink);
void paintGround(QPainter* painter, const QColor& ink);
void paintPortMarker(QPainter* painter, const QColor& ink);
void paintInputMarker(QPainter* painter, const QColor& ink, DriveKind drive);
void paintOutputMarker(QPainter* painter, const QColor& ink);
// The small ground sign at a marker's − terminal when it touches nothing.
void paintImpliedGround(QPainter* painter, QPointF at, const QColor& ink);

// A toolbar icon showing the symbol.
QIcon symbolIcon(SymbolKind kind);

}  // namespace tauline::ui
