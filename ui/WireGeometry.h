// Integer geometry of wires: every wire point lies on the grid, so hit tests
// are exact and connectivity never depends on rounding.
#pragma once

#include <QPoint>
#include <QPointF>
#include <QHash>
#include <QSet>
#include <QVector>

namespace tauline::ui {

QPoint snapToGrid(QPointF scenePoint);

// On the closed segment a-b (any direction; exact for integer points).
bool pointOnSegment(QPoint p, QPoint a, QPoint b);
bool pointOnPolyline(QPoint p, const QVector<QPoint>& points);
// On the polyline but not one of its two ends.
bool pointInsidePolyline(QPoint p, const QVector<QPoint>& points);

// Drops repeated points and middle points of straight runs (not reversals).
QVector<QPoint> simplifyPolyline(const QVector<QPoint>& points);

// The points after `from` of an orthogonal route to `to`: [to] when they line
// up, else [elbow, to] leaving `from` horizontally or vertically.
QVector<QPoint> orthogonalRoute(QPoint from, QPoint to, bool horizontalFirst);

// The polyline with one end moved to `newEnd`, kept orthogonal: the
// neighbouring corner slides along when there is one and nothing is attached
// to it (it is not in `pinned`), else an elbow is added.
QVector<QPoint> stretchPolylineEnd(const QVector<QPoint>& points, bool firstEnd, QPoint newEnd,
                                   const QSet<QPoint>& pinned = {});

}  // namespace tauline::ui

namespace tauline::ui {

// A wire whose ends sat on terminals that moved (old point -> new point): the
// ends follow, the wire stays orthogonal; both ends moving alike moves it whole.
QVector<QPoint> followMovedEnds(const QVector<QPoint>& points, const QHash<QPoint, QPoint>& moved,
                                const QSet<QPoint>& pinned = {});

}  // namespace tauline::ui
