#pragma once

#include <QList>
#include <QPointF>
#include <QRectF>

namespace tauline::ui {

// Cuts a polyline to a rectangle (in data coordinates) and returns the
// pieces that lie inside, each a polyline of its own. Qt Charts clips on
// screen but QSvgGenerator writes no clip path, so an exported series that
// ran past the axes would draw outside the plot.
QList<QList<QPointF>> clipPolyline(const QList<QPointF>& points, const QRectF& box);

// Keeps only the points inside the rectangle (for markers).
QList<QPointF> pointsInside(const QList<QPointF>& points, const QRectF& box);

}  // namespace tauline::ui
